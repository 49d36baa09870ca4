import { describe, expect, it } from 'vitest';
import type { AnalysisEtco2 } from '@upstroke/contracts';
import { analyze } from '../analyze.js';
import { LiveAnalyzer } from '../live/live-analyzer.js';
import { at, compressionEvents, ev, record } from '../testing/records.js';

// Invented values; the conversion is the definition of the mmHg: 1 kPa = 7.50062 mmHg
// (1 mmHg = 133.322387415 Pa, REFERENCE.md "Units and codes", checked).
const kPa = (pairs: [number, number][]): AnalysisEtco2[] =>
  pairs.map(([t, v]) => ({ at: at(t), value: v, unit: 'kPa', source: 'manual' }));
const every = (from: number, to: number, step: number, v: (t: number) => number) => {
  const out: [number, number][] = [];
  for (let t = from; t <= to; t += step) out.push([t, v(t)]);
  return out;
};

describe('findings in the site unit', () => {
  // 0.8 kPa = 6.0 mmHg, below the 10 mmHg (1.3 kPa) default (AHA 2020 adult ALS — summary).
  const low = record(compressionEvents(0, 300), {
    etco2: kPa(every(0, 300, 10, (t) => (t >= 100 && t < 200 ? 0.8 : 2.4))),
  });

  it('a kPa site reads kPa in the low-EtCO2 message, an mmHg site mmHg', () => {
    const inKPa = analyze({ ...low, displayUnit: 'kPa' }).findings.find(
      (f) => f.kind === 'etco2-low',
    );
    expect(inKPa?.message).toMatch(/below 1\.3 kPa for \d+ s .*\(lowest 0\.8 kPa\)/);
    expect(inKPa?.message).not.toMatch(/mmHg/);
    const inMmHg = analyze(low).findings.find((f) => f.kind === 'etco2-low');
    expect(inMmHg?.message).toMatch(/below 10 mmHg .*\(lowest 6 mmHg\)/);
  });

  it('rise and prognosis messages follow the unit too', () => {
    // 2.0 → 4.0 kPa is a rise of 15 mmHg, above the 10 mmHg of Lui 2016 (checked).
    const rise = record(compressionEvents(0, 400), {
      etco2: kPa(every(0, 400, 6, (t) => (t < 200 ? 2 : 4))),
    });
    const r = analyze({ ...rise, displayUnit: 'kPa' }).findings.find(
      (f) => f.kind === 'etco2-rise',
    );
    expect(r?.message).toMatch(/rose 2\.0 kPa .*from about 2\.0 kPa to 4\.0 kPa/);
    const events = [
      ...compressionEvents(0, 1500),
      ev('airway', 300, { device: 'tracheal-tube', confirmation: 'waveform-capnography' }),
    ];
    const late = record(events, { etco2: kPa(every(0, 1500, 30, () => 1)) });
    const p = analyze({ ...late, displayUnit: 'kPa' }).findings.find(
      (f) => f.kind === 'etco2-prognosis-caution',
    );
    // Paiva 2018: < 10 mmHg after 20 min with an advanced airway (checked); 10 mmHg = 1.3 kPa.
    expect(p?.message).toMatch(/still below 1\.3 kPa \(median 1\.0 kPa over the last minute\)/);
  });

  it('the Live prompt for low EtCO2 is in the site unit', () => {
    const live = new LiveAnalyzer({
      arrestAt: at(0),
      sampleRateHz: 50,
      unit: 'mmHg',
      displayUnit: 'kPa',
    });
    live.pushEvent({ id: 'c1', at: at(0), kind: 'compressions-start', data: {} });
    for (const [t, v] of every(0, 60, 5, () => 0.7))
      live.pushEtco2({ at: at(t), value: v, unit: 'kPa', source: 'manual' });
    const prompt = live.activeFindings(60).find((f) => f.kind === 'etco2-low');
    expect(prompt?.message).toMatch(/below 1\.3 kPa .*\(lowest 0\.7 kPa\)/);
  });
});

describe('EtCO2 ≥ target follows the profile', () => {
  // 18 mmHg throughout: at or above a 15 mmHg target, below the 20 mmHg default (Meaney 2013).
  const input = record(compressionEvents(0, 300), {
    etco2: every(0, 300, 10, () => 18).map(([t, v]) => ({
      at: at(t),
      value: v,
      unit: 'mmHg' as const,
      source: 'manual' as const,
    })),
  });

  it('uses the default 20 mmHg and a site target of 15 mmHg', () => {
    const byDefault = analyze(input).measures.etco2;
    expect(byDefault.targetMmHg).toBe(20);
    expect(byDefault.fractionAtOrAboveTarget).toBe(0);
    const site = analyze({ ...input, profile: { targetEtco2MmHg: 15 } }).measures.etco2;
    expect(site.targetMmHg).toBe(15);
    expect(site.fractionAtOrAboveTarget).toBe(1);
    // The fixed 20 mmHg share of the contract is unchanged by the site's target.
    expect(site.fractionAtOrAbove20).toBe(0);
  });
});
