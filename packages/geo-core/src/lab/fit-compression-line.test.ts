import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { fitCompressionLine } from './fit-compression-line.js';

describe('fitCompressionLine(points)', () => {
  it('through two points is their chord: slope −Cc per log cycle and e at 1 kPa (hand calculation)', () => {
    // (100 kPa, 1.0) and (1000 kPa, 0.6): slope (0.6 − 1.0)/1 = −0.4 per cycle; e(1 kPa) = 1.0 + 0.4 × 2 = 1.8.
    const fit = fitCompressionLine([{ stressKpa: 100, voidRatio: 1 }, { stressKpa: 1000, voidRatio: 0.6 }]);
    expect(fit.line.voidRatioPerLogCycle).toBeCloseTo(-0.4, 12);
    expect(fit.line.voidRatioAtOneKpa).toBeCloseTo(1.8, 12);
    expect(fit.rSquared).toBe(1);
  });

  it('least squares through three points (hand calculation: x = 2, 2.30103, 2.60206; e = 1.00, 0.85, 0.74)', () => {
    // Equally spaced x: slope = (0.74 − 1.00)/(2 × 0.30103) = −0.43185; intercept through the means (2.30103, 0.86333):
    // 0.86333 + 0.43185 × 2.30103 = 1.85704. Fitted e 0.99333, 0.86333, 0.73333; residuals 0.00667, −0.01333, 0.00667:
    // SSres = 2.6667e-4, SStot = 0.136667² + 0.013333² + 0.123333² = 0.034067, r² = 1 − 0.0078278 = 0.99217.
    const fit = fitCompressionLine([
      { stressKpa: 100, voidRatio: 1.0 },
      { stressKpa: 200, voidRatio: 0.85 },
      { stressKpa: 400, voidRatio: 0.74 },
    ]);
    expect(fit.line.voidRatioPerLogCycle).toBeCloseTo(-0.26 / (2 * Math.log10(2)), 10);
    expect(fit.line.voidRatioAtOneKpa).toBeCloseTo(0.86333333 + (0.26 / (2 * Math.log10(2))) * Math.log10(200), 6);
    expect(fit.rSquared).toBeCloseTo(0.99217, 5);
  });

  it('property: points on a straight e–log σ′ line give that line back with r² = 1, in any stress unit', () => {
    fc.assert(
      fc.property(fc.double({ min: 0.05, max: 1, noNaN: true }), fc.double({ min: 0.5, max: 3, noNaN: true }), fc.double({ min: 0.001, max: 1000, noNaN: true }), (cc, eAtOne, unit) => {
        const points = [10, 40, 160, 640].map((stressKpa) => ({ stressKpa: stressKpa * unit, voidRatio: eAtOne - cc * Math.log10(stressKpa) }));
        const fit = fitCompressionLine(points);
        expect(fit.line.voidRatioPerLogCycle).toBeCloseTo(-cc, 9);
        expect(fit.rSquared).toBeCloseTo(1, 9);
      }),
    );
  });

  it('throws RangeError for fewer than two distinct stresses or a stress not positive', () => {
    expect(() => fitCompressionLine([{ stressKpa: 100, voidRatio: 1 }, { stressKpa: 100, voidRatio: 0.9 }])).toThrow(new RangeError('fitCompressionLine requires at least two distinct stresses'));
    expect(() => fitCompressionLine([{ stressKpa: 0, voidRatio: 1 }, { stressKpa: 100, voidRatio: 0.9 }])).toThrow(new RangeError('fitCompressionLine requires positive finite stresses and finite void ratios'));
  });
});
