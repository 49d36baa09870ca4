import { reviewSchema } from '@upstroke/contracts';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { z } from 'zod';
import { apiFetch } from '../../../lib/api-client';

const historySchema = z.object({ items: z.array(reviewSchema) });

export function getReviewHistory(resuscitationId: string) {
  return apiFetch(`/reviews/${resuscitationId}`, { schema: historySchema });
}

export const reviewHistoryQuery = (id: string) =>
  queryOptions({ queryKey: ['reviews', 'history', id], queryFn: () => getReviewHistory(id) });

export function useReviewHistory(id: string) {
  return useQuery(reviewHistoryQuery(id));
}
