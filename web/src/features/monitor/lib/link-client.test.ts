import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import { type LinkStatus, MonitorLinkClient } from './link-client';
import { ChunkAccumulator } from './waveform-store';

class FakeSocket {
  static all: FakeSocket[] = [];
  readyState = 1;
  onmessage: ((m: MessageEvent) => void) | null = null;
  onclose: (() => void) | null = null;
  onerror: (() => void) | null = null;
  constructor(readonly url: string) {
    FakeSocket.all.push(this);
  }
  send(): void {}
  close(): void {
    this.readyState = 3;
  }
  frame(body: object): void {
    this.onmessage?.({ data: JSON.stringify(body) } as MessageEvent);
  }
  drop(): void {
    this.readyState = 3;
    this.onclose?.();
  }
}

const hello = {
  type: 'hello',
  sampleRateHz: 50,
  unit: 'mmHg',
  startAt: '2026-03-04T10:00:00.000Z',
};
const frame = (seq: number, t0Ms: number, n = 10) => ({
  type: 'samples',
  seq,
  t0: new Date(Date.parse(hello.startAt) + t0Ms).toISOString(),
  values: Array.from({ length: n }, (_, i) => seq * 100 + i),
});

describe('MonitorLinkClient', () => {
  beforeEach(() => {
    vi.useFakeTimers();
    FakeSocket.all = [];
  });
  afterEach(() => vi.useRealTimers());

  function start() {
    const got = {
      statuses: [] as LinkStatus[],
      values: [] as number[],
      gaps: 0,
      starts: [] as number[],
    };
    const client = new MonitorLinkClient(
      'ws://link.test/x',
      {
        status: (s) => got.statuses.push(s),
        hello: () => undefined,
        samples: (t0, v) => {
          got.starts.push(t0);
          got.values.push(...v);
        },
        gap: (n) => (got.gaps += n),
      },
      { createSocket: (u) => new FakeSocket(u) as unknown as WebSocket, delay: () => 1000 },
    );
    client.connect();
    return { client, got, socket: () => FakeSocket.all[FakeSocket.all.length - 1] };
  }

  it('counts frames missing by seq', () => {
    const { got, socket } = start();
    socket().frame(hello);
    socket().frame(frame(0, 0));
    socket().frame(frame(3, 600)); // frames 1 and 2 never came
    expect(got.gaps).toBe(2);
    expect(got.values).toHaveLength(20);
    expect(got.statuses).toContain('live');
  });

  it('reconnects after a drop and never hands on a sample twice', () => {
    const { got, socket } = start();
    socket().frame(hello);
    socket().frame(frame(0, 0));
    socket().frame(frame(1, 200));
    socket().drop();
    expect(got.statuses[got.statuses.length - 1]).toBe('lost');
    vi.advanceTimersByTime(1000);
    expect(FakeSocket.all).toHaveLength(2);
    // The link replays from 100 ms before the last sample it sent: 5 of 10 are old.
    socket().frame(hello);
    socket().frame({ ...frame(0, 300), values: Array.from({ length: 10 }, (_, i) => 900 + i) });
    expect(got.values).toHaveLength(25);
    expect(got.values.slice(20)).toEqual([905, 906, 907, 908, 909]);
    expect(got.starts[2]).toBe(Date.parse(hello.startAt) + 400); // 20 samples × 20 ms
  });

  it('treats a silent link as lost, and stays closed after disconnect', () => {
    const { client, got, socket } = start();
    socket().frame(hello);
    vi.advanceTimersByTime(1900);
    expect(got.statuses).not.toContain('lost');
    // Issue: "Link lost" within 3 s of the last sample (frames come every 200 ms).
    vi.advanceTimersByTime(200);
    expect(got.statuses).toContain('lost');
    client.disconnect();
    vi.advanceTimersByTime(60_000);
    expect(FakeSocket.all).toHaveLength(1);
    expect(got.statuses[got.statuses.length - 1]).toBe('idle');
  });
});

describe('ChunkAccumulator', () => {
  it('closes chunks every 5 s and at a discontinuity, each at its exact start', () => {
    const out: { startAt: string; values: number[]; seq: number }[] = [];
    const acc = new ChunkAccumulator((c) => out.push(c));
    const t0 = Date.parse('2026-03-04T10:00:00Z');
    for (let i = 0; i < 30; i++) acc.push(t0 + i * 200, new Array(10).fill(i), 50, 'mmHg');
    acc.push(t0 + 60_000, [1, 2], 50, 'mmHg'); // after a gap
    acc.flush();
    expect(out.map((c) => c.values.length)).toEqual([250, 50, 2]);
    expect(out.map((c) => c.startAt)).toEqual([
      '2026-03-04T10:00:00.000Z',
      '2026-03-04T10:00:05.000Z',
      '2026-03-04T10:01:00.000Z',
    ]);
    expect(out.map((c) => c.seq)).toEqual([0, 1, 2]);
  });
});
