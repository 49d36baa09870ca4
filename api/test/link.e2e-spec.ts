import type { AddressInfo } from 'node:net';
import { detectBreaths } from '@upstroke/capno';
import { linkMessageSchema, type LinkMessage } from '@upstroke/contracts';
import WebSocket from 'ws';
import { simulatorSource } from '../src/modules/link/simulator';
import { startTestApp, type TestApp } from './test-app';

/** Collects frames until `count` sample frames arrived (or the socket closes). */
function collect(url: string, count: number): Promise<LinkMessage[]> {
  return new Promise((resolve, reject) => {
    const ws = new WebSocket(url);
    const got: LinkMessage[] = [];
    ws.on('message', (data: Buffer) => {
      got.push(linkMessageSchema.parse(JSON.parse(data.toString('utf8'))));
      if (got.filter((m) => m.type === 'samples').length >= count) ws.close();
    });
    ws.on('close', () => resolve(got));
    ws.on('error', reject);
  });
}

describe('monitor link simulator', () => {
  let t: TestApp;
  let base: string;
  beforeAll(async () => {
    t = await startTestApp();
    await t.app.listen(0, '127.0.0.1');
    const { port } = t.app.getHttpServer().address() as AddressInfo;
    base = `ws://127.0.0.1:${port}/api/link/simulator`;
  });
  afterAll(() => t.close());

  it('sends hello, then consecutive sample frames with contiguous times', async () => {
    const frames = await collect(`${base}?scenario=rosc&speed=50`, 20);
    const [hello, ...rest] = frames;
    expect(hello).toMatchObject({ type: 'hello', sampleRateHz: 50, unit: 'mmHg' });
    const samples = rest.filter((m) => m.type === 'samples');
    expect(samples.map((s) => s.seq)).toEqual(samples.map((_, i) => i));
    for (let i = 1; i < samples.length; i++) {
      const step = Date.parse(samples[i].t0) - Date.parse(samples[i - 1].t0);
      // Each frame starts where the previous one ended: its sample count over the rate.
      expect(step).toBe((samples[i - 1].values.length * 1000) / 50);
    }
    expect(samples[0].t0).toBe(hello.type === 'hello' ? hello.startAt : '');
    expect(samples.flatMap((s) => s.values).every((v) => v >= 0 && v < 80)).toBe(true);
  });

  it('refuses an unknown scenario with a 400 naming the parameter', async () => {
    const status = await new Promise<number>((resolve) => {
      const ws = new WebSocket(`${base}?scenario=asystole-forever`);
      ws.on('unexpected-response', (_req, res) => resolve(res.statusCode ?? 0));
      ws.on('error', () => undefined);
    });
    expect(status).toBe(400);
  });

  it('simulates a ROSC rise and a dislodged tube that the breath detector sees', () => {
    const rosc = simulatorSource({ scenario: 'rosc', seed: 3 });
    const breaths = detectBreaths(rosc.values, rosc.sampleRateHz);
    const before = breaths.filter((b) => b.tSec > 200 && b.tSec < 350);
    const after = breaths.filter((b) => b.tSec > 400 && b.tSec < 500);
    const mean = (xs: typeof breaths) => xs.reduce((a, b) => a + b.etco2MmHg, 0) / xs.length;
    // 10 ventilations/min, the scenario's set rate: ~25 in 150 s.
    expect(before.length).toBeGreaterThan(20);
    expect(mean(after) - mean(before)).toBeGreaterThan(10);
    const tube = simulatorSource({ scenario: 'dislodged-tube', seed: 3 });
    const tubeBreaths = detectBreaths(tube.values, tube.sampleRateHz);
    expect(tubeBreaths.some((b) => b.tSec > 200 && b.tSec < 290)).toBe(true);
    expect(tubeBreaths.some((b) => b.tSec > 310)).toBe(false);
  });
});
