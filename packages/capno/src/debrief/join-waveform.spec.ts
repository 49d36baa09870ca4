import { describe, expect, it } from 'vitest';
import { analyze } from '../analyze.js';
import { valuesBesideWaveform } from '../etco2/series.js';
import { synthCapnogram } from '../testing/synth-capnogram.js';
import { analyseStored } from './compose.js';
import { joinWaveform } from './stored-record.js';

const at = (sec: number) => new Date(Date.parse('2026-03-04T10:00:00Z') + sec * 1000).toISOString();

describe('joinWaveform (one rule for the debrief and the audit summary)', () => {
  it('places chunks on one clock, leaves a gap as a gap and drops overlapping samples', () => {
    const w = joinWaveform([
      { startAt: at(1), sampleRateHz: 10, unit: 'mmHg', values: [5, 6] }, // t = 1.0–1.1 s
      { startAt: at(0), sampleRateHz: 10, unit: 'mmHg', values: [1, 2, 3] }, // t = 0.0–0.2 s
      { startAt: at(0.3), sampleRateHz: 10, unit: 'mmHg', values: [4] }, // follows on at 0.3 s
      { startAt: at(1.1), sampleRateHz: 10, unit: 'mmHg', values: [9, 7] }, // 1.1 overlaps
    ]);
    expect(w.map((r) => [r.startAt, r.values])).toEqual([
      [at(0), [1, 2, 3, 4]],
      [at(1), [5, 6, 7]],
    ]);
  });

  it('never allocates samples for a gap: two chunks a year apart are two short runs', () => {
    const year = 365 * 24 * 3600;
    const w = joinWaveform([
      { startAt: at(0), sampleRateHz: 200, unit: 'mmHg', values: [1, 2] },
      { startAt: at(year), sampleRateHz: 200, unit: 'mmHg', values: [3] },
    ]);
    expect(w.map((r) => r.values.length)).toEqual([2, 1]);
  });

  it('uses only the source with most samples, so an import and a stream are not mixed', () => {
    const w = joinWaveform([
      { startAt: at(0), sampleRateHz: 10, unit: 'mmHg', source: 'stream', values: [1, 1] },
      { startAt: at(0), sampleRateHz: 10, unit: 'kPa', source: 'import', values: [4, 4, 4] },
    ]);
    expect(w).toMatchObject([{ unit: 'kPa', values: [4, 4, 4] }]);
  });

  it('returns nothing for no chunks', () => {
    expect(joinWaveform([])).toEqual([]);
  });
});

describe('valuesBesideWaveform (a breath is counted once)', () => {
  // A capnogram synthesised with known breaths (physical model in testing/synth-capnogram).
  const cap = synthCapnogram({ durationSec: 120 });
  const waveform = {
    startAt: at(0),
    sampleRateHz: cap.sampleRateHz,
    unit: 'mmHg' as const,
    values: Array.from(cap.values),
  };
  // What the monitor link would also have stored: one value per breath, read off the same trace.
  const perBreath = cap.truth.breaths.map((b) => ({
    at: at(b.tSec),
    value: b.etco2MmHg,
    unit: 'mmHg' as const,
    source: 'stream' as const,
  }));
  const typed = { at: at(30), value: 18, unit: 'mmHg' as const, source: 'manual' as const };
  const afterTrace = { at: at(200), value: 25, unit: 'mmHg' as const, source: 'stream' as const };

  it('leaves out values read off the analysed capnogram within its span; keeps typed and later ones', () => {
    expect(valuesBesideWaveform([...perBreath, typed, afterTrace], waveform)).toEqual([
      typed,
      afterTrace,
    ]);
    expect(valuesBesideWaveform(perBreath, undefined)).toEqual(perBreath);
  });

  it('gives the audit summary the same EtCO2 figures with or without the stored per-breath values', () => {
    const base = {
      id: 'r1',
      siteId: 's1',
      unitId: null,
      arrestAt: at(0),
      events: [],
      waveform: [
        {
          startAt: at(0),
          sampleRateHz: cap.sampleRateHz,
          unit: 'mmHg' as const,
          values: waveform.values,
        },
      ],
    };
    const alone = analyseStored({ ...base, etco2: [] }).input;
    const both = analyseStored({ ...base, etco2: perBreath }).input;
    expect(both.etco2).toEqual([]);
    expect(analyze(both).breaths.length).toBe(analyze(alone).breaths.length);
  });
});
