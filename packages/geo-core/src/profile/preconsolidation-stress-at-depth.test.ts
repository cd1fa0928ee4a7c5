import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { carryPreconsolidationFromSample } from './carry-preconsolidation-from-sample.js';
import { preconsolidationStressAtDepth } from './preconsolidation-stress-at-depth.js';
import type { SoilLayer, SoilProfile } from './soil-profile.types.js';

// Hand-calculation profile (invented): 2 m of sand over 8 m of clay, water table at 2 m, γw = 10
// so that every stress is a round number.
const withClay = (clay: Partial<SoilLayer>): SoilProfile => ({
  groundLevelM: 0,
  waterTableDepthM: 2,
  waterUnitWeightKnPerM3: 10,
  layers: [
    { name: 'sand', thicknessM: 2, unitWeightKnPerM3: 18, saturatedUnitWeightKnPerM3: 20 },
    { name: 'clay', thicknessM: 8, unitWeightKnPerM3: 18, saturatedUnitWeightKnPerM3: 18, e0: 1.2, cc: 0.4, cs: 0.06, ...clay },
  ],
});

describe('preconsolidationStressAtDepth(profile, depthM)', () => {
  // σ′v0 at z in the clay: 2 × 18 + (z − 2) × (18 − 10) = 36 + 8(z − 2) kPa → 36 at 2 m, 52 at 4 m, 84 at 8 m.
  it('POP: σ′p = σ′v0 + POP at every depth (hand calculation: 52 + 30 = 82 kPa at 4 m, 84 + 30 = 114 kPa at 8 m)', () => {
    const profile = withClay({ preOverburdenPressureKpa: 30 });
    expect(preconsolidationStressAtDepth(profile, 4)).toMatchObject({ layerIndex: 1, effectiveStressKpa: 52, preconsolidationKpa: 82, basis: 'pre-overburden-pressure', raisedToInSituStress: false });
    expect(preconsolidationStressAtDepth(profile, 8).preconsolidationKpa).toBeCloseTo(114, 12);
  });

  it('OCR: σ′p = OCR·σ′v0 (hand calculation: 1.5 × 52 = 78 kPa at 4 m)', () => {
    expect(preconsolidationStressAtDepth(withClay({ ocr: 1.5 }), 4)).toMatchObject({ preconsolidationKpa: 78, basis: 'ocr' });
  });

  it('constant σ′p is raised to σ′v0 where it falls below, and says so (70 kPa: kept at 4 m, raised to 84 kPa at 8 m)', () => {
    const profile = withClay({ preconsolidationKpa: 70 });
    expect(preconsolidationStressAtDepth(profile, 4)).toMatchObject({ preconsolidationKpa: 70, basis: 'preconsolidation-stress', raisedToInSituStress: false });
    expect(preconsolidationStressAtDepth(profile, 8)).toMatchObject({ preconsolidationKpa: 84, raisedToInSituStress: true });
  });

  it('none given: normally consolidated; outside compressible layers: null', () => {
    expect(preconsolidationStressAtDepth(withClay({}), 4)).toMatchObject({ preconsolidationKpa: 52, basis: 'assumed-normally-consolidated' });
    expect(preconsolidationStressAtDepth(withClay({}), 1)).toMatchObject({ layerIndex: 0, preconsolidationKpa: null, basis: null });
    // A boundary depth belongs to the layer above.
    expect(preconsolidationStressAtDepth(withClay({}), 2).layerIndex).toBe(0);
  });

  it('property: POP 0 gives the same σ′p as OCR 1 at every depth', () => {
    fc.assert(
      fc.property(fc.double({ min: 2.01, max: 10, noNaN: true }), (depthM) => {
        expect(preconsolidationStressAtDepth(withClay({ preOverburdenPressureKpa: 0 }), depthM).preconsolidationKpa).toBeCloseTo(
          preconsolidationStressAtDepth(withClay({ ocr: 1 }), depthM).preconsolidationKpa ?? Number.NaN,
          10,
        );
      }),
    );
  });

  it('throws RangeError for two bases at once, a negative POP, or a depth outside the profile', () => {
    expect(() => preconsolidationStressAtDepth(withClay({ ocr: 2, preOverburdenPressureKpa: 10 }), 4)).toThrow(
      new RangeError('preconsolidationStressAtDepth requires only one of preconsolidationKpa, ocr and preOverburdenPressureKpa in layer 2 (clay)'),
    );
    expect(() => preconsolidationStressAtDepth(withClay({ preOverburdenPressureKpa: -5 }), 4)).toThrow(
      new RangeError('preconsolidationStressAtDepth requires preOverburdenPressureKpa >= 0 in layer 2 (clay)'),
    );
    expect(() => preconsolidationStressAtDepth(withClay({}), 11)).toThrow(new RangeError('verticalStressAtDepth requires a depth within the profile (bottom at 10 m)'));
  });
});

