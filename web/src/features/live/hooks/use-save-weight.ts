import type { EventData, EventKind } from '@upstroke/contracts';
import { useCallback } from 'react';
import { updateResuscitation } from '../../../lib/offline';
import type { OnWeight } from '../components/dose-choice-dialog';

/**
 * Saves a child's weight on the record (offline first). An estimate from age is also
 * recorded as a note naming the age and the formula, so the chart shows where it came from.
 */
export function useSaveWeight(
  recordId: string,
  record: <K extends EventKind>(kind: K, data: EventData<K>) => void,
): OnWeight {
  return useCallback<OnWeight>(
    (kg, estimate) => {
      void updateResuscitation(recordId, { weightKg: kg });
      if (estimate)
        record('note', {
          text: `Weight estimated at ${kg} kg from age ${estimate.age} (${estimate.formula})`,
        });
    },
    [recordId, record],
  );
}
