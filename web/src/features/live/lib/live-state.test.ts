import { describe, expect, it } from 'vitest';
import type { LocalEvent } from '../../../lib/offline';
import { liveState } from './live-state';

let n = 0;
function ev(kind: LocalEvent['kind'], sec: number, data: Record<string, unknown> = {}): LocalEvent {
  n += 1;
  const at = new Date(Date.UTC(2026, 2, 4, 10, 0, sec)).toISOString();
  return { id: `e${n}`, resuscitationId: 'r', at, kind, data, deviceId: 'd' };
}

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
    const s = liveState(events);
    expect(s.compressing).toBe(false);
    expect(s.compressionsChangedAt).toBe(Date.UTC(2026, 2, 4, 10, 1, 58));
    expect(s.lastRhythmCheckAt).toBe(Date.UTC(2026, 2, 4, 10, 2, 0));
    expect(s.lastEpinephrineAt).toBe(Date.UTC(2026, 2, 4, 10, 3, 20));
    expect(s.shocks).toBe(1);
    expect(s.undoable?.kind).toBe('drug');
  });

  it('applies a correction: the superseded event no longer counts, Undo moves to the one before', () => {
    const start = ev('compressions-start', 5);
    const shock = ev('shock', 60, { energyJ: 200 });
    const fix = ev('correction', 61, { supersedes: shock.id, reason: 'undo' });
    const s = liveState([start, shock, fix]);
    expect(s.shocks).toBe(0);
    expect(s.compressing).toBe(true);
    expect(s.undoable?.id).toBe(start.id);
  });
});
