/** Seconds from `zeroIso` to `iso` (both ISO-8601 with offset). Millisecond precision. */
export function secondsFrom(zeroIso: string, iso: string): number {
  return (Date.parse(iso) - Date.parse(zeroIso)) / 1000;
}

/** Median of a list (copy sorted); null when empty. */
export function median(values: readonly number[]): number | null {
  if (values.length === 0) return null;
  const s = [...values].sort((a, b) => a - b);
  const m = s.length >> 1;
  return s.length % 2 ? s[m] : (s[m - 1] + s[m]) / 2;
}

/** Rounds to `digits` decimals so outputs stay readable and stable across platforms. */
export function round(value: number, digits = 2): number {
  const k = 10 ** digits;
  return Math.round(value * k) / k;
}
