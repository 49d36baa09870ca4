import type { DebriefEvent } from '@upstroke/contracts';
import { describe, expect, it } from 'vitest';
import { eventRows } from './event-rows';

const t0 = Date.parse('2026-03-04T10:00:00Z');
const ev = (
  id: string,
  s: number,
  kind: string,
  data: Record<string, unknown>,
  o: Partial<DebriefEvent> = {},
) =>
  ({
    id,
    at: new Date(t0 + s * 1000).toISOString(),
    tSec: s,
    kind,
    data,
    recordedBy: 'u1',
    recordedByName: 'Rae Recorder',
    amendment: false,
    amendmentId: null,
    supersededBy: null,
    ...o,
  }) as DebriefEvent;

const record = { arrestAt: '2026-03-04T10:00:00Z' } as never;

describe('eventRows', () => {
  it('lists dose, route, energy and note text with who recorded them', () => {
    const rows = eventRows({
      record,
      events: [
        ev('a', 0, 'arrest', { witnessed: true }),
        ev('s', 60, 'shock', { energyJ: 200 }),
        ev('d', 90, 'drug', { drug: 'epinephrine', dose: 1, unit: 'mg', route: 'iv' }),
        ev('n', 95, 'note', { text: 'Family in the relatives room' }),
      ],
    });
    expect(rows.map((r) => [r.event, r.details])).toEqual([
      ['Arrest', 'witnessed'],
      ['Shock', '200 J'],
      ['Drug', 'Epinephrine 1 mg IV'],
      ['Note', 'Family in the relatives room'],
    ]);
    expect(rows[2].by).toBe('Rae Recorder');
  });

  it('strikes a corrected event and puts its amended replacement at its own time', () => {
    const rows = eventRows({
      record,
      events: [
        ev(
          'd',
          90,
          'drug',
          { drug: 'epinephrine', dose: 1, unit: 'mg', route: 'iv' },
          { supersededBy: 'c' },
        ),
        ev('u', 120, 'rhythm', { rhythm: 'vf' }, { supersededBy: 'k' }),
        ev('k', 121, 'correction', { supersedes: 'u' }),
        ev(
          'c',
          4000,
          'correction',
          {
            supersedes: 'd',
            reason: 'Given IO, not IV',
            replacement: {
              kind: 'drug',
              at: new Date(t0 + 90_000).toISOString(),
              data: { drug: 'epinephrine', dose: 1, unit: 'mg', route: 'io' },
            },
          },
          { amendment: true },
        ),
      ],
    });
    expect(rows.map((r) => [r.id, r.details, r.struck])).toEqual([
      ['d', 'Epinephrine 1 mg IV', true],
      ['c', 'Epinephrine 1 mg IO', false],
      ['u', 'VF', true],
    ]);
    expect(rows[0].note).toBe('Replaced by an amendment: Given IO, not IV');
    expect(rows[1]).toMatchObject({ tSec: 90, amended: true });
    expect(rows[1].note).toBe('Amended (was Drug Epinephrine 1 mg IV): Given IO, not IV');
    expect(rows[2].note).toBe('Taken back');
  });

  it('puts a replacement with a corrected dose and time at its new time, naming the old one', () => {
    const rows = eventRows({
      record,
      events: [
        ev(
          'd',
          200,
          'drug',
          { drug: 'epinephrine', dose: 1, unit: 'mg', route: 'iv' },
          {
            supersededBy: 'c',
          },
        ),
        ev('r', 150, 'rhythm', { rhythm: 'pea' }),
        ev(
          'c',
          9000,
          'correction',
          {
            supersedes: 'd',
            reason: 'Drug chart',
            replacement: {
              kind: 'drug',
              at: new Date(t0 + 140_000).toISOString(),
              data: { drug: 'epinephrine', dose: 0.5, unit: 'mg', route: 'iv' },
            },
          },
          { amendment: true },
        ),
      ],
    });
    expect(rows.map((r) => [r.id, r.tSec, r.details, r.struck])).toEqual([
      ['c', 140, 'Epinephrine 0.5 mg IV', false],
      ['r', 150, 'PEA', false],
      ['d', 200, 'Epinephrine 1 mg IV', true],
    ]);
    expect(rows[0].note).toBe('Amended (was Drug Epinephrine 1 mg IV at 3:20): Drug chart');
  });
});
