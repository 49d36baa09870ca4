import { describe, expect, it } from 'vitest';
import type { AnalysisEtco2, FindingKind } from '@upstroke/contracts';
import { analyze } from '../analyze.js';
import { at, compressionEvents, ev, record } from '../testing/records.js';
import { synthCapnogram } from '../testing/synth-capnogram.js';

const etco2 = (pairs: [number, number][]): AnalysisEtco2[] =>
  pairs.map(([t, v]) => ({ at: at(t), value: v, unit: 'mmHg', source: 'manual' }));
const every = (from: number, to: number, step: number, f: (t: number) => number) => {
  const out: [number, number][] = [];
  for (let t = from; t <= to; t += step) out.push([t, f(t)]);
  return out;
};
const kinds = (input: Parameters<typeof analyze>[0], kind: FindingKind) =>
  analyze(input).findings.filter((f) => f.kind === kind);

describe('findings', () => {
  it('etco2-low: below 10 mmHg for ≥ 20 s during compressions only', () => {
    const input = record(compressionEvents(0, 300, [[150, 180]]), {
      etco2: etco2(every(0, 300, 10, (t) => (t >= 100 && t < 200 ? 6 : 18))),
    });
    const f = kinds(input, 'etco2-low');
    // AHA 2020 / Sandroni 2018: < 10 mmHg suggests poor CPR (summary); 20 s: common practice
    expect(f.map((x) => [x.startSec, x.endSec])).toEqual([
      [100, 150],
      [180, 200],
    ]);
    expect(f[0].message).toMatch(/suggests/);
    const short = record(compressionEvents(0, 300), {
      etco2: etco2(every(0, 300, 10, (t) => (t === 100 ? 6 : 18))),
    });
    expect(kinds(short, 'etco2-low')).toEqual([]);
  });

  it('etco2-rise: ≥ 10 mmHg above the previous minute, sustained 30 s; bicarbonate marked as confounder', () => {
    const values = every(0, 400, 6, (t) => (t < 200 ? 15 : 30));
    const plain = kinds(record(compressionEvents(0, 400), { etco2: etco2(values) }), 'etco2-rise');
    // Lui 2016: a rise ≥ 10 mmHg is specific for ROSC (checked)
    expect(plain).toHaveLength(1);
    expect(plain[0].startSec).toBeGreaterThanOrEqual(198);
    expect(plain[0].startSec).toBeLessThanOrEqual(210);
    expect(plain[0].confounder).toBeNull();
    // Roh 2024: bicarbonate roughly doubles EtCO2 for minutes (checked)
    const bicarb = record(
      [...compressionEvents(0, 400), ev('drug', 170, { drug: 'sodium-bicarbonate' })],
      { etco2: etco2(values) },
    );
    expect(kinds(bicarb, 'etco2-rise')[0].confounder).toBe('sodium-bicarbonate');
    const brief = every(0, 400, 6, (t) => (t >= 200 && t < 220 ? 30 : 15));
    expect(kinds(record(compressionEvents(0, 400), { etco2: etco2(brief) }), 'etco2-rise')).toEqual(
      [],
    );
  });

  it('etco2-prognosis-caution: < 10 mmHg after 20 min of CPR with an advanced airway', () => {
    const events = [
      ...compressionEvents(0, 1500),
      ev('airway', 300, { device: 'tracheal-tube', confirmation: 'waveform-capnography' }),
    ];
    const low = kinds(
      record(events, { etco2: etco2(every(0, 1500, 30, () => 8)) }),
      'etco2-prognosis-caution',
    );
    // Paiva 2018: < 10 mmHg after 20 min with an advanced airway — ROSC very unlikely (checked)
    expect(low.map((f) => f.startSec)).toEqual([1200]);
    expect(low[0].caution).toMatch(/never use EtCO2 alone/i);
    expect(
      kinds(
        record(events, { etco2: etco2(every(0, 1500, 30, () => 12)) }),
        'etco2-prognosis-caution',
      ),
    ).toEqual([]);
    const noAirway = record(compressionEvents(0, 1500), {
      etco2: etco2(every(0, 1500, 30, () => 8)),
    });
    expect(kinds(noAirway, 'etco2-prognosis-caution')).toEqual([]);
  });

  it('pause-long and preshock-pause-long', () => {
    const input = record([
      ...compressionEvents(0, 300, [
        [100, 109],
        [200, 225],
      ]),
      ev('shock', 221, { energyJ: 200 }),
    ]);
    // AHA BLS: interruptions < 10 s (checked); Cheskes 2011: pre-shock ≥ 20 s, OR 0.47 (checked)
    expect(kinds(input, 'pause-long').map((f) => [f.startSec, f.severity])).toEqual([
      [200, 'critical'],
    ]);
    // The pause's reason is written in words, never as its code ("pre-shock").
    expect(kinds(input, 'pause-long')[0]?.message).toMatch(/paused for 25 s \(around a shock\)/);
    expect(kinds(input, 'preshock-pause-long').map((f) => [f.endSec, f.severity])).toEqual([
      [221, 'critical'],
    ]);
  });

  it('rhythm-check-late: more than 2 min + 15 s between checks', () => {
    const input = record([
      ...compressionEvents(0, 600),
      ev('rhythm', 120, { rhythm: 'pea' }),
      ev('rhythm', 240, { rhythm: 'pea' }),
      ev('rhythm', 420, { rhythm: 'pea' }),
    ]);
    // AHA 2020; RCUK 2021: rhythm check every 2 min (summary)
    expect(kinds(input, 'rhythm-check-late').map((f) => [f.startSec, f.endSec])).toEqual([
      [360, 420],
      [540, 600],
    ]);
  });

  it('epinephrine-interval: outside 3–5 min', () => {
    const input = record([
      ...compressionEvents(0, 1000),
      ...[60, 150, 390, 630].map((t) => ev('drug', t, { drug: 'epinephrine' })),
    ]);
    // AHA 2020: epinephrine every 3–5 min (summary). 90 s is too short; 240 s is fine;
    // from 630 s no further dose while compressions continue to 1000 s: overdue from 930 s.
    expect(kinds(input, 'epinephrine-interval').map((f) => [f.startSec, f.endSec])).toEqual([
      [60, 150],
      [930, 1000],
    ]);
  });

  it('ventilation-fast, waveform-absent, airway-unconfirmed and rebreathing from a capnogram', () => {
    const s = synthCapnogram({
      seed: 3,
      durationSec: 400,
      ventilationRatePerMin: 24,
      inspirationSec: 0.8,
      baselineMmHg: 4,
      levels: [[0, 30]],
      modifiers: [{ kind: 'dislodged', atSec: 300 }],
    });
    const input = record(
      [...compressionEvents(0, 400), ev('airway', 60, { device: 'tracheal-tube' })],
      {
        waveform: {
          startAt: at(0),
          sampleRateHz: s.sampleRateHz,
          unit: 'mmHg',
          values: Array.from(s.values),
        },
      },
    );
    const out = analyze(input);
    const by = (k: FindingKind) => out.findings.filter((f) => f.kind === k);
    // Meaney 2013 / AHA 2020: 10/min with an airway; Aufderheide 2004 saw 30/min (summary/checked)
    expect(by('ventilation-fast').length).toBeGreaterThan(0);
    expect(by('waveform-absent').map((f) => f.severity)).toEqual(['critical']);
    expect(by('waveform-absent')[0].startSec).toBeGreaterThan(295);
    expect(by('airway-unconfirmed')).toHaveLength(1);
    // rebreathing shows as CO2 in the phase-I baseline, cut-off ~2 mmHg (memory)
    expect(by('rebreathing').length).toBeGreaterThan(0);
  });

  it('words every finding as a suggestion with a caution, never an order', () => {
    const s = synthCapnogram({
      seed: 8,
      durationSec: 1500,
      ventilationRatePerMin: 24,
      baselineMmHg: 4,
      levels: [
        [0, 8],
        [600, 8],
        [610, 25],
      ],
      modifiers: [{ kind: 'dislodged', atSec: 1300 }],
    });
    const input = record(
      [
        ...compressionEvents(0, 1500, [
          [100, 130],
          [200, 225],
        ]),
        ev('shock', 221, { energyJ: 200 }),
        ev('airway', 60, { device: 'tracheal-tube' }),
        ...[60, 120, 600].map((t) => ev('drug', t, { drug: 'epinephrine' })),
        ev('drug', 590, { drug: 'sodium-bicarbonate' }),
      ],
      {
        waveform: {
          startAt: at(0),
          sampleRateHz: 25,
          unit: 'mmHg',
          values: Array.from(s.values).filter((_, i) => i % 2 === 0),
        },
      },
    );
    const out = analyze(input);
    expect(new Set(out.findings.map((f) => f.kind)).size).toBeGreaterThanOrEqual(9);
    for (const f of out.findings) {
      expect(f.message).toMatch(/suggest|consider|associated/i);
      expect(f.message).not.toMatch(/(^|\. )(Check|Give|Stop|Change|Shock|Intubate|Start)\b/);
      expect(f.caution).toMatch(/local resuscitation protocol and clinical judgement/);
    }
  });
});
