import type { StressVoidRatioPoint } from './compression-curve-types.js';

/** A segment flatter than this fraction of the line so far is taken as the knee, not the virgin line. */
const MINIMUM_SLOPE_FRACTION = 0.85;

/**
 * Automatic choice of the virgin compression line: starting from the two
 * highest-stress first-loading points, walk down in stress and keep each
 * next point while the segment it adds is at least 0.85 times as steep as the
 * least-squares line through the points kept so far. The walk stops at the
 * knee, where the curve flattens towards recompression. A reviewer can
 * override the choice (picks.virginLine).
 *
 * Why this rule: ASTM D2435/D2435M leaves the "straight-line portion" to the
 * engineer; keeping the high-stress end and stopping at the first markedly
 * flatter segment is what one does by eye, and it never reaches back past
 * σ′p into recompression. At 0.8 a point 0.04 decade below σ′p on a rounded
 * knee still joined the line on doubling loads, flattening Cc and moving
 * Pacheco Silva's σ′p 13 % low; 0.85 leaves it out, and noise of 0.001 in e
 * changes a segment's slope by under 0.01 per cycle, far inside the margin.
 *
 * @param loadingPoints first-loading points in increasing stress.
 * @returns positions (into loadingPoints) of the virgin-line points, increasing; empty when fewer than two points.
 * @example selectVirginLine(points) // e.g. [4, 5, 6, 7]
 */
export function selectVirginLine(loadingPoints: readonly StressVoidRatioPoint[]): number[] {
  const count = loadingPoints.length;
  if (count < 2) return [];
  const x = (position: number): number => Math.log10((loadingPoints[position] as StressVoidRatioPoint).stressKpa);
  const e = (position: number): number => (loadingPoints[position] as StressVoidRatioPoint).voidRatio;
  let sumX = x(count - 1) + x(count - 2);
  let sumY = e(count - 1) + e(count - 2);
  let sumXX = x(count - 1) ** 2 + x(count - 2) ** 2;
  let sumXY = x(count - 1) * e(count - 1) + x(count - 2) * e(count - 2);
  let first = count - 2;
  while (first > 0) {
    const n = count - first;
    const fittedSlope = -(n * sumXY - sumX * sumY) / (n * sumXX - sumX * sumX);
    const segmentSlope = -(e(first) - e(first - 1)) / (x(first) - x(first - 1));
    if (!(fittedSlope > 0) || segmentSlope < MINIMUM_SLOPE_FRACTION * fittedSlope) break;
    first -= 1;
    sumX += x(first);
    sumY += e(first);
    sumXX += x(first) ** 2;
    sumXY += x(first) * e(first);
  }
  return Array.from({ length: count - first }, (_, offset) => first + offset);
}
