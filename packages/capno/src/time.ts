/** Seconds from `zeroIso` to `iso` (both ISO-8601 with offset). Millisecond precision. */
export function secondsFrom(zeroIso: string, iso: string): number {
  return (Date.parse(iso) - Date.parse(zeroIso)) / 1000;
}

/** Median of a list (sorted in a copy: a typed array sorts numbers natively); null when empty. */
export function median(values: ArrayLike<number>): number | null {
  if (values.length === 0) return null;
  return medianOfSorted(Float64Array.from(values).sort());
}

/** Median of the first `n` entries of `buf`, which it sorts in place; null when n = 0. */
export function medianInPlace(buf: Float64Array, n: number): number | null {
  if (n === 0) return null;
  // Insertion sort: the windows this serves hold a few dozen values.
  for (let i = 1; i < n; i++) {
    const v = buf[i];
    let j = i - 1;
    for (; j >= 0 && buf[j] > v; j--) buf[j + 1] = buf[j];
    buf[j + 1] = v;
  }
  return medianOfSorted(buf, n);
}

function medianOfSorted(s: ArrayLike<number>, n = s.length): number {
  const m = n >> 1;
  return n % 2 ? s[m] : (s[m - 1] + s[m]) / 2;
}

/** Rounds to `digits` decimals so outputs stay readable and stable across platforms. */
export function round(value: number, digits = 2): number {
  const k = 10 ** digits;
  return Math.round(value * k) / k;
}
