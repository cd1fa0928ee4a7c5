import { circleRimCosines } from '../stress/circle-rim-quadrature.js';
import { completeEllipticIntegrals } from './complete-elliptic-integrals.js';

/**
 * Vertical displacement w of an elastic half-space at offset r from the centre
 * of a uniformly loaded flexible circle (radius a) and depth z, as the factor
 * W = w·E/q (in m): w = q·W/E.
 *
 * At the surface, Timoshenko & Goodier's closed forms: inside the circle
 * W = 4(1 − ν²)·a·E(r/a)/π, outside W = 4(1 − ν²)·r·[E(a/r) − (1 − a²/r²)·K(a/r)]/π,
 * on the rim 4(1 − ν²)·a/π, at the centre 2(1 − ν²)·a — the published factors
 * α = 1 (centre) and 2/π (edge) of Se = q·D·(1 − ν²)/E·α.
 * Below the surface, Boussinesq's point-load displacement
 * w = P(1 + ν)/(2πE)·[2(1 − ν)/R + z²/R³] integrated over the circle: along
 * each ray in closed form, then around the rim (as circleStressInfluence),
 * W = (1 + ν)·(1/2π)∫₀^2π a(a − r·cos t)·(2(1 − ν) + z/R)/(R + z) dt,
 * R² = a² + r² − 2ar·cos t + z², by the trapezoidal rule (about 1e-13); on the
 * axis in closed form, W = (1 + ν)·[z − z²/√(a² + z²) + 2(1 − ν)(√(a² + z²) − z)].
 *
 * W(0) − W(H) is the settlement of a layer of thickness H by the route of
 * Steinbrenner's factors (the half-space strains integrated over the layer),
 * so a circle and a rectangle are treated alike in the layered settlement.
 *
 * Source: Timoshenko & Goodier (1970), *Theory of Elasticity*, 3rd ed.
 * (the uniformly loaded circular area on a semi-infinite body); Poulos &
 * Davis (1974), ch. 3 (uniform circular load: displacements on the axis).
 *
 * @param radiusM a, m (> 0)
 * @param offsetM r, m (≥ 0)
 * @param depthM z, m (≥ 0)
 * @param poissonRatio ν (0–0.5)
 * @returns W = w·E/q, m; inputs are validated by the callers
 * @example circleDisplacementFactor(1, 0, 0, 0.3) // 1.82 (2 × 0.91 × 1)
 */
export function circleDisplacementFactor(radiusM: number, offsetM: number, depthM: number, poissonRatio: number): number {
  const a = radiusM;
  const r = offsetM;
  const z = depthM;
  const nu = poissonRatio;
  if (r === 0) {
    const slant = Math.hypot(a, z);
    return (1 + nu) * (z - (z * z) / slant + 2 * (1 - nu) * (slant - z));
  }
  if (z === 0) {
    const scale = (4 * (1 - nu * nu)) / Math.PI;
    if (r === a) return scale * a;
    if (r < a) return scale * a * completeEllipticIntegrals(r / a).e;
    const ratio = a / r;
    const { k, e } = completeEllipticIntegrals(ratio);
    return scale * r * (e - (1 - ratio * ratio) * k);
  }
  const cosines = circleRimCosines(a, r, z);
  const intervals = cosines.length - 1;
  const aa = a * a + r * r + z * z;
  const twoAr = 2 * a * r;
  const twoOneMinusNu = 2 * (1 - nu);
  let sum = 0;
  for (let k = 0; k <= intervals; k += 1) {
    const c = cosines[k] ?? 0;
    const slant = Math.sqrt(aa - twoAr * c);
    const value = (a * (a - r * c) * (twoOneMinusNu + z / slant)) / (slant + z);
    sum += k === 0 || k === intervals ? value / 2 : value;
  }
  return ((1 + nu) * sum) / intervals;
}
