/** A straight line y = intercept + slope·x with the centroid it passes through. */
export interface FittedLine {
  readonly slope: number;
  readonly intercept: number;
  readonly centroidX: number;
  readonly centroidY: number;
}

/**
 * Ordinary least-squares line through points [from, to] of two typed arrays,
 * optionally forced through a fixed intercept (Taylor's method with a picked
 * d0). Written out over the arrays rather than through simple-statistics'
 * array-of-pairs interface because it runs over every logger window of a
 * million-reading test, where building pair arrays would dominate the time.
 *
 * @param xs abscissae; @param ys ordinates; @param from first index; @param to last index (inclusive).
 * @param fixedIntercept when given, the fit is y − b = slope·x through (0, b).
 * @returns the line, or null when fewer than two distinct abscissae are in range.
 * @example leastSquaresLine(Float64Array.of(0, 1, 2), Float64Array.of(1, 3, 5), 0, 2)?.slope // 2
 */
export function leastSquaresLine(xs: Float64Array, ys: Float64Array, from: number, to: number, fixedIntercept?: number): FittedLine | null {
  const count = to - from + 1;
  if (count < 1) return null;
  let sumX = 0;
  let sumY = 0;
  for (let index = from; index <= to; index += 1) {
    sumX += xs[index] as number;
    sumY += ys[index] as number;
  }
  const meanX = sumX / count;
  const meanY = sumY / count;
  if (fixedIntercept !== undefined) {
    let sxy = 0;
    let sxx = 0;
    for (let index = from; index <= to; index += 1) {
      const x = xs[index] as number;
      sxy += x * ((ys[index] as number) - fixedIntercept);
      sxx += x * x;
    }
    if (!(sxx > 0)) return null;
    return { slope: sxy / sxx, intercept: fixedIntercept, centroidX: meanX, centroidY: meanY };
  }
  if (count < 2) return null;
  let sxy = 0;
  let sxx = 0;
  for (let index = from; index <= to; index += 1) {
    const dx = (xs[index] as number) - meanX;
    sxy += dx * ((ys[index] as number) - meanY);
    sxx += dx * dx;
  }
  if (!(sxx > 0)) return null;
  const slope = sxy / sxx;
  return { slope, intercept: meanY - slope * meanX, centroidX: meanX, centroidY: meanY };
}
