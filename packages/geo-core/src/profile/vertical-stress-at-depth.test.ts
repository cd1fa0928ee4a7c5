import { describe, expect, it } from 'vitest';
import type { SoilProfile } from './soil-profile.types.js';
import { splitIntoSublayers } from './split-into-sublayers.js';
import { validateSoilProfile } from './validate-soil-profile.js';
import { verticalStressAtDepth } from './vertical-stress-at-depth.js';

const profile: SoilProfile = {
  groundLevelM: 12.5,
  waterTableDepthM: 2,
  layers: [
    { name: 'sand', thicknessM: 4, unitWeightKnPerM3: 18, saturatedUnitWeightKnPerM3: 20 },
    { name: 'clay', thicknessM: 4, unitWeightKnPerM3: 19, saturatedUnitWeightKnPerM3: 19, e0: 1, cc: 0.35, cs: 0.06 },
  ],
};

describe('verticalStressAtDepth(profile, depthM)', () => {
  it('sums bulk weight above the water table and saturated weight below, less hydrostatic pore pressure', () => {
    // Hand calculation at 6 m: σv = 2 × 18 + 2 × 20 + 2 × 19 = 114 kPa; u = 4 × 9.81 = 39.24 kPa; σ′v = 74.76 kPa.
    const state = verticalStressAtDepth(profile, 6);
    expect(state.totalStressKpa).toBeCloseTo(114, 12);
    expect(state.porePressureKpa).toBeCloseTo(39.24, 12);
    expect(state.effectiveStressKpa).toBeCloseTo(74.76, 12);
  });

  it('takes γw from the profile where given: with 10 kN/m³, u = 40 kPa at 6 m', () => {
    // Hand calculation at 6 m: σv = 114 kPa as above; u = 4 × 10 = 40 kPa; σ′v = 74 kPa.
    const state = verticalStressAtDepth({ ...profile, waterUnitWeightKnPerM3: 10 }, 6);
    expect(state.totalStressKpa).toBeCloseTo(114, 12);
    expect(state.porePressureKpa).toBeCloseTo(40, 12);
    expect(state.effectiveStressKpa).toBeCloseTo(74, 12);
  });

  it('uses WATER_UNIT_WEIGHT_KN_PER_M3 = 9.81 when γw is not given', () => {
    expect(verticalStressAtDepth(profile, 6)).toEqual(verticalStressAtDepth({ ...profile, waterUnitWeightKnPerM3: 9.81 }, 6));
  });

  it('has no pore pressure above the water table', () => {
    expect(verticalStressAtDepth(profile, 1.5)).toEqual({ totalStressKpa: 27, porePressureKpa: 0, effectiveStressKpa: 27 });
  });

  it('is zero at ground level and defined at the bottom of the profile', () => {
    expect(verticalStressAtDepth(profile, 0).totalStressKpa).toBe(0);
    expect(verticalStressAtDepth(profile, 8).totalStressKpa).toBeCloseTo(152, 12);
  });

  it('throws RangeError below the profile or for a negative depth', () => {
    expect(() => verticalStressAtDepth(profile, 8.5)).toThrow(new RangeError('verticalStressAtDepth requires a depth within the profile (bottom at 8 m)'));
    expect(() => verticalStressAtDepth(profile, -1)).toThrow(new RangeError('verticalStressAtDepth requires a finite depthM >= 0'));
    expect(() => verticalStressAtDepth({ ...profile, waterUnitWeightKnPerM3: 62.4 }, 6)).toThrow(
      new RangeError('verticalStressAtDepth requires waterUnitWeightKnPerM3 between 9 and 10.5 kN/m³'),
    );
  });
});

describe('splitIntoSublayers(profile, spacing)', () => {
  it('slices only compressible layers, by count', () => {
    const slices = splitIntoSublayers(profile, { count: 4 });
    expect(slices.map((slice) => slice.midDepthM)).toEqual([4.5, 5.5, 6.5, 7.5]);
    expect(slices.every((slice) => slice.layerName === 'clay' && slice.thicknessM === 1)).toBe(true);
  });

  it('slices by a maximum thickness into equal slices no thicker than it', () => {
    const slices = splitIntoSublayers(profile, { maxThicknessM: 1.5 });
    expect(slices).toHaveLength(3);
    expect(slices[0]?.thicknessM).toBeCloseTo(4 / 3, 12);
    expect(splitIntoSublayers(profile, { maxThicknessM: 2 })).toHaveLength(2);
  });

  it('throws RangeError for a non-integer count or non-positive thickness', () => {
    expect(() => splitIntoSublayers(profile, { count: 1.5 })).toThrow(new RangeError('splitIntoSublayers requires count to be an integer >= 1'));
    expect(() => splitIntoSublayers(profile, { maxThicknessM: 0 })).toThrow(new RangeError('splitIntoSublayers requires a finite maxThicknessM > 0'));
  });
});

describe('validateSoilProfile(profile, caller)', () => {
  it('accepts a sound profile', () => {
    expect(() => validateSoilProfile(profile, 'test')).not.toThrow();
  });

  it.each([
    [{ ...profile, waterTableDepthM: -1 }, 'test requires a finite waterTableDepthM >= 0'],
    [{ ...profile, layers: [] }, 'test requires at least one soil layer'],
    [{ ...profile, waterUnitWeightKnPerM3: 62.4 }, 'test requires waterUnitWeightKnPerM3 between 9 and 10.5 kN/m³ (9.81 for fresh water, or 10 where the reference rounds it)'],
    [{ ...profile, layers: [{ ...profile.layers[0]!, thicknessM: 0 }] }, 'test requires thicknessM > 0 in layer 1 (sand)'],
    [{ ...profile, layers: [{ ...profile.layers[1]!, ocr: 0.8 }] }, 'test requires ocr >= 1 in layer 1 (clay)'],
    [{ ...profile, layers: [{ ...profile.layers[1]!, ocr: 2, preconsolidationKpa: 100 }] }, 'test requires only one of preconsolidationKpa, ocr and preOverburdenPressureKpa in layer 1 (clay)'],
    [{ ...profile, layers: [{ ...profile.layers[1]!, cvM2PerYr: 2 }] }, 'test requires drainageTop and drainageBottom wherever cvM2PerYr is given, in layer 1 (clay)'],
    [{ ...profile, layers: [{ ...profile.layers[1]!, poissonRatio: 0.7 }] }, 'test requires 0 <= poissonRatio <= 0.5 in layer 1 (clay)'],
    [{ ...profile, layers: [{ ...profile.layers[0]!, cc: 0.3 }] }, 'test requires e0 wherever cc is given, in layer 1 (sand)'],
  ])('throws RangeError naming the field (%#)', (bad, message) => {
    expect(() => validateSoilProfile(bad as SoilProfile, 'test')).toThrow(new RangeError(message));
  });
});
