import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { stressIncreaseRectangle } from './stress-increase-rectangle.js';
import { stressIncreaseStrip } from './stress-increase-strip.js';

describe('stressIncreaseStrip({ pressureKpa, widthM, xM, depthM })', () => {
  // Table of Δσz/q below a strip against 2z/B and 2x/B (Das, Principles of Geotechnical
  // Engineering), from memory, three printed decimals: tolerance 0.0005.
  it.each([
    [1, 0, 0.818],
    [2, 0, 0.55],
    [4, 0, 0.306],
  ])('at 2z/B = %s, 2x/B = %s the ratio Δσz/q is the published %s', (twoZOverB, twoXOverB, expected) => {
    const value = stressIncreaseStrip({ pressureKpa: 1, widthM: 2, xM: twoXOverB, depthM: twoZOverB });
    expect(Math.abs(value - expected)).toBeLessThanOrEqual(0.0005);
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
