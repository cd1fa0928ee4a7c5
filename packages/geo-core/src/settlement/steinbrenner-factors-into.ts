/**
 * steinbrennerFactors without the result object: writes F1 to out[0] and F2
 * to out[1]. The settlement check calls it some half a million times, and an
 * object per call was a fifth of the check's garbage-collection time. Same
 * formulas, same source (Steinbrenner 1934; see steinbrennerFactors); inputs
 * are validated by the callers (m′ > 0 finite, n′ ≥ 0).
 *
 * @param lengthRatio m′ = L′/B′, dimensionless
 * @param depthRatio n′ = H/B′, dimensionless (Infinity for a half-space)
 * @param out two slots, overwritten with F1 and F2
 * @example steinbrennerFactorsInto(1, 1, out) // out = [0.1419, 0.0833]
 */
export function steinbrennerFactorsInto(lengthRatio: number, depthRatio: number, out: Float64Array): void {
  const m = lengthRatio;
  const n = depthRatio;
  if (n === 0) {
    out[0] = 0;
    out[1] = 0;
    return;
  }
  const rootM = Math.sqrt(m * m + 1);
  if (n === Infinity) {
    out[0] = (m * Math.log((1 + rootM) / m) + Math.log(m + rootM)) / Math.PI;
    out[1] = 0;
    return;
  }
  const rootMn = Math.sqrt(m * m + n * n + 1);
  const a0 = m * Math.log(((1 + rootM) * Math.sqrt(m * m + n * n)) / (m * (1 + rootMn)));
  const a1 = Math.log(((m + rootM) * Math.sqrt(1 + n * n)) / (m + rootMn));
  out[0] = (a0 + a1) / Math.PI;
  out[1] = (n / (2 * Math.PI)) * Math.atan(m / (n * rootMn));
}
