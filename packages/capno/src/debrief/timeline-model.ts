import {
  type AnalysisOutput,
  clockFromArrest,
  type DebriefEvent,
  epinephrineMarkerCode,
  type Etco2Point,
  eventLabel,
  eventMarkerCodes,
  type Interval,
  type TimelineModel,
} from '@upstroke/contracts';

/** Longest clinical axis drawn: a day. A later (mistyped) time cannot stretch it further. */
export const MAX_SPAN_SEC = 24 * 3600;
/** Shortest axis: one minute, so that a record with one event still has a scale. */
export const MIN_SPAN_SEC = 60;
/** Tick spacing in minutes, the first that keeps the axis to about a dozen ticks. */
const TICK_STEPS_MIN = [1, 2, 5, 10, 15, 30, 60, 120, 180, 360, 720];
const MAX_TICKS = 12;

export interface TimelineParts {
  /** Every event in force (capno's correction rule), on the record's clock. */
  inForce: readonly DebriefEvent[];
  output: AnalysisOutput;
  etco2Series: readonly Etco2Point[];
  /** Where a capnogram was stored (seconds from arrest); its gaps are the analysis' `dataGaps`. */
  waveformCoverage: readonly Interval[];
}

/**
 * End of the clinical axis: the `end` event in force, else the last clinical event, value
 * or capnogram sample. Events added by an amendment do not count (an amendment written days
 * later must not stretch the code), and the result lies in [MIN_SPAN_SEC, MAX_SPAN_SEC].
 */
export function spanEndSec(p: Omit<TimelineParts, 'output'>): number {
  const end = p.inForce.find((e) => e.kind === 'end');
  let last = 0;
  if (end) last = end.tSec;
  else {
    for (const e of p.inForce) if (!e.amendment) last = Math.max(last, e.tSec);
    for (const v of p.etco2Series) last = Math.max(last, v.tSec);
    for (const w of p.waveformCoverage) last = Math.max(last, w.endSec);
  }
  if (!Number.isFinite(last)) return MIN_SPAN_SEC;
  return Math.min(MAX_SPAN_SEC, Math.max(MIN_SPAN_SEC, last));
}

/** Ticks at round minutes from 0 to the end, at most `MAX_TICKS` intervals. */
export function ticksFor(endSec: number): TimelineModel['ticks'] {
  const minutes = endSec / 60;
  const step = TICK_STEPS_MIN.find((s) => minutes / s <= MAX_TICKS) ?? TICK_STEPS_MIN.at(-1)!;
  const ticks: TimelineModel['ticks'] = [];
  for (let m = 0; m * 60 <= endSec; m += step) ticks.push({ tSec: m * 60, label: String(m) });
  return ticks;
}

/** The short code drawn for an event ('' when it has none); epinephrine has its own. */
export function markerCode(e: Pick<DebriefEvent, 'kind' | 'data'>): string {
  if (e.kind === 'drug' && e.data.drug === 'epinephrine') return epinephrineMarkerCode;
  return eventMarkerCodes[e.kind] ?? '';
}

const clip = (xs: readonly Interval[], end: number): Interval[] =>
  xs
    .filter((x) => x.endSec > 0 && x.startSec < end)
    .map((x) => ({ startSec: Math.max(0, x.startSec), endSec: Math.min(end, x.endSec) }));

/** The timeline model every drawing reads (see `timelineModelSchema`). Pure. */
export function buildTimelineModel(p: TimelineParts): TimelineModel {
  const end = spanEndSec(p);
  const findings = p.output.findings;
  return {
    span: { startSec: 0, endSec: end },
    ticks: ticksFor(end),
    markers: p.inForce
      .filter((e) => e.tSec >= 0 && e.tSec <= end)
      .map((e) => ({
        id: e.id,
        tSec: e.tSec,
        kind: e.kind,
        code: markerCode(e),
        label: `${clockFromArrest(e.tSec)} ${eventLabel(e.kind, e.data)}`,
        amendment: e.amendment,
      })),
    shaded: [
      ...clip(p.output.measures.compressionIntervals ?? [], end).map((x) => ({
        kind: 'compressions' as const,
        ...x,
      })),
      ...clip(
        findings.filter((f) => f.kind === 'etco2-low'),
        end,
      ).map((x) => ({ kind: 'etco2-low' as const, ...x })),
      ...clip(p.output.measures.roscPeriods ?? [], end).map((x) => ({
        kind: 'rosc' as const,
        ...x,
      })),
    ],
    gaps: clip(p.output.measures.dataGaps ?? [], end),
    rises: findings
      .filter((f) => f.kind === 'etco2-rise' && f.startSec <= end)
      .map((f) => ({ tSec: f.startSec, confounder: f.confounder })),
  };
}
