import { monotoneCubicAt } from './monotone-cubic-at.js';

/**
 * Deformation on a reduced time curve at abscissa x (√t or log t, whichever
 * axis the arrays are in), read off the monotone cubic through the points
 * (see monotoneCubicAt) — the smooth curve an engineer draws through them.
 *
 * @param abscissae increasing abscissae of the curve.
 * @param deformationsMm deformations at those abscissae, mm.
 * @param x where to read, within [first, last] abscissa.
 * @returns the deformation in mm, or null when x lies outside the curve.
 * @example deformationAtAbscissa(Float64Array.of(0, 1), Float64Array.of(0, 2), 0.5) // 1
 */
export function deformationAtAbscissa(abscissae: Float64Array, deformationsMm: Float64Array, x: number): number | null {
  const last = abscissae.length - 1;
  if (last < 0 || !(x >= (abscissae[0] as number)) || !(x <= (abscissae[last] as number))) return null;
  if (last === 0) return deformationsMm[0] as number;
  let low = 0;
  let high = last;
  while (high - low > 1) {
    const middle = (low + high) >> 1;
    if ((abscissae[middle] as number) <= x) low = middle;
    else high = middle;
  }
  return monotoneCubicAt(abscissae, deformationsMm, low, x);
}
