import { circleRimCosines } from './circle-rim-quadrature.js';

/**
 * Δσz/q at any point below or beside a uniformly loaded flexible circle on an
 * elastic half-space (Boussinesq's point load integrated over the circle).
 *
 * Method: in polar coordinates about the point's plan position, the point-load
 * kernel 3z³/(2π(ρ² + z²)^2.5) integrates along each ray in closed form to
 * (1/2π)·[1 − z³/(ρ² + z²)^1.5], so the area integral becomes one around the
 * rim (the winding form of Green's theorem, valid for points inside, on and
 * outside the circle): with d² = a² + r² − 2ar·cos t, R² = d² + z²,
 * Δσz/q = (1/2π)∫₀^2π a(a − r·cos t)·(R² + Rz + z²)/(R³(R + z)) dt,
 * the factor (R² + Rz + z²)/(R³(R + z)) being [1 − z³/R³]/d² without the
 * cancellation. Summed by the trapezoidal rule (circleRimCosines), to about
 * 1e-13. On the axis (r = 0) it is the closed form 1 − (1 + (a/z)²)^−1.5.
 *
 * Source: the ray integration is that behind Newmark's (1942) influence chart;
 * off-axis values are tabulated by Ahlvin & Ulery (1962), Highway Research
 * Board Bulletin 342; Poulos & Davis (1974), *Elastic Solutions for Soil and
 * Rock Mechanics*, ch. 3 (uniform circular load).
 *
 * @param radiusM a, m (> 0)
 * @param offsetM r, horizontal distance from the centre, m (≥ 0)
 * @param depthM z below the loaded surface, m (> 0)
 * @returns Δσz/q, dimensionless; inputs are validated by the callers
 * @example circleStressInfluence(1, 0, 2) // 0.28446 (on the axis, z/a = 2)
 * @example circleStressInfluence(1, 1, 0.5) // 0.41748 (below the rim, z/a = 0.5)
 */
export function circleStressInfluence(radiusM: number, offsetM: number, depthM: number): number {
  const z = depthM;
  if (offsetM === 0) {
    const ratio = radiusM / z;
    return 1 - Math.pow(1 / (1 + ratio * ratio), 1.5);
  }
  const cosines = circleRimCosines(radiusM, offsetM, z);
  const intervals = cosines.length - 1;
  const aa = radiusM * radiusM + offsetM * offsetM + z * z;
  const twoAr = 2 * radiusM * offsetM;
  const zz = z * z;
  let sum = 0;
  for (let k = 0; k <= intervals; k += 1) {
    const c = cosines[k] ?? 0;
    const r2 = aa - twoAr * c;
    const r = Math.sqrt(r2);
    const value = (radiusM * (radiusM - offsetM * c) * (r2 + r * z + zz)) / (r2 * r * (r + z));
    sum += k === 0 || k === intervals ? value / 2 : value;
  }
  return sum / intervals;
}
