/** A rectangular footing load for the 2V:1H spread. */
export interface StressIncrease2to1Input {
  /** Total net vertical load on the footing, kN. */
  readonly loadKn: number;
  /** Footing width B, m (> 0). */
  readonly widthM: number;
  /** Footing length L, m (≥ widthM is usual but not required; > 0). */
  readonly lengthM: number;
  /** Depth below the footing base, m (≥ 0). */
  readonly depthM: number;
}

/**
 * The 2V:1H (2:1) load-spread approximation: the load spreads at one horizontal
 * to two vertical from every edge, so at depth z it is shared uniformly by an
 * area (B + z)(L + z): Δσz = Q/((B + z)(L + z)).
 *
 * Assumptions: the average increase over the spread area, not the peak under
 * the centre; crude near the base and for points off the footing. A square
 * footing is B = L; a strip is stressIncrease2to1Strip.
 * Source: Das, *Principles of Foundation Engineering*, section on the 2:1
 * method; Holtz & Kovacs, *An Introduction to Geotechnical Engineering*, ch. 10.
 *
 * @param input load in kN, sides in m, depth below the base in m
 * @returns Δσz in kPa
 * @throws RangeError when sides are not positive, depth is negative, or any value is not finite
 * @example stressIncrease2to1({ loadKn: 900, widthM: 2, lengthM: 3, depthM: 1 }) // 75 (900/(3 × 4))
 */
export function stressIncrease2to1(input: StressIncrease2to1Input): number {
  const { loadKn, widthM, lengthM, depthM } = input;
  if (!Number.isFinite(loadKn)) throw new RangeError('stressIncrease2to1 requires a finite loadKn');
  if (!(widthM > 0) || !(lengthM > 0) || !Number.isFinite(widthM) || !Number.isFinite(lengthM)) {
    throw new RangeError('stressIncrease2to1 requires finite widthM > 0 and lengthM > 0');
  }
  if (!(depthM >= 0) || !Number.isFinite(depthM)) throw new RangeError('stressIncrease2to1 requires finite depthM >= 0');
  return loadKn / ((widthM + depthM) * (lengthM + depthM));
}
