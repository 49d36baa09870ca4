import { z } from 'zod';
import { uuidSchema } from './common.js';

/**
 * `POST /resuscitations/:id/discards`: a lead gives up, with a reason, on entries the server
 * refused. The tablet keeps them (marked discarded); the server records who, why and what.
 */
export const discardRefusedSchema = z
  .object({
    reason: z.string().trim().min(3, 'say why (at least 3 characters)').max(500),
    items: z
      .array(
        z
          .object({
            id: uuidSchema,
            kind: z.enum(['events', 'etco2', 'waveform']),
            /** The server's reason for refusing it, as the tablet kept it. */
            refusal: z.string().max(500),
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
