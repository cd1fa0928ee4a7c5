/** A strip footing load for the 2V:1H spread. */
export interface StressIncrease2to1StripInput {
  /** Uniform net pressure on the strip, kPa. */
  readonly pressureKpa: number;
  /** Strip width B, m (> 0). */
  readonly widthM: number;
  /** Depth below the footing base, m (≥ 0). */
  readonly depthM: number;
}

/**
 * The 2V:1H spread under a strip: the line load q·B spreads over a width B + z,
 * so Δσz = q·B/(B + z).
 *
 * Assumptions and source as stressIncrease2to1 (Das, *Principles of Foundation
 * Engineering*, 2:1 method).
 *
 * @param input pressure in kPa, width and depth in m
 * @returns Δσz in kPa
 * @throws RangeError when width is not positive, depth is negative, or any value is not finite
 * @example stressIncrease2to1Strip({ pressureKpa: 100, widthM: 2, depthM: 2 }) // 50
 */
export function stressIncrease2to1Strip(input: StressIncrease2to1StripInput): number {
  const { pressureKpa, widthM, depthM } = input;
  if (!Number.isFinite(pressureKpa)) throw new RangeError('stressIncrease2to1Strip requires a finite pressureKpa');
  if (!(widthM > 0) || !Number.isFinite(widthM)) throw new RangeError('stressIncrease2to1Strip requires finite widthM > 0');
  if (!(depthM >= 0) || !Number.isFinite(depthM)) throw new RangeError('stressIncrease2to1Strip requires finite depthM >= 0');
  return (pressureKpa * widthM) / (widthM + depthM);
}
