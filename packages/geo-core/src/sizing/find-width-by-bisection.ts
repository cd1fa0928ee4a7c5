/** Outcome of a monotone root search on a bracket. */
export type BisectionOutcome =
  | { readonly status: 'found'; readonly x: number; readonly valueAtX: number; readonly iterations: number }
  | { readonly status: 'below-bracket'; readonly valueAtLow: number; readonly valueAtHigh: number }
  | { readonly status: 'above-bracket'; readonly valueAtLow: number; readonly valueAtHigh: number };

/**
 * Bisection for a decreasing function: the smallest x in [low, high], to within
 * `toleranceX`, with f(x) ≤ target. Returns the upper end of the final bracket,
 * so the answer always satisfies f(x) ≤ target — a width found this way, put
 * back in, meets its settlement target.
 *
 * 'below-bracket': already f(low) ≤ target (the smallest size is enough);
 * 'above-bracket': even f(high) > target (no size within the bounds works).
 * Bisection rather than a faster secant step because each evaluation is cheap
 * and bisection cannot leave the bracket; it needs ~log2((high − low)/tol) steps.
 *
 * @param f decreasing function of x
 * @param target the value f must not exceed
 * @param low lower end of the bracket (finite)
 * @param high upper end of the bracket (> low)
 * @param toleranceX width of the final bracket in x's units (> 0)
 * @returns the outcome with x, or which side of the bracket the target lies on
 * @throws RangeError when the bracket or tolerance is not valid, or f returns a non-finite value
 * @example findWidthByBisection((b) => 1 / b, 0.25, 1, 10, 1e-6) // { status: 'found', x ≈ 4 }
 */
export function findWidthByBisection(f: (x: number) => number, target: number, low: number, high: number, toleranceX: number): BisectionOutcome {
  if (!(Number.isFinite(low) && Number.isFinite(high) && high > low)) throw new RangeError('findWidthByBisection requires finite low < high');
  if (!(toleranceX > 0)) throw new RangeError('findWidthByBisection requires toleranceX > 0');
  const evaluate = (x: number) => {
    const value = f(x);
    if (!Number.isFinite(value)) throw new RangeError(`findWidthByBisection requires f to return finite values (f(${x}) = ${value})`);
    return value;
  };
  const valueAtLow = evaluate(low);
  if (valueAtLow <= target) return { status: 'below-bracket', valueAtLow, valueAtHigh: evaluate(high) };
  let valueAtHigh = evaluate(high);
  if (valueAtHigh > target) return { status: 'above-bracket', valueAtLow, valueAtHigh };
  let lowX = low;
  let highX = high;
  let iterations = 0;
  while (highX - lowX > toleranceX && iterations < 200) {
    const midX = (lowX + highX) / 2;
    const valueAtMid = evaluate(midX);
    if (valueAtMid <= target) {
      highX = midX;
      valueAtHigh = valueAtMid;
    } else {
      lowX = midX;
    }
    iterations += 1;
  }
  return { status: 'found', x: highX, valueAtX: valueAtHigh, iterations };
}
