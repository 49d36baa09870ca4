import { type LinkMessage, linkMessageSchema } from '@upstroke/contracts';
import { type LinkSocket, type LinkSource, startPacedLink } from './paced-link';
import { isDown, SimulatedDrops } from './simulated-drop';

/** A socket that keeps what it was sent. */
function fakeSocket() {
  const sent: LinkMessage[] = [];
  const socket: LinkSocket = {
    readyState: 1,
    bufferedAmount: 0,
    send: (data) => void sent.push(linkMessageSchema.parse(JSON.parse(data))),
    close: () => undefined,
  };
  const samples = () => sent.filter((m) => m.type === 'samples');
  return { socket, sent, samples };
}

// 10 Hz, 2 frames of 5 samples a second; 60 s of a ramp (invented values).
const src: LinkSource = {
  sampleRateHz: 10,
  unit: 'mmHg',
  values: Array.from({ length: 600 }, (_, i) => i / 10),
  label: 'test',
};
const T0 = Date.parse('2026-03-04T10:00:00Z');

describe('paced link with a simulated drop (fake timers: time is the subject)', () => {
  let clock = T0;
  const now = () => clock;
  beforeEach(() => {
    jest.useFakeTimers();
    clock = T0;
  });
  afterEach(() => jest.useRealTimers());
  const run = (ms: number) => {
    for (let t = 0; t < ms; t += 50) {
      clock += 50;
      jest.advanceTimersByTime(50);
    }
  };

  it('sends nothing in the silent stretch, keeps numbering frames, then goes on', () => {
    const drops = new SimulatedDrops();
    const plan = drops.plan(
      '?scenario=rosc&dropAfter=10&dropFor=20',
      { dropAfter: 10, dropFor: 20 },
      now(),
    );
    expect(plan).not.toBeNull();
    const { socket, samples } = fakeSocket();
    const stop = startPacedLink(socket, src, {
      speed: 1,
      now,
      anchorMs: plan?.anchorMs,
      silence: plan?.silence,
      batchSize: 5,
    });
    run(40_000);
    stop();
    const t0s = samples().map((m) => (m.type === 'samples' ? Date.parse(m.t0) - T0 : NaN));
    // Frames every 0.5 s up to 10 s, none from 10 to 30 s, then again.
    expect(t0s.filter((t) => t >= 10_000 && t < 30_000)).toEqual([]);
    expect(t0s.filter((t) => t < 10_000)).toHaveLength(20);
    expect(t0s.filter((t) => t >= 30_000).length).toBeGreaterThanOrEqual(19);
    const seqs = samples().map((m) => (m.type === 'samples' ? m.seq : -1));
    const after = t0s.findIndex((t) => t >= 30_000);
    // The 40 frames of the drop were numbered and never sent.
    expect(seqs[after] - seqs[after - 1]).toBe(41);
  });

  it('the same address is the same monitor: refused while down, resumed at the present after', () => {
    const drops = new SimulatedDrops();
    const q = { dropAfter: 10, dropFor: 20 };
    const address = '?scenario=rosc&seed=4&dropAfter=10';
    const plan = drops.plan(address, q, now());
    if (!plan) throw new Error('no plan');
    expect(isDown(plan, 1, T0 + 9_999)).toBe(false);
    expect(isDown(plan, 1, T0 + 10_000)).toBe(true);
    expect(isDown(plan, 1, T0 + 29_999)).toBe(true);
    expect(isDown(plan, 1, T0 + 30_000)).toBe(false);
    // Speed 10: ten seconds of stream a second, so the drop is from 1 s to 3 s of wall time.
    expect(isDown(plan, 10, T0 + 1_500)).toBe(true);
    // A reconnect 31 s later: the same anchor, the stream resumes at 31 s, not at 0.
    clock = T0 + 31_000;
    const again = drops.plan(address, q, now());
    expect(again?.anchorMs).toBe(T0);
    expect(drops.plan('?scenario=rosc&seed=5&dropAfter=10', q, now())?.anchorMs).toBe(clock);
    expect(drops.plan('?scenario=rosc', { dropAfter: undefined, dropFor: 20 }, now())).toBeNull();
    const { socket, sent, samples } = fakeSocket();
    const stop = startPacedLink(socket, src, { speed: 1, now, ...again, batchSize: 5 });
    run(1_000);
    stop();
    expect(sent[0]).toMatchObject({ type: 'hello', startAt: new Date(T0).toISOString() });
    const first = samples()[0];
    expect(first?.type === 'samples' && Date.parse(first.t0) - T0).toBe(31_000);
    expect(first?.type === 'samples' && first.values[0]).toBe(src.values[310]);
  });
});
