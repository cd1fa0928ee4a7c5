/** Half-width of the window in which the local slope of d–log t is fitted (a factor of 2 in time across). */
const SLOPE_HALF_WINDOW_DECADES = 0.15;

/** The tangent at the steepest part of a d–log t curve. */
export interface SteepestLogTimeTangent {
  /** Slope, mm per log10 cycle of time (positive in compression). */
  readonly slope: number;
  /** Index of the reading at the centre of the steepest window. */
  readonly index: number;
  /** The fitted window's centroid, through which the tangent passes. */
  readonly centroidLogTime: number;
  readonly centroidDeformationMm: number;
}

/**
 * The tangent at the steepest part of the deformation–log10 t curve, as
 * Casagrande & Fadum's (1940) construction draws it: at every interior
 * reading, the least-squares slope over ±0.15 decade of log t (at least one
 * neighbour each side); the steepest such line is the tangent. Prefix sums
 * make every window O(1), so a logger record costs one pass.
 *
 * @param logs log10 of the (binned) times, increasing.
 * @param deformations deformation at each, mm.
 * @returns the tangent, or null when the curve never steepens in compression.
 * @example steepestLogTimeTangent(Float64Array.of(0, 1, 2, 3), Float64Array.of(0, 0.1, 0.5, 0.6))?.index // 1
 */
export function steepestLogTimeTangent(logs: Float64Array, deformations: Float64Array): SteepestLogTimeTangent | null {
  const count = logs.length;
  const sumX = new Float64Array(count + 1);
  const sumY = new Float64Array(count + 1);
  const sumXX = new Float64Array(count + 1);
  const sumXY = new Float64Array(count + 1);
  for (let index = 0; index < count; index += 1) {
    const x = logs[index] as number;
    const y = deformations[index] as number;
    sumX[index + 1] = (sumX[index] as number) + x;
    sumY[index + 1] = (sumY[index] as number) + y;
    sumXX[index + 1] = (sumXX[index] as number) + x * x;
    sumXY[index + 1] = (sumXY[index] as number) + x * y;
  }
  let steepestSlope = -Infinity;
  let steepestIndex = -1;
  let tangentCentroidX = 0;
  let tangentCentroidY = 0;
  let low = 0;
  let high = 0;
  for (let centre = 1; centre < count - 1; centre += 1) {
    const x = logs[centre] as number;
    while ((logs[low] as number) < x - SLOPE_HALF_WINDOW_DECADES) low += 1;
    while (high + 1 < count && (logs[high + 1] as number) <= x + SLOPE_HALF_WINDOW_DECADES) high += 1;
    const from = Math.min(low, centre - 1);
    const to = Math.max(high, centre + 1);
    const n = to - from + 1;
    const sx = (sumX[to + 1] as number) - (sumX[from] as number);
    const sy = (sumY[to + 1] as number) - (sumY[from] as number);
    const sxx = (sumXX[to + 1] as number) - (sumXX[from] as number);
    const sxy = (sumXY[to + 1] as number) - (sumXY[from] as number);
    const denominator = n * sxx - sx * sx;
    if (!(denominator > 0)) continue;
    const slope = (n * sxy - sx * sy) / denominator;
    if (slope > steepestSlope) {
      steepestSlope = slope;
      steepestIndex = centre;
      tangentCentroidX = sx / n;
      tangentCentroidY = sy / n;
    }
  }
  if (steepestIndex < 0 || !(steepestSlope > 0)) return null;
  return { slope: steepestSlope, index: steepestIndex, centroidLogTime: tangentCentroidX, centroidDeformationMm: tangentCentroidY };
}
