import type { AnyEventOf, EventData, EventKind } from './events.js';

/**
 * One event of `kind` with its data and the fields `extra`, as the discriminated union.
 * TypeScript cannot choose the union member for a generic kind; the pairing of `kind` and
 * `data` is checked here by the signature, so callers need no cast. (Apart from the events'
 * schemas, so a screen that records events, Live, loads no zod.)
 */
export function eventOfKind<K extends EventKind, Extra extends object>(
  extra: Extra,
  kind: K,
  data: EventData<K>,
): AnyEventOf<Extra> {
  return { ...extra, kind, data } as AnyEventOf<Extra>;
}
