import { describe, expect, it } from 'vitest';
import { casagrandePreconsolidation } from './casagrande-preconsolidation.js';
import { loadingKinds } from './loading-kinds.js';
import { pachecoSilvaPreconsolidation } from './pacheco-silva-preconsolidation.js';
import { sampleQualityLunne } from './sample-quality-lunne.js';

const points = [
  { stressKpa: 10, voidRatio: 0.95 },
  { stressKpa: 100, voidRatio: 0.85 },
  { stressKpa: 1000, voidRatio: 0.4 },
  { stressKpa: 10000, voidRatio: 0.1 },
];
// Virgin line e = 1.3 − 0.3·log10 σ′ (through the last two points).
const virginLine = { voidRatioPerLogCycle: -0.3, voidRatioAtOneKpa: 1.3 };

describe('pachecoSilvaPreconsolidation(loadingPoints, virginLine, initialVoidRatio)', () => {
  it('reproduces the hand construction: A at e0 = 1.0 → σ′ = 10 kPa; B on the curve at 10 kPa, e = 0.95; C at 10^((1.3 − 0.95)/0.3) = 14.68 kPa', () => {
    const construction = pachecoSilvaPreconsolidation(points, virginLine, 1.0).construction;
    expect(construction?.pointA.stressKpa).toBeCloseTo(10, 10);
    expect(construction?.pointB.voidRatio).toBeCloseTo(0.95, 10);
    expect(construction?.preconsolidationStressKpa).toBeCloseTo(14.678, 3);
  });

  it('returns null with a reason when the virgin line does not fall', () => {
    const result = pachecoSilvaPreconsolidation(points, { voidRatioPerLogCycle: 0, voidRatioAtOneKpa: 1 }, 1);
    expect(result.construction).toBeNull();
    expect(result.warnings).toHaveLength(1);
  });
});

describe('casagrandePreconsolidation(loadingPoints, virginLine, virginStartStressKpa)', () => {
  const construction = casagrandePreconsolidation(points, virginLine, 1000).construction;

  it('puts the intersection on the virgin line and on the bisector from the point of maximum curvature', () => {
    const x = Math.log10(construction?.intersection.stressKpa ?? 0);
    expect(construction?.intersection.voidRatio).toBeCloseTo(1.3 - 0.3 * x, 10);
    const m = construction?.maximumCurvaturePoint;
    const bisectorSlope = ((construction?.intersection.voidRatio ?? 0) - (m?.voidRatio ?? 0)) / (x - Math.log10(m?.stressKpa ?? 1));
    // The bisector's angle is half the tangent's (horizontal at 0): tan(θ/2).
    expect(Math.atan(bisectorSlope)).toBeCloseTo(Math.atan(construction?.tangentSlopePerLogCycle ?? 0) / 2, 10);
  });

  it('finds the point of maximum curvature between the first point and the start of the virgin line', () => {
    expect(construction?.maximumCurvaturePoint.stressKpa).toBeGreaterThanOrEqual(10);
    expect(construction?.maximumCurvaturePoint.stressKpa).toBeLessThanOrEqual(1000);
    expect(construction?.preconsolidationStressKpa).toBeGreaterThan(10);
  });

  it('finds the sharpest bend between the points on a kink midway between two loads, and σ′p at the kink within 12.5 % (measured +11.4 %, the sharpest bend at 104 kPa)', () => {
    // Recompression e = 1 − 0.03·log10(σ′/10) to 113 kPa (log 2.053, midway between 80 and 160), virgin slope −0.4 beyond.
    const kinkKpa = 10 ** ((Math.log10(80) + Math.log10(160)) / 2);
    const e = (stressKpa: number): number => 1 - 0.03 * Math.log10(stressKpa / 10) - (stressKpa > kinkKpa ? 0.37 * Math.log10(stressKpa / kinkKpa) : 0);
    const kinked = [10, 20, 40, 80, 160, 320, 640].map((stressKpa) => ({ stressKpa, voidRatio: e(stressKpa) }));
    const line = { voidRatioPerLogCycle: -0.4, voidRatioAtOneKpa: e(640) + 0.4 * Math.log10(640) };
    const found = casagrandePreconsolidation(kinked, line, 160).construction;
    expect(found?.maximumCurvaturePoint.stressKpa).toBeGreaterThan(82);
    expect(found?.maximumCurvaturePoint.stressKpa).toBeLessThan(158);
    expect(Math.abs((found?.preconsolidationStressKpa ?? 0) / kinkKpa - 1)).toBeLessThan(0.125);
  });

  it('falls back to the sharpest bend off the virgin line when the sharpest bend lies on the line, and says so', () => {
    // A stiff clay with a sharp kink on the 80 kPa point: Cr = 0.0075, Cc = 0.1 (hand-made curve).
    const stiff = [10, 20, 40, 80, 160, 320, 640].map((stressKpa) => ({
      stressKpa,
      voidRatio: 1 - 0.0075 * Math.log10(Math.min(stressKpa, 80) / 10) - 0.1 * Math.log10(Math.max(stressKpa, 80) / 80),
    }));
    const line = { voidRatioPerLogCycle: -0.1, voidRatioAtOneKpa: 1 - 0.0075 * Math.log10(8) + 0.1 * Math.log10(80) };
    const result = casagrandePreconsolidation(stiff, line, 80);
    expect(result.construction?.maximumCurvatureSearch).toBe('off-virgin-line');
    expect(result.warnings[0]).toMatch(/lies on the virgin line itself/);
    // Measured 78.7 kPa, −1.6 % from the kink.
    expect(Math.abs((result.construction?.preconsolidationStressKpa ?? 0) / 80 - 1)).toBeLessThan(0.03);
  });

  it('returns null with a reason for fewer than three points', () => {
    expect(casagrandePreconsolidation(points.slice(2), virginLine, 1000).construction).toBeNull();
  });
});

describe('sampleQualityLunne(voidRatioChangeRatio, overconsolidationRatio)', () => {
  it.each([
    [0.039, 1.5, 'very good to excellent'],
    [0.04, 1.5, 'good to fair'],
    [0.1, 1.5, 'poor'],
    [0.14, 1.5, 'very poor'],
    [0.04, 3, 'good to fair'],
    [0.05, 3, 'poor'],
  ] as const)('puts Δe/e0 = %s at OCR %s in "%s" (worked by hand from the bands the function states; a boundary falls in the worse category)', (ratio, ocr, category) => {
    expect(sampleQualityLunne(ratio, ocr)?.category).toBe(category);
  });

  it('gives null above OCR 4, outside the table', () => {
    expect(sampleQualityLunne(0.02, 5)).toBeNull();
  });
});

describe('loadingKinds(stressesKpa)', () => {
  it('marks new maxima as loading, drops as unloading and rises below the old maximum as reloading', () => {
    expect(loadingKinds([25, 50, 25, 50, 100, 50])).toEqual(['loading', 'loading', 'unloading', 'reloading', 'loading', 'unloading']);
  });
});
