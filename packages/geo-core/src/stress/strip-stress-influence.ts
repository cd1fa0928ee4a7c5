/**
 * Δσz/q below a uniformly loaded flexible strip (plane strain), Boussinesq's
 * line load integrated across the width: with θ1 = atan((x + B/2)/z) and
 * θ2 = atan((x − B/2)/z), Δσz/q = (1/π)·[θ1 − θ2 + sin θ1 cos θ1 − sin θ2 cos θ2].
 *
 * Source: Das, *Principles of Geotechnical Engineering*, uniformly loaded strip;
 * Poulos & Davis (1974), ch. 2.
 *
 * @param halfWidthM B/2, m (> 0)
 * @param offsetM x from the centre line, m (any sign)
 * @param depthM z below the strip, m (> 0)
 * @returns Δσz/q, dimensionless; inputs are validated by the callers
 * @example stripStressInfluence(1, 0, 2) // 0.54980
 */
export function stripStressInfluence(halfWidthM: number, offsetM: number, depthM: number): number {
  const theta1 = Math.atan((offsetM + halfWidthM) / depthM);
  const theta2 = Math.atan((offsetM - halfWidthM) / depthM);
  return (theta1 - theta2 + Math.sin(theta1) * Math.cos(theta1) - Math.sin(theta2) * Math.cos(theta2)) / Math.PI;
}
