/** Value, slope and second derivative of a spline at one abscissa. */
export interface SplineSample {
  readonly value: number;
  readonly slope: number;
  readonly secondDerivative: number;
}

/**
 * Natural cubic spline through points (zero second derivative at both ends),
 * the smooth interpolant on which Casagrande's maximum curvature is found. It
 * is C², so curvature is continuous — a piecewise-linear or monotone (C¹)
 * interpolant has its curvature only at the data points or jumping there.
 *
 * Tridiagonal solve (Thomas algorithm) for the knot second derivatives; see
 * de Boor, C. (1978) *A Practical Guide to Splines*, ch. IV.
 *
 * @param xs strictly increasing abscissae (at least two).
 * @param ys ordinates.
 * @returns an evaluator, valid on [xs[0], xs[last]] (held at the end values outside).
 * @throws RangeError when fewer than two points are given, lengths differ, or xs is not strictly increasing.
 * @example naturalCubicSpline([0, 1, 2], [0, 1, 0])(1).value // 1
 */
export function naturalCubicSpline(xs: readonly number[], ys: readonly number[]): (x: number) => SplineSample {
  const count = xs.length;
  if (count < 2 || ys.length !== count) throw new RangeError('naturalCubicSpline requires at least two points and equal lengths');
  for (let index = 1; index < count; index += 1) {
    if (!((xs[index] as number) > (xs[index - 1] as number))) throw new RangeError('naturalCubicSpline requires strictly increasing abscissae');
  }
  const second = new Float64Array(count);
  if (count > 2) {
    const diagonal = new Float64Array(count);
    const rhs = new Float64Array(count);
    const upper = new Float64Array(count);
    for (let index = 1; index < count - 1; index += 1) {
      const hBefore = (xs[index] as number) - (xs[index - 1] as number);
      const hAfter = (xs[index + 1] as number) - (xs[index] as number);
      diagonal[index] = 2 * (hBefore + hAfter);
      upper[index] = hAfter;
      rhs[index] = 6 * (((ys[index + 1] as number) - (ys[index] as number)) / hAfter - ((ys[index] as number) - (ys[index - 1] as number)) / hBefore);
    }
    for (let index = 2; index < count - 1; index += 1) {
      const hBefore = (xs[index] as number) - (xs[index - 1] as number);
      const factor = hBefore / (diagonal[index - 1] as number);
      diagonal[index] = (diagonal[index] as number) - factor * (upper[index - 1] as number);
      rhs[index] = (rhs[index] as number) - factor * (rhs[index - 1] as number);
    }
    for (let index = count - 2; index >= 1; index -= 1) {
      second[index] = ((rhs[index] as number) - (upper[index] as number) * (second[index + 1] as number)) / (diagonal[index] as number);
    }
  }
  return (x: number): SplineSample => {
    const clamped = Math.min(Math.max(x, xs[0] as number), xs[count - 1] as number);
    let segment = 0;
    while (segment < count - 2 && clamped > (xs[segment + 1] as number)) segment += 1;
    const x0 = xs[segment] as number;
    const x1 = xs[segment + 1] as number;
    const h = x1 - x0;
    const a = (x1 - clamped) / h;
    const b = (clamped - x0) / h;
    const m0 = second[segment] as number;
    const m1 = second[segment + 1] as number;
    const y0 = ys[segment] as number;
    const y1 = ys[segment + 1] as number;
    return {
      value: a * y0 + b * y1 + ((a * a * a - a) * m0 + (b * b * b - b) * m1) * (h * h) / 6,
      slope: (y1 - y0) / h - ((3 * a * a - 1) * m0 - (3 * b * b - 1) * m1) * h / 6,
      secondDerivative: a * m0 + b * m1,
    };
  };
}
