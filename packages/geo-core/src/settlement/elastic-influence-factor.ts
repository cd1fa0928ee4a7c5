import type { FootingShape } from '../stress/footing.types.js';

/** Where on the footing the settlement is wanted, or a rigid footing's uniform settlement. */
export type ElasticSettlementPosition = 'centre' | 'corner' | 'average' | 'rigid';

// Rigid-footing factors αr against L/B as the textbooks tabulate them (Das, *Principles
// of Foundation Engineering*, table of α, αav and αr for shallow foundations on
// an elastic half-space), quoted without the book at hand: they are not checked
// against it here, only against the bounds every rigid factor must keep (between
// the flexible corner and average values, tested). No closed form exists for a
// rigid rectangle; beyond the last row the function answers null rather than extrapolate.
const RIGID_FACTOR_TABLE: ReadonlyArray<readonly [number, number]> = [
  [1, 0.88],
  [1.5, 1.08],
  [2, 1.22],
  [3, 1.44],
  [5, 1.72],
  [10, 2.12],
];

/**
 * The shape factor α of immediate settlement on an elastic half-space,
 * Se = q·B·(1 − ν²)/E·α, for a uniformly loaded rectangle with m = L/B ≥ 1
 * (Schleicher 1926; Terzaghi 1943):
 * - flexible, corner: α = (1/π)·[ln(m + √(1 + m²)) + m·ln((1 + √(1 + m²))/m)];
 * - flexible, centre: twice the corner value (four corner rectangles of half size);
 * - flexible, average: (2/π)·[ln(m + √(1 + m²)) + m·ln((1 + √(1 + m²))/m) + (1 + m³ − (1 + m²)^1.5)/(3m)];
 * - rigid: the published table, interpolated linearly in L/B, 1 ≤ L/B ≤ 10.
 * A square is the rectangle with L/B = 1. For a circle (B the diameter) the
 * exact values are centre 1, edge 2/π, average 8/(3π) and rigid π/4
 * (Boussinesq's rigid punch; Timoshenko & Goodier, *Theory of Elasticity*, the
 * uniformly loaded circular area). A strip on a half-space settles without
 * bound (the plane-strain displacement grows like the logarithm of depth), so
 * it has no α: null — use a finite layer (immediateSettlementFiniteLayer).
 *
 * Values for a square: centre 1.1222, corner 0.5611, average 0.9464 (the
 * closed forms, worked by hand in the tests); rigid 0.88 (the table).
 *
 * @param shape 'rectangle' (then lengthToWidthRatio = L/B ≥ 1), 'square', 'circle' or 'strip'
 * @param lengthToWidthRatio L/B, dimensionless (read for a rectangle only)
 * @param position 'centre' | 'corner' (the edge for a circle) | 'average' | 'rigid'
 * @returns α, dimensionless; null for a rigid rectangle beyond L/B = 10, where the table stops, and for a strip
 * @throws RangeError when L/B < 1 or not finite for a rectangle
 * @example elasticInfluenceFactor('rectangle', 1, 'centre') // 1.1222
 */
export function elasticInfluenceFactor(shape: FootingShape, lengthToWidthRatio: number, position: ElasticSettlementPosition): number | null {
  if (shape === 'strip') return null;
  if (shape === 'square') return elasticInfluenceFactor('rectangle', 1, position);
  if (shape === 'circle') {
    const circle: Record<ElasticSettlementPosition, number> = { centre: 1, corner: 2 / Math.PI, average: 8 / (3 * Math.PI), rigid: Math.PI / 4 };
    return circle[position];
  }
  const m = lengthToWidthRatio;
  if (!(m >= 1) || !Number.isFinite(m)) throw new RangeError('elasticInfluenceFactor requires a finite lengthToWidthRatio >= 1');
  const root = Math.sqrt(1 + m * m);
  const corner = (Math.log(m + root) + m * Math.log((1 + root) / m)) / Math.PI;
  if (position === 'corner') return corner;
  if (position === 'centre') return 2 * corner;
  if (position === 'average') return 2 * corner + (2 / Math.PI) * ((1 + m * m * m - root * root * root) / (3 * m));
  return interpolateRigidFactor(m);
}

function interpolateRigidFactor(lengthToWidthRatio: number): number | null {
  for (let row = 1; row < RIGID_FACTOR_TABLE.length; row += 1) {
    const lower = RIGID_FACTOR_TABLE[row - 1];
    const upper = RIGID_FACTOR_TABLE[row];
    if (lower === undefined || upper === undefined) break;
    if (lengthToWidthRatio <= upper[0]) {
      const share = (lengthToWidthRatio - lower[0]) / (upper[0] - lower[0]);
      return lower[1] + share * (upper[1] - lower[1]);
    }
  }
  return null;
}
