/** A uniformly loaded circle and a point on its axis. */
export interface StressIncreaseCircleInput {
  /** Uniform pressure on the circle, kPa. */
  readonly pressureKpa: number;
  /** Radius of the loaded circle, m (> 0). */
  readonly radiusM: number;
  /** Depth of the point below the loaded surface, on the axis, m (> 0). */
  readonly depthM: number;
}

/**
 * Vertical stress increase on the axis of a uniformly loaded flexible circle
 * (integration of Boussinesq's point load over the circle):
 * Δσz = q·[1 − (1/(1 + (R/z)²))^1.5].
 *
 * Assumptions: Boussinesq elastic half-space; point on the centre line only.
 * Source: Das, *Principles of Geotechnical Engineering*, section on stress below
 * the centre of a uniformly loaded circular area; Poulos & Davis (1974), ch. 3.
 *
 * @param input pressure in kPa, radius and depth in m
 * @returns Δσz in kPa
 * @throws RangeError when radius or depth are not positive or any value is not finite
 * @example stressIncreaseCircle({ pressureKpa: 100, radiusM: 1, depthM: 2 }) // 28.45
 */
export function stressIncreaseCircle(input: StressIncreaseCircleInput): number {
  const { pressureKpa, radiusM, depthM } = input;
  if (!Number.isFinite(pressureKpa)) throw new RangeError('stressIncreaseCircle requires a finite pressureKpa');
  if (!(radiusM > 0) || !Number.isFinite(radiusM)) throw new RangeError('stressIncreaseCircle requires finite radiusM > 0');
  if (!(depthM > 0) || !Number.isFinite(depthM)) throw new RangeError('stressIncreaseCircle requires finite depthM > 0');
  const ratio = radiusM / depthM;
  return pressureKpa * (1 - Math.pow(1 / (1 + ratio * ratio), 1.5));
}
