/** A date (`2026-03-01`) means its midnight UTC; a date-time is taken as given. */
export function toInstant(value: string): string {
  return /^\d{4}-\d{2}-\d{2}$/.test(value)
    ? `${value}T00:00:00.000Z`
    : new Date(value).toISOString();
}

const monthOf = (value: string) => value.slice(0, 7);

function addMonth(month: string): string {
  const [y, m] = month.split('-').map(Number);
  return m === 12 ? `${y + 1}-01` : `${y}-${String(m + 1).padStart(2, '0')}`;
}

/**
 * Calendar months (UTC, `YYYY-MM`) from `from` to `to`. With an exclusive end instant, the
 * month holding it is left out when the end falls exactly on its first moment. At most
 * 240 months, so a careless filter cannot ask for an endless axis.
 */
export function monthsBetween(from?: string, to?: string, toIsExclusive = false): string[] {
  if (!from || !to) return [];
  let last = monthOf(to);
  if (toIsExclusive && /^\d{4}-\d{2}-01T00:00:00(\.000)?Z$/.test(to)) {
    const d = new Date(to);
    d.setUTCMonth(d.getUTCMonth() - 1);
    last = d.toISOString().slice(0, 7);
  }
  const out: string[] = [];
  for (let m = monthOf(from); m <= last && out.length < 240; m = addMonth(m)) out.push(m);
  return out;
}

/** `YYYY-MM` moved by `n` calendar months (negative goes back). */
export function addMonths(month: string, n: number): string {
  const [y, m] = month.split('-').map(Number);
  const i = y * 12 + (m - 1) + n;
  return `${Math.floor(i / 12)}-${String((i % 12) + 1).padStart(2, '0')}`;
}
