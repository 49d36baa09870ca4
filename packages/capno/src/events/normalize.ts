import {
  analysisEventSchema,
  type AnalysisEvent,
  type AnalysisInput,
  type EventKind,
} from '@upstroke/contracts';
import { activeCorrections } from './corrections.js';

/** An event on the analysis clock: `tSec` is seconds from the arrest time. */
export type TimedEvent = AnalysisEvent & { tSec: number };
/**
 * An event as `analysisInputSchema` infers it. The schema pairs each kind with its data,
 * but the inferred type does not say so; once validated it is an `AnalysisEvent`.
 */
export type InputEvent = AnalysisInput['events'][number] | AnalysisEvent;
export type TimedEventOf<K extends EventKind> = Extract<TimedEvent, { kind: K }>;

/**
 * Applies `correction` events, then puts events on the analysis clock, sorted by time
 * (stable for equal times).
 *
 * A correction removes the event it supersedes and, when it carries a replacement
 * `{kind, data, at}`, adds that event in its place (id = the correction's id). A correction
 * that is itself superseded by a later correction has no effect. A replacement that does
 * not match the event schema is dropped (the CLI rejects such input before analysis).
 */
export function normalizeEvents(arrestAt: string, input: readonly InputEvent[]): TimedEvent[] {
  const events = input as readonly AnalysisEvent[];
  const corrections = activeCorrections<Correction>(events.filter((e) => isCorrection(e)));
  const supersededIds = new Set(corrections.map((c) => c.data.supersedes));
  const kept: AnalysisEvent[] = [];
  for (const e of events) {
    if (e.kind !== 'correction' && !supersededIds.has(e.id)) kept.push(e);
  }
  for (const c of corrections) {
    const r = c.data.replacement;
    if (!r) continue;
    const parsed = analysisEventSchema.safeParse({ id: c.id, ...r });
    if (parsed.success && parsed.data.kind !== 'correction')
      kept.push(parsed.data as AnalysisEvent);
  }
  const zeroMs = Date.parse(arrestAt);
  // What the analysis reads of an event, built field by field (a spread costs far more).
  const timed = kept.map((e) => {
    const tSec = (Date.parse(e.at) - zeroMs) / 1000;
    return { id: e.id, at: e.at, kind: e.kind, data: e.data, tSec } as TimedEvent;
  });
  // Array sort is stable: equal times keep their input order.
  return timed.sort((a, b) => a.tSec - b.tSec);
}

type Correction = Extract<AnalysisEvent, { kind: 'correction' }>;

function isCorrection(e: AnalysisEvent): e is Correction {
  return e.kind === 'correction';
}

/** Type guard for narrowing a timed event by kind. */
export function isKind<K extends EventKind>(e: TimedEvent, kind: K): e is TimedEventOf<K> {
  return e.kind === kind;
}

/** The first event of a kind matching an optional predicate, or undefined. */
export function firstOf<K extends EventKind>(
  events: readonly TimedEvent[],
  kind: K,
  pred: (e: TimedEventOf<K>) => boolean = () => true,
): TimedEventOf<K> | undefined {
  for (const e of events) if (isKind(e, kind) && pred(e)) return e;
  return undefined;
}

/** Times of epinephrine doses, in order. */
export function epinephrineTimes(events: readonly TimedEvent[]): number[] {
  const out: number[] = [];
  for (const e of events) if (e.kind === 'drug' && e.data.drug === 'epinephrine') out.push(e.tSec);
  return out;
}
