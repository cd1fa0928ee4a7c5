import { describe, expect, it } from 'vitest';
import { preconsolidationStressAtDepth } from '../profile/preconsolidation-stress-at-depth.js';
import type { SoilLayer, SoilProfile } from '../profile/soil-profile.types.js';
import { verticalStressAtDepth } from '../profile/vertical-stress-at-depth.js';
import { stressIncrease2to1 } from '../stress/stress-increase-2to1.js';
import { stressIncreaseStrip } from '../stress/stress-increase-strip.js';
import { convertUnit } from '../units/convert-unit.js';
import { primaryConsolidationSettlement } from './primary-consolidation-settlement.js';
import { runSettlementCheck } from './run-settlement-check.js';

// Published worked examples of consolidation settlement, each test named by its source line. The data are
// typed in as printed; the printed answers are the expected values, with the agreement the printed rounding
// allows (0.5 % on stresses and settlements: the answers are printed to 3–4 figures).
const FAIR_AGREEMENT = 0.005;
const agreement = (value: number, printed: number) => Math.abs(value / printed - 1);

/** Settlement of one layer from its mid-depth stresses, σ′0 and σ′p worked out from the profile. */
const oneLayerSettlement = (profile: SoilProfile, clayIndex: number, midDepthM: number, stressIncreaseKpa: number) => {
  const clay = profile.layers[clayIndex] as SoilLayer;
  const state = preconsolidationStressAtDepth(profile, midDepthM);
  const result = primaryConsolidationSettlement({
    thicknessM: clay.thicknessM,
    e0: clay.e0 ?? Number.NaN,
    cc: clay.cc ?? Number.NaN,
    cs: clay.cs ?? 0,
    initialEffectiveStressKpa: state.effectiveStressKpa,
    stressIncreaseKpa,
    preconsolidationKpa: state.preconsolidationKpa ?? Number.NaN,
  });
  return { ...result, initialEffectiveStressKpa: state.effectiveStressKpa, preconsolidationKpa: state.preconsolidationKpa ?? Number.NaN };
};

// S1–S3: sand 9 m, water table 3 m below ground, the sand above it taken as saturated (19.0 kN/m³);
// clay 10 m below (e0 and γsat as the solution uses them); gravel below. γw = 9.81 kN/m³. Δσ = 200 kPa at mid-clay.
const maineProfile = (clay: Partial<SoilLayer>): SoilProfile => ({
  groundLevelM: 0,
  waterTableDepthM: 3,
  waterUnitWeightKnPerM3: 9.81,
  layers: [
    { name: 'sand', thicknessM: 9, unitWeightKnPerM3: 19.0, saturatedUnitWeightKnPerM3: 19.0 },
    { name: 'clay', thicknessM: 10, unitWeightKnPerM3: 17.4, saturatedUnitWeightKnPerM3: 17.4, e0: 1.15, cc: 0.3, ...clay },
  ],
});
const MID_CLAY_M = 14;

