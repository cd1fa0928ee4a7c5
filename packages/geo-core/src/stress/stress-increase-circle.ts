import { circleStressInfluence } from './circle-stress-influence.js';

/** A uniformly loaded circle and a point below or beside it. */
export interface StressIncreaseCircleInput {
  /** Uniform pressure on the circle, kPa. */
  readonly pressureKpa: number;
  /** Radius of the loaded circle, m (> 0). */
  readonly radiusM: number;
  /** Depth of the point below the loaded surface, m (> 0). */
  readonly depthM: number;
  /** Horizontal distance of the point from the circle's axis, m (≥ 0; inside, on or beyond the rim). Default 0: on the axis. */
  readonly radialOffsetM?: number;
}

/**
 * Vertical stress increase below or beside a uniformly loaded flexible circle
 * (integration of Boussinesq's point load over the circle). On the axis the
 * closed form Δσz = q·[1 − (1/(1 + (R/z)²))^1.5]; off the axis the same
 * integral taken around the rim (circleStressInfluence: closed form along each
 * ray, trapezoidal rule around the rim, about 1e-13 of q).
 *
 * Assumptions: Boussinesq elastic half-space, flexible uniform load.
 * Source: Das, *Principles of Geotechnical Engineering*, section on stress below
 * the centre of a uniformly loaded circular area; Ahlvin & Ulery (1962), Highway
 * Research Board Bulletin 342 (off-axis values); Poulos & Davis (1974), ch. 3.
 *
 * @param input pressure in kPa, radius, depth and offset in m
 * @returns Δσz in kPa
 * @throws RangeError when radius or depth are not positive, the offset is negative, or any value is not finite
 * @example stressIncreaseCircle({ pressureKpa: 100, radiusM: 1, depthM: 2 }) // 28.45
 * @example stressIncreaseCircle({ pressureKpa: 100, radiusM: 1, depthM: 0.5, radialOffsetM: 1 }) // 41.75 (below the rim)
 */
export function stressIncreaseCircle(input: StressIncreaseCircleInput): number {
  const { pressureKpa, radiusM, depthM } = input;
  const radialOffsetM = input.radialOffsetM ?? 0;
  if (!Number.isFinite(pressureKpa)) throw new RangeError('stressIncreaseCircle requires a finite pressureKpa');
  if (!(radiusM > 0) || !Number.isFinite(radiusM)) throw new RangeError('stressIncreaseCircle requires finite radiusM > 0');
  if (!(depthM > 0) || !Number.isFinite(depthM)) throw new RangeError('stressIncreaseCircle requires finite depthM > 0');
  if (!(radialOffsetM >= 0) || !Number.isFinite(radialOffsetM)) throw new RangeError('stressIncreaseCircle requires a finite radialOffsetM >= 0');
  return pressureKpa * circleStressInfluence(radiusM, radialOffsetM, depthM);
}
