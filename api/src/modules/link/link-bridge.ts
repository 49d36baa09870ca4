import type { AddressInfo } from 'node:net';
import type { Readable } from 'node:stream';
import { WebSocketServer } from 'ws';
import { parseMonitorFile } from '../../common/monitor-file/parse-monitor-file';
import type { LineError } from '../../common/monitor-file/monitor-csv';
import { type LinkSource, startPacedLink } from './paced-link';

export interface BridgeOptions {
  input: Readable;
  label: string;
  port: number;
  speed: number;
}

export interface Bridge {
  port: number;
  source: LinkSource;
  /** Pieces of the file that were not contiguous (replayed back to back). */
  segments: number;
  close(): Promise<void>;
}

export class BridgeInputError extends Error {
  constructor(readonly errors: LineError[]) {
    super(errors.map((e) => `line ${e.line}: ${e.message}`).join('\n'));
  }
}

/** Reads a monitor CSV (same checks as the import) into one array of samples. */
export async function readRecording(input: Readable, label: string) {
  const pieces: Float32Array[] = [];
  const parsed = await parseMonitorFile(input, (chunks) => {
    for (const c of chunks) pieces.push(c.values);
    return Promise.resolve();
  });
  if (parsed.errors.length > 0) throw new BridgeInputError(parsed.errors);
  const values = new Float32Array(pieces.reduce((n, p) => n + p.length, 0));
  let at = 0;
  let segments = 0;
  for (const p of pieces) {
    values.set(p, at);
    at += p.length;
    segments++;
  }
  const source: LinkSource = {
    sampleRateHz: parsed.sampleRateHz,
    unit: parsed.unit ?? 'mmHg',
    values,
    label: `file:${label}`,
  };
  return { source, segments };
}

/**
 * Replays a monitor CSV as a live link (CONTRACT.md "Monitor link"): each client that
 * connects gets `hello` and the recording from its start, paced to the wall clock. A real
 * device adapter can later stand behind the same protocol.
 */
export async function startBridge(o: BridgeOptions): Promise<Bridge> {
  const { source, segments } = await readRecording(o.input, o.label);
  const wss = new WebSocketServer({ port: o.port, maxPayload: 64 * 1024 });
  await new Promise<void>((resolve, reject) => {
    wss.once('listening', resolve);
    wss.once('error', reject);
  });
  const stops = new Set<() => void>();
  wss.on('connection', (ws) => {
    const stop = startPacedLink(ws, source, { speed: o.speed });
    stops.add(stop);
    ws.on('close', () => {
      stop();
      stops.delete(stop);
    });
  });
  return {
    port: (wss.address() as AddressInfo).port,
    source,
    segments,
    close: () =>
      new Promise<void>((resolve) => {
        for (const stop of stops) stop();
        for (const c of wss.clients) c.terminate();
        wss.close(() => resolve());
      }),
  };
}
