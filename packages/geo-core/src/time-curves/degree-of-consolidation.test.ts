import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { degreeOfConsolidation } from './degree-of-consolidation.js';
import { timeFactorForDegree } from './time-factor-for-degree.js';

// The U–Tv table of Terzaghi (1943), as textbooks print it (Das, *Principles of Geotechnical Engineering*,
// "Variation of Tv with Uav"), three decimals. Hand calculation of one entry, U(0.197) from the series
// U = 1 − Σ (2/M²)·exp(−M²Tv): 0.810569 × e^(−0.486078) = 0.498529; 0.090063 × e^(−4.374703) = 0.001134;
// the next term 2e-7 → U = 0.500337, which the table rounds to 50 %.
const PUBLISHED_TABLE: readonly [number, number][] = [
  [0.1, 0.008],
  [0.2, 0.031],
  [0.3, 0.071],
  [0.4, 0.126],
  [0.5, 0.197],
  [0.6, 0.286],
  [0.7, 0.403],
  [0.8, 0.567],
  [0.9, 0.848],
  [0.95, 1.129],
];

describe('timeFactorForDegree(u)', () => {
  it.each(PUBLISHED_TABLE)('reproduces the published table: U = %s → Tv = %s to the three decimals printed', (u, published) => {
    expect(Math.abs(timeFactorForDegree(u) - published)).toBeLessThanOrEqual(0.0005 + 1e-12);
  });

  it('matches Tv = (π/4)·U² below U = 60 % within 0.6 % (the approximation\'s known error, measured 0.56 % at U = 55 %)', () => {
    for (const u of [0.05, 0.2, 0.4, 0.55]) {
      expect(Math.abs(timeFactorForDegree(u) / ((Math.PI / 4) * u * u) - 1)).toBeLessThan(0.006);
    }
  });

  it('matches Tv = 1.781 − 0.933·log10(100 − U%) above U = 60 % within 0.003 (the approximation\'s printed accuracy)', () => {
    for (const u of [0.65, 0.8, 0.9, 0.95, 0.99]) {
      expect(Math.abs(timeFactorForDegree(u) - (1.781 - 0.933 * Math.log10(100 - 100 * u)))).toBeLessThan(0.003);
    }
  });

  it('is the inverse of degreeOfConsolidation across 0 < u < 1', () => {
    fc.assert(
      fc.property(fc.double({ min: 1e-6, max: 1 - 1e-9, noNaN: true }), (u) => {
        expect(degreeOfConsolidation(timeFactorForDegree(u))).toBeCloseTo(u, 10);
      }),
    );
  });

  it.each([0, 1, -0.1, 1.5, Number.NaN])('throws a RangeError for u = %s, outside (0, 1)', (u) => {
    expect(() => timeFactorForDegree(u)).toThrow(RangeError);
    expect(() => timeFactorForDegree(u)).toThrow('timeFactorForDegree requires');
  });
});

describe('degreeOfConsolidation(timeFactor)', () => {
  it('is 0 at Tv = 0 and tends to 1 for large Tv (1 − U < 1e-10 at Tv = 10)', () => {
    expect(degreeOfConsolidation(0)).toBe(0);
    expect(1 - degreeOfConsolidation(10)).toBeLessThan(1e-10);
  });

  it('gives U = 0.900 at Tv = 0.848 and 0.500 at Tv = 0.197 (published table, three decimals)', () => {
    expect(degreeOfConsolidation(0.848)).toBeCloseTo(0.9, 3);
    expect(degreeOfConsolidation(0.197)).toBeCloseTo(0.5, 3);
  });

  it('joins the short-time form and the series continuously at Tv = 0.02 (difference below 1e-12)', () => {
    expect(Math.abs(degreeOfConsolidation(0.02 - 1e-13) - degreeOfConsolidation(0.02))).toBeLessThan(1e-12);
  });

  it('increases strictly with the time factor', () => {
    fc.assert(
      fc.property(fc.double({ min: 0, max: 3, noNaN: true }), fc.double({ min: 1e-6, max: 1, noNaN: true }), (tv, step) => {
        expect(degreeOfConsolidation(tv + step)).toBeGreaterThan(degreeOfConsolidation(tv));
      }),
    );
  });

  it.each([-1e-9, Number.POSITIVE_INFINITY, Number.NaN])('throws a RangeError for Tv = %s', (tv) => {
    expect(() => degreeOfConsolidation(tv)).toThrow('degreeOfConsolidation requires');
  });
});
