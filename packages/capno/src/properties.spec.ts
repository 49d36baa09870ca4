import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import {
  analysisInputSchema,
  analysisOutputSchema,
  type AnalysisEvent,
  type Co2Unit,
} from '@upstroke/contracts';
import { analyze } from './analyze.js';
import { detectBreaths } from './breaths/breath-detector.js';
import { synthCapnogram } from './testing/synth-capnogram.js';
import { at, ev, record } from './testing/records.js';

const rates = fc.constantFrom(10, 25, 50, 100, 200);

describe('properties', () => {
  it('the unit of the waveform (mmHg, kPa, %) does not change the results in mmHg', () => {
    const arb = fc.record({
      seed: fc.nat(),
      level: fc.double({ min: 5, max: 60, noNaN: true }),
      fs: rates,
      baro: fc.double({ min: 600, max: 800, noNaN: true }),
    });
    fc.assert(
      fc.property(arb, ({ seed, level, fs, baro }) => {
        const s = synthCapnogram({
          seed,
          sampleRateHz: fs,
          durationSec: 90,
          levels: [[0, level]],
          compressions: [[0, 90]],
          artefactMmHg: 2,
          noiseMmHg: 0.3,
        });
        const mm = Array.from(s.values);
        const asUnit = (unit: Co2Unit, k: number) =>
          analyze(
            record([], {
              waveform: {
                startAt: at(0),
                sampleRateHz: fs,
                unit,
                barometricMmHg: baro,
                values: mm.map((v) => v / k),
              },
            }),
          ).breaths;
        const ref = asUnit('mmHg', 1);
        for (const other of [asUnit('kPa', 7.50062), asUnit('%', baro / 100)]) {
          expect(other.length).toBe(ref.length);
          other.forEach((b, i) => {
            expect(b.etco2MmHg).toBeCloseTo(ref[i].etco2MmHg, 6);
            expect(b.tSec).toBeCloseTo(ref[i].tSec, 9);
          });
        }
      }),
      { numRuns: 15 },
    );
  });

  it('finds no breath in a noisy flat signal at 10 Hz (a counterexample fast-check found)', () => {
    // 1.8 mmHg with 0.5 mmHg noise, no artefact: one unsmoothed sample crossed the threshold.
    const s = synthCapnogram({
      seed: 2134900721,
      sampleRateHz: 10,
      durationSec: 60,
      ventilationRatePerMin: 1e-3,
      levels: [[0, 1.8067514870288361]],
      baselineMmHg: 1.8067514870288361,
      compressions: [[0, 60]],
      compressionRateHz: 1.5,
      artefactMmHg: 0,
      noiseMmHg: 0.5,
    });
    expect(detectBreaths(s.values, 10)).toEqual([]);
  });

  it('finds no breath in a flat signal or in compression artefact alone', () => {
    const arb = fc.record({
      seed: fc.nat(),
      fs: rates,
      level: fc.double({ min: 0, max: 60, noNaN: true }),
      amp: fc.double({ min: 0, max: 3, noNaN: true }), // "a few mmHg"
      hz: fc.double({ min: 1.5, max: 2, noNaN: true }), // 90–120 compressions/min
      noise: fc.double({ min: 0, max: 0.5, noNaN: true }),
    });
    fc.assert(
      fc.property(arb, ({ seed, fs, level, amp, hz, noise }) => {
        const s = synthCapnogram({
          seed,
          sampleRateHz: fs,
          durationSec: 60,
          ventilationRatePerMin: 1e-3,
          levels: [[0, level]],
          baselineMmHg: level,
          compressions: [[0, 60]],
          compressionRateHz: hz,
          artefactMmHg: amp,
          noiseMmHg: noise,
        });
        expect(detectBreaths(s.values, fs)).toEqual([]);
        expect(detectBreaths(new Float64Array(fs * 30).fill(level), fs)).toEqual([]);
      }),
      { numRuns: 40 },
    );
  });

  const eventArb: fc.Arbitrary<(t: number) => AnalysisEvent> = fc.oneof(
    fc
      .constantFrom('compressions-start', 'compressions-stop', 'rosc', 'rearrest')
      .map((k) => (t: number) => ev(k, t, {})),
    fc.integer({ min: 1, max: 360 }).map((j) => (t: number) => ev('shock', t, { energyJ: j })),
    fc
      .constantFrom('epinephrine', 'sodium-bicarbonate', 'amiodarone')
      .map((d) => (t: number) => ev('drug', t, { drug: d })),
    fc
      .constantFrom('vf', 'pvt', 'pea', 'asystole', 'organised')
      .map((r) => (t: number) => ev('rhythm', t, { rhythm: r })),
    fc.boolean().map((p) => (t: number) => ev('pulse', t, { present: p })),
    fc
      .constantFrom('bag-mask', 'supraglottic', 'tracheal-tube')
      .map((d) => (t: number) => ev('airway', t, { device: d })),
    fc
      .option(fc.integer({ min: 4, max: 40 }), { nil: undefined })
      .map((r) => (t: number) => ev('ventilation', t, r === undefined ? {} : { ratePerMin: r })),
    fc
      .constantFrom('terminated', 'rosc-sustained')
      .map((r) => (t: number) => ev('end', t, { reason: r })),
  );
  const inputArb = fc.record({
    events: fc.array(fc.tuple(fc.double({ min: 0, max: 3000, noNaN: true }), eventArb), {
      maxLength: 60,
    }),
    etco2: fc.array(
      fc.tuple(
        fc.double({ min: 0, max: 3000, noNaN: true }),
        fc.double({ min: 0, max: 90, noNaN: true }),
      ),
      { maxLength: 40 },
    ),
    wave: fc.option(
      fc.array(fc.double({ min: 0, max: 80, noNaN: true }), { minLength: 1, maxLength: 3000 }),
      { nil: undefined },
    ),
    start: fc.double({ min: 0, max: 2000, noNaN: true }),
  });

  it('never throws on well-formed input; output is schema-valid; findings lie within the record', () => {
    fc.assert(
      fc.property(inputArb, ({ events, etco2, wave, start }) => {
        const input = analysisInputSchema.parse(
          record(
            events.map(([t, mk]) => mk(Math.round(t * 1000) / 1000)),
            {
              etco2: etco2
                .map(([t, v]) => ({
                  at: at(Math.round(t)),
                  value: v,
                  unit: 'mmHg' as const,
                  source: 'manual' as const,
                }))
                .sort((a, b) => a.at.localeCompare(b.at)),
              waveform: wave && {
                startAt: at(Math.round(start)),
                sampleRateHz: 10,
                unit: 'mmHg',
                values: wave,
              },
            },
          ),
        );
        const out = analysisOutputSchema.parse(analyze(input));
        for (const f of out.findings) {
          expect(f.startSec).toBeGreaterThanOrEqual(0);
          expect(f.startSec).toBeLessThanOrEqual(f.endSec);
          expect(f.endSec).toBeLessThanOrEqual(out.measures.durationSec);
        }
        const cf = out.measures.compressionFraction;
        if (cf !== null) expect(cf).toBeGreaterThanOrEqual(0);
        if (cf !== null) expect(cf).toBeLessThanOrEqual(1 + 1e-9);
      }),
      { numRuns: 200 },
    );
  });
});
