import { composeDebrief } from '@upstroke/capno';
import { type Debrief, type DebriefRecord, defaultDisplayFormat } from '@upstroke/contracts';
// The mapping file itself (not the offline index): no IndexedDB code comes with it.
import { type LocalRecord, storedFromLocal } from '../../../lib/offline/stored-record';

export type { LocalRecord };

/** The header the server would show, from what the tablet knows (closing details stay there). */
function headerOf({ record, context }: LocalRecord): DebriefRecord {
  const site = context?.sites.find((s) => s.id === record.siteId);
  return {
    id: record.id,
    siteId: record.siteId,
    unitId: record.unitId ?? null,
    arrestAt: record.arrestAt,
    location: record.location ?? null,
    patientRef: record.patientRef ?? null,
    ageGroup: record.ageGroup ?? null,
    weightKg: record.weightKg ?? null,
    status: record.status,
    witnessed: null,
    monitored: null,
    firstRhythm: null,
    outcome: null,
    endReason: null,
    notesWentWell: null,
    notesToChange: null,
    createdBy: null,
    createdAt: new Date(record.createdAt).toISOString(),
    signedAt: null,
    signedBy: null,
    siteName: site?.name ?? '',
    unitName: site?.units.find((u) => u.id === record.unitId)?.name ?? null,
    paperSize: 'A4',
    etco2Unit: site?.etco2Unit ?? 'mmHg',
    display: site?.display ?? defaultDisplayFormat,
    createdByName: null,
    signedByName: null,
  };
}

/**
 * The debrief of a record made on this tablet, from its own store, when the API cannot be
 * reached: the same composition as the server (capno's `composeDebrief`) from the same
 * kind of stored record, with the site's thresholds as last synced.
 */
export function debriefFromLocal(local: LocalRecord): Debrief {
  return composeDebrief(storedFromLocal(local), {
    record: headerOf(local),
    computedBy: 'device',
  }).debrief;
}
