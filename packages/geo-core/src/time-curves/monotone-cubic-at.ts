/** Fritsch–Carlson slope at node k from its neighbouring secants (0 at a local extremum). */
function nodeSlope(xs: Float64Array, ys: Float64Array, k: number): number {
  const last = xs.length - 1;
  const secant = (i: number): number => ((ys[i + 1] as number) - (ys[i] as number)) / ((xs[i + 1] as number) - (xs[i] as number));
  if (last < 1) return 0;
  if (k === 0) return secant(0);
  if (k === last) return secant(last - 1);
  const before = secant(k - 1);
  const after = secant(k);
  if (!(before * after > 0)) return 0;
  const hBefore = (xs[k] as number) - (xs[k - 1] as number);
  const hAfter = (xs[k + 1] as number) - (xs[k] as number);
  const w1 = 2 * hAfter + hBefore;
  const w2 = hAfter + 2 * hBefore;
  return (w1 + w2) / (w1 / before + w2 / after);
}

/**
 * Value at x of the monotone piecewise-cubic (PCHIP) interpolant through the
 * points, on the segment [xs[segment], xs[segment + 1]] that holds x.
 *
 * Fritsch, F. N. & Carlson, R. E. (1980) Monotone piecewise cubic
 * interpolation, SIAM J. Numer. Anal. 17(2):238–246. Used to read t90, t50 and
 * d(4·t1) between sparse hand readings the way an engineer's smooth pencil
 * curve does: a straight chord between readings 15 and 30 min apart cuts
 * inside the concave primary curve and reads t90 early by several per cent.
 * Monotone data give a monotone curve, so it never invents a wiggle.
 *
 * @param xs increasing abscissae; @param ys ordinates; @param segment index of the left node.
 * @param x abscissa inside the segment.
 * @returns the interpolated ordinate.
 * @throws RangeError when the segment is not inside the arrays.
 * @example monotoneCubicAt(Float64Array.of(0, 1, 2), Float64Array.of(0, 1, 2), 0, 0.5) // 0.5
 */
export function monotoneCubicAt(xs: Float64Array, ys: Float64Array, segment: number, x: number): number {
  if (!(segment >= 0 && segment + 1 < xs.length)) throw new RangeError('monotoneCubicAt requires a segment inside the arrays');
  const x0 = xs[segment] as number;
  const x1 = xs[segment + 1] as number;
  const y0 = ys[segment] as number;
  const y1 = ys[segment + 1] as number;
  const h = x1 - x0;
  if (!(h > 0)) return y0;
  const secant = (y1 - y0) / h;
  let m0 = nodeSlope(xs, ys, segment);
  let m1 = nodeSlope(xs, ys, segment + 1);
  // Fritsch–Carlson limiter keeps the segment monotone where the data are.
  if (secant === 0) {
    m0 = 0;
    m1 = 0;
  } else {
    const a = m0 / secant;
    const b = m1 / secant;
    const r = a * a + b * b;
    if (r > 9) {
      const tau = 3 / Math.sqrt(r);
      m0 = tau * a * secant;
      m1 = tau * b * secant;
    }
  }
  const t = (x - x0) / h;
  const t2 = t * t;
  const t3 = t2 * t;
  return (2 * t3 - 3 * t2 + 1) * y0 + (t3 - 2 * t2 + t) * h * m0 + (-2 * t3 + 3 * t2) * y1 + (t3 - t2) * h * m1;
}
