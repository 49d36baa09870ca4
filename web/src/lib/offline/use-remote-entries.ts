import { useQuery } from '@tanstack/react-query';
import { useRef, useSyncExternalStore } from 'react';
import { apiFetch } from '../api-client';
import { offlineDb } from './db';
import { syncEngine } from './engine-instance';
import { mergeRemoteEntries, remoteEntriesSchema } from './pull';

/** How often Live asks the server for other tablets' entries while it is open and online. */
export const PULL_INTERVAL_MS = 5000;

/**
 * While Live is open and online, brings in what other tablets record for the same code
 * (timers and prompts count every tablet's taps). Failures are quiet: the sync indicator
 * already says when the server cannot be reached, and this tablet's own entries never wait
 * for it.
 */
export function useRemoteEntries(
  resuscitationId: string,
  enabled: boolean,
  /** Ids the screen already holds for this record (skips a store look-up for them). */
  known: ReadonlySet<string>,
): void {
  const { online } = useSyncExternalStore(syncEngine.subscribe, syncEngine.getState);
  const knownNow = useRef(known);
  knownNow.current = known;
  useQuery({
    queryKey: ['resuscitations', resuscitationId, 'other-tablets'],
    queryFn: async () =>
      mergeRemoteEntries(
        offlineDb,
        resuscitationId,
        await apiFetch(`/resuscitations/${resuscitationId}`, { schema: remoteEntriesSchema }),
        knownNow.current,
      ),
    enabled: enabled && online,
    refetchInterval: PULL_INTERVAL_MS,
    retry: false,
    gcTime: 0,
  });
}
