/**
 * Below this time factor the short-time (image) form of Terzaghi's solution is
 * used: it equals the Fourier series to better than 1e-20 there, while the
 * series would need ever more terms as Tv → 0.
 */
const SHORT_TIME_LIMIT = 0.02;

/** A series term below this no longer changes a double next to 1. */
const NEGLIGIBLE_TERM = 1e-17;

/**
 * Average degree of consolidation U for a time factor Tv — Terzaghi's (1943)
 * one-dimensional consolidation theory, uniform initial excess pore pressure.
 *
 * U = 1 − Σ (2/M²)·exp(−M²·Tv), M = π(2m + 1)/2, m = 0, 1, 2 …; for Tv < 0.02
 * the equivalent short-time solution U = 2·√(Tv/π) is used (the remaining
 * terms, of order ierfc(1/√Tv), are below 1e-20 there).
 *
 * Assumptions: saturated soil, Darcy flow, small strain, constant cv and
 * uniform initial excess pore pressure (Terzaghi 1943, *Theoretical Soil
 * Mechanics*, ch. XIII; table of U–Tv in Das, *Principles of Geotechnical
 * Engineering*, ch. "Consolidation").
 *
 * @param timeFactor Tv = cv·t/Hdr², dimensionless, ≥ 0.
 * @returns U as a fraction 0–1 (not percent).
 * @throws RangeError when the time factor is negative or not finite.
 * @example degreeOfConsolidation(0.848) // ≈ 0.900
 */
export function degreeOfConsolidation(timeFactor: number): number {
  if (!Number.isFinite(timeFactor) || timeFactor < 0) {
    throw new RangeError('degreeOfConsolidation requires a finite time factor ≥ 0');
  }
  if (timeFactor < SHORT_TIME_LIMIT) return 2 * Math.sqrt(timeFactor / Math.PI);
  let remaining = 0;
  for (let m = 0; ; m += 1) {
    const eigenvalue = (Math.PI * (2 * m + 1)) / 2;
    const term = (2 / (eigenvalue * eigenvalue)) * Math.exp(-eigenvalue * eigenvalue * timeFactor);
    remaining += term;
    if (term < NEGLIGIBLE_TERM) break;
  }
  return 1 - remaining;
}
