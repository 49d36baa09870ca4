import { useQuery, useQueryClient } from '@tanstack/react-query';
import { useEffect, useRef, useState, useSyncExternalStore } from 'react';
import { apiFetch } from '../api-client';
import { authStore } from '../auth-store';
import { offlineDb } from './db';
import { syncEngine } from './engine-instance';
import { mergeRemoteEntries } from './pull';
import { wireSchemas } from './transport';

/**
 * How often Live asks the server for other tablets' entries while it is open and online and
 * the live feed is down (while the feed is up, the server pushes them as they arrive).
 */
export const PULL_INTERVAL_MS = 5000;
/**
 * Each ask reaches back this far before the server's last answer: an entry is stamped when
 * its transaction began, so one committed just after an answer can carry an earlier time.
 */
const OVERLAP_MS = 30_000;

/**
 * While Live is open and online, brings in what other tablets record for the same code
 * (timers and prompts count every tablet's taps). Failures are quiet: the sync indicator
 * already says when the server cannot be reached, and this tablet's own entries never wait
 * for it.
 */
export function useRemoteEntries(
  resuscitationId: string,
  enabled: boolean,
  /** What the screen already holds for this record (no store look-up for those). */
  held: readonly (readonly { id: string }[])[],
): void {
  const { online } = useSyncExternalStore(syncEngine.subscribe, syncEngine.getState);
  // Read when an answer arrives, not on every tap.
  const heldNow = useRef(held);
  heldNow.current = held;
  const pushed = useLiveFeed(resuscitationId, enabled && online, heldNow);
  // The next `since`, for this record only (a new record starts from the beginning).
  const since = useRef<{ id: string; at: string } | null>(null);
  useQuery({
    queryKey: ['resuscitations', resuscitationId, 'other-tablets'],
    queryFn: async () => {
      const from = since.current?.id === resuscitationId ? since.current.at : null;
      const query = from ? `?since=${encodeURIComponent(from)}` : '';
      const answer = await apiFetch(`/resuscitations/${resuscitationId}/entries${query}`, {
        schema: (await wireSchemas()).recordEntriesSchema,
      });
      const added = await mergeRemoteEntries(offlineDb, resuscitationId, answer, idsOf(heldNow));
      const at = new Date(Date.parse(answer.serverTime) - OVERLAP_MS).toISOString();
      since.current = { id: resuscitationId, at };
      return added;
    },
    enabled: enabled && online,
    refetchInterval: pushed ? false : PULL_INTERVAL_MS,
    retry: false,
    gcTime: 0,
  });
}

type Held = { readonly current: readonly (readonly { id: string }[])[] };

function idsOf(held: Held): Set<string> {
  return new Set(held.current.flatMap((rows) => rows.map((r) => r.id)));
}

/**
 * The server's live feed for this record: pushed entries go straight into the store (the
 * screen's live queries redraw at once). True while subscribed; each new subscription asks
 * once for what arrived while the feed was down. The feed also echoes this tablet's own
 * entries once they reach the server: those the screen already holds are dropped without a
 * store look-up (a read of the events table would hold the next tap's write back).
 */
function useLiveFeed(resuscitationId: string, enabled: boolean, held: Held): boolean {
  const client = useQueryClient();
  const [live, setLive] = useState(false);
  useEffect(() => {
    if (!enabled) return;
    let close: (() => void) | undefined;
    let stopped = false;
    // The feed and its message schema (zod) load after Live's first draw.
    void import('./live-feed').then(({ openLiveFeed }) => {
      if (stopped) return;
      close = openLiveFeed(resuscitationId, () => authStore.get()?.accessToken ?? null, {
        onEntries: (entries) =>
          void mergeRemoteEntries(offlineDb, resuscitationId, entries, idsOf(held)),
        onLive: (up) => {
          setLive(up);
          if (up)
            void client.invalidateQueries({
              queryKey: ['resuscitations', resuscitationId, 'other-tablets'],
            });
        },
      });
    });
    return () => {
      stopped = true;
      close?.();
      setLive(false);
    };
  }, [resuscitationId, enabled, client, held]);
  return live;
}
