import { signedRectangleInfluence } from './signed-rectangle-influence.js';

// Below this depth, relative to the footing's size, the combined arctangents
// could overflow (t ~ ab/(z·R) grows without bound); the corner-by-corner
// Newmark sum is used there instead.
const SHALLOW_DEPTH_RATIO = 1e-6;

/**
 * Δσz/q at offset (dx, dy) from a rectangle's centre and depth z below it —
 * the same superposition as signedRectangleInfluence, written for speed with
 * Holl's branch-free form of the corner factor (Poulos & Davis 1974):
 * I = (1/2π)[atan t + t·z²·(1/(a² + z²) + 1/(b² + z²))], t = ab/(z·√(a² + b² + z²)).
 * The four signed arctangents are combined in pairs, atan x ± atan y =
 * atan2(x ± y, 1 ∓ xy) (exact for x, y ≥ 0), halving the arctangent calls —
 * the settlement check evaluates this some ten million times.
 *
 * @param halfWidthM B/2, m
 * @param halfLengthM L/2, m
 * @param dxM offset along x, m
 * @param dyM offset along y, m
 * @param zM depth below the base, m (> 0)
 * @returns the influence, dimensionless (Δσz/q)
 * @example rectangleInfluenceHoll(1, 1, 0, 0, 1) // 0.70088 (4 × 0.17522)
 */
export function rectangleInfluenceHoll(halfWidthM: number, halfLengthM: number, dxM: number, dyM: number, zM: number): number {
  const a1 = halfWidthM - dxM;
  const a2 = halfWidthM + dxM;
  const b1 = halfLengthM - dyM;
  const b2 = halfLengthM + dyM;
  if (zM < SHALLOW_DEPTH_RATIO * (halfWidthM + halfLengthM)) return signedRectangleInfluence(a1, a2, b1, b2, zM);
  const z2 = zM * zM;
  const sa1 = a1 < 0 ? -1 : 1;
  const sa2 = a2 < 0 ? -1 : 1;
  const sb1 = b1 < 0 ? -1 : 1;
  const sb2 = b2 < 0 ? -1 : 1;
  const aa1 = a1 * a1;
  const aa2 = a2 * a2;
  const bb1 = b1 * b1;
  const bb2 = b2 * b2;
  const inverseA1 = 1 / (aa1 + z2);
  const inverseA2 = 1 / (aa2 + z2);
  const inverseB1 = 1 / (bb1 + z2);
  const inverseB2 = 1 / (bb2 + z2);
  const absA1OverZ = Math.abs(a1) / zM;
  const absA2OverZ = Math.abs(a2) / zM;
  const absB1 = Math.abs(b1);
  const absB2 = Math.abs(b2);
  const t11 = (absA1OverZ * absB1) / Math.sqrt(aa1 + bb1 + z2);
  const t12 = (absA1OverZ * absB2) / Math.sqrt(aa1 + bb2 + z2);
  const t21 = (absA2OverZ * absB1) / Math.sqrt(aa2 + bb1 + z2);
  const t22 = (absA2OverZ * absB2) / Math.sqrt(aa2 + bb2 + z2);
  const s11 = sa1 * sb1;
  const s12 = sa1 * sb2;
  const s21 = sa2 * sb1;
  const s22 = sa2 * sb2;
  const angles =
    s11 * (s11 === s12 ? Math.atan2(t11 + t12, 1 - t11 * t12) : Math.atan2(t11 - t12, 1 + t11 * t12)) +
    s21 * (s21 === s22 ? Math.atan2(t21 + t22, 1 - t21 * t22) : Math.atan2(t21 - t22, 1 + t21 * t22));
  const algebraic =
    z2 *
    (s11 * t11 * (inverseA1 + inverseB1) + s12 * t12 * (inverseA1 + inverseB2) + s21 * t21 * (inverseA2 + inverseB1) + s22 * t22 * (inverseA2 + inverseB2));
  return (angles + algebraic) / (2 * Math.PI);
}
