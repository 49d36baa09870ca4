/**
 * The correction rules: which entries a record's corrections take back or replace. Apart from
 * `normalizeEvents` (which re-validates replacements with the events' schemas), so a screen
 * that only shows events in force (Live) loads no zod.
 */

/** What the correction rules need of an event: stored, synced, debrief and live events all fit. */
export interface CorrectableEvent {
  id: string;
  kind: string;
  at: string;
  data: unknown;
}

interface CorrectionFields {
  supersedes: string;
  replacement?: { kind: string; data: unknown; at: string };
}

export const correctionData = (e: Pick<CorrectableEvent, 'data'>) => e.data as CorrectionFields;

/** Corrections in force: latest first, a correction cancelled by one in force is not. */
export function activeCorrections<E extends CorrectableEvent>(corrections: E[]): E[] {
  const byTime = [...corrections].sort((a, b) => Date.parse(b.at) - Date.parse(a.at));
  const cancelled = new Set<string>();
  const active: E[] = [];
  for (const c of byTime) {
    if (cancelled.has(c.id)) continue;
    active.push(c);
    cancelled.add(correctionData(c).supersedes);
  }
  return active.reverse();
}

/**
 * The events as finally recorded, by the same rule as `normalizeEvents`: superseded events
 * and corrections leave; a correction's replacement stands in its place (the correction's
 * other fields, with the replacement's kind, data and time). Sorted by time, stable. For
 * screens and exports that show events rather than analyse them (the replacement is not
 * re-validated here).
 */
export function eventsInForce<E extends CorrectableEvent>(events: readonly E[]): E[] {
  const corrections = activeCorrections(events.filter((e) => e.kind === 'correction'));
  const superseded = new Set(corrections.map((c) => correctionData(c).supersedes));
  const kept = events.filter((e) => e.kind !== 'correction' && !superseded.has(e.id));
  for (const c of corrections) {
    const r = correctionData(c).replacement;
    if (r) kept.push({ ...c, kind: r.kind, data: r.data, at: r.at });
  }
  return kept
    .map((e, i) => ({ e, i, t: Date.parse(e.at) }))
    .sort((a, b) => a.t - b.t || a.i - b.i)
    .map((x) => x.e);
}

/**
 * For each superseded event, the correction in force that superseded it (id → correction
 * id), by the same rule as `eventsInForce`: a correction that was itself undone supersedes
 * nothing (it is listed as superseded by the correction that undid it).
 */
export function supersededByMap(events: readonly CorrectableEvent[]): Map<string, string> {
  const map = new Map<string, string>();
  for (const c of activeCorrections(events.filter((e) => e.kind === 'correction')))
    map.set(correctionData(c).supersedes, c.id);
  return map;
}

/**
 * Ids removed by the corrections in force (same rule as `eventsInForce`). A correction may
 * supersede any entry of the record: an event, or a typed EtCO2 value taken back by Undo.
 */
export function supersededIds(events: readonly CorrectableEvent[]): Set<string> {
  return new Set(supersededByMap(events).keys());
}
