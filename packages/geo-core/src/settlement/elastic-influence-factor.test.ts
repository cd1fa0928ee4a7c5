import { describe, expect, it } from 'vitest';
import { elasticInfluenceFactor } from './elastic-influence-factor.js';
import { immediateSettlement } from './immediate-settlement.js';

// The table of α (flexible centre) and αav (flexible average) against L/B printed in
// Das, Principles of Foundation Engineering (elastic settlement section), three decimals,
// values from memory; the corner is half the centre (published as 0.561 for a square).
const FLEXIBLE_TABLE: ReadonlyArray<readonly [number, number, number]> = [
  [1, 1.122, 0.946],
  [1.5, 1.358, 1.148],
  [2, 1.532, 1.3],
  [3, 1.783, 1.527],
  [5, 2.105, 1.826],
  [10, 2.544, 2.246],
];

describe('elasticInfluenceFactor(shape, lengthToWidthRatio, position)', () => {
  it.each(FLEXIBLE_TABLE)('L/B = %s: centre %s and average %s as the published table prints them', (ratio, centre, average) => {
    expect(Math.abs((elasticInfluenceFactor('rectangle', ratio, 'centre') ?? Number.NaN) - centre)).toBeLessThanOrEqual(0.0005);
    expect(Math.abs((elasticInfluenceFactor('rectangle', ratio, 'average') ?? Number.NaN) - average)).toBeLessThanOrEqual(0.0005);
    expect(elasticInfluenceFactor('rectangle', ratio, 'corner')).toBeCloseTo((elasticInfluenceFactor('rectangle', ratio, 'centre') ?? 0) / 2, 12);
  });

  it('rigid square is the published 0.88 and the table is interpolated linearly in L/B', () => {
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
    // Hand calculation with the published α = 1.122 (no worked textbook example is recalled
    // precisely enough to cite): 150 × 2 × (1 − 0.3²)/12 000 × 1.122 = 0.025526 m; the table's
    // three decimals bound the relative error to 0.05 %.
    const result = immediateSettlement({ pressureKpa: 150, widthM: 2, lengthM: 2, elasticModulusKpa: 12_000, poissonRatio: 0.3, position: 'centre' });
    expect(Math.abs((result.settlementM ?? 0) - 0.025526)).toBeLessThanOrEqual(0.025526 * 5e-4);
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
