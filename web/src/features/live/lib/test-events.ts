import { type EventData, type EventKind, eventOfKind } from '@upstroke/contracts';
import type { LocalEtco2, LocalEvent } from '../../../lib/offline';

/** Test entries of one record, `sec` seconds after 2026-03-04T10:00:00Z. */
export const T0 = Date.UTC(2026, 2, 4, 10, 0, 0);
/** The arrest time of these tests' record. */
export const ARREST = new Date(T0).toISOString();
export const atSec = (sec: number) => new Date(T0 + sec * 1000).toISOString();

let n = 0;
/** An event of `kind`; kinds whose data has required fields name them. */
export function ev<K extends EventKind>(
  kind: K,
  sec: number,
  data: EventData<K> = {} as EventData<K>,
): LocalEvent {
  n += 1;
  return eventOfKind(
    { id: `e${n}`, resuscitationId: 'r', at: atSec(sec), deviceId: 'd' },
    kind,
    data,
  );
}

export function typed(
  value: number,
  sec: number,
  source: LocalEtco2['source'] = 'manual',
): LocalEtco2 {
  n += 1;
  return {
    id: `v${n}`,
    resuscitationId: 'r',
    at: atSec(sec),
    value,
    unit: 'mmHg',
    source,
    deviceId: 'd',
  };
}
