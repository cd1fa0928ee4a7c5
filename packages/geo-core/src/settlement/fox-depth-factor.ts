import { gaussLegendreRule } from './gauss-legendre-rule.js';

// 24 points on each side of the rectangle's diagonal integrate the smooth
// angular integrand to 1e-10 or better (the tests compare an independent
// Cartesian quadrature).
const RULE = gaussLegendreRule(24);

/**
 * Fox's (1948) depth factor If: the mean settlement of a flexible, uniformly
 * loaded rectangle B × L buried at depth D in an elastic half-space, over the
 * mean settlement of the same rectangle at the surface (If = 1 at D = 0).
 * Fox integrated Mindlin's (1936) point-load solution over the rectangle; this
 * function does the same, in closed form along each ray from a point and by
 * Gauss–Legendre quadrature over the angle, rather than reading the chart.
 *
 * Mindlin's vertical displacement at the load's own depth c, distance r:
 * w = P(1 + ν)/(8πE(1 − ν))·[(3 − 4ν)/r + (8(1 − ν)² − (3 − 4ν))/R + (10 − 16ν)c²/R³ + 24c⁴/R⁵],
 * R = √(r² + 4c²); at c = 0 it is Boussinesq's P(1 − ν²)/(πEr). The mean over
 * the rectangle of the load spread over it is ∫∫ (B − u)(L − v)·w(√(u² + v²)) du dv
 * (times 4/(BL)²), so If = [(3 − 4ν)J1 + (8(1 − ν)² − (3 − 4ν))J2 + (10 − 16ν)c²J3 + 24c⁴J5] / [8(1 − ν)²J1],
 * Jk = ∫∫ (B − u)(L − v)/Rᵏ du dv over 0 ≤ u ≤ B, 0 ≤ v ≤ L (J1 with R = r).
 * As D/B → ∞, If → (3 − 4ν)/(8(1 − ν)²) (Kelvin's full-space solution): 0.50
 * for ν = 0.5, 0.459 for ν = 0.3.
 *
 * Assumptions: homogeneous isotropic elastic half-space, the soil above the
 * base in place and bonded to the footing (no excavation, no side shear
 * loss), flexible footing, the factor applied to centre, corner or rigid
 * settlement alike as the textbooks do. Real embedment effects are smaller;
 * the factor is often capped by designers (e.g. at 0.5 or more).
 * Source: Fox (1948), "The mean elastic settlement of a uniformly loaded area
 * at a depth below the ground surface", Proc. 2nd ICSMFE, Rotterdam, 1:129–132;
 * Mindlin (1936), Physics 7:195–202; the factor as charted in Das,
 * *Principles of Foundation Engineering* (If against Df/B for B/L and ν) and
 * Bowles, *Foundation Analysis and Design*, ch. 5.
 *
 * @param lengthToWidthRatio L/B, dimensionless (≥ 1, finite)
 * @param depthToWidthRatio D/B, depth of the base below ground over the width, dimensionless (≥ 0, finite)
 * @param poissonRatio ν, dimensionless (0–0.5)
 * @returns If, dimensionless, in ((3 − 4ν)/(8(1 − ν)²), 1]
 * @throws RangeError for L/B < 1, D/B < 0, ν outside 0–0.5, or non-finite input
 * @example foxDepthFactor(2, 1, 0.3) // 0.7088
 */
export function foxDepthFactor(lengthToWidthRatio: number, depthToWidthRatio: number, poissonRatio: number): number {
  if (!(lengthToWidthRatio >= 1) || !Number.isFinite(lengthToWidthRatio)) throw new RangeError('foxDepthFactor requires a finite lengthToWidthRatio >= 1');
  if (!(depthToWidthRatio >= 0) || !Number.isFinite(depthToWidthRatio)) throw new RangeError('foxDepthFactor requires a finite depthToWidthRatio >= 0');
  if (!(poissonRatio >= 0 && poissonRatio <= 0.5)) throw new RangeError('foxDepthFactor requires 0 <= poissonRatio <= 0.5');
  if (depthToWidthRatio === 0) return 1;
  const nu = poissonRatio;
  // Work with B = 1: the factor depends only on the ratios.
  const lengthM = lengthToWidthRatio;
  const depthM = depthToWidthRatio;
  const h = 2 * depthM;
  const j = rectangleKernelIntegrals(1, lengthM, h);
  const surface = 8 * (1 - nu) * (1 - nu);
  const buried = (3 - 4 * nu) * j.j1 + (surface - (3 - 4 * nu)) * j.j2 + (10 - 16 * nu) * depthM * depthM * j.j3 + 24 * depthM ** 4 * j.j5;
  return buried / (surface * j.j1);
}

interface KernelIntegrals {
  readonly j1: number;
  readonly j2: number;
  readonly j3: number;
  readonly j5: number;
}

/**
 * Jk = ∫∫ (B − u)(L − v)·(u² + v² + h²)^(−k/2) du dv over [0, B] × [0, L]
 * (J1 at h = 0): polar coordinates about the origin, the radial integral of
 * each power of r in closed form, the angle by Gauss–Legendre on either side
 * of the diagonal, where the ray's end switches from the edge u = B to v = L.
 */
function rectangleKernelIntegrals(widthM: number, lengthM: number, h: number): KernelIntegrals {
  const diagonal = Math.atan2(lengthM, widthM);
  let j1 = 0;
  let j2 = 0;
  let j3 = 0;
  let j5 = 0;
  for (const [from, to] of [
    [0, diagonal],
    [diagonal, Math.PI / 2],
  ] as const) {
    const half = (to - from) / 2;
    for (let i = 0; i < RULE.nodes.length; i += 1) {
      const theta = from + half * (1 + (RULE.nodes[i] ?? 0));
      const weight = half * (RULE.weights[i] ?? 0);
      const cos = Math.cos(theta);
      const sin = Math.sin(theta);
      const rho = theta <= diagonal ? widthM / cos : lengthM / sin;
      // (B − r cos θ)(L − r sin θ) = BL − (B sin θ + L cos θ)·r + cos θ sin θ·r², times r dr.
      const c0 = widthM * lengthM;
      const c1 = -(widthM * sin + lengthM * cos);
      const c2 = cos * sin;
      j1 += weight * (c0 * rho + (c1 * rho * rho) / 2 + (c2 * rho * rho * rho) / 3);
      const s = Math.sqrt(rho * rho + h * h);
      const sMinusH = (rho * rho) / (s + h);
      const asinh = Math.asinh(rho / h);
      // ∫0^ρ r^(n+1)·(r² + h²)^(−k/2) dr for n = 0, 1, 2, in forms free of cancellation where they can be.
      const k1 = [sMinusH, (rho * s - h * h * asinh) / 2, (sMinusH * sMinusH * (s + 2 * h)) / 3] as const;
      const k3 = [sMinusH / (h * s), asinh - rho / s, (sMinusH * sMinusH) / s] as const;
      const k5 = [
        (sMinusH * (s * s + s * h + h * h)) / (3 * h ** 3 * s ** 3),
        rho ** 3 / (3 * h * h * s ** 3),
        (sMinusH * sMinusH * (2 * s + h)) / (3 * h * s ** 3),
      ] as const;
      j2 += weight * (c0 * k1[0] + c1 * k1[1] + c2 * k1[2]);
      j3 += weight * (c0 * k3[0] + c1 * k3[1] + c2 * k3[2]);
      j5 += weight * (c0 * k5[0] + c1 * k5[1] + c2 * k5[2]);
    }
  }
  return { j1, j2, j3, j5 };
}
