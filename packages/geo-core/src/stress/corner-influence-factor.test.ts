import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { gaussLegendreRule } from '../settlement/gauss-legendre-rule.js';
import { cornerInfluenceFactor } from './corner-influence-factor.js';

// Holl's form of the same integral, written without the branch of the arctangent
// (Poulos & Davis 1974, eq. for the corner of a rectangle):
// I = (1/2π)[atan(mn/√V) + (mn/√V)(1/(1+m²) + 1/(1+n²))], V = 1 + m² + n².
// Derived and coded separately here, it checks the atan2 form on a wide range.
function hollCornerFactor(m: number, n: number): number {
  const rootV = Math.sqrt(1 + m * m + n * n);
  return (Math.atan((m * n) / rootV) + ((m * n) / rootV) * (1 / (1 + m * m) + 1 / (1 + n * n))) / (2 * Math.PI);
}

// Hand calculations of Newmark's formula, written out (V = m² + n² + 1, V1 = m²n², I = [A + atan2(2mn√V, V − V1)]/(4π),
// A = (2mn√V/(V + V1))·((V + 1)/V)):
// I(1, 1): V = 3, V1 = 1, 2mn√V = 3.464102, A = 0.866025 × 4/3 = 1.154701, atan2(3.464102, 2) = π/3 = 1.047198 → 0.175221.
// I(0.5, 0.5): V = 1.5, V1 = 0.0625, 2mn√V = 0.612372, A = 0.391918 × 5/3 = 0.653197, atan2(0.612372, 1.4375) = 0.402716 → 1.055913/(4π) = 0.084027.
// I(2, 2): V = 9, V1 = 16, 2mn√V = 24, A = 0.96 × 10/9 = 1.066667, atan2(24, −7) = π − 1.287002 = 1.854590 → 0.232466.
// I(1, ∞) = [2/(1 + 1) + atan2(2, 0)]/(4π) = (1 + π/2)/(4π) = 2.570796/12.566371 = 0.204577; I(∞, ∞) = 1/4 (a quarter of an infinite load).
const HAND_CALCULATED: ReadonlyArray<readonly [number, number, number]> = [
  [1, 1, 0.175221],
  [0.5, 0.5, 0.084027],
  [2, 2, 0.232466],
  [1, Infinity, 0.204577],
  [Infinity, Infinity, 0.25],
];

// An independent route to the same number: Boussinesq's point load 3z³/(2πR⁵) integrated over the m × n corner
// rectangle at z = 1 by a 64 × 64 Gauss–Legendre product rule (smooth at z = 1: converged to 1e-12 for m, n ≤ 3).
const { nodes, weights } = gaussLegendreRule(64);
function quadratureCornerFactor(m: number, n: number): number {
  let sum = 0;
  nodes.forEach((u, i) => {
    const x = (m / 2) * (1 + u);
    nodes.forEach((v, j) => {
      const y = (n / 2) * (1 + v);
      sum += (weights[i] ?? 0) * (weights[j] ?? 0) * (m / 2) * (n / 2) * (3 / (2 * Math.PI * (x * x + y * y + 1) ** 2.5));
    });
  });
  return sum;
}

describe('cornerInfluenceFactor(m, n)', () => {
  it.each(HAND_CALCULATED)('I(%s, %s) = %s, the hand calculation written out above (six decimals)', (m, n, expected) => {
    expect(Math.abs(cornerInfluenceFactor(m, n) - expected)).toBeLessThanOrEqual(0.0000005 + 1e-12);
  });

  it.each([
    [0.1, 0.1],
    [0.1, 1],
    [0.2, 0.5],
    [0.5, 2],
    [0.8, 1],
    [1, 1.5],
    [1.5, 3],
    [3, 3],
  ])('I(%s, %s) equals the point load integrated over the rectangle (independent quadrature, 1e-10)', (m, n) => {
    expect(Math.abs(cornerInfluenceFactor(m, n) - quadratureCornerFactor(m, n))).toBeLessThan(1e-10);
  });

  it('agrees with Holl’s branch-free form over six decades of m and n (relative 1e-12)', () => {
    fc.assert(
      fc.property(fc.double({ min: 1e-3, max: 1e3, noNaN: true }), fc.double({ min: 1e-3, max: 1e3, noNaN: true }), (m, n) => {
        const expected = hollCornerFactor(m, n);
        expect(Math.abs(cornerInfluenceFactor(m, n) - expected)).toBeLessThanOrEqual(1e-12 * expected + 1e-15);
      }),
    );
  });

  it('is symmetric: I(m, n) = I(n, m)', () => {
    fc.assert(
      fc.property(fc.double({ min: 0, max: 1e4, noNaN: true }), fc.double({ min: 0, max: 1e4, noNaN: true }), (m, n) => {
        expect(cornerInfluenceFactor(m, n)).toBeCloseTo(cornerInfluenceFactor(n, m), 14);
      }),
    );
    expect(cornerInfluenceFactor(Infinity, 0.7)).toBe(cornerInfluenceFactor(0.7, Infinity));
  });

  it('grows with either ratio and stays within 0 and 1/4', () => {
    fc.assert(
      fc.property(fc.double({ min: 1e-3, max: 1e3, noNaN: true }), fc.double({ min: 1e-3, max: 1e3, noNaN: true }), (m, n) => {
        const value = cornerInfluenceFactor(m, n);
        expect(value).toBeGreaterThan(0);
        expect(value).toBeLessThanOrEqual(0.25);
        expect(cornerInfluenceFactor(m * 1.1, n)).toBeGreaterThanOrEqual(value);
      }),
    );
  });

  it('tends continuously to the one-infinite-side limit and to 1/4', () => {
    expect(cornerInfluenceFactor(1, 1e6)).toBeCloseTo(cornerInfluenceFactor(1, Infinity), 6);
    expect(cornerInfluenceFactor(1e6, 1e6)).toBeCloseTo(0.25, 6);
    expect(cornerInfluenceFactor(1e120, 1e120)).toBe(0.25);
  });

  it('is zero when either side is zero (the point is under an edge line of zero area)', () => {
    expect(cornerInfluenceFactor(0, 3)).toBe(0);
    expect(cornerInfluenceFactor(Infinity, 0)).toBe(0);
  });

  it('throws RangeError for a negative or NaN ratio', () => {
    expect(() => cornerInfluenceFactor(-0.1, 1)).toThrow(new RangeError('cornerInfluenceFactor requires m >= 0 and n >= 0'));
    expect(() => cornerInfluenceFactor(1, Number.NaN)).toThrow(RangeError);
  });
});
