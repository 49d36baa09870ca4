import type { AgeGroup, AnalysisInput, FindingKind } from '@upstroke/contracts';
import { thresholdDefaults } from '@upstroke/contracts';
import { describe, expect, it } from 'vitest';
import { thresholdsForAgeGroup } from './age-rules.js';
import { analyze } from './analyze.js';
import { LiveAnalyzer } from './live/live-analyzer.js';
import { at, compressionEvents, ev, record } from './testing/records.js';
import { synthCapnogram } from './testing/synth-capnogram.js';

/** Five minutes of CPR with a tracheal tube, ventilated at `rate`/min (synthetic capnogram). */
function ventilated(rate: number, ageGroup?: AgeGroup): AnalysisInput {
  const s = synthCapnogram({
    seed: 11,
    durationSec: 300,
    ventilationRatePerMin: rate,
    inspirationSec: 0.5,
    levels: [[0, 25]],
  });
  return record(
    [
      ...compressionEvents(0, 300),
      ev('airway', 10, { device: 'tracheal-tube', confirmation: 'waveform-capnography' }),
    ],
    {
      ageGroup,
      waveform: {
        startAt: at(0),
        sampleRateHz: s.sampleRateHz,
        unit: 'mmHg',
        values: [...s.values],
      },
    },
  );
}

/** A recorded ventilation rate (no waveform) on a record with a tracheal tube. */
function recordedRate(rate: number, ageGroup?: AgeGroup): AnalysisInput {
  return record(
    [
      ...compressionEvents(0, 300),
      ev('airway', 10, { device: 'tracheal-tube', confirmation: 'waveform-capnography' }),
      ev('ventilation', 20, { ratePerMin: rate }),
    ],
    { ageGroup },
  );
}

const kinds = (input: AnalysisInput, kind: FindingKind) =>
  analyze(input).findings.filter((f) => f.kind === kind);

describe('paediatric rules: children are not small adults', () => {
  it('a child with an advanced airway ventilated at 24/min raises no ventilation-fast; 40/min does', () => {
    // AHA 2020 paediatric guideline (Topjian et al., Circulation 2020;142 suppl 2:S469), top
    // take-home message 2: 20–30 breaths/min for infants and children receiving CPR with an
    // advanced airway (checked). Tolerance: the profile's 2/min (common practice).
    expect(kinds(ventilated(24, 'child'), 'ventilation-fast')).toEqual([]);
    expect(kinds(recordedRate(24, 'child'), 'ventilation-fast')).toEqual([]);
    expect(kinds(ventilated(40, 'child'), 'ventilation-fast').length).toBeGreaterThan(0);
    expect(kinds(recordedRate(40, 'child'), 'ventilation-fast')).toHaveLength(1);
    // Infants share the 20–30/min range in the AHA 2020 guideline (checked).
    expect(kinds(ventilated(24, 'infant'), 'ventilation-fast')).toEqual([]);
    expect(kinds(recordedRate(40, 'infant'), 'ventilation-fast')).toHaveLength(1);
  });

  it('adult behaviour is unchanged: 24/min is fast for an adult (10/min with an airway)', () => {
    // AHA 2020 adult ALS: 1 breath every 6 s (10/min) with an advanced airway (summary).
    expect(kinds(ventilated(24), 'ventilation-fast').length).toBeGreaterThan(0);
    expect(kinds(ventilated(24, 'adult'), 'ventilation-fast').length).toBeGreaterThan(0);
    expect(kinds(recordedRate(24, 'adult'), 'ventilation-fast')).toHaveLength(1);
    expect(analyze(ventilated(24, 'adult'))).toEqual(analyze(ventilated(24)));
  });

  it('follows the site profile: a stricter child limit of 20/min flags 24/min', () => {
    const input = { ...recordedRate(24, 'child'), profile: { paediatricVentilationMaxPerMin: 20 } };
    expect(kinds(input, 'ventilation-fast')).toHaveLength(1);
    const t = thresholdsForAgeGroup(thresholdDefaults, 'infant');
    expect(t.ventilationMaxPerMin).toBe(thresholdDefaults.infantVentilationMaxPerMin);
    expect(thresholdsForAgeGroup(thresholdDefaults, 'adult')).toBe(thresholdDefaults);
  });

  it('no etco2-prognosis-caution on child or infant records; adults keep it', () => {
    const low = (ageGroup?: AgeGroup) =>
      record(
        [
          ...compressionEvents(0, 1500),
          ev('airway', 300, { device: 'tracheal-tube', confirmation: 'waveform-capnography' }),
        ],
        {
          ageGroup,
          etco2: Array.from({ length: 51 }, (_, i) => ({
            at: at(i * 30),
            value: 8,
            unit: 'mmHg' as const,
            source: 'manual' as const,
          })),
        },
      );
    // Paiva 2018 (adult): < 10 mmHg after 20 min with an advanced airway (checked); no
    // validated EtCO2 cut-off for children — AHA 2020 paediatric guideline (summary).
    expect(kinds(low('adult'), 'etco2-prognosis-caution').map((f) => f.startSec)).toEqual([1200]);
    expect(kinds(low(), 'etco2-prognosis-caution')).toHaveLength(1);
    expect(kinds(low('child'), 'etco2-prognosis-caution')).toEqual([]);
    expect(kinds(low('infant'), 'etco2-prognosis-caution')).toEqual([]);
    // The low-EtCO2 finding about CPR quality still applies to children.
    expect(kinds(low('child'), 'etco2-low').length).toBeGreaterThan(0);
  });

  it('the live analyser applies the same age rules', () => {
    const live = new LiveAnalyzer({
      arrestAt: at(0),
      sampleRateHz: 50,
      unit: 'mmHg',
      ageGroup: 'child',
    });
    for (const e of recordedRate(40, 'child').events) live.pushEvent(e);
    expect(live.snapshot(300).findings.filter((f) => f.kind === 'ventilation-fast')).toHaveLength(
      1,
    );
    const calm = new LiveAnalyzer({
      arrestAt: at(0),
      sampleRateHz: 50,
      unit: 'mmHg',
      ageGroup: 'child',
    });
    for (const e of recordedRate(24, 'child').events) calm.pushEvent(e);
    expect(calm.snapshot(300).findings.filter((f) => f.kind === 'ventilation-fast')).toEqual([]);
  });
});
