import { describe, expect, it } from 'vitest';
import { elasticInfluenceFactor } from './elastic-influence-factor.js';
import { gaussLegendreRule } from './gauss-legendre-rule.js';
import { immediateSettlement } from './immediate-settlement.js';

// Hand calculations of the closed forms (corner α = (1/π)[ln(m + √(1 + m²)) + m·ln((1 + √(1 + m²))/m)], centre twice it,
// average centre + (2/π)(1 + m³ − (1 + m²)^1.5)/(3m)):
// m = 1: (1/π)(0.881374 + 0.881374) = 0.561100; centre 1.122200; average 1.122200 + 0.636620 × (−0.828427/3) = 0.946402.
// m = 2: (1/π)(ln 4.236068 + 2 ln 1.618034) = (1.443635 + 0.962424)/π = 0.765872; centre 1.531745;
//        average 1.531745 + 0.636620 × (−2.180340/6) = 1.300404.
const HAND_CALCULATED: ReadonlyArray<readonly [number, number, number]> = [
  [1, 1.1222, 0.946402],
  [2, 1.531745, 1.300404],
];

// Independently: the corner α is (1/(πB))∫∫ dA/r over the B × L rectangle (Boussinesq's surface displacement
// P(1 − ν²)/(πEr) summed over the load), in polar coordinates about the corner, ∫ ρmax(θ) dθ: each side of the
// diagonal by 48-point Gauss–Legendre (the integrand is smooth there).
const { nodes, weights } = gaussLegendreRule(48);
const quadratureCornerFactor = (m: number): number => {
  const diagonal = Math.atan2(m, 1);
  const part = (from: number, to: number, reach: (theta: number) => number) =>
    nodes.reduce((sum, u, i) => sum + (weights[i] ?? 0) * ((to - from) / 2) * reach(from + ((to - from) / 2) * (1 + u)), 0);
  return (part(0, diagonal, (theta) => 1 / Math.cos(theta)) + part(diagonal, Math.PI / 2, (theta) => m / Math.sin(theta))) / Math.PI;
};

describe('elasticInfluenceFactor(shape, lengthToWidthRatio, position)', () => {
  it.each(HAND_CALCULATED)('L/B = %s: centre %s and average %s, the hand calculations written out above', (ratio, centre, average) => {
    expect(Math.abs((elasticInfluenceFactor('rectangle', ratio, 'centre') ?? Number.NaN) - centre)).toBeLessThanOrEqual(0.000001);
    expect(Math.abs((elasticInfluenceFactor('rectangle', ratio, 'average') ?? Number.NaN) - average)).toBeLessThanOrEqual(0.000001);
    expect(elasticInfluenceFactor('rectangle', ratio, 'corner')).toBeCloseTo((elasticInfluenceFactor('rectangle', ratio, 'centre') ?? 0) / 2, 12);
  });

  it.each([1, 1.5, 3, 5, 10])('L/B = %s: the corner factor equals the surface displacement integrated over the rectangle (independent quadrature, 1e-12)', (ratio) => {
    expect(Math.abs((elasticInfluenceFactor('rectangle', ratio, 'corner') ?? Number.NaN) - quadratureCornerFactor(ratio))).toBeLessThan(1e-12);
  });

  it('interpolates the rigid-footing table it holds linearly in L/B (its values are quoted, not derived: see the source comment)', () => {
    expect(elasticInfluenceFactor('rectangle', 1, 'rigid')).toBeCloseTo(0.88, 12);
    // Halfway between L/B = 3 (1.44) and 5 (1.72): 1.58.
    expect(elasticInfluenceFactor('rectangle', 4, 'rigid')).toBeCloseTo(1.58, 12);
  });

  it('rigid factor lies between the flexible average and corner, as a rigid footing must', () => {
    for (const ratio of [1, 1.5, 2, 3, 5, 10]) {
      const rigid = elasticInfluenceFactor('rectangle', ratio, 'rigid') ?? Number.NaN;
      expect(rigid).toBeLessThan(elasticInfluenceFactor('rectangle', ratio, 'average') ?? 0);
      expect(rigid).toBeGreaterThan(elasticInfluenceFactor('rectangle', ratio, 'corner') ?? 0);
    }
  });

  it('circle: the exact elastic solutions 1, 2/π, 8/(3π), π/4 (Timoshenko & Goodier; Poulos & Davis 1974)', () => {
    expect(elasticInfluenceFactor('circle', 1, 'centre')).toBe(1);
    expect(elasticInfluenceFactor('circle', 1, 'corner')).toBeCloseTo(0.6366, 4);
    expect(elasticInfluenceFactor('circle', 1, 'average')).toBeCloseTo(0.8488, 4);
    expect(elasticInfluenceFactor('circle', 1, 'rigid')).toBeCloseTo(0.7854, 4);
  });

  it('a square is the rectangle with L/B = 1; a strip has no half-space factor (null)', () => {
    for (const position of ['centre', 'corner', 'average', 'rigid'] as const) {
      expect(elasticInfluenceFactor('square', 7, position)).toBe(elasticInfluenceFactor('rectangle', 1, position));
      expect(elasticInfluenceFactor('strip', 1, position)).toBeNull();
    }
  });

  it('is null for a rigid rectangle beyond the table (L/B > 10)', () => {
    expect(elasticInfluenceFactor('rectangle', 12, 'rigid')).toBeNull();
  });

  it('throws RangeError for L/B below 1', () => {
    expect(() => elasticInfluenceFactor('rectangle', 0.5, 'centre')).toThrow(new RangeError('elasticInfluenceFactor requires a finite lengthToWidthRatio >= 1'));
  });
});

