import { firstCrossingOnSegment } from './first-crossing-on-segment.js';

/**
 * Abscissa (√t or log t) at which a reduced time curve first reaches a
 * deformation, on the monotone cubic through the readings that bracket it —
 * how t50 is read off a plotted curve.
 *
 * @param abscissae increasing abscissae of the curve.
 * @param deformationsMm deformations at those abscissae, mm, compression positive.
 * @param targetMm the deformation to reach, mm.
 * @returns the abscissa, or null when the curve never reaches the target (or starts beyond it).
 * @example abscissaAtDeformation(Float64Array.of(0, 1), Float64Array.of(0, 2), 1) // 0.5
 */
export function abscissaAtDeformation(abscissae: Float64Array, deformationsMm: Float64Array, targetMm: number): number | null {
  const count = abscissae.length;
  if (count === 0 || (deformationsMm[0] as number) > targetMm) return null;
  if ((deformationsMm[0] as number) === targetMm) return abscissae[0] as number;
  for (let index = 1; index < count; index += 1) {
    if ((deformationsMm[index] as number) >= targetMm) {
      return firstCrossingOnSegment(abscissae, deformationsMm, index - 1, targetMm, 0);
    }
  }
  return null;
}
