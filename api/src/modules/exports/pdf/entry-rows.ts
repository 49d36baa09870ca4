import {
  type Debrief,
  type DebriefEtco2Entry,
  type Etco2DisplayUnit,
  eventDetails,
  eventKindLabels,
  eventLabel,
  formatEtco2Reading,
} from '@upstroke/contracts';

/** One line of the chart record's entry table: an event or a typed EtCO2 value. */
export interface EntryRow {
  id: string;
  tSec: number;
  at: string;
  what: string;
  details: string;
  status: string;
  /** Undone or corrected: printed struck through, never left out. */
  struck: boolean;
  amendment: boolean;
}

interface CorrectionData {
  supersedes?: unknown;
  reason?: unknown;
  replacement?: { kind?: unknown; data?: unknown; at?: unknown };
}

const isObject = (x: unknown): x is Record<string, unknown> =>
  x !== null && typeof x === 'object' && !Array.isArray(x);

/** What a correction names: the event's one-line label; a note with (the start of) its text. */
function targetLabel(kind: string, data: Record<string, unknown>): string {
  if (kind !== 'note' || typeof data.text !== 'string') return eventLabel(kind, data);
  return `Note: ${data.text.length > 60 ? `${data.text.slice(0, 59)}…` : data.text}`;
}

/** A value in the site's unit, with the unit it was recorded in when that differs. */
const reading = (v: DebriefEtco2Entry, unit: Etco2DisplayUnit) =>
  formatEtco2Reading(v, unit, { showRecorded: true });

/**
 * Every event and every typed EtCO2 value of the record, in time order, as the chart record
 * lists them: an entry a correction replaced or took back (Live's Undo) stays, struck through
 * with its status, and each correction says what it changed.
 */
export function entryRows(
  d: Pick<Debrief, 'events' | 'etco2Entries' | 'amendments'>,
  clock: (iso: string) => string,
  unit: Etco2DisplayUnit = 'mmHg',
): EntryRow[] {
  const labels = new Map<string, string>([
    ...d.events.map((e) => [e.id, targetLabel(e.kind, e.data)] as const),
    ...d.etco2Entries.map((v) => [v.id, `EtCO2 ${reading(v, unit)}`] as const),
  ]);
  const replaces = new Set(
    d.events
      .filter((e) => e.kind === 'correction' && isObject(e.data.replacement))
      .map((e) => e.id),
  );
  const statusOf = (supersededBy: string | null) =>
    supersededBy === null ? '' : replaces.has(supersededBy) ? 'corrected later' : 'undone';
  const amendNo = new Map(d.amendments.map((a, i) => [a.id, i + 1]));
  const rows: EntryRow[] = d.events.map((e) => ({
    id: e.id,
    tSec: e.tSec,
    at: e.at,
    what: eventKindLabels[e.kind] ?? e.kind,
    details:
      e.kind === 'correction'
        ? correctionDetails(e.data as CorrectionData, labels, clock)
        : eventDetails(e.kind, e.data),
    status: [statusOf(e.supersededBy), e.amendment ? amendmentStatus(amendNo, e.amendmentId) : '']
      .filter(Boolean)
      .join('; '),
    struck: e.supersededBy !== null,
    amendment: e.amendment,
  }));
  for (const v of d.etco2Entries) rows.push(valueRow(v, statusOf(v.supersededBy), unit));
  return rows
    .map((r, i) => ({ r, i }))
    .sort((a, b) => a.r.tSec - b.r.tSec || a.i - b.i)
    .map((x) => x.r);
}

const amendmentStatus = (numbers: ReadonlyMap<string, number>, id: string | null) =>
  `amendment ${numbers.get(id ?? '') ?? ''}`.trim();

function valueRow(v: DebriefEtco2Entry, status: string, unit: Etco2DisplayUnit): EntryRow {
  return {
    id: v.id,
    tSec: v.tSec,
    at: v.at,
    what: 'EtCO2',
    details: `${reading(v, unit)}${v.source === 'manual' ? ' (typed)' : ''}`,
    status,
    struck: v.supersededBy !== null,
    amendment: false,
  };
}

/** "Undoes EtCO2 18 mmHg — reason", "Replaces Shock: 150 J with Shock: 200 J at 10:02:30 — reason". */
function correctionDetails(
  c: CorrectionData,
  labels: ReadonlyMap<string, string>,
  clock: (iso: string) => string,
): string {
  const target = labels.get(String(c.supersedes)) ?? 'an entry';
  const r = c.replacement;
  const reason = typeof c.reason === 'string' && c.reason ? ` — ${c.reason}` : '';
  if (!r || typeof r.kind !== 'string') return `Undoes ${target}${reason}`;
  const data = isObject(r.data) ? r.data : {};
  const when = typeof r.at === 'string' ? ` at ${clock(r.at)}` : '';
  return `Replaces ${target} with ${eventLabel(r.kind, data)}${when}${reason}`;
}
