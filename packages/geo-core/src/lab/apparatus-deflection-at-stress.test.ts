import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { apparatusDeflectionAtStress } from './apparatus-deflection-at-stress.js';

// An invented steel-dummy calibration (ASTM D2435/D2435M §8.1.2): deflection of the loaded apparatus, mm.
const calibration = [
  { stressKpa: 800, deflectionMm: 0.052 },
  { stressKpa: 0, deflectionMm: 0 },
  { stressKpa: 100, deflectionMm: 0.02 },
  { stressKpa: 400, deflectionMm: 0.038 },
];

describe('apparatusDeflectionAtStress(calibration, stressKpa)', () => {
  it('interpolates straight between the calibration points, in any order (hand calculation: 250 kPa → 0.02 + 0.5 × 0.018 = 0.029 mm)', () => {
    const result = apparatusDeflectionAtStress(calibration, 250);
    expect(result.deflectionMm).toBeCloseTo(0.029, 15);
    expect(result.outsideCalibration).toBe(false);
    expect(apparatusDeflectionAtStress(calibration, 50).deflectionMm).toBeCloseTo(0.01, 15);
  });

  it('returns each calibration point’s own deflection at its stress', () => {
    for (const point of calibration) expect(apparatusDeflectionAtStress(calibration, point.stressKpa)).toEqual({ deflectionMm: point.deflectionMm, outsideCalibration: false });
  });

  it('holds the end value outside the calibration and says so', () => {
    expect(apparatusDeflectionAtStress(calibration, 1600)).toEqual({ deflectionMm: 0.052, outsideCalibration: true });
    expect(apparatusDeflectionAtStress([{ stressKpa: 12.5, deflectionMm: 0.004 }, { stressKpa: 100, deflectionMm: 0.02 }], 5)).toEqual({ deflectionMm: 0.004, outsideCalibration: true });
  });

  it('property: never leaves the range of the calibrated deflections, and rises where the calibration rises', () => {
    fc.assert(
      fc.property(fc.double({ min: 0, max: 2000, noNaN: true }), fc.double({ min: 0, max: 2000, noNaN: true }), (a, b) => {
        const low = apparatusDeflectionAtStress(calibration, Math.min(a, b)).deflectionMm;
        const high = apparatusDeflectionAtStress(calibration, Math.max(a, b)).deflectionMm;
        expect(low).toBeGreaterThanOrEqual(0);
        expect(high).toBeLessThanOrEqual(0.052);
        expect(high).toBeGreaterThanOrEqual(low);
      }),
    );
  });

  it('throws RangeError for an empty calibration, a negative or repeated stress, or a non-finite deflection', () => {
    expect(() => apparatusDeflectionAtStress([], 10)).toThrow(new RangeError('apparatusDeflectionAtStress requires at least one calibration point'));
    expect(() => apparatusDeflectionAtStress([{ stressKpa: -1, deflectionMm: 0 }], 10)).toThrow(new RangeError('apparatusDeflectionAtStress requires finite calibration points with stress ≥ 0'));
    expect(() => apparatusDeflectionAtStress([{ stressKpa: 1, deflectionMm: Number.NaN }], 10)).toThrow(new RangeError('apparatusDeflectionAtStress requires finite calibration points with stress ≥ 0'));
    expect(() => apparatusDeflectionAtStress([{ stressKpa: 100, deflectionMm: 0.01 }, { stressKpa: 100, deflectionMm: 0.02 }], 10)).toThrow(new RangeError('apparatusDeflectionAtStress requires each calibration stress once'));
  });
});
