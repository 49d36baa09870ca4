export interface Change {
  from: unknown;
  to: unknown;
}

const same = (a: unknown, b: unknown) =>
  JSON.stringify(Array.isArray(a) ? [...(a as unknown[])].sort() : a) ===
  JSON.stringify(Array.isArray(b) ? [...(b as unknown[])].sort() : b);

/**
 * What an edit changed, field by field as { from, to }, for the audit trail's before → after
 * view. Fields the edit did not name, or set to what they were, are left out (lists compare
 * as sets: the order of sites is not a change).
 */
export function changesOf<T extends object>(before: T, patch: Partial<T>): Record<string, Change> {
  const out: Record<string, Change> = {};
  for (const [key, to] of Object.entries(patch)) {
    if (to === undefined) continue;
    const from = (before as Record<string, unknown>)[key] ?? null;
    if (!same(from, to)) out[key] = { from, to };
  }
  return out;
}