describe('carryPreconsolidationFromSample({ profile, sampleDepthM, preconsolidationKpa, basis })', () => {
  it('gives OCR or POP from σ′v0 at the sample (hand calculation at 4 m: σ′v0 = 52 kPa, σ′p = 104 kPa → OCR 2, POP 52 kPa)', () => {
    const base = { profile: withClay({}), sampleDepthM: 4, preconsolidationKpa: 104 };
    expect(carryPreconsolidationFromSample({ ...base, basis: 'ocr' })).toMatchObject({ layerFields: { ocr: 2 }, effectiveStressAtSampleKpa: 52, preOverburdenPressureAtSampleKpa: 52, warnings: [] });
    expect(carryPreconsolidationFromSample({ ...base, basis: 'pre-overburden-pressure' }).layerFields).toEqual({ preOverburdenPressureKpa: 52 });
    expect(carryPreconsolidationFromSample({ ...base, basis: 'preconsolidation-stress' }).layerFields).toEqual({ preconsolidationKpa: 104 });
  });

  it('property: carried back to the sample depth, every basis gives the measured σ′p', () => {
    fc.assert(
      fc.property(
        fc.double({ min: 2.2, max: 9.8, noNaN: true }),
        fc.double({ min: 1, max: 4, noNaN: true }),
        fc.constantFrom('ocr' as const, 'pre-overburden-pressure' as const, 'preconsolidation-stress' as const),
        (sampleDepthM, ocr, basis) => {
          const preconsolidationKpa = ocr * (36 + 8 * (sampleDepthM - 2));
          const { layerFields } = carryPreconsolidationFromSample({ profile: withClay({}), sampleDepthM, preconsolidationKpa, basis });
          expect(preconsolidationStressAtDepth(withClay(layerFields), sampleDepthM).preconsolidationKpa).toBeCloseTo(preconsolidationKpa, 9);
        },
      ),
    );
  });

  it('a σ′p below σ′v0 at the sample sets the layer normally consolidated and says why', () => {
    const result = carryPreconsolidationFromSample({ profile: withClay({}), sampleDepthM: 4, preconsolidationKpa: 40, basis: 'ocr' });
    expect(result.layerFields).toEqual({ ocr: 1 });
    expect(result.raisedToInSituStress).toBe(true);
    expect(result.warnings[0]).toMatch(/^σ′p of 40.0 kPa is below the in-situ effective stress of 52.0 kPa at 4 m \(OCR 0.77\)/);
  });

  it('throws RangeError for σ′p ≤ 0 or an unknown basis', () => {
    expect(() => carryPreconsolidationFromSample({ profile: withClay({}), sampleDepthM: 4, preconsolidationKpa: 0, basis: 'ocr' })).toThrow(
      new RangeError('carryPreconsolidationFromSample requires a finite preconsolidationKpa > 0'),
    );
    expect(() => carryPreconsolidationFromSample({ profile: withClay({}), sampleDepthM: 4, preconsolidationKpa: 100, basis: 'pop' as 'ocr' })).toThrow(RangeError);
  });
});
