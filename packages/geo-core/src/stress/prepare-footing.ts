import { footingPressureKpa } from './footing-pressure.js';
import type { Footing } from './footing.types.js';
import type { PreparedFooting } from './prepared-footing.js';

/**
 * A footing as the sums take it: its shape resolved (rectangle when omitted),
 * its length set by shape (a square's and a circle's equal to the width, a
 * strip's infinite) and its load turned into the pressure at its base
 * (footingPressureKpa).
 *
 * @param footing the footing (m, kN, kN/m or kPa)
 * @returns the prepared footing
 * @throws RangeError as footingPressureKpa
 * @example prepareFooting({ id: 'C1', shape: 'circle', xM: 0, yM: 0, widthM: 2, depthM: 1, pressureKpa: 100 }) // { shape: 'circle', widthM: 2, lengthM: 2, pressureKpa: 100, … }
 */
export function prepareFooting(footing: Footing): PreparedFooting {
  const pressureKpa = footingPressureKpa(footing);
  const shape = footing.shape ?? 'rectangle';
  const lengthM = shape === 'rectangle' ? (footing.lengthM ?? Number.NaN) : shape === 'strip' ? Infinity : footing.widthM;
  return { id: footing.id, shape, xM: footing.xM, yM: footing.yM, widthM: footing.widthM, lengthM, depthM: footing.depthM, pressureKpa };
}
