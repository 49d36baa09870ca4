import { LIVE_FEED_PATH, type LiveFeedEntries, liveFeedMessageSchema } from '@upstroke/contracts';

/** Wait before reconnecting after the feed closed (the 5-s ask covers the meantime). */
export const RECONNECT_MS = 3000;

export interface LiveFeedHandlers {
  /** Entries another tablet sent to the server for this record. */
  onEntries: (entries: LiveFeedEntries) => void;
  /** True once the server confirmed the subscription; false whenever the socket is down. */
  onLive: (live: boolean) => void;
}

export function liveFeedUrl(origin: Pick<Location, 'protocol' | 'host'> = window.location): string {
  return `${origin.protocol === 'https:' ? 'wss:' : 'ws:'}//${origin.host}${LIVE_FEED_PATH}`;
}

/**
 * Listens to the server's live feed for one record (CONTRACT: `/api/live-feed`), reconnecting
 * while open. Returns the function that closes it. Messages that fail the schema are ignored.
 */
export function openLiveFeed(
  resuscitationId: string,
  token: () => string | null,
  handlers: LiveFeedHandlers,
  url = liveFeedUrl(),
): () => void {
  let socket: WebSocket | null = null;
  let retry: ReturnType<typeof setTimeout> | undefined;
  let closed = false;
  const connect = () => {
    const bearer = token();
    if (closed || !bearer || typeof WebSocket === 'undefined') return;
    const ws = new WebSocket(url);
    socket = ws;
    ws.onopen = () =>
      ws.send(JSON.stringify({ type: 'subscribe', token: bearer, resuscitationId }));
    ws.onmessage = (e: MessageEvent) => {
      let m;
      try {
        m = liveFeedMessageSchema.safeParse(JSON.parse(String(e.data)));
      } catch {
        return;
      }
      if (!m.success) return;
      if (m.data.type === 'subscribed') handlers.onLive(true);
      else if (m.data.type === 'entries' && m.data.resuscitationId === resuscitationId)
        handlers.onEntries(m.data);
    };
    ws.onclose = () => {
      handlers.onLive(false);
      if (socket === ws && !closed) retry = setTimeout(connect, RECONNECT_MS);
    };
  };
  connect();
  return () => {
    closed = true;
    clearTimeout(retry);
    socket?.close(1000, 'Live closed');
  };
}
