import { useQuery } from '@tanstack/react-query';
import { type Resuscitation, type Thresholds, thresholdDefaults } from '@upstroke/contracts';
import { useLiveQuery } from 'dexie-react-hooks';
import { useEffect, useMemo } from 'react';
import { useLocation } from 'react-router-dom';
import { apiFetch } from '../../../lib/api-client';
import {
  type LocalResuscitation,
  offlineDb,
  type SyncAck,
  useRecordRows,
  useRemoteEntries,
  wireSchemas,
} from '../../../lib/offline';

/**
 * The record, its events and EtCO2 values as this tablet holds them (IndexedDB first). A
 * record started on another tablet is fetched once and kept locally so Live works offline;
 * while online, what other tablets record for it is brought in every few seconds.
 */
export function useLiveRecord(id: string) {
  // Just started on the Board: drawn from what Start stored, while the store is read.
  const started = (useLocation().state as { started?: LocalResuscitation } | null)?.started;
  const record = useLiveQuery(
    () => offlineDb.resuscitations.get(id),
    [id],
    started?.id === id ? started : null,
  );
  // Events and typed values are append-only: after a commit only the new rows are read.
  const events = useRecordRows(offlineDb.events, id);
  const etco2 = useRecordRows(offlineDb.etco2, id);
  // The server's answers, for the "waiting" and "refused" marks (kept apart from the taps).
  const answers = useLiveQuery(
    () => offlineDb.acks.where('resuscitationId').equals(id).toArray(),
    [id],
    [],
  );
  const acks = useMemo(() => new Map<string, SyncAck>(answers.map((a) => [a.id, a])), [answers]);
  const remote = useQuery({
    queryKey: ['resuscitations', id, 'summary'],
    queryFn: async () =>
      apiFetch(`/resuscitations/${id}`, { schema: (await wireSchemas()).resuscitationSchema }),
    enabled: record === undefined,
  });
  useEffect(() => {
    if (record === undefined && remote.data) void adopt(remote.data);
  }, [record, remote.data]);
  // Other tablets on the same code: their taps join this tablet's store.
  useRemoteEntries(id, Boolean(record), [events, etco2]);
  return { record, events, etco2, acks, loadError: record === undefined ? remote.error : null };
}

async function adopt(r: Resuscitation): Promise<void> {
  await offlineDb.resuscitations.put({
    id: r.id,
    siteId: r.siteId,
    unitId: r.unitId ?? undefined,
    arrestAt: r.arrestAt,
    location: r.location ?? undefined,
    patientRef: r.patientRef ?? undefined,
    ageGroup: r.ageGroup ?? undefined,
    weightKg: r.weightKg ?? undefined,
    roster: r.roster ?? [],
    status: r.status === 'open' ? 'open' : 'closed',
    local: 0,
    createdAt: Date.now(),
  });
}

/** The site's thresholds and EtCO2 unit from the cached context (defaults when unknown). */
export function useSiteSettings(siteId: string | undefined): {
  thresholds: Thresholds;
  etco2Unit: 'mmHg' | 'kPa';
} {
  const context = useLiveQuery(() => offlineDb.meta.get('context'), []);
  const sites = context && 'sites' in context.value ? context.value.sites : [];
  const site = sites.find((s) => s.id === siteId);
  return {
    thresholds: site?.profile?.thresholds ?? thresholdDefaults,
    etco2Unit: site?.etco2Unit ?? 'mmHg',
  };
}
