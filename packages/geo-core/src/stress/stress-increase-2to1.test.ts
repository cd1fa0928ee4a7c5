import { describe, expect, it } from 'vitest';
import { stressIncrease2to1 } from './stress-increase-2to1.js';
import { stressIncrease2to1Circle } from './stress-increase-2to1-circle.js';
import { stressIncrease2to1Strip } from './stress-increase-2to1-strip.js';

describe('stressIncrease2to1({ loadKn, widthM, lengthM, depthM })', () => {
  it('spreads the load over (B + z)(L + z)', () => {
    // Hand calculation from the formula in Das, Principles of Foundation Engineering: 900/((2 + 1)(3 + 1)) = 75 kPa.
    expect(stressIncrease2to1({ loadKn: 900, widthM: 2, lengthM: 3, depthM: 1 })).toBe(75);
  });

  it('at the base equals the contact pressure Q/(B·L)', () => {
    expect(stressIncrease2to1({ loadKn: 900, widthM: 2, lengthM: 3, depthM: 0 })).toBe(150);
  });

  it('falls with depth', () => {
    expect(stressIncrease2to1({ loadKn: 900, widthM: 2, lengthM: 3, depthM: 4 })).toBeLessThan(stressIncrease2to1({ loadKn: 900, widthM: 2, lengthM: 3, depthM: 3 }));
  });

  it('throws RangeError for a non-positive side, a negative depth or a non-finite load', () => {
    expect(() => stressIncrease2to1({ loadKn: 1, widthM: 0, lengthM: 1, depthM: 1 })).toThrow(new RangeError('stressIncrease2to1 requires finite widthM > 0 and lengthM > 0'));
    expect(() => stressIncrease2to1({ loadKn: 1, widthM: 1, lengthM: 1, depthM: -1 })).toThrow(new RangeError('stressIncrease2to1 requires finite depthM >= 0'));
    expect(() => stressIncrease2to1({ loadKn: Number.NaN, widthM: 1, lengthM: 1, depthM: 1 })).toThrow(new RangeError('stressIncrease2to1 requires a finite loadKn'));
  });
});

describe('stressIncrease2to1Strip({ pressureKpa, widthM, depthM })', () => {
  it('spreads the line load q·B over B + z', () => {
    // Hand calculation: 100 × 2/(2 + 2) = 50 kPa.
    expect(stressIncrease2to1Strip({ pressureKpa: 100, widthM: 2, depthM: 2 })).toBe(50);
  });

  it('throws RangeError for a non-positive width or negative depth', () => {
    expect(() => stressIncrease2to1Strip({ pressureKpa: 100, widthM: -2, depthM: 2 })).toThrow(new RangeError('stressIncrease2to1Strip requires finite widthM > 0'));
    expect(() => stressIncrease2to1Strip({ pressureKpa: 100, widthM: 2, depthM: -2 })).toThrow(new RangeError('stressIncrease2to1Strip requires finite depthM >= 0'));
  });
});

describe('stressIncrease2to1Circle({ loadKn, diameterM, depthM })', () => {
  it('spreads the load over a circle of diameter D + z', () => {
    // Hand calculation: Q = 100π kN on D = 2 m (q = 100 kPa); at z = 2 m, 4 × 100π/(π × 4²) = 25 kPa.
    expect(stressIncrease2to1Circle({ loadKn: 100 * Math.PI, diameterM: 2, depthM: 2 })).toBeCloseTo(25, 12);
    expect(stressIncrease2to1Circle({ loadKn: 100 * Math.PI, diameterM: 2, depthM: 0 })).toBeCloseTo(100, 12);
  });

  it('a circle lies between its inscribed and circumscribed squares at the same pressure (equal to the circumscribed one: similar spread areas)', () => {
    // q·D²/(D + z)² for both the circle and the square of side D: 2V:1H keeps the ratio of similar areas.
    for (const depthM of [0, 0.3, 1, 2.5, 7]) {
      const pressureKpa = 100;
      const circle = stressIncrease2to1Circle({ loadKn: pressureKpa * Math.PI, diameterM: 2, depthM });
      const inscribed = stressIncrease2to1({ loadKn: pressureKpa * 2, widthM: Math.SQRT2, lengthM: Math.SQRT2, depthM });
      const circumscribed = stressIncrease2to1({ loadKn: pressureKpa * 4, widthM: 2, lengthM: 2, depthM });
      expect(circle).toBeGreaterThanOrEqual(inscribed);
      expect(circle).toBeCloseTo(circumscribed, 12);
    }
  });

  it('throws RangeError for a non-positive diameter, a negative depth or a non-finite load', () => {
    expect(() => stressIncrease2to1Circle({ loadKn: 1, diameterM: 0, depthM: 1 })).toThrow(new RangeError('stressIncrease2to1Circle requires a finite diameterM > 0'));
    expect(() => stressIncrease2to1Circle({ loadKn: 1, diameterM: 1, depthM: -1 })).toThrow(new RangeError('stressIncrease2to1Circle requires a finite depthM >= 0'));
    expect(() => stressIncrease2to1Circle({ loadKn: Number.NaN, diameterM: 1, depthM: 1 })).toThrow(new RangeError('stressIncrease2to1Circle requires a finite loadKn'));
  });
});
