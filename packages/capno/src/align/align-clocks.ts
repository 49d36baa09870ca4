import { median } from '../time.js';

/** How the file's clock was lined up with the record's (all times in seconds, any epoch). */
export interface ClockAlignment {
  /** File clock minus record clock: positive when the monitor runs ahead. */
  offsetSec: number;
  /** Median absolute residual of the matched markers after alignment. */
  residualSec: number;
  /** File markers that found a recorded event within the tolerance. */
  matched: number;
  /** File markers considered. */
  markers: number;
}

export interface AlignOptions {
  /** A marker farther than this from every recorded event after alignment is unmatched. */
  toleranceSec: number;
  /** Offsets beyond this are not considered (a monitor set to the wrong day is not aligned). */
  maxOffsetSec: number;
}

export const alignDefaults: AlignOptions = { toleranceSec: 10, maxOffsetSec: 6 * 3600 };

/** Distance from `t` to the nearest value of a sorted list. */
function nearest(sorted: readonly number[], t: number): number {
  let lo = 0;
  let hi = sorted.length - 1;
  while (lo < hi) {
    const mid = (lo + hi) >> 1;
    if (sorted[mid] < t) lo = mid + 1;
    else hi = mid;
  }
  const after = Math.abs(sorted[lo] - t);
  return lo > 0 ? Math.min(after, Math.abs(sorted[lo - 1] - t)) : after;
}

interface Score {
  offset: number;
  matched: number;
  cost: number;
}

function score(file: readonly number[], record: readonly number[], offset: number, tol: number) {
  const residuals = file.map((f) => nearest(record, f - offset));
  const matched = residuals.filter((r) => r <= tol).length;
  // Unmatched markers cost the tolerance: a spurious marker cannot drag the choice far.
  const cost = median(residuals.map((r) => Math.min(r, tol))) as number;
  return { offset, matched, cost };
}

/**
 * Estimates the clock offset between a monitor file and the record from event markers
 * (e.g. the file's shocks against the recorded shocks). Every pairing of one file marker
 * with one recorded event proposes an offset; the proposal that matches the most markers
 * within the tolerance, then with the smallest median residual, wins. The offset is then
 * refined to the median of the matched pairs' differences, which a lone outlier cannot move.
 * Returns null when either list is empty or no proposal is within `maxOffsetSec`.
 */
export function alignClocks(
  fileMarkers: readonly number[],
  recordEvents: readonly number[],
  options: Partial<AlignOptions> = {},
): ClockAlignment | null {
  const o = { ...alignDefaults, ...options };
  const record = [...recordEvents].sort((a, b) => a - b);
  if (fileMarkers.length === 0 || record.length === 0) return null;
  let best: Score | null = null;
  for (const f of fileMarkers) {
    for (const r of record) {
      const offset = f - r;
      if (Math.abs(offset) > o.maxOffsetSec) continue;
      const s = score(fileMarkers, record, offset, o.toleranceSec);
      if (!best || s.matched > best.matched || (s.matched === best.matched && s.cost < best.cost))
        best = s;
    }
  }
  if (!best) return null;
  return refine(fileMarkers, record, best.offset, o.toleranceSec);
}

function refine(
  file: readonly number[],
  record: readonly number[],
  offset: number,
  tol: number,
): ClockAlignment {
  const diffs: number[] = [];
  for (const f of file) {
    const t = f - offset;
    const d = nearest(record, t);
    if (d > tol) continue;
    const r = record.reduce((a, b) => (Math.abs(b - t) < Math.abs(a - t) ? b : a));
    diffs.push(f - r);
  }
  const refined = median(diffs) ?? offset;
  const residuals = diffs.map((d) => Math.abs(d - refined));
  return {
    offsetSec: Math.round(refined * 1000) / 1000,
    residualSec: Math.round((median(residuals) ?? 0) * 1000) / 1000,
    matched: diffs.length,
    markers: file.length,
  };
}
