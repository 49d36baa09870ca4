import { describe, expect, it } from 'vitest';
import type { AnalysisInput, Breath, Finding } from '@upstroke/contracts';
import { analyze } from '../analyze.js';
import { at, compressionEvents, ev, record } from '../testing/records.js';
import { synthCapnogram } from '../testing/synth-capnogram.js';
import { oneFindingPerEpisode } from './episodes.js';
import { rollingRates } from './ventilation-findings.js';

/** A capnogram of consecutive stretches [durationSec, breaths/min], 50 Hz, EtCO2 30 mmHg. */
function capnogram(parts: [number, number][], rateJitter = 0.05, seed = 1) {
  const values: number[] = [];
  for (const [durationSec, rate] of parts) {
    const s = synthCapnogram({
      seed: seed++,
      durationSec,
      ventilationRatePerMin: rate,
      rateJitter,
      levels: [[0, 30]],
    });
    for (const v of s.values) values.push(v);
  }
  return { startAt: at(0), sampleRateHz: 50, unit: 'mmHg' as const, values };
}

// AHA 2020: with an advanced airway, 1 breath every 6 s = 10/min (summary); the profile's
// tolerance of 2/min makes 12/min the limit (a site setting).
const profile = { ventilationMaxPerMin: 10, ventilationTolerancePerMin: 2 };

function fast(input: AnalysisInput): Finding[] {
  return analyze(input).findings.filter((f) => f.kind === 'ventilation-fast');
}

const withTube = (durationSec: number, extra: Partial<AnalysisInput>) =>
  record([...compressionEvents(0, durationSec), ev('airway', 5, { device: 'tracheal-tube' })], {
    profile,
    ...extra,
  });

describe('ventilation rate from breath intervals', () => {
  it('reads a steady breath every 5 s as 12/min, whatever one missed breath does', () => {
    // Physical definition: rate = 60 ÷ interval; 5 s → 12/min.
    const times = [0, 5, 10, 15, 20, 25, 35, 40, 45, 50, 55, 60, 65];
    const breaths: Breath[] = times.map((tSec) => ({ tSec, etco2MmHg: 30, baselineMmHg: 0 }));
    const rates = rollingRates(breaths);
    expect(rates.slice(0, 6).every((r) => r === null)).toBe(true); // < 30 s of breaths
    expect(rates.slice(6)).toEqual([12, 12, 12, 12, 12, 12, 12]);
    // A data gap (link drop) between 25 and 35 s: that interval is not a breath interval.
    expect(rollingRates(breaths, Infinity, [{ startSec: 26, endSec: 34 }]).at(-1)).toBe(12);
  });

  it('raises no ventilation-fast for a steady 12/min with a 10 + 2 limit', () => {
    for (const jitter of [0, 0.05]) {
      const input = withTube(600, { waveform: capnogram([[600, 12]], jitter) });
      expect(analyze(input).breaths.length).toBeGreaterThan(110); // 12/min for 10 min
      expect(fast(input)).toEqual([]);
    }
  });

  it('reports one continuous episode of fast ventilation once, with its peak rate', () => {
    // Aufderheide 2004: teams seen ventilating at 30 ± 3/min (checked) — here 24/min for 3 min.
    const input = withTube(540, {
      waveform: capnogram([
        [180, 10],
        [180, 24],
        [180, 10],
      ]),
    });
    const f = fast(input);
    expect(f).toHaveLength(1);
    expect(f[0].startSec).toBeGreaterThanOrEqual(120);
    expect(f[0].startSec).toBeLessThanOrEqual(190);
    expect(f[0].endSec).toBeGreaterThanOrEqual(360);
    expect(f[0].endSec).toBeLessThanOrEqual(420);
    expect(f[0].message).toMatch(/about 2[3-5]\/min/);
  });

  it('merges a recorded fast rate overlapping a measured episode into that one episode', () => {
    const input = withTube(540, {
      events: [
        ...compressionEvents(0, 540),
        ev('airway', 5, { device: 'tracheal-tube' }),
        ev('ventilation', 200, { ratePerMin: 30 }),
        ev('ventilation', 300, { ratePerMin: 10 }),
      ],
      waveform: capnogram([
        [180, 10],
        [180, 24],
        [180, 10],
      ]),
    });
    const f = fast(input);
    expect(f).toHaveLength(1);
    expect(f[0].message).toMatch(/about 30\/min/);
  });
});

describe('one finding per episode (window-based kinds)', () => {
  const f = (kind: Finding['kind'], s: number, e: number, severity: Finding['severity']) =>
    ({
      kind,
      startSec: s,
      endSec: e,
      severity,
      message: `${s}`,
      caution: '',
      confounder: null,
    }) as Finding;

  it('merges overlapping and touching findings of one kind, keeping the strongest message', () => {
    const out = oneFindingPerEpisode([
      f('waveform-absent', 100, 150, 'critical'),
      f('waveform-absent', 150, 170, 'critical'),
      f('etco2-low', 10, 50, 'warning'),
      f('etco2-low', 40, 90, 'warning'),
      f('etco2-low', 95, 99, 'warning'),
      f('pause-long', 10, 30, 'warning'),
      f('pause-long', 20, 30, 'critical'), // not a window-based kind: kept as is
    ]);
    expect(out.map((x) => [x.kind, x.startSec, x.endSec, x.message])).toEqual([
      ['etco2-low', 10, 90, '40'],
      ['pause-long', 10, 30, '10'],
      ['pause-long', 20, 30, '20'],
      ['etco2-low', 95, 99, '95'],
      ['waveform-absent', 100, 170, '100'],
    ]);
  });
});
