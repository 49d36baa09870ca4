import type { Interval } from '@upstroke/contracts';

/** Total length of disjoint sorted intervals. */
export function totalLength(xs: readonly Interval[]): number {
  let s = 0;
  for (const x of xs) s += Math.max(0, x.endSec - x.startSec);
  return s;
}

/** Intersection of two lists of disjoint sorted intervals (linear merge). */
export function intersect(a: readonly Interval[], b: readonly Interval[]): Interval[] {
  const out: Interval[] = [];
  let i = 0;
  let j = 0;
  while (i < a.length && j < b.length) {
    const s = Math.max(a[i].startSec, b[j].startSec);
    const e = Math.min(a[i].endSec, b[j].endSec);
    if (e > s) out.push({ startSec: s, endSec: e });
    if (a[i].endSec < b[j].endSec) i++;
    else j++;
  }
  return out;
}

/** `a` minus `b`, both disjoint and sorted. */
export function subtract(a: readonly Interval[], b: readonly Interval[]): Interval[] {
  const out: Interval[] = [];
  let j = 0;
  for (const x of a) {
    let s = x.startSec;
    while (j < b.length && b[j].endSec <= s) j++;
    let k = j;
    while (k < b.length && b[k].startSec < x.endSec) {
      if (b[k].startSec > s) out.push({ startSec: s, endSec: b[k].startSec });
      s = Math.max(s, b[k].endSec);
      k++;
    }
    if (x.endSec > s) out.push({ startSec: s, endSec: x.endSec });
  }
  return out;
}

/** Merges intervals closer than `gapSec` (input sorted by start). */
export function mergeClose(xs: readonly Interval[], gapSec = 0): Interval[] {
  const out: Interval[] = [];
  for (const x of xs) {
    const last = out[out.length - 1];
    if (last && x.startSec - last.endSec <= gapSec) last.endSec = Math.max(last.endSec, x.endSec);
    else out.push({ ...x });
  }
  return out;
}

/** Whether `t` lies inside any interval (linear; lists here are short). */
export function contains(xs: readonly Interval[], t: number): boolean {
  return xs.some((x) => t >= x.startSec && t < x.endSec);
}
