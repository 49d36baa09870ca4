import { createReadStream } from 'node:fs';
import { parseArgs } from 'node:util';
import { BridgeInputError, startBridge } from './link-bridge';

/**
 * `npm run link -- --from <file.csv | -> [--port 8765] [--speed 1]`: serves a monitor CSV
 * as a live link on ws://localhost:<port>. Exit 2 with the file's line errors on bad input.
 */
async function main(): Promise<void> {
  const { values } = parseArgs({
    options: {
      from: { type: 'string' },
      port: { type: 'string', default: '8765' },
      speed: { type: 'string', default: '1' },
    },
  });
  const port = Number(values.port);
  const speed = Number(values.speed);
  if (!values.from || !Number.isInteger(port) || !(speed > 0 && speed <= 100)) {
    process.stderr.write(
      'usage: npm run link -- --from <file.csv | -> [--port 8765] [--speed 1]\n',
    );
    process.exit(2);
  }
  const fromStdin = values.from === '-';
  const input = fromStdin ? process.stdin : createReadStream(values.from);
  const bridge = await startBridge({
    input,
    label: fromStdin ? 'stdin' : values.from,
    port,
    speed,
  });
  const { sampleRateHz, values: samples } = bridge.source;
  process.stdout.write(
    `link: ${samples.length} samples at ${sampleRateHz} Hz (${bridge.segments} segment(s)) ` +
      `on ws://localhost:${bridge.port}\n`,
  );
  const stop = () => void bridge.close().then(() => process.exit(0));
  process.on('SIGINT', stop);
  process.on('SIGTERM', stop);
}

main().catch((e: unknown) => {
  const message = e instanceof BridgeInputError ? e.message : String((e as Error)?.message ?? e);
  process.stderr.write(`link: ${message}\n`);
  process.exit(2);
});
