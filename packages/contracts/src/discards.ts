import { z } from 'zod';
import { uuidSchema } from './common.js';
import { DISCARD_CONTENT_MAX } from './discard-content.js';

/**
 * `POST /resuscitations/:id/discards`: a lead gives up, with a reason, on entries the server
 * refused. The tablet drops them from its outbox (they stay in its store, marked discarded);
 * the server's audit log records who, why, the server's reason and each entry's content.
 * `siteId` names the record's site when the server never received the record itself (its
 * start was refused): the lead must belong to that site.
 */
export const discardRefusedSchema = z
  .object({
    reason: z.string().trim().min(3, 'say why (at least 3 characters)').max(500),
    siteId: uuidSchema.optional(),
    items: z
      .array(
        z
          .object({
            id: uuidSchema,
            /** `record`: the start or an update of the record itself. */
            kind: z.enum(['events', 'etco2', 'waveform', 'record']),
            /** The server's reason for refusing it, as the tablet kept it ('' when held back). */
            refusal: z.string().max(500),
            /**
             * The entry as the tablet kept it, as JSON text (so a refused NUL or lone surrogate
             * arrives escaped, never raw); longer content is cut with a note.
             */
            content: z
              .string()
              .max(DISCARD_CONTENT_MAX + 100)
              .optional(),
          })
          .strict(),
      )
      .min(1)
      .max(5000),
  })
  .strict();
export type DiscardRefused = z.infer<typeof discardRefusedSchema>;

export const discardResultSchema = z.object({ discarded: z.number().int().nonnegative() });
export type DiscardResult = z.infer<typeof discardResultSchema>;
