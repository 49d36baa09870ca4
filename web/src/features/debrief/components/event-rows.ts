import {
  clockFromArrest,
  type Debrief,
  type DebriefEvent,
  eventDetails,
  eventKindLabels,
  labelOf,
} from '@upstroke/contracts';

/** One line of the Debrief's event table. */
export interface EventRow {
  /** The id of the chart marker it matches (the replacement of a correction: the correction's). */
  id: string;
  tSec: number;
  at: string;
  event: string;
  details: string;
  by: string | null;
  /** Taken back or replaced by a correction: drawn struck through, with no marker. */
  struck: boolean;
  /** Why it was struck, or what this row replaced: "Corrected after signing: IV given as IO". */
  note: string | null;
  /** Added or replaced by an amendment after signing. */
  amended: boolean;
}

interface CorrectionData {
  supersedes?: string;
  reason?: string;
  replacement?: { kind: string; data: Record<string, unknown>; at: string };
}

const corr = (e: DebriefEvent) => e.data as CorrectionData;
const who = (e: DebriefEvent) => e.recordedByName ?? null;

function struckNote(c: DebriefEvent): string {
  const d = corr(c);
  const what = d.replacement ? 'Replaced' : 'Taken back';
  const when = c.amendment ? ' by an amendment' : '';
  return `${what}${when}${d.reason ? `: ${d.reason}` : ''}`;
}

/**
 * Every event as recorded, in time order: events later taken back or replaced stay listed,
 * struck through with the correction's reason, and each replacement stands at its own time
 * naming what it replaced. Corrections that were themselves undone leave no row.
 */
export function eventRows(d: Pick<Debrief, 'events' | 'record'>): EventRow[] {
  const t0 = Date.parse(d.record.arrestAt);
  const byId = new Map(d.events.map((e) => [e.id, e]));
  const rows: EventRow[] = [];
  for (const e of d.events) {
    const by = e.supersededBy ? byId.get(e.supersededBy) : undefined;
    if (e.kind !== 'correction') {
      rows.push({
        id: e.id,
        tSec: e.tSec,
        at: e.at,
        event: labelOf(eventKindLabels, e.kind),
        details: eventDetails(e.kind, e.data),
        by: who(e),
        struck: Boolean(by),
        note: by ? struckNote(by) : null,
        amended: e.amendment,
      });
      continue;
    }
    const r = corr(e).replacement;
    if (e.supersededBy || !r) continue;
    const old = corr(e).supersedes ? byId.get(corr(e).supersedes ?? '') : undefined;
    // A replacement at another time also says when the struck entry stood.
    const moved = old && Date.parse(old.at) !== Date.parse(r.at);
    const was = old
      ? `${labelOf(eventKindLabels, old.kind)} ${eventDetails(old.kind, old.data)}`.trim() +
        (moved ? ` at ${clockFromArrest(old.tSec)}` : '')
      : '';
    rows.push({
      id: e.id,
      tSec: (Date.parse(r.at) - t0) / 1000,
      at: r.at,
      event: labelOf(eventKindLabels, r.kind),
      details: eventDetails(r.kind, r.data ?? {}),
      by: who(e),
      struck: false,
      note: `${e.amendment ? 'Amended' : 'Corrected'}${was ? ` (was ${was.trim()})` : ''}${corr(e).reason ? `: ${corr(e).reason}` : ''}`,
      amended: e.amendment,
    });
  }
  return rows
    .map((r, i) => ({ r, i }))
    .sort((a, b) => a.r.tSec - b.r.tSec || a.i - b.i)
    .map((x) => x.r);
}
