import { signedRectangleInfluence } from './signed-rectangle-influence.js';

/** A uniformly loaded rectangle and a point below it, both in metres. */
export interface StressIncreaseRectangleInput {
  /** Uniform pressure on the footing base, kPa (the net increase at founding level). */
  readonly pressureKpa: number;
  /** Side along x, m. */
  readonly widthM: number;
  /** Side along y, m. */
  readonly lengthM: number;
  /** Offset of the point from the footing centre along x, m (any sign; inside or outside). */
  readonly xM: number;
  /** Offset of the point from the footing centre along y, m (any sign; inside or outside). */
  readonly yM: number;
  /** Depth of the point below the footing base, m (> 0). */
  readonly depthM: number;
}

/**
 * Vertical stress increase at any point below or beside a uniformly loaded
 * rectangle, by superposing Newmark's corner rectangles (Newmark 1935; Fadum 1948).
 *
 * The point's distances to the four edges, a1 = B/2 − x, a2 = B/2 + x,
 * b1 = L/2 − y, b2 = L/2 + y, define four rectangles sharing a corner above the
 * point; Δσz = q·Σ sign(a)·sign(b)·I(|a|/z, |b|/z). A negative distance means
 * the point lies beyond that edge, and its rectangle is subtracted.
 *
 * Assumptions: Boussinesq elastic half-space, flexible uniform load.
 * Source: Das, *Principles of Geotechnical Engineering*, section on stress
 * below a rectangular area (superposition of corner rectangles); Poulos & Davis
 * (1974), *Elastic Solutions for Soil and Rock Mechanics*, ch. 3.
 *
 * @param input pressure in kPa, sides and offsets in m, depth below the base in m
 * @returns Δσz in kPa
 * @throws RangeError when the sides or depth are not positive, or any value is not finite
 * @example stressIncreaseRectangle({ pressureKpa: 100, widthM: 2, lengthM: 2, xM: 0, yM: 0, depthM: 1 }) // 70.09 (4 × 0.17522 × 100)
 */
export function stressIncreaseRectangle(input: StressIncreaseRectangleInput): number {
  const { pressureKpa, widthM, lengthM, xM, yM, depthM } = input;
  if (!Number.isFinite(pressureKpa) || !Number.isFinite(xM) || !Number.isFinite(yM)) {
    throw new RangeError('stressIncreaseRectangle requires finite pressureKpa, xM and yM');
  }
  if (!(widthM > 0) || !(lengthM > 0) || !Number.isFinite(widthM) || !Number.isFinite(lengthM)) {
    throw new RangeError('stressIncreaseRectangle requires finite widthM > 0 and lengthM > 0');
  }
  if (!(depthM > 0) || !Number.isFinite(depthM)) throw new RangeError('stressIncreaseRectangle requires finite depthM > 0');
  return pressureKpa * signedRectangleInfluence(widthM / 2 - xM, widthM / 2 + xM, lengthM / 2 - yM, lengthM / 2 + yM, depthM);
}
