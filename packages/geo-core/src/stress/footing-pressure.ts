import type { Footing } from './footing.types.js';

/**
 * The uniform pressure a footing applies at its base: the given pressure, or
 * the load over the plan area — q = Q/(B·L) for a rectangle, Q/B² for a
 * square, 4Q/(π·D²) for a circle (widthM = D) — or, for a strip, the load per
 * metre run over the width, q = Q′/B.
 *
 * @param footing a footing with loadKn (kN), loadKnPerM (kN/m, strips only) or pressureKpa (kPa), sizes in m
 * @returns q in kPa
 * @throws RangeError when a size is not positive, a square's lengthM differs from its width, a circle or strip has a
 *   lengthM, the shape is unknown, a strip has loadKn or another shape loadKnPerM, or the load is not finite
 * @example footingPressureKpa({ id: 'F1', xM: 0, yM: 0, widthM: 2, lengthM: 3, depthM: 1, loadKn: 600 }) // 100
 * @example footingPressureKpa({ id: 'C1', shape: 'circle', xM: 0, yM: 0, widthM: 2, depthM: 1, loadKn: 314.159 }) // 100.0
 * @example footingPressureKpa({ id: 'W1', shape: 'strip', xM: 0, yM: 0, widthM: 1.5, depthM: 1, loadKnPerM: 150 }) // 100
 */
export function footingPressureKpa(footing: Footing): number {
  const where = `(footing ${footing.id})`;
  const shape = footing.shape ?? 'rectangle';
  if (!(footing.widthM > 0) || !Number.isFinite(footing.widthM)) throw new RangeError(`footingPressureKpa requires a finite widthM > 0 ${where}`);
  let areaM2: number | null;
  switch (shape) {
    case 'rectangle':
      if (!(footing.lengthM !== undefined && footing.lengthM > 0 && Number.isFinite(footing.lengthM))) {
        throw new RangeError(`footingPressureKpa requires finite widthM > 0 and lengthM > 0 ${where}`);
      }
      areaM2 = footing.widthM * footing.lengthM;
      break;
    case 'square':
      if (footing.lengthM !== undefined && footing.lengthM !== footing.widthM) {
        throw new RangeError(`footingPressureKpa requires a square's lengthM, if given, to equal its widthM ${where}`);
      }
      areaM2 = footing.widthM * footing.widthM;
      break;
    case 'circle':
    case 'strip':
      if (footing.lengthM !== undefined) {
        throw new RangeError(`footingPressureKpa requires no lengthM for a ${shape} (widthM is ${shape === 'circle' ? 'the diameter' : 'the width across the strip'}) ${where}`);
      }
      areaM2 = shape === 'circle' ? (Math.PI * footing.widthM * footing.widthM) / 4 : null;
      break;
    default:
      throw new RangeError(`footingPressureKpa requires shape 'rectangle', 'square', 'circle' or 'strip' ${where}`);
  }
  if (areaM2 === null && footing.loadKn !== undefined) throw new RangeError(`footingPressureKpa requires loadKnPerM or pressureKpa for a strip, not loadKn ${where}`);
  if (areaM2 !== null && footing.loadKnPerM !== undefined) throw new RangeError(`footingPressureKpa requires loadKn or pressureKpa for a ${shape}; loadKnPerM is for strips ${where}`);
  const pressureKpa =
    footing.pressureKpa ?? (areaM2 === null ? (footing.loadKnPerM ?? Number.NaN) / footing.widthM : (footing.loadKn ?? Number.NaN) / areaM2);
  if (!Number.isFinite(pressureKpa)) throw new RangeError(`footingPressureKpa requires a finite loadKn, loadKnPerM or pressureKpa ${where}`);
  return pressureKpa;
}
