import { ReviewEventSchema, type ReviewEvent } from '@porestack/types';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiPaths } from '../../../config/paths';
import { api } from '../../../lib/api-client';

const ReviewsSchema = ReviewEventSchema.array();

export function getReviews(orgId: string, testId: string): Promise<ReviewEvent[]> {
  return api.get(apiPaths.testReviews(orgId, testId), ReviewsSchema);
}

export const reviewsQueryOptions = (orgId: string, testId: string) =>
  queryOptions({ queryKey: ['orgs', orgId, 'tests', testId, 'reviews'], queryFn: () => getReviews(orgId, testId) });

export function useReviews(orgId: string, testId: string) {
  return useQuery(reviewsQueryOptions(orgId, testId));
}
