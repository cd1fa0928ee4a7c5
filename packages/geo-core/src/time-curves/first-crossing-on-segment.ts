import { monotoneCubicAt } from './monotone-cubic-at.js';

/**
 * Abscissa inside segment [xs[segment], xs[segment + 1]] where the monotone
 * cubic through the points meets the line y = intercept + slope·x, given that
 * (curve − line) changes sign across the segment. Bisection: 50 halvings take
 * the bracket below 1e-15 of its width, and it cannot leave the segment.
 *
 * @param xs abscissae; @param ys ordinates; @param segment left node of the bracketing segment.
 * @param intercept line intercept (a horizontal line has slope 0); @param slope line slope.
 * @returns the crossing abscissa.
 * @throws RangeError when the segment is not inside the arrays.
 * @example firstCrossingOnSegment(Float64Array.of(0, 1), Float64Array.of(0, 2), 0, 1, 0) // 0.5
 */
export function firstCrossingOnSegment(xs: Float64Array, ys: Float64Array, segment: number, intercept: number, slope: number): number {
  if (!(segment >= 0 && segment + 1 < xs.length)) throw new RangeError('firstCrossingOnSegment requires a segment inside the arrays');
  let low = xs[segment] as number;
  let high = xs[segment + 1] as number;
  const gap = (x: number): number => monotoneCubicAt(xs, ys, segment, x) - (intercept + slope * x);
  const lowSign = Math.sign(gap(low));
  for (let iteration = 0; iteration < 50; iteration += 1) {
    const middle = (low + high) / 2;
    if (Math.sign(gap(middle)) === lowSign && lowSign !== 0) low = middle;
    else high = middle;
  }
  return (low + high) / 2;
}
