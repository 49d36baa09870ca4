import { useMutation } from '@tanstack/react-query';
import type { SendDebriefEmail } from '@upstroke/contracts';
import { z } from 'zod';
import { apiFetch } from '../../../lib/api-client';

export const emailResultSchema = z.object({
  status: z.enum(['sent', 'queued']),
});

export function sendDebriefEmail(id: string, body: SendDebriefEmail) {
  return apiFetch(`/resuscitations/${id}/email`, {
    method: 'POST',
    body,
    schema: emailResultSchema,
  });
}

export function useSendDebriefEmail(id: string) {
  return useMutation({ mutationFn: (body: SendDebriefEmail) => sendDebriefEmail(id, body) });
}
