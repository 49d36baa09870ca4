import { describe, expect, it } from 'vitest';
import { analyze } from '../analyze.js';
import { compressionEvents, ev, record } from '../testing/records.js';
import { normalizeEvents } from './normalize.js';

describe('CPR measures from the event log', () => {
  it('computes times, pauses with context and the compression fraction', () => {
    const input = record([
      ev('arrest', 0, { witnessed: true }),
      ...compressionEvents(20, 600, [
        [120, 128], // rhythm check
        [240, 262], // pre-shock: 15 s to the shock, 7 s after
        [400, 405], // airway
        [500, 530], // nothing recorded
      ]),
      ev('rhythm', 122, { rhythm: 'vf' }),
      ev('shock', 255, { energyJ: 200 }),
      ev('airway', 401, { device: 'tracheal-tube', confirmation: 'waveform-capnography' }),
      ev('drug', 300, { drug: 'epinephrine' }),
      ev('drug', 540, { drug: 'epinephrine' }),
      ev('end', 600, { reason: 'terminated' }),
    ]);
    const m = analyze(input).measures;
    expect(m.durationSec).toBe(600);
    expect(m.timeToFirstCompressionSec).toBe(20);
    expect(m.timeToFirstShockSec).toBe(255);
    expect(m.timeToFirstEpinephrineSec).toBe(300);
    expect(m.epinephrineIntervalsSec).toEqual([240]);
    expect(m.pauses.map((p) => [p.context, p.durationSec])).toEqual([
      ['rhythm-check', 8],
      ['pre-shock', 22],
      ['airway', 5],
      ['unexplained', 30],
    ]);
    expect(m.pauses[1]).toMatchObject({ preShockSec: 15, postShockSec: 7 });
    expect(m.longestPauseSec).toBe(30);
    // compression time = 580 − (8 + 22 + 5 + 30) = 515 over 600 s without circulation
    expect(m.compressionFraction).toBeCloseTo(515 / 600, 10);
  });

  it('counts pulseless time only: a pulse present is ROSC until pulse absent', () => {
    const input = record([
      ...compressionEvents(0, 200, [[100, 110]]),
      ev('pulse', 100, { present: true }), // organised rhythm with a pulse: not a pause
      ev('pulse', 108, { present: false }),
      ev('rosc', 200, {}),
      ev('end', 400, { reason: 'rosc-sustained' }),
    ]);
    const m = analyze(input).measures;
    expect(m.pauses).toEqual([]);
    expect(m.timeWithoutCirculationSec).toBe(192);
    expect(m.compressionFraction).toBeCloseTo(190 / 192, 10);
    expect(m.roscPeriods).toEqual([
      { startSec: 100, endSec: 108 },
      { startSec: 200, endSec: 400 },
    ]);
  });

  it('applies corrections before analysis (removal, replacement, corrected corrections)', () => {
    const shock = ev('shock', 50, { energyJ: 150 }, 'shock-1');
    const wrong = ev('drug', 60, { drug: 'amiodarone' }, 'drug-1');
    const events = normalizeEvents(record([]).arrestAt, [
      shock,
      wrong,
      ev(
        'correction',
        70,
        {
          supersedes: 'drug-1',
          replacement: { kind: 'drug', data: { drug: 'epinephrine' }, at: shock.at },
        },
        'c-1',
      ),
      ev('correction', 80, { supersedes: 'shock-1', reason: 'logged twice' }, 'c-2'),
      ev('correction', 90, { supersedes: 'c-2', reason: 'it was right' }, 'c-3'),
    ]);
    expect(events.map((e) => [e.id, e.kind, e.tSec])).toEqual([
      ['shock-1', 'shock', 50],
      ['c-1', 'drug', 50],
    ]);
  });
});
