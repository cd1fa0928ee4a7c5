import { describe, expect, it } from 'vitest';
import { secondaryCompressionSettlement } from './secondary-compression-settlement.js';

const base = { thicknessM: 5, cAlpha: 0.02, voidRatioAtEndOfPrimary: 1, endOfPrimaryYears: 2, designLifeYears: 50 };

describe('secondaryCompressionSettlement({ thicknessM, cAlpha, voidRatioAtEndOfPrimary, endOfPrimaryYears, designLifeYears })', () => {
  it('is Cα/(1 + ep)·H·log10(t2/t1)', () => {
    // Hand calculation: 0.02/2 × 5 × log10(25) = 0.05 × 1.397940 = 0.069897 m.
    expect(secondaryCompressionSettlement(base)).toBeCloseTo(0.069897, 6);
  });

  it('is zero when the design life ends before primary consolidation does', () => {
    expect(secondaryCompressionSettlement({ ...base, designLifeYears: 1 })).toBe(0);
  });

  it('grows by the same amount for each tenfold of time', () => {
    const a = secondaryCompressionSettlement({ ...base, designLifeYears: 20 });
    const b = secondaryCompressionSettlement({ ...base, designLifeYears: 200 });
    expect(b - a).toBeCloseTo(0.05, 12);
  });

  it('throws RangeError for non-positive thickness, void ratio or times, and negative Cα', () => {
    expect(() => secondaryCompressionSettlement({ ...base, thicknessM: 0 })).toThrow(new RangeError('secondaryCompressionSettlement requires a finite thicknessM > 0'));
    expect(() => secondaryCompressionSettlement({ ...base, cAlpha: -0.01 })).toThrow(new RangeError('secondaryCompressionSettlement requires a finite cAlpha >= 0'));
    expect(() => secondaryCompressionSettlement({ ...base, voidRatioAtEndOfPrimary: 0 })).toThrow(new RangeError('secondaryCompressionSettlement requires a finite voidRatioAtEndOfPrimary > 0'));
    expect(() => secondaryCompressionSettlement({ ...base, endOfPrimaryYears: 0 })).toThrow(new RangeError('secondaryCompressionSettlement requires finite endOfPrimaryYears > 0 and designLifeYears > 0'));
  });
});
