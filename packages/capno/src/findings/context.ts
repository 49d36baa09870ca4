import {
  type AgeGroup,
  type Breath,
  type Etco2DisplayUnit,
  type Etco2Point,
  type Finding,
  type FindingKind,
  formatEtco2,
  type Interval,
  type Pause,
  type Severity,
  type Thresholds,
} from '@upstroke/contracts';
import type { Etco2Segment } from '../etco2/segments.js';
import type { TimedEvent } from '../events/normalize.js';
import type { Timeline } from '../events/timeline.js';

/** Everything the finding rules read; built once per analysis (or per live refresh). */
export interface FindingContext {
  t: Thresholds;
  events: readonly TimedEvent[];
  tl: Timeline;
  pauses: readonly Pause[];
  points: readonly Etco2Point[];
  segments: readonly Etco2Segment[];
  breaths: readonly Breath[];
  /** Where the capnogram has no data between samples received (a link drop): no breath can be seen. */
  dataGaps: readonly Interval[];
  /** Times covered by waveform samples (no waveform → empty: absence cannot be judged). */
  waveformCoverage: readonly Interval[];
  /** Live use: the record is still open at `tl.endSec`, so open states (a pause) are ongoing. */
  live: boolean;
  /** Only findings that end at or after this time are needed (live refresh); else -Infinity. */
  from: number;
  /** All EtCO2 values, for rules that look far back (prognosis) when `points` is a recent tail. */
  allPoints: readonly Etco2Point[];
  /** Child and infant records: rules whose evidence is adult-only are not applied. */
  ageGroup: AgeGroup;
  /** The site's unit: messages write EtCO2 in it (values stay mmHg). */
  unit: Etco2DisplayUnit;
}

/** Shown with every finding: Upstroke supports documentation and review, never treatment. */
export const CAUTION =
  'Decision support only, not a diagnosis: follow your local resuscitation protocol and ' +
  "clinical judgement. Thresholds are your site's settings.";

/** Whole seconds (or minutes, breaths) for messages. */
export const fmt = (x: number) => String(Math.round(x));

/** An EtCO2 value or threshold (mmHg) in the site's unit for messages: "10 mmHg", "1.3 kPa". */
export const co2 = (c: Pick<FindingContext, 'unit'>, mmHg: number) => formatEtco2(mmHg, c.unit);

export function finding(
  kind: FindingKind,
  startSec: number,
  endSec: number,
  severity: Severity,
  message: string,
  confounder: Finding['confounder'] = null,
  caution: string = CAUTION,
): Finding {
  return { kind, startSec, endSec, severity, message, caution, confounder };
}

export const overlaps = (xs: readonly Interval[], s: number, e: number) =>
  xs.some((x) => x.startSec < e && x.endSec > s);

/** Whether [s, e] lies wholly inside one pulseless interval (no ROSC or end in between). */
export function pulselessThrough(tl: Timeline, s: number, e: number): boolean {
  return tl.pulseless.some((x) => x.startSec <= s && x.endSec >= e);
}

/** Whether compressions are still going at the end of the record (an open interval). */
export function compressionsRunningAtEnd(tl: Timeline): boolean {
  const last = tl.compressions[tl.compressions.length - 1];
  return last !== undefined && last.endSec >= tl.endSec;
}