describe('University of Maine, CIE 365 Soil Mechanics course notes (L. Zambrano-Cruzatty), "Consolidation" (public course repository luisez1988/CIE365-Soil-mechanics, Consolidation/)', () => {
  it('Example 7.1 (S1): normally consolidated clay — σ′0 = 150.1 kPa, settlement 0.513 m', () => {
    // e0 = w·Gs = 0.43 × 2.67 = 1.148 → 1.15 and γsat = (Gs + e0)γw/(1 + e0) = 17.43 → 17.4 kN/m³, as the solution rounds them.
    expect(agreement(0.43 * 2.67, 1.15)).toBeLessThan(FAIR_AGREEMENT);
    expect(agreement(((2.67 + 1.15) * 9.81) / 2.15, 17.4)).toBeLessThan(FAIR_AGREEMENT);
    const result = oneLayerSettlement(maineProfile({}), 1, MID_CLAY_M, 200);
    // Ours: σ′0 = 9 × 19 + 5 × 17.4 − 11 × 9.81 = 150.09 kPa; Sc = 0.3 × 10/2.15 × log10(350.09/150.09) = 0.5133 m.
    expect(agreement(result.initialEffectiveStressKpa, 150.1)).toBeLessThan(FAIR_AGREEMENT);
    expect(result.consolidationCase).toBe('normally-consolidated');
    expect(agreement(result.settlementM, 0.513)).toBeLessThan(FAIR_AGREEMENT);
  });

  it('Example 7.2 (S2): overconsolidated, staying below σ′p (OCR 4, Cr 0.05) — σ′0 153.1, σ′p 612.4, σ′f 353.1 kPa, settlement 0.0903 m', () => {
    const result = oneLayerSettlement(maineProfile({ e0: 1.01, unitWeightKnPerM3: 18.0, saturatedUnitWeightKnPerM3: 18.0, ocr: 4, cs: 0.05 }), 1, MID_CLAY_M, 200);
    // Ours: σ′0 = 171 + 90 − 107.91 = 153.09 kPa, σ′p = 612.36 kPa; Sc = 0.05 × 10/2.01 × log10(353.09/153.09) = 0.09029 m.
    expect(agreement(result.initialEffectiveStressKpa, 153.1)).toBeLessThan(FAIR_AGREEMENT);
    expect(agreement(result.preconsolidationKpa, 612.4)).toBeLessThan(FAIR_AGREEMENT);
    expect(agreement(result.initialEffectiveStressKpa + 200, 353.1)).toBeLessThan(FAIR_AGREEMENT);
    expect(result.consolidationCase).toBe('overconsolidated-below');
    expect(agreement(result.settlementM, 0.0903)).toBeLessThan(FAIR_AGREEMENT);
  });

  it('Example 7.3 (S3): overconsolidated, crossing σ′p (OCR 1.2) — σ′p 183.7 kPa, settlement 0.443 m', () => {
    const result = oneLayerSettlement(maineProfile({ e0: 1.01, unitWeightKnPerM3: 18.0, saturatedUnitWeightKnPerM3: 18.0, ocr: 1.2, cs: 0.05 }), 1, MID_CLAY_M, 200);
    // Ours: σ′p = 183.71 kPa; Sc = 0.2488 × log10(183.71/153.09) + 1.4925 × log10(353.09/183.71) = 0.0197 + 0.4235 = 0.4432 m.
    expect(agreement(result.preconsolidationKpa, 183.7)).toBeLessThan(FAIR_AGREEMENT);
    expect(result.consolidationCase).toBe('overconsolidated-crossing');
    expect(agreement(result.settlementM, 0.443)).toBeLessThan(FAIR_AGREEMENT);
  });

  it('Example 7.4(a) (S4): strip load, Boussinesq stress, crossing σ′p, US units — σ′0 782.5 psf, Δσ 3749 psf, σ′p 1174 psf, settlement 2.57 ft', () => {
    // Converted at the edge with the unit table (NIST SP 811): ft → m, lbf/ft³ → kN/m³, lbf/ft² → kPa.
    const ft = (value: number) => convertUnit(value, 'ft', 'm');
    const pcf = (value: number) => convertUnit(value, 'pcf', 'knPerM3');
    const psf = (value: number) => convertUnit(value, 'psf', 'kPa');
    const toPsf = (kpa: number) => convertUnit(kpa, 'kPa', 'psf');
    const profile: SoilProfile = {
      groundLevelM: 0,
      waterTableDepthM: 0,
      waterUnitWeightKnPerM3: pcf(62.4),
      layers: [{ name: 'clay', thicknessM: ft(25), unitWeightKnPerM3: pcf(125), saturatedUnitWeightKnPerM3: pcf(125), e0: 0.95, cc: 0.33, cs: 0.04, ocr: 1.5 }],
    };
    // Strip influence at the centre line, z = 12.5 ft, B = 15 ft: (2/π)(α + sin α cos α), tan α = 0.6 → 0.6248.
    const stressIncreaseKpa = stressIncreaseStrip({ pressureKpa: psf(6000), widthM: ft(15), xM: 0, depthM: ft(12.5) });
    expect(agreement(toPsf(stressIncreaseKpa), 3749)).toBeLessThan(FAIR_AGREEMENT);
    const result = oneLayerSettlement(profile, 0, ft(12.5), stressIncreaseKpa);
    // Ours: σ′0 = (125 − 62.4) × 12.5 = 782.5 psf; σ′p = 1173.75 psf;
    // Sc = 0.04 × 25/1.95 × log10(1.5) + 0.33 × 25/1.95 × log10(4531.6/1173.75) = 0.0903 + 2.4821 = 2.5724 ft.
    expect(agreement(toPsf(result.initialEffectiveStressKpa), 782.5)).toBeLessThan(FAIR_AGREEMENT);
    expect(agreement(toPsf(result.preconsolidationKpa), 1174)).toBeLessThan(FAIR_AGREEMENT);
    expect(result.consolidationCase).toBe('overconsolidated-crossing');
    expect(agreement(convertUnit(result.settlementM, 'm', 'ft'), 2.57)).toBeLessThan(FAIR_AGREEMENT);
    // The same through the whole check: a strip footing on the surface, one sublayer, Boussinesq.
    const check = runSettlementCheck({
      profile,
      footings: [{ id: 'strip', shape: 'strip', xM: 0, yM: 0, widthM: ft(15), depthM: 0, pressureKpa: psf(6000) }],
      options: { sublayerCount: 1, evaluationPoints: 'centre', stressMethod: 'boussinesq' },
    });
    expect(check.footings[0]?.sublayers[0]?.stressIncreaseKpa).toBeCloseTo(stressIncreaseKpa, 9);
    expect(agreement(convertUnit(check.footings[0]?.primaryM ?? 0, 'm', 'ft'), 2.57)).toBeLessThan(FAIR_AGREEMENT);
  });
});

