import { type AgeGroup, ageGroupLabels, type EventData, type EventKind } from '@upstroke/contracts';
import { useCallback } from 'react';
import { updateResuscitation } from '../../../lib/offline';
import type { OnAgeGroup } from '../components/age-group-switch';

/**
 * Puts the record's age group right from a dose or energy dialog (offline first), and records
 * the change as a note naming the old and new group, so the chart shows it was corrected and
 * when: a record's patient is never changed silently.
 */
export function useSaveAgeGroup(
  recordId: string,
  current: AgeGroup | undefined,
  record: <K extends EventKind>(kind: K, data: EventData<K>) => void,
): OnAgeGroup {
  return useCallback<OnAgeGroup>(
    (ageGroup) => {
      const from = ageGroupLabels[current ?? 'adult'];
      void updateResuscitation(recordId, { ageGroup });
      record('note', {
        text: `Age group corrected on Live: ${from} → ${ageGroupLabels[ageGroup]}`,
      });
    },
    [recordId, current, record],
  );
}
