import { useCallback, useRef } from 'react';
import { type LocalEvent, recordEvent, updateResuscitation } from '../../../lib/offline';
import { arrestCorrection, startArrest } from '../lib/arrest-time';

/**
 * "The arrest was N min before": corrections with the reason (never a silent change), then
 * the record's arrest time, so that every clock on Live and the debrief's time zero follow.
 */
export function useArrestTime(id: string, arrestAt: string, events: readonly LocalEvent[]) {
  // Read when the change is saved, not on every tap.
  const latest = useRef(events);
  latest.current = events;
  return useCallback(
    async (minutes: number, reason: string) => {
      // A record without an arrest entry gets the Start tap's, for the correction to supersede.
      const original =
        startArrest(latest.current) ?? (await recordEvent(id, 'arrest', {}, { at: arrestAt }));
      const change = arrestCorrection(latest.current, original, minutes, reason);
      for (const data of change.corrections) await recordEvent(id, 'correction', data);
      await updateResuscitation(id, { arrestAt: change.arrestAt });
    },
    [id, arrestAt],
  );
}