describe('GATE 2020 Civil Engineering paper, Set II (a 2-mark question), with its published solution', () => {
  // 2 m × 2 m footing, 200 kPa taken as the stress increase, base 1.5 m below ground; sand 15 kN/m³ to the water table
  // at 2.0 m, 18 kN/m³ (saturated) to 2.5 m; clay 2.5–4.0 m, γsat 17 kN/m³, Gs 2.65, Cc 0.30, normally consolidated;
  // γw = 10 kN/m³ as the paper states. e0 from γsat = (Gs + e)γw/(1 + e): 17 + 17e = 26.5 + 10e → e0 = 9.5/7 = 1.357.
  const e0 = (2.65 * 10 - 17) / (17 - 10);
  const profile: SoilProfile = {
    groundLevelM: 0,
    waterTableDepthM: 2,
    waterUnitWeightKnPerM3: 10,
    layers: [
      { name: 'sand', thicknessM: 2.5, unitWeightKnPerM3: 15, saturatedUnitWeightKnPerM3: 18 },
      { name: 'clay', thicknessM: 1.5, unitWeightKnPerM3: 17, saturatedUnitWeightKnPerM3: 17, e0, cc: 0.3 },
    ],
  };

  it('S5: square footing, 2V:1H spread, normally consolidated — σ′0 39.25 kPa, Δσ 56.89 kPa, settlement 74.28 mm', () => {
    expect(agreement(e0, 1.357)).toBeLessThan(FAIR_AGREEMENT);
    // Ours: σ′0 at 3.25 m = 2 × 15 + 0.5 × 18 + 0.75 × 17 − 1.25 × 10 = 39.25 kPa.
    const initialEffectiveStressKpa = verticalStressAtDepth(profile, 3.25).effectiveStressKpa;
    expect(agreement(initialEffectiveStressKpa, 39.25)).toBeLessThan(FAIR_AGREEMENT);
    // Δσ = 200 × 2 × 2/(2 + 1.75)² = 56.889 kPa, z = 3.25 − 1.5 m below the base.
    const stressIncreaseKpa = stressIncrease2to1({ loadKn: 200 * 2 * 2, widthM: 2, lengthM: 2, depthM: 3.25 - 1.5 });
    expect(agreement(stressIncreaseKpa, 56.89)).toBeLessThan(FAIR_AGREEMENT);
    const { settlementM } = primaryConsolidationSettlement({ thicknessM: 1.5, e0, cc: 0.3, cs: 0, initialEffectiveStressKpa, stressIncreaseKpa, preconsolidationKpa: initialEffectiveStressKpa });
    // Sc = 0.3 × 1.5/2.357 × log10(96.139/39.25) = 0.07428 m.
    expect(agreement(settlementM * 1000, 74.28)).toBeLessThan(FAIR_AGREEMENT);
    // The same through the whole check: the footing with its 200 kPa (net), 2V:1H, one sublayer.
    const check = runSettlementCheck({
      profile,
      footings: [{ id: 'F', shape: 'square', xM: 0, yM: 0, widthM: 2, depthM: 1.5, pressureKpa: 200 }],
      options: { sublayerCount: 1, evaluationPoints: 'centre', stressMethod: '2to1' },
    });
    expect(check.method.waterUnitWeightKnPerM3).toBe(10);
    expect(check.footings[0]?.sublayers[0]?.stressIncreaseKpa).toBeCloseTo(stressIncreaseKpa, 12);
    expect(agreement((check.footings[0]?.primaryM ?? 0) * 1000, 74.28)).toBeLessThan(FAIR_AGREEMENT);
  });
});
