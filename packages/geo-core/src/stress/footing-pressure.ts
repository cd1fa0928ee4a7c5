import type { Footing } from './footing.types.js';

/**
 * The uniform net pressure a footing applies: the given pressure, or the total
 * load over the plan area, q = Q/(B·L).
 *
 * @param footing a footing with loadKn (kN) or pressureKpa (kPa), sides in m
 * @returns q in kPa
 * @throws RangeError when the sides are not positive or the load is not finite
 * @example footingPressureKpa({ id: 'F1', xM: 0, yM: 0, widthM: 2, lengthM: 3, depthM: 1, loadKn: 600 }) // 100
 */
export function footingPressureKpa(footing: Footing): number {
  if (!(footing.widthM > 0) || !(footing.lengthM > 0) || !Number.isFinite(footing.widthM) || !Number.isFinite(footing.lengthM)) {
    throw new RangeError(`footingPressureKpa requires finite widthM > 0 and lengthM > 0 (footing ${footing.id})`);
  }
  const pressureKpa = footing.pressureKpa ?? (footing.loadKn ?? Number.NaN) / (footing.widthM * footing.lengthM);
  if (!Number.isFinite(pressureKpa)) throw new RangeError(`footingPressureKpa requires a finite loadKn or pressureKpa (footing ${footing.id})`);
  return pressureKpa;
}
