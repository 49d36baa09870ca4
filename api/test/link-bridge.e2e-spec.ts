import { spawn } from 'node:child_process';
import { resolve } from 'node:path';
import { Readable } from 'node:stream';
import { linkMessageSchema, type LinkMessage } from '@upstroke/contracts';
import WebSocket from 'ws';
import { startBridge } from '../src/modules/link/link-bridge';
import { monitorCsv } from './monitor-files';

function frames(url: string, samples: number): Promise<LinkMessage[]> {
  return new Promise((done, reject) => {
    const ws = new WebSocket(url);
    const got: LinkMessage[] = [];
    let n = 0;
    ws.on('message', (data: Buffer) => {
      const m = linkMessageSchema.parse(JSON.parse(data.toString('utf8')));
      got.push(m);
      if (m.type === 'samples') n += m.values.length;
      if (n >= samples) ws.close();
    });
    ws.on('close', () => done(got));
    ws.on('error', reject);
  });
}

describe('link bridge (npm run link)', () => {
  const csv = monitorCsv({ startIso: '2026-03-04T10:00:00Z', durationSec: 30, sampleRateHz: 50 });

  it('replays a CSV in the link protocol, every sample once and in order', async () => {
    const bridge = await startBridge({
      input: Readable.from([csv]),
      label: 'test.csv',
      port: 0,
      speed: 50,
    });
    try {
      const got = await frames(`ws://127.0.0.1:${bridge.port}`, 1500);
      expect(got[0]).toMatchObject({
        type: 'hello',
        sampleRateHz: 50,
        unit: 'mmHg',
        source: 'file:test.csv',
      });
      const sent = got.flatMap((m) => (m.type === 'samples' ? m.values : []));
      // The file's own values (2 decimals), back in the same order.
      const fileValues = csv
        .split('\n')
        .slice(2, 1502)
        .map((l) => Number(l.split(',')[1]));
      expect(sent.slice(0, 1500)).toEqual(fileValues);
    } finally {
      await bridge.close();
    }
  });

  it('runs as a command reading stdin, and exits 2 naming the line of a bad file', async () => {
    const run = (input: string) =>
      new Promise<{ code: number | null; out: string; err: string }>((done) => {
        const child = spawn(
          process.execPath,
          [
            '--conditions=upstroke-source',
            '--import',
            'tsx',
            resolve(__dirname, '../src/modules/link/link-bridge.cli.ts'),
            '--from',
            '-',
            '--port',
            '0',
          ],
          { cwd: resolve(__dirname, '../..') },
        );
        let out = '';
        let err = '';
        child.stdout.on('data', (d: Buffer) => {
          out += d.toString();
          if (out.includes('ws://')) child.kill('SIGTERM');
        });
        child.stderr.on('data', (d: Buffer) => (err += d.toString()));
        child.on('close', (code) => done({ code, out, err }));
        child.stdin.end(input);
      });
    const ok = await run(csv);
    expect(ok.out).toMatch(/1500 samples at 50 Hz .* on ws:\/\/localhost:\d+/);
    const bad = await run('# unit=mmHg\ntime,co2\n2026-03-04T10:00:00Z,abc\n');
    expect(bad.code).toBe(2);
    expect(bad.err).toMatch(/line 3: co2: "abc" is not a number/);
  }, 60_000);
});
