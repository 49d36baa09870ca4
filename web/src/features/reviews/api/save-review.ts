import { type ReviewInput, reviewSchema } from '@upstroke/contracts';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { z } from 'zod';
import { apiFetch } from '../../../lib/api-client';

export function saveReview(resuscitationId: string, input: ReviewInput) {
  return apiFetch(`/reviews/${resuscitationId}`, {
    method: 'POST',
    body: input,
    schema: z.object({ items: z.array(reviewSchema) }),
  });
}

/** Records a review status; the queue, history and trends table refresh afterwards. */
export function useSaveReview(resuscitationId: string) {
  const client = useQueryClient();
  return useMutation({
    mutationFn: (input: ReviewInput) => saveReview(resuscitationId, input),
    onSuccess: () => {
      void client.invalidateQueries({ queryKey: ['reviews'] });
      void client.invalidateQueries({ queryKey: ['trends', 'records'] });
    },
  });
}
