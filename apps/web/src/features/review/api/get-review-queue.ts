import { ReviewQueueItemSchema, type ReviewQueueItem } from '@porestack/types';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiPaths } from '../../../config/paths';
import { api } from '../../../lib/api-client';

const QueueSchema = ReviewQueueItemSchema.array();

export function getReviewQueue(orgId: string): Promise<ReviewQueueItem[]> {
  return api.get(apiPaths.reviewQueue(orgId), QueueSchema);
}

export const reviewQueueQueryOptions = (orgId: string) =>
  queryOptions({ queryKey: ['orgs', orgId, 'review-queue'], queryFn: () => getReviewQueue(orgId) });

export function useReviewQueue(orgId: string) {
  return useQuery(reviewQueueQueryOptions(orgId));
}
