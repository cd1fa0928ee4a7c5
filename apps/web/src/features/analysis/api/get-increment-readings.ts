import { ReadingsPageSchema, type TimeCurvePoint } from '@porestack/types';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiPaths } from '../../../config/paths';
import { api } from '../../../lib/api-client';

const MAX_PAGE = 5000;
/** Enough points to see the curve's shape; a logger's 50,000 are thinned for drawing only. */
const MAX_PLOTTED_POINTS = 4000;

/**
 * One increment's readings for its time plots, asked for by increment (`?increment=N`), page by
 * page until the increment's total. `count` (from the analysis) only decides whether to ask.
 */
export async function getIncrementReadings(orgId: string, testId: string, incrementIndex: number): Promise<TimeCurvePoint[]> {
  const points: TimeCurvePoint[] = [];
  for (let start = 0; ; start += MAX_PAGE) {
    const page = await api.get(`${apiPaths.testReadings(orgId, testId)}?increment=${incrementIndex}&offset=${start}&limit=${MAX_PAGE}`, ReadingsPageSchema);
    for (const r of page.readings) points.push({ timeMin: r.elapsedMin, deformationMm: r.deformationMm });
    if (page.readings.length < MAX_PAGE || start + MAX_PAGE >= page.total) break;
  }
  return thin(points);
}

function thin(points: TimeCurvePoint[]): TimeCurvePoint[] {
  if (points.length <= MAX_PLOTTED_POINTS) return points;
  const step = points.length / MAX_PLOTTED_POINTS;
  const kept: TimeCurvePoint[] = [];
  for (let n = 0; n < MAX_PLOTTED_POINTS; n += 1) {
    const point = points[Math.floor(n * step)];
    if (point) kept.push(point);
  }
  const last = points[points.length - 1];
  if (last) kept.push(last);
  return kept;
}

export const incrementReadingsQueryOptions = (orgId: string, testId: string, incrementIndex: number, offset: number, count: number) =>
  queryOptions({
    queryKey: ['orgs', orgId, 'tests', testId, 'readings', 'increment', { incrementIndex, offset, count }],
    queryFn: () => getIncrementReadings(orgId, testId, incrementIndex),
    staleTime: 5 * 60_000,
  });

export function useIncrementReadings(orgId: string, testId: string, incrementIndex: number, offset: number, count: number) {
  return useQuery({ ...incrementReadingsQueryOptions(orgId, testId, incrementIndex, offset, count), enabled: count > 0 });
}
