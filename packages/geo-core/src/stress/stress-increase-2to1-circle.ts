/** A circular footing load for the 2V:1H spread. */
export interface StressIncrease2to1CircleInput {
  /** Total net vertical load on the footing, kN. */
  readonly loadKn: number;
  /** Footing diameter D, m (> 0). */
  readonly diameterM: number;
  /** Depth below the footing base, m (≥ 0). */
  readonly depthM: number;
}

/**
 * The 2V:1H spread under a circle: the load spreads at one horizontal to two
 * vertical all round, so at depth z it is shared uniformly by a circle of
 * diameter D + z: Δσz = 4Q/(π·(D + z)²).
 *
 * Assumptions as stressIncrease2to1 (an average over the spread area, crude
 * near the base). Source: the 2:1 method of Das, *Principles of Foundation
 * Engineering*, applied to a circle's spread cone; Holtz & Kovacs, *An
 * Introduction to Geotechnical Engineering*, ch. 10.
 *
 * @param input load in kN, diameter and depth in m
 * @returns Δσz in kPa
 * @throws RangeError when the diameter is not positive, the depth is negative, or any value is not finite
 * @example stressIncrease2to1Circle({ loadKn: 314.16, diameterM: 2, depthM: 2 }) // 25.0 (314.16/(π × 4²/4))
 */
export function stressIncrease2to1Circle(input: StressIncrease2to1CircleInput): number {
  const { loadKn, diameterM, depthM } = input;
  if (!Number.isFinite(loadKn)) throw new RangeError('stressIncrease2to1Circle requires a finite loadKn');
  if (!(diameterM > 0) || !Number.isFinite(diameterM)) throw new RangeError('stressIncrease2to1Circle requires a finite diameterM > 0');
  if (!(depthM >= 0) || !Number.isFinite(depthM)) throw new RangeError('stressIncrease2to1Circle requires a finite depthM >= 0');
  const spreadDiameterM = diameterM + depthM;
  return (4 * loadKn) / (Math.PI * spreadDiameterM * spreadDiameterM);
}
