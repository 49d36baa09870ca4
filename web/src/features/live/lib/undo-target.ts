import { supersededIds } from '@upstroke/capno';
import { type Etco2DisplayUnit, eventLabel, formatEtco2Reading } from '@upstroke/contracts';
import type { LocalEtco2, LocalEvent } from '../../../lib/offline';

/** The entry Undo takes back: the newest tap still in force, event or typed EtCO2 value. */
export interface UndoTarget {
  id: string;
  at: string;
  /** What the screen says it undid ("EtCO2 18 mmHg", "Shock 200 J"). */
  label: string;
}

/**
 * "18 mmHg": a value typed in the site's unit as typed; any other (a monitor link's mmHg on
 * a kPa site) converted to the site's unit, so Live reads in one unit.
 */
export function etco2Reading(
  v: Pick<LocalEtco2, 'value' | 'unit'>,
  siteUnit: Etco2DisplayUnit = 'mmHg',
): string {
  return formatEtco2Reading(v, siteUnit);
}

/** What the log and Undo call a value ("EtCO2 18 mmHg"). */
export function etco2Label(
  v: Pick<LocalEtco2, 'value' | 'unit'>,
  siteUnit: Etco2DisplayUnit = 'mmHg',
): string {
  return `EtCO2 ${etco2Reading(v, siteUnit)}`;
}

/**
 * Newest by time, events in force and typed values not taken back alike; values from the
 * monitor link are not taps and are never undone. On equal times the event wins (a typed
 * value is rarely stamped in the same millisecond as a tap).
 */
export function undoTarget(
  inForce: readonly LocalEvent[],
  events: readonly LocalEvent[],
  etco2: readonly LocalEtco2[],
  siteUnit: Etco2DisplayUnit = 'mmHg',
): UndoTarget | null {
  const gone = supersededIds(events);
  let value: LocalEtco2 | undefined;
  for (const v of etco2)
    if (v.source === 'manual' && !gone.has(v.id) && (!value || v.at > value.at)) value = v;
  const event = inForce.at(-1);
  if (value && (!event || Date.parse(value.at) > Date.parse(event.at)))
    return { id: value.id, at: value.at, label: etco2Label(value, siteUnit) };
  return event ? { id: event.id, at: event.at, label: eventLabel(event.kind, event.data) } : null;
}

/** Ids of every entry (event or value) that a correction in force took back. */
export function undoneIds(events: readonly LocalEvent[]): ReadonlySet<string> {
  return supersededIds(events);
}
