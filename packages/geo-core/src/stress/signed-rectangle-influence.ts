import { cornerInfluenceFactor } from './corner-influence-factor.js';

/**
 * Newmark's corner-rectangle superposition: Σ sign(a)·sign(b)·I(|a|/z, |b|/z)
 * over the point's four edge distances a1, a2 (along x) and b1, b2 (along y); a
 * negative distance means the point lies beyond that edge and its rectangle is
 * subtracted. Inputs are validated by the callers.
 *
 * Source: Das, *Principles of Geotechnical Engineering*, stress below a
 * rectangular area; Newmark (1935).
 *
 * @param a1 B/2 − x, m
 * @param a2 B/2 + x, m
 * @param b1 L/2 − y, m
 * @param b2 L/2 + y, m
 * @param depthM depth below the loaded area, m (> 0)
 * @returns Δσz/q, dimensionless
 * @example signedRectangleInfluence(1, 1, 1, 1, 1) // 0.70088 (4 × 0.17522)
 */
export function signedRectangleInfluence(a1: number, a2: number, b1: number, b2: number, depthM: number): number {
  return (
    signedCorner(a1, b1, depthM) + signedCorner(a1, b2, depthM) + signedCorner(a2, b1, depthM) + signedCorner(a2, b2, depthM)
  );
}

function signedCorner(a: number, b: number, depthM: number): number {
  if (a === 0 || b === 0) return 0;
  const value = cornerInfluenceFactor(Math.abs(a) / depthM, Math.abs(b) / depthM);
  return (a > 0) === (b > 0) ? value : -value;
}
