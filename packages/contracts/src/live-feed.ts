import { z } from 'zod';
import { uuidSchema } from './common.js';
import { recordEntriesSchema } from './resuscitations.js';

/**
 * The live feed: a WebSocket at `/api/live-feed` that pushes every entry the server accepts
 * for a record to the tablets showing it, so that a ROSC tapped on one tablet reaches the
 * others at once (Live's 5-s ask for new entries remains only as a fallback). The browser
 * cannot set a header on a WebSocket, so the bearer token is the first message.
 */
export const LIVE_FEED_PATH = '/api/live-feed';

/** Client → server, once after connecting. */
export const liveFeedSubscribeSchema = z
  .object({
    type: z.literal('subscribe'),
    token: z.string().min(1).max(4000),
    resuscitationId: uuidSchema,
  })
  .strict();
export type LiveFeedSubscribe = z.infer<typeof liveFeedSubscribeSchema>;

/** Server → client: subscribed, new entries (the same shape as `GET …/entries`), or refused. */
export const liveFeedMessageSchema = z.discriminatedUnion('type', [
  z.object({ type: z.literal('subscribed'), resuscitationId: uuidSchema }),
  z.object({
    type: z.literal('entries'),
    resuscitationId: uuidSchema,
    events: recordEntriesSchema.shape.events,
    etco2: recordEntriesSchema.shape.etco2,
  }),
  z.object({ type: z.literal('refused'), message: z.string() }),
]);
export type LiveFeedMessage = z.infer<typeof liveFeedMessageSchema>;
export type LiveFeedEntries = Extract<LiveFeedMessage, { type: 'entries' }>;
