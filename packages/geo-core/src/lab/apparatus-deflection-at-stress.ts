import type { ComplianceCalibrationPoint } from './consolidation-test-input.js';

export interface ApparatusDeflection {
  readonly deflectionMm: number;
  /** True when the stress lies outside the calibration and the end value was used. */
  readonly outsideCalibration: boolean;
}

/**
 * Apparatus deflection (compliance) at a stress, interpolated straight
 * between calibration points (ASTM D2435/D2435M §8.1.2: the deflection of the
 * loaded apparatus with a steel dummy is subtracted from every reading).
 * Outside the calibration the nearest end value is used — extrapolating a
 * bedding-in curve is less safe than holding it — and the caller warns.
 *
 * @param calibration points in any order, stress ≥ 0 kPa, deflection finite mm; at least one.
 * @param stressKpa the applied stress, kPa.
 * @returns the deflection in mm and whether the stress was outside the calibration.
 * @throws RangeError when the calibration is empty, has non-finite values, negative or repeated stresses.
 * @example apparatusDeflectionAtStress([{ stressKpa: 0, deflectionMm: 0 }, { stressKpa: 100, deflectionMm: 0.02 }], 50).deflectionMm // 0.01
 */
export function apparatusDeflectionAtStress(calibration: readonly ComplianceCalibrationPoint[], stressKpa: number): ApparatusDeflection {
  if (calibration.length === 0) throw new RangeError('apparatusDeflectionAtStress requires at least one calibration point');
  const sorted = [...calibration].sort((a, b) => a.stressKpa - b.stressKpa);
  for (let index = 0; index < sorted.length; index += 1) {
    const point = sorted[index] as ComplianceCalibrationPoint;
    if (!(point.stressKpa >= 0 && Number.isFinite(point.stressKpa)) || !Number.isFinite(point.deflectionMm)) {
      throw new RangeError('apparatusDeflectionAtStress requires finite calibration points with stress ≥ 0');
    }
    if (index > 0 && point.stressKpa === (sorted[index - 1] as ComplianceCalibrationPoint).stressKpa) {
      throw new RangeError('apparatusDeflectionAtStress requires each calibration stress once');
    }
  }
  const first = sorted[0] as ComplianceCalibrationPoint;
  const last = sorted[sorted.length - 1] as ComplianceCalibrationPoint;
  if (stressKpa < first.stressKpa) return { deflectionMm: first.deflectionMm, outsideCalibration: true };
  if (stressKpa > last.stressKpa) return { deflectionMm: last.deflectionMm, outsideCalibration: true };
  for (let index = 1; index < sorted.length; index += 1) {
    const high = sorted[index] as ComplianceCalibrationPoint;
    if (stressKpa <= high.stressKpa) {
      const low = sorted[index - 1] as ComplianceCalibrationPoint;
      const fraction = (stressKpa - low.stressKpa) / (high.stressKpa - low.stressKpa);
      return { deflectionMm: low.deflectionMm + fraction * (high.deflectionMm - low.deflectionMm), outsideCalibration: false };
    }
  }
  return { deflectionMm: first.deflectionMm, outsideCalibration: false };
}
