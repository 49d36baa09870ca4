import { queryOptions, useQuery } from '@tanstack/react-query';
import { type Debrief, debriefSchema, type RecordingContext } from '@upstroke/contracts';
import { apiFetch, ApiRequestError } from '../../../lib/api-client';
import { offlineDb, withAcks } from '../../../lib/offline';
import { debriefFromLocal } from './offline-debrief';

export function getDebrief(id: string): Promise<Debrief> {
  return apiFetch(`/resuscitations/${id}/debrief`, { schema: debriefSchema });
}

/** The record from this tablet's own store, or null when it was not made here. */
export async function getLocalDebrief(id: string): Promise<Debrief | null> {
  const record = await offlineDb.resuscitations.get(id);
  if (!record) return null;
  const range = [
    [id, ''],
    [id, '\uffff'],
  ] as const;
  const [events, etco2, waveformChunks, answers, meta] = await Promise.all([
    offlineDb.events.where('[resuscitationId+at]').between(range[0], range[1]).toArray(),
    offlineDb.etco2.where('[resuscitationId+at]').between(range[0], range[1]).toArray(),
    offlineDb.waveformChunks
      .where('[resuscitationId+startAt]')
      .between(range[0], range[1])
      .toArray(),
    offlineDb.acks.where('resuscitationId').equals(id).toArray(),
    offlineDb.meta.get('context'),
  ]);
  const context = (meta?.value as RecordingContext | undefined) ?? null;
  const acks = new Map(answers.map((a) => [a.id, a]));
  return debriefFromLocal({
    record,
    events: withAcks(events, acks),
    etco2: withAcks(etco2, acks),
    waveformChunks: waveformChunks.filter((c) => acks.get(c.id)?.state !== 2),
    context,
  });
}

/**
 * The server's debrief; when the API cannot be reached (no network, not an HTTP answer),
 * the same analysis runs on this tablet from its own store for a record made here.
 */
export async function getDebriefOrLocal(id: string): Promise<Debrief> {
  try {
    return await getDebrief(id);
  } catch (error) {
    if (error instanceof ApiRequestError && error.status < 500) throw error;
    const local = await getLocalDebrief(id);
    if (!local) throw error;
    return local;
  }
}

export const debriefQuery = (id: string) =>
  queryOptions({
    queryKey: ['debrief', id],
    queryFn: () => getDebriefOrLocal(id),
    retry: false,
  });

export function useDebrief(id: string) {
  return useQuery(debriefQuery(id));
}
