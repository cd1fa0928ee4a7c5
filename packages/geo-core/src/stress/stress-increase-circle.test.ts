import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { stressIncreaseCircle } from './stress-increase-circle.js';

describe('stressIncreaseCircle({ pressureKpa, radiusM, depthM })', () => {
  // Published table of Δσz/q on the axis of a circle (Das, Principles of Geotechnical
  // Engineering): z/R = 2 → 0.2845 (also printed in domain.md); z/R = 1 → 0.6465 and
  // z/R = 0.5 → 0.9106 from memory. Four printed decimals: tolerance 0.00005 (+ rounding).
  it.each([
    [2, 0.2845],
    [1, 0.6465],
    [0.5, 0.9106],
  ])('at z/R = %s the ratio Δσz/q is the published %s', (depthOverRadius, expected) => {
    expect(Math.abs(stressIncreaseCircle({ pressureKpa: 1, radiusM: 1, depthM: depthOverRadius }) - expected)).toBeLessThanOrEqual(0.00006);
  });

  it('property: falls as depth grows and never exceeds q', () => {
    fc.assert(
      fc.property(fc.double({ min: 0.01, max: 50, noNaN: true }), fc.double({ min: 0.01, max: 50, noNaN: true }), (radiusM, depthM) => {
        const upper = stressIncreaseCircle({ pressureKpa: 100, radiusM, depthM });
        expect(upper).toBeLessThanOrEqual(100);
        expect(stressIncreaseCircle({ pressureKpa: 100, radiusM, depthM: depthM * 1.5 })).toBeLessThan(upper);
      }),
    );
  });

  it('tends to Boussinesq’s point load 3P/(2πz²) for a small circle', () => {
    // P = q·πR² with R = 0.01 m, z = 5 m: the series 1 − (1 + a)^−1.5 = 1.5a(1 − 1.25a + …), a = (R/z)²,
    // puts the circle within 1.25a = 5e-6 of the point load.
    const pressureKpa = 1000;
    const pointLoadKpa = (3 * pressureKpa * Math.PI * 0.01 ** 2) / (2 * Math.PI * 25);
    expect(stressIncreaseCircle({ pressureKpa, radiusM: 0.01, depthM: 5 }) / pointLoadKpa).toBeCloseTo(1, 4);
  });

  it('throws RangeError for a non-positive radius or depth', () => {
    expect(() => stressIncreaseCircle({ pressureKpa: 1, radiusM: 0, depthM: 1 })).toThrow(new RangeError('stressIncreaseCircle requires finite radiusM > 0'));
    expect(() => stressIncreaseCircle({ pressureKpa: 1, radiusM: 1, depthM: -1 })).toThrow(new RangeError('stressIncreaseCircle requires finite depthM > 0'));
    expect(() => stressIncreaseCircle({ pressureKpa: Number.NaN, radiusM: 1, depthM: 1 })).toThrow(new RangeError('stressIncreaseCircle requires a finite pressureKpa'));
  });
});
