import { listSchema, reviewQueueItemSchema, type ReviewQueueQuery } from '@upstroke/contracts';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiFetch } from '../../../lib/api-client';

export type QueueStatus = ReviewQueueQuery['status'];

export function getReviewQueue(status: QueueStatus) {
  return apiFetch(`/reviews?status=${status}&limit=500`, {
    schema: listSchema(reviewQueueItemSchema),
  });
}

export const reviewQueueQuery = (status: QueueStatus) =>
  queryOptions({ queryKey: ['reviews', 'queue', status], queryFn: () => getReviewQueue(status) });

export function useReviewQueue(status: QueueStatus) {
  return useQuery(reviewQueueQuery(status));
}
