import { describe, expect, it } from 'vitest';
import { liveState } from './live-state';
import { ARREST, ev, typed } from './test-events';
import { undoneIds, undoTarget } from './undo-target';

const target = (events: Parameters<typeof liveState>[0], etco2: ReturnType<typeof typed>[]) =>
  undoTarget(liveState(events, ARREST).inForce, events, etco2);

describe('undoTarget', () => {
  it('takes back a typed EtCO2 value typed after the last event, and names it', () => {
    const rhythm = ev('rhythm', 60, { rhythm: 'vf' });
    const value = typed(18, 70);
    expect(target([rhythm], [value])).toEqual({
      id: value.id,
      at: value.at,
      label: 'EtCO2 18 mmHg',
    });
  });

  it('then the event before it, once the value is undone; monitor values are never undone', () => {
    const rhythm = ev('rhythm', 60, { rhythm: 'vf' });
    const value = typed(18, 70);
    const undo = ev('correction', 72, { supersedes: value.id });
    const stream = typed(30, 75, 'stream');
    const events = [rhythm, undo];
    expect(target(events, [value, stream])).toMatchObject({ id: rhythm.id, label: 'Rhythm: VF' });
    expect([...undoneIds(events)]).toEqual([value.id]);
  });

  it('nothing to undo on an empty record', () => {
    expect(target([], [])).toBeNull();
  });
});
