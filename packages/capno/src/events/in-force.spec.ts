import { describe, expect, it } from 'vitest';
import { eventsInForce, supersededByMap, supersededIds } from './corrections.js';

const at = (sec: number) => new Date(Date.parse('2026-03-04T10:00:00Z') + sec * 1000).toISOString();
const ev = (id: string, sec: number, kind: string, data: object = {}) => ({
  id,
  at: at(sec),
  kind,
  data,
  extra: `row ${id}`,
});

describe('eventsInForce (the correction rule for screens and exports)', () => {
  it('drops superseded events and corrections, puts a replacement in place at its own time', () => {
    const events = [
      ev('a', 0, 'arrest'),
      ev('s', 60, 'shock', { energyJ: 150 }),
      ev('r', 90, 'rosc'),
      ev('c1', 100, 'correction', {
        supersedes: 's',
        replacement: { kind: 'shock', data: { energyJ: 200 }, at: at(55) },
      }),
      ev('c2', 120, 'correction', { supersedes: 'r' }),
    ];
    expect(eventsInForce(events)).toEqual([
      ev('a', 0, 'arrest'),
      { ...ev('c1', 55, 'shock', { energyJ: 200 }), extra: 'row c1' },
    ]);
    expect(supersededByMap(events)).toEqual(
      new Map([
        ['s', 'c1'],
        ['r', 'c2'],
      ]),
    );
  });

  it('restores an event when the correction that removed it is itself superseded (undo of an undo)', () => {
    const events = [
      ev('r', 90, 'rosc'),
      ev('u1', 95, 'correction', { supersedes: 'r' }),
      ev('u2', 97, 'correction', { supersedes: 'u1' }),
    ];
    expect(eventsInForce(events).map((e) => e.id)).toEqual(['r']);
    // The same rule for the event list: the undone correction supersedes nothing.
    expect(supersededByMap(events)).toEqual(new Map([['u1', 'u2']]));
  });

  it('names what the corrections in force took back, typed EtCO2 values included', () => {
    const events = [
      ev('r', 90, 'rosc'),
      ev('u1', 95, 'correction', { supersedes: 'r' }),
      ev('u2', 97, 'correction', { supersedes: 'u1' }),
      // 'v' is not an event: a typed EtCO2 value taken back by Undo.
      ev('u3', 99, 'correction', { supersedes: 'v' }),
    ];
    expect([...supersededIds(events)].sort()).toEqual(['u1', 'v']);
  });
});
