import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { stressIncreaseRectangle } from './stress-increase-rectangle.js';
import { stressIncreaseStrip } from './stress-increase-strip.js';

describe('stressIncreaseStrip({ pressureKpa, widthM, xM, depthM })', () => {
  // Hand calculations under the centre line (θ1 = −θ2 = atan(B/2z), sin θ cos θ = tan θ/(1 + tan² θ)):
  // 2z/B = 1: (1/π)(π/2 + 2 × 0.5) = 0.818310; 2z/B = 2: (1/π)(2 × 0.463648 + 2 × 0.4) = 0.549815;
  // 2z/B = 4: (1/π)(2 × 0.244979 + 2 × 0.235294) = 0.960545/π = 0.305751.
  it.each([
    [1, 0, 0.81831],
    [2, 0, 0.549815],
    [4, 0, 0.305751],
  ])('at 2z/B = %s, 2x/B = %s the ratio Δσz/q is %s (hand calculation, six decimals)', (twoZOverB, twoXOverB, expected) => {
    const value = stressIncreaseStrip({ pressureKpa: 1, widthM: 2, xM: twoXOverB, depthM: twoZOverB });
    expect(Math.abs(value - expected)).toBeLessThanOrEqual(0.0000005);
  });

  it('gives the influence 0.6248 of University of Maine, CIE 365 course notes, "Consolidation", Example 7.4(a) (tan α = 15/(2 × 12.5))', () => {
    // Printed: (2/π)(α + sin α cos α) with tan α = 0.6 → 0.625 (and Δσ = 3749 psf for q = 6000 psf): 0.5 % agreement.
    expect(Math.abs(stressIncreaseStrip({ pressureKpa: 1, widthM: 15, xM: 0, depthM: 12.5 }) / 0.6248 - 1)).toBeLessThan(0.005);
  });

  it('under an edge, just below the surface, carries half the pressure', () => {
    expect(stressIncreaseStrip({ pressureKpa: 100, widthM: 2, xM: 1, depthM: 1e-9 })).toBeCloseTo(50, 6);
  });

  it('is symmetric about the centre line', () => {
    expect(stressIncreaseStrip({ pressureKpa: 100, widthM: 3, xM: -2.2, depthM: 1.5 })).toBeCloseTo(stressIncreaseStrip({ pressureKpa: 100, widthM: 3, xM: 2.2, depthM: 1.5 }), 12);
  });

  it('property: a strip is the limit of a long rectangle (L = 10⁴·B, at its middle) to 1e-6 of q', () => {
    // A rectangle's ends at ±L/2 take away about (2/π)(B/L)(z/L)… of q from the middle: below 1e-7 here.
    fc.assert(
      fc.property(fc.double({ min: 0.5, max: 4, noNaN: true }), fc.double({ min: -6, max: 6, noNaN: true }), fc.double({ min: 0.05, max: 10, noNaN: true }), (widthM, xM, depthM) => {
        const strip = stressIncreaseStrip({ pressureKpa: 100, widthM, xM, depthM });
        const rectangle = stressIncreaseRectangle({ pressureKpa: 100, widthM, lengthM: 1e4 * widthM, xM, yM: 0, depthM });
        expect(Math.abs(strip - rectangle)).toBeLessThan(1e-4);
      }),
    );
  });

  it('throws RangeError for a non-positive width or depth, or non-finite offset', () => {
    expect(() => stressIncreaseStrip({ pressureKpa: 1, widthM: 0, xM: 0, depthM: 1 })).toThrow(new RangeError('stressIncreaseStrip requires finite widthM > 0'));
    expect(() => stressIncreaseStrip({ pressureKpa: 1, widthM: 1, xM: 0, depthM: 0 })).toThrow(new RangeError('stressIncreaseStrip requires finite depthM > 0'));
    expect(() => stressIncreaseStrip({ pressureKpa: 1, widthM: 1, xM: Infinity, depthM: 1 })).toThrow(new RangeError('stressIncreaseStrip requires finite pressureKpa and xM'));
  });
});
