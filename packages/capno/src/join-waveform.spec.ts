import { describe, expect, it } from 'vitest';
import { joinWaveform } from './summary-row.js';

const at = (sec: number) => new Date(Date.parse('2026-03-04T10:00:00Z') + sec * 1000).toISOString();

describe('joinWaveform (one rule for the debrief and the audit summary)', () => {
  it('places chunks on one clock, fills a gap with zero and drops overlapping samples', () => {
    const w = joinWaveform([
      { startAt: at(1), sampleRateHz: 10, unit: 'mmHg', values: [5, 6] }, // t = 1.0–1.1 s
      { startAt: at(0), sampleRateHz: 10, unit: 'mmHg', values: [1, 2, 3] }, // t = 0.0–0.2 s
      { startAt: at(1.1), sampleRateHz: 10, unit: 'mmHg', values: [9, 7] }, // 1.1 overlaps
    ]);
    expect(w?.startAt).toBe(at(0));
    expect(w?.values).toEqual([1, 2, 3, 0, 0, 0, 0, 0, 0, 0, 5, 6, 7]);
  });

  it('uses only the source with most samples, so an import and a stream are not mixed', () => {
    const w = joinWaveform([
      { startAt: at(0), sampleRateHz: 10, unit: 'mmHg', source: 'stream', values: [1, 1] },
      { startAt: at(0), sampleRateHz: 10, unit: 'kPa', source: 'import', values: [4, 4, 4] },
    ]);
    expect(w).toMatchObject({ unit: 'kPa', values: [4, 4, 4] });
  });

  it('returns nothing for no chunks', () => {
    expect(joinWaveform([])).toBeUndefined();
  });
});
