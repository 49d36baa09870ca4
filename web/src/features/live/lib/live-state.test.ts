import { describe, expect, it } from 'vitest';
import { cycleStart, liveState } from './live-state';
import { ARREST, ev, T0 } from './test-events';

describe('liveState', () => {
  it('tracks compressions, epinephrine, rhythm checks and shocks in time order', () => {
    const events = [
      ev('compressions-start', 5),
      ev('rhythm', 120, { rhythm: 'vf' }),
      ev('compressions-stop', 118),
      ev('shock', 125, { energyJ: 200 }),
      ev('drug', 200, { drug: 'epinephrine', dose: 1, unit: 'mg' }),
      ev('drug', 230, { drug: 'amiodarone', dose: 300, unit: 'mg' }),
    ];
    const s = liveState(events, ARREST);
    expect(s.phase).toBe('pulseless');
    expect(s.compressing).toBe(false);
    expect(s.compressionsChangedAt).toBe(T0 + 118_000);
    expect(s.lastRhythmCheckAt).toBe(T0 + 120_000);
    expect(s.lastEpinephrineAt).toBe(T0 + 200_000);
    expect(s.shocks).toBe(1);
    expect(s.inForce.at(-1)?.kind).toBe('drug');
  });

  it('applies a correction: the superseded event no longer counts', () => {
    const start = ev('compressions-start', 5);
    const shock = ev('shock', 60, { energyJ: 200 });
    const fix = ev('correction', 61, { supersedes: shock.id, reason: 'undo' });
    const s = liveState([start, shock, fix], ARREST);
    expect(s.shocks).toBe(0);
    expect(s.compressing).toBe(true);
    expect(s.inForce.map((e) => e.id)).toEqual([start.id]);
  });

  it('follows the patient: ROSC, re-arrest (a new cycle begins), end', () => {
    const rosc = ev('rosc', 300);
    const rearrest = ev('rearrest', 900);
    const base = [ev('compressions-start', 5), ev('rhythm', 240, { rhythm: 'vf' }), rosc];
    expect(liveState(base, ARREST)).toMatchObject({ phase: 'rosc', phaseSince: T0 + 300_000 });
    const again = liveState([...base, rearrest], ARREST);
    expect(again).toMatchObject({ phase: 'pulseless', phaseSince: T0 + 900_000 });
    // The 2-min cycle counts from the re-arrest, not from the check before the ROSC.
    expect(cycleStart(again, T0)).toBe(T0 + 900_000);
    const ended = liveState([...base, rearrest, ev('end', 1000, { reason: 'terminated' })], ARREST);
    expect(ended).toMatchObject({ phase: 'ended', ended: true, endReason: 'terminated' });
  });

  it('an undone ROSC puts the patient back to pulseless', () => {
    const rosc = ev('rosc', 300);
    const s = liveState([rosc, ev('correction', 302, { supersedes: rosc.id })], ARREST);
    expect(s.phase).toBe('pulseless');
    expect(s.phaseSince).toBe(T0);
  });
});
