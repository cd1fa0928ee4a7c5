/** Value, slope and second derivative of a spline at one abscissa. */
export interface SplineSample {
  readonly value: number;
  readonly slope: number;
  readonly secondDerivative: number;
}

/**
 * Natural quintic spline through points: of all C⁴ interpolants it has the
 * least ∫(f‴)² (the curve whose curvature changes least abruptly), with
 * f‴ = f⁗ = 0 beyond the ends. It is the interpolant on which Casagrande's
 * maximum curvature is found: a cubic spline's second derivative is piecewise
 * linear, so its sharpest bend always falls on a data point; here f″ is a
 * smooth piecewise cubic and the sharpest bend falls between points where the
 * data put it. Straight data give a straight line and quadratic data the
 * quadratic itself (both reproduced exactly).
 *
 * Built in the polyharmonic form f(x) = Σ cⱼ|x − xⱼ|⁵ + a + b·x + c·x², with
 * Σ cⱼ = Σ cⱼxⱼ = Σ cⱼxⱼ² = 0, which is exactly the natural quintic spline in
 * one dimension (Schoenberg, I. J. (1964) Spline interpolation and best
 * quadrature formulae, Bull. AMS 70:143–148; Duchon, J. (1977) Splines
 * minimizing rotation-invariant semi-norms in Sobolev spaces). The dense
 * (n + 3)² solve is trivial for the tens of points of a compression curve.
 *
 * @param xs strictly increasing abscissae (at least three).
 * @param ys ordinates.
 * @returns an evaluator (it extends smoothly, as a quadratic, beyond the ends).
 * @throws RangeError when fewer than three points are given, lengths differ, values are not finite, or xs is not strictly increasing.
 * @example naturalQuinticSpline([0, 1, 2], [0, 1, 4])(1.5).value // 2.25
 */
export function naturalQuinticSpline(xs: readonly number[], ys: readonly number[]): (x: number) => SplineSample {
  const count = xs.length;
  if (count < 3 || ys.length !== count) throw new RangeError('naturalQuinticSpline requires at least three points and equal lengths');
  for (let index = 0; index < count; index += 1) {
    if (!Number.isFinite(xs[index]) || !Number.isFinite(ys[index])) throw new RangeError('naturalQuinticSpline requires finite values');
    if (index > 0 && !((xs[index] as number) > (xs[index - 1] as number))) throw new RangeError('naturalQuinticSpline requires strictly increasing abscissae');
  }
  // Centre and scale the abscissae so the polynomial columns are of order one.
  const centre = ((xs[0] as number) + (xs[count - 1] as number)) / 2;
  const scale = ((xs[count - 1] as number) - (xs[0] as number)) / 2;
  const us = xs.map((x) => (x - centre) / scale);
  const size = count + 3;
  const matrix = Array.from({ length: size }, () => new Float64Array(size + 1));
  for (let row = 0; row < count; row += 1) {
    const line = matrix[row] as Float64Array;
    const u = us[row] as number;
    for (let column = 0; column < count; column += 1) line[column] = Math.abs(u - (us[column] as number)) ** 5;
    line[count] = 1;
    line[count + 1] = u;
    line[count + 2] = u * u;
    line[size] = ys[row] as number;
    (matrix[count] as Float64Array)[row] = 1;
    (matrix[count + 1] as Float64Array)[row] = u;
    (matrix[count + 2] as Float64Array)[row] = u * u;
  }
  const solution = solveDense(matrix);
  const weights = solution.subarray(0, count);
  const [a, b, c] = [solution[count] as number, solution[count + 1] as number, solution[count + 2] as number];
  return (x: number): SplineSample => {
    const u = (x - centre) / scale;
    let value = a + b * u + c * u * u;
    let slope = b + 2 * c * u;
    let second = 2 * c;
    for (let index = 0; index < count; index += 1) {
      const r = u - (us[index] as number);
      const r2 = r * r;
      const weight = weights[index] as number;
      const absR3 = r2 * Math.abs(r);
      value += weight * absR3 * r2;
      slope += 5 * weight * absR3 * r;
      second += 20 * weight * absR3;
    }
    return { value, slope: slope / scale, secondDerivative: second / (scale * scale) };
  };
}

/** Gaussian elimination with partial pivoting on an augmented matrix (rows of n + 1); returns the solution. */
function solveDense(matrix: Float64Array[]): Float64Array {
  const size = matrix.length;
  for (let pivotColumn = 0; pivotColumn < size; pivotColumn += 1) {
    let pivotRow = pivotColumn;
    for (let row = pivotColumn + 1; row < size; row += 1) {
      if (Math.abs((matrix[row] as Float64Array)[pivotColumn] as number) > Math.abs((matrix[pivotRow] as Float64Array)[pivotColumn] as number)) pivotRow = row;
    }
    [matrix[pivotColumn], matrix[pivotRow]] = [matrix[pivotRow] as Float64Array, matrix[pivotColumn] as Float64Array];
    const pivot = matrix[pivotColumn] as Float64Array;
    for (let row = pivotColumn + 1; row < size; row += 1) {
      const line = matrix[row] as Float64Array;
      const factor = (line[pivotColumn] as number) / (pivot[pivotColumn] as number);
      if (factor === 0) continue;
      for (let column = pivotColumn; column <= size; column += 1) line[column] = (line[column] as number) - factor * (pivot[column] as number);
    }
  }
  const solution = new Float64Array(size);
  for (let row = size - 1; row >= 0; row -= 1) {
    const line = matrix[row] as Float64Array;
    let sum = line[size] as number;
    for (let column = row + 1; column < size; column += 1) sum -= (line[column] as number) * (solution[column] as number);
    solution[row] = sum / (line[row] as number);
  }
  return solution;
}
