import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { cornerInfluenceFactor } from './corner-influence-factor.js';
import { stressIncreaseRectangle } from './stress-increase-rectangle.js';
import { stressIncreaseStrip } from './stress-increase-strip.js';

const positive = (max: number) => fc.double({ min: 0.05, max, noNaN: true });

describe('stressIncreaseRectangle({ pressureKpa, widthM, lengthM, xM, yM, depthM })', () => {
  it('under the centre is 4·q·I(B/2z, L/2z)', () => {
    // Hand calculation: 2 m × 2 m, z = 1 m → m = n = 1, I = 0.1752 (published table), Δσ = 4 × 0.1752 × 100 = 70.08 kPa.
    const value = stressIncreaseRectangle({ pressureKpa: 100, widthM: 2, lengthM: 2, xM: 0, yM: 0, depthM: 1 });
    expect(value).toBeCloseTo(70.08, 1);
  });

  it('under a corner is q·I(B/z, L/z)', () => {
    // Hand calculation: 2 m × 4 m, z = 2 m → m = 1, n = 2, I = 0.1999 (published table) → 19.99 kPa for q = 100 kPa.
    expect(stressIncreaseRectangle({ pressureKpa: 100, widthM: 2, lengthM: 4, xM: 1, yM: 2, depthM: 2 })).toBeCloseTo(19.99, 1);
  });

  it('at a point outside reproduces the subtraction of corner rectangles', () => {
    // Hand calculation: 2 m × 2 m footing, point 1 m beyond one edge on the centre line (x = 2, y = 0), z = 1 m.
    // Rectangles from the point: 3 m × 1 m twice, less 1 m × 1 m twice: 2·q·[I(3,1) − I(1,1)].
    const expected = 2 * 100 * (cornerInfluenceFactor(3, 1) - cornerInfluenceFactor(1, 1));
    expect(stressIncreaseRectangle({ pressureKpa: 100, widthM: 2, lengthM: 2, xM: 2, yM: 0, depthM: 1 })).toBeCloseTo(expected, 12);
  });

  it('property: four quarter rectangles, each loading the centre through one corner, reproduce the centre value', () => {
    fc.assert(
      fc.property(positive(20), positive(20), positive(30), (widthM, lengthM, depthM) => {
        const centre = stressIncreaseRectangle({ pressureKpa: 100, widthM, lengthM, xM: 0, yM: 0, depthM });
        const quarters = [-1, 1].flatMap((sx) =>
          [-1, 1].map((sy) =>
            stressIncreaseRectangle({ pressureKpa: 100, widthM: widthM / 2, lengthM: lengthM / 2, xM: (sx * widthM) / 4, yM: (sy * lengthM) / 4, depthM }),
          ),
        );
        expect(quarters.reduce((a, b) => a + b, 0)).toBeCloseTo(centre, 9);
      }),
    );
  });

  it('property: two halves of a footing add up to the whole at any point, inside or outside', () => {
    fc.assert(
      fc.property(positive(10), positive(10), fc.double({ min: -15, max: 15, noNaN: true }), fc.double({ min: -15, max: 15, noNaN: true }), positive(20), (widthM, lengthM, xM, yM, depthM) => {
        const whole = stressIncreaseRectangle({ pressureKpa: 80, widthM, lengthM, xM, yM, depthM });
        const left = stressIncreaseRectangle({ pressureKpa: 80, widthM: widthM / 2, lengthM, xM: xM + widthM / 4, yM, depthM });
        const right = stressIncreaseRectangle({ pressureKpa: 80, widthM: widthM / 2, lengthM, xM: xM - widthM / 4, yM, depthM });
        expect(left + right).toBeCloseTo(whole, 9);
      }),
    );
  });

  it('property: on the axis the stress falls as depth grows', () => {
    fc.assert(
      fc.property(positive(20), positive(20), positive(30), fc.double({ min: 1.01, max: 10, noNaN: true }), (widthM, lengthM, depthM, factor) => {
        const shallow = stressIncreaseRectangle({ pressureKpa: 100, widthM, lengthM, xM: 0, yM: 0, depthM });
        const deep = stressIncreaseRectangle({ pressureKpa: 100, widthM, lengthM, xM: 0, yM: 0, depthM: depthM * factor });
        expect(deep).toBeLessThan(shallow);
      }),
    );
  });

  it('is symmetric in ±x and ±y', () => {
    const at = (xM: number, yM: number) => stressIncreaseRectangle({ pressureKpa: 100, widthM: 3, lengthM: 5, xM, yM, depthM: 2 });
    expect(at(-1.2, 0.7)).toBeCloseTo(at(1.2, -0.7), 12);
    expect(at(4, 3)).toBeCloseTo(at(-4, -3), 12);
  });

  it('tends to the strip solution when the length is very long', () => {
    const rectangle = stressIncreaseRectangle({ pressureKpa: 100, widthM: 2, lengthM: 1e6, xM: 0.5, yM: 0, depthM: 2 });
    expect(rectangle).toBeCloseTo(stressIncreaseStrip({ pressureKpa: 100, widthM: 2, xM: 0.5, depthM: 2 }), 4);
  });

  it('tends to q just below the centre and q/4 just below a corner', () => {
    expect(stressIncreaseRectangle({ pressureKpa: 100, widthM: 2, lengthM: 2, xM: 0, yM: 0, depthM: 1e-6 })).toBeCloseTo(100, 3);
    expect(stressIncreaseRectangle({ pressureKpa: 100, widthM: 2, lengthM: 2, xM: 1, yM: 1, depthM: 1e-6 })).toBeCloseTo(25, 3);
  });

  it('throws RangeError for a non-positive side or depth and non-finite values', () => {
    const base = { pressureKpa: 100, widthM: 2, lengthM: 2, xM: 0, yM: 0, depthM: 1 };
    expect(() => stressIncreaseRectangle({ ...base, widthM: 0 })).toThrow(new RangeError('stressIncreaseRectangle requires finite widthM > 0 and lengthM > 0'));
    expect(() => stressIncreaseRectangle({ ...base, lengthM: Infinity })).toThrow(RangeError);
    expect(() => stressIncreaseRectangle({ ...base, depthM: 0 })).toThrow(new RangeError('stressIncreaseRectangle requires finite depthM > 0'));
    expect(() => stressIncreaseRectangle({ ...base, xM: Number.NaN })).toThrow(new RangeError('stressIncreaseRectangle requires finite pressureKpa, xM and yM'));
  });
});
