import { degreeOfConsolidation } from './degree-of-consolidation.js';
import { degreeOfConsolidationRate } from './degree-of-consolidation-rate.js';

/**
 * Time factor Tv at which Terzaghi's (1943) average degree of consolidation
 * reaches u — the inverse of degreeOfConsolidation.
 *
 * Newton's method on U(Tv) − u, started from the usual approximations
 * Tv = (π/4)·u² (u < 0.6) and Tv = −(4/π²)·ln(π²(1 − u)/8) (u ≥ 0.6, the
 * first series term alone); U is increasing and concave so the iteration
 * converges monotonically. Published table values: U = 50 % → 0.197,
 * 90 % → 0.848 (Das, *Principles of Geotechnical Engineering*, table of U–Tv).
 *
 * @param u average degree of consolidation, a fraction strictly between 0 and 1.
 * @returns Tv, dimensionless.
 * @throws RangeError when u is not strictly between 0 and 1.
 * @example timeFactorForDegree(0.5) // ≈ 0.1967
 */
export function timeFactorForDegree(u: number): number {
  if (!Number.isFinite(u) || u <= 0 || u >= 1) {
    throw new RangeError('timeFactorForDegree requires a degree of consolidation strictly between 0 and 1');
  }
  let timeFactor = u < 0.6 ? (Math.PI / 4) * u * u : (-4 / (Math.PI * Math.PI)) * Math.log((Math.PI * Math.PI * (1 - u)) / 8);
  for (let iteration = 0; iteration < 60; iteration += 1) {
    const step = (degreeOfConsolidation(timeFactor) - u) / degreeOfConsolidationRate(timeFactor);
    // Keep the iterate positive: U is only defined for Tv ≥ 0.
    const next = timeFactor - step > 0 ? timeFactor - step : timeFactor / 2;
    if (Math.abs(next - timeFactor) <= 1e-15 * next) return next;
    timeFactor = next;
  }
  return timeFactor;
}
