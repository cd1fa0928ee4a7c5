import { describe, expect, it } from 'vitest';
import { firstLoadingVoidRatio, type FirstLoadingCurve } from './first-loading-void-ratio.js';

const curve: FirstLoadingCurve = {
  initialVoidRatio: 1.1,
  startingEffectiveStressKpa: 5,
  recompressionIndex: 0.05,
  compressionIndex: 0.45,
  preconsolidationStressKpa: 150,
  transitionHalfWidthDecades: 0.2,
};
const recompression = (stressKpa: number): number => 1.1 - 0.05 * Math.log10(stressKpa / 5);
const virgin = (stressKpa: number): number => recompression(150) - 0.45 * Math.log10(stressKpa / 150);

describe('firstLoadingVoidRatio(curve, stressKpa)', () => {
  it('is the recompression line below σ′p·10^−w and the virgin line above σ′p·10^w, the two meeting at σ′p', () => {
    for (const stressKpa of [5, 20, 150 / 10 ** 0.2]) expect(firstLoadingVoidRatio(curve, stressKpa)).toBeCloseTo(recompression(stressKpa), 12);
    for (const stressKpa of [150 * 10 ** 0.2, 400, 3200]) expect(firstLoadingVoidRatio(curve, stressKpa)).toBeCloseTo(virgin(stressKpa), 12);
  });

  it('lies (Cc − Cr)·w·3/16 = 0.4 × 0.2 × 0.1875 = 0.015 below the asymptotes\' intersection at σ′p (hand calculation)', () => {
    expect(recompression(150) - firstLoadingVoidRatio(curve, 150)).toBeCloseTo(0.015, 12);
  });

  it('turns its slope smoothly from −Cr to −Cc, halfway (−0.25) at σ′p, and never bends the wrong way', () => {
    const slope = (stressKpa: number): number => (firstLoadingVoidRatio(curve, stressKpa * 1.0001) - firstLoadingVoidRatio(curve, stressKpa / 1.0001)) / (2 * Math.log10(1.0001));
    expect(slope(150)).toBeCloseTo(-0.25, 5);
    let previous = 0;
    for (let x = 1; x < 3; x += 0.01) {
      const current = slope(10 ** x);
      expect(current).toBeLessThanOrEqual(previous + 1e-9);
      previous = current;
    }
  });

  it('has a sharp kink at σ′p when w = 0', () => {
    const sharp = { ...curve, transitionHalfWidthDecades: 0 };
    expect(firstLoadingVoidRatio(sharp, 150)).toBeCloseTo(recompression(150), 12);
    expect(firstLoadingVoidRatio(sharp, 200)).toBeCloseTo(virgin(200), 12);
  });

  it.each([
    ['a zero stress', curve, 0],
    ['a negative width', { ...curve, transitionHalfWidthDecades: -0.1 }, 100],
    ['a transition starting below the starting stress', { ...curve, preconsolidationStressKpa: 6 }, 100],
  ])('throws a RangeError for %s', (_, badCurve, stressKpa) => {
    expect(() => firstLoadingVoidRatio(badCurve, stressKpa)).toThrow('firstLoadingVoidRatio requires');
  });
});
