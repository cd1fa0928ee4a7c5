/** Same switch as in degreeOfConsolidation, so the two stay consistent. */
const SHORT_TIME_LIMIT = 0.02;

/**
 * dU/dTv, the slope of Terzaghi's (1943) average degree of consolidation with
 * respect to the time factor: Σ 2·exp(−M²·Tv), or 1/√(π·Tv) on the short-time
 * branch. Used by Newton's method when inverting U(Tv).
 *
 * @param timeFactor Tv, dimensionless, > 0.
 * @returns dU/dTv, per unit time factor.
 * @throws RangeError when the time factor is not positive and finite.
 * @example degreeOfConsolidationRate(0.01) // ≈ 5.64
 */
export function degreeOfConsolidationRate(timeFactor: number): number {
  if (!Number.isFinite(timeFactor) || timeFactor <= 0) {
    throw new RangeError('degreeOfConsolidationRate requires a finite time factor > 0');
  }
  if (timeFactor < SHORT_TIME_LIMIT) return 1 / Math.sqrt(Math.PI * timeFactor);
  let rate = 0;
  for (let m = 0; ; m += 1) {
    const eigenvalue = (Math.PI * (2 * m + 1)) / 2;
    const term = 2 * Math.exp(-eigenvalue * eigenvalue * timeFactor);
    rate += term;
    if (term < 1e-17 * rate) break;
  }
  return rate;
}
