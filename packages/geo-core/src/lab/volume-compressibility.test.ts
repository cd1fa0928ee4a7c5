import { describe, expect, it } from 'vitest';
import { hydraulicConductivityMPerS } from './hydraulic-conductivity.js';
import { coefficientOfVolumeCompressibilityM2PerKn } from './volume-compressibility.js';

describe('coefficientOfVolumeCompressibilityM2PerKn({ voidRatioBefore, voidRatioAfter, stressIncreaseKpa, reference })', () => {
  it('refers the volume to the start by default, to the mean void ratio when asked (hand calculations)', () => {
    // 0.94 → 0.82 over 100 kPa: 0.12/(1.94 × 100) = 6.1856e-4 and 0.12/(1.88 × 100) = 6.3830e-4 m²/kN.
    expect(coefficientOfVolumeCompressibilityM2PerKn({ voidRatioBefore: 0.94, voidRatioAfter: 0.82, stressIncreaseKpa: 100 })).toBeCloseTo(6.1856e-4, 8);
    expect(coefficientOfVolumeCompressibilityM2PerKn({ voidRatioBefore: 0.94, voidRatioAfter: 0.82, stressIncreaseKpa: 100, reference: 'mean' })).toBeCloseTo(6.383e-4, 8);
  });

  it('equals (ΔH/H1)/Δσ′ for the start reference: heights in proportion to 1 + e', () => {
    // H = Hs(1 + e): H1 = 19.4 mm, H2 = 18.2 mm for Hs = 10 mm; (1.2/19.4)/100 kPa.
    expect(coefficientOfVolumeCompressibilityM2PerKn({ voidRatioBefore: 0.94, voidRatioAfter: 0.82, stressIncreaseKpa: 100 })).toBeCloseTo(1.2 / 19.4 / 100, 15);
  });

  it('throws RangeError for a zero stress change, a bad void ratio or an unknown reference', () => {
    const base = { voidRatioBefore: 0.94, voidRatioAfter: 0.82, stressIncreaseKpa: 100 };
    expect(() => coefficientOfVolumeCompressibilityM2PerKn({ ...base, stressIncreaseKpa: 0 })).toThrow(new RangeError('coefficientOfVolumeCompressibilityM2PerKn requires a finite, non-zero stressIncreaseKpa'));
    expect(() => coefficientOfVolumeCompressibilityM2PerKn({ ...base, voidRatioBefore: 0 })).toThrow(RangeError);
    expect(() => coefficientOfVolumeCompressibilityM2PerKn({ ...base, reference: 'end' as 'mean' })).toThrow(new RangeError("coefficientOfVolumeCompressibilityM2PerKn requires reference 'start' or 'mean'"));
  });
});

describe('hydraulicConductivityMPerS(cvM2PerYr, mvM2PerKn, waterUnitWeightKnPerM3)', () => {
  it('is cv·mv·γw in m/s (hand calculation: 1.5 m²/yr = 4.7532e-8 m²/s; × 5e-4 m²/kN × 9.81 kN/m³ = 2.3314e-10 m/s)', () => {
    expect(hydraulicConductivityMPerS(1.5, 5e-4, 9.81)).toBeCloseTo((1.5 / 31_557_600) * 5e-4 * 9.81, 20);
    expect(hydraulicConductivityMPerS(1.5, 5e-4)).toBe(hydraulicConductivityMPerS(1.5, 5e-4, 9.81));
  });

  it('throws RangeError for cv ≤ 0, mv < 0 or γw ≤ 0', () => {
    expect(() => hydraulicConductivityMPerS(0, 5e-4)).toThrow(new RangeError('hydraulicConductivityMPerS requires a finite cvM2PerYr > 0'));
    expect(() => hydraulicConductivityMPerS(1, -1)).toThrow(new RangeError('hydraulicConductivityMPerS requires a finite mvM2PerKn >= 0'));
    expect(() => hydraulicConductivityMPerS(1, 1e-4, 0)).toThrow(new RangeError('hydraulicConductivityMPerS requires a finite waterUnitWeightKnPerM3 > 0'));
  });
});