describe('immediateSettlement({ pressureKpa, widthM, lengthM, elasticModulusKpa, poissonRatio, position, shape })', () => {
  it('a flexible square, centre: q·B·(1 − ν²)/E·1.122', () => {
    // Hand calculation with α = 1.1222 (worked out above): 150 × 2 × (1 − 0.3²)/12 000 × 1.1222 = 0.025530 m.
    const result = immediateSettlement({ pressureKpa: 150, widthM: 2, lengthM: 2, elasticModulusKpa: 12_000, poissonRatio: 0.3, position: 'centre' });
    expect(Math.abs((result.settlementM ?? 0) - 0.02553)).toBeLessThanOrEqual(0.0000005);
    expect(result.warnings).toEqual([]);
  });

  it('a rigid circle is Boussinesq’s punch: π·q·a·(1 − ν²)/(2E)', () => {
    // Closed form (Timoshenko & Goodier): a = 1.5 m, q = 100 kPa, ν = 0.5, E = 20 MPa → π × 100 × 1.5 × 0.75/40 000 = 0.0088357 m.
    const result = immediateSettlement({ pressureKpa: 100, widthM: 3, lengthM: 3, elasticModulusKpa: 20_000, poissonRatio: 0.5, position: 'rigid', shape: 'circle' });
    expect(result.settlementM).toBeCloseTo(0.0088357, 7);
  });

  it('answers null with a warning for a rigid strip-like rectangle beyond the table', () => {
    const result = immediateSettlement({ pressureKpa: 100, widthM: 1, lengthM: 20, elasticModulusKpa: 20_000, poissonRatio: 0.3, position: 'rigid' });
    expect(result.settlementM).toBeNull();
    expect(result.warnings[0]).toMatch(/No published rigid-footing factor/);
  });

  it('a strip answers null with a warning: on a half-space it settles without bound', () => {
    const result = immediateSettlement({ pressureKpa: 100, widthM: 1, lengthM: 1, elasticModulusKpa: 20_000, poissonRatio: 0.3, position: 'centre', shape: 'strip' });
    expect(result.settlementM).toBeNull();
    expect(result.warnings[0]).toMatch(/^A strip on an elastic half-space settles without bound/);
  });

  it('a square is the rectangle with L = B, and must have L = B', () => {
    const base = { pressureKpa: 100, widthM: 2, lengthM: 2, elasticModulusKpa: 10_000, poissonRatio: 0.3, position: 'centre' as const };
    expect(immediateSettlement({ ...base, shape: 'square' })).toEqual(immediateSettlement(base));
    expect(() => immediateSettlement({ ...base, shape: 'square', lengthM: 3 })).toThrow(new RangeError('immediateSettlement requires lengthM = widthM for a square'));
  });

  it('throws RangeError for L < B, ν above 0.5 or a non-positive modulus', () => {
    const base = { pressureKpa: 100, widthM: 2, lengthM: 2, elasticModulusKpa: 10_000, poissonRatio: 0.3, position: 'centre' as const };
    expect(() => immediateSettlement({ ...base, lengthM: 1 })).toThrow(new RangeError('immediateSettlement requires a finite lengthM >= widthM'));
    expect(() => immediateSettlement({ ...base, poissonRatio: 0.6 })).toThrow(new RangeError('immediateSettlement requires 0 <= poissonRatio <= 0.5'));
    expect(() => immediateSettlement({ ...base, elasticModulusKpa: 0 })).toThrow(new RangeError('immediateSettlement requires a finite elasticModulusKpa > 0'));
    expect(() => immediateSettlement({ ...base, widthM: 0 })).toThrow(new RangeError('immediateSettlement requires a finite widthM > 0'));
  });
});
