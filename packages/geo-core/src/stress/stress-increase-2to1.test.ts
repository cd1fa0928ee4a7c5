import { describe, expect, it } from 'vitest';
import { stressIncrease2to1 } from './stress-increase-2to1.js';
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
