import type { SoilProfile } from '../profile/soil-profile.types.js';
import { footingPressureKpa } from './footing-pressure.js';
import type { Footing } from './footing.types.js';
import { netFootingPressure } from './net-footing-pressure.js';
import type { PreparedFooting } from './prepared-footing.js';

/**
 * A footing as the sums take it: its shape resolved (rectangle when omitted),
 * its length set by shape (a square's and a circle's equal to the width, a
 * strip's infinite) and its load turned into the net pressure at its base
 * (netFootingPressure: a gross load less the overburden removed).
 *
 * @param footing the footing (m, kN, kN/m or kPa, net or gross)
 * @param profile the ground model, needed for a gross load (σv0 at the founding depth); null where every load is net
 * @param warnings collects netFootingPressure's warnings (a gross load below the overburden), when given
 * @returns the prepared footing
 * @throws RangeError as netFootingPressure, or for a gross load without a profile
 * @example prepareFooting({ id: 'C1', shape: 'circle', xM: 0, yM: 0, widthM: 2, depthM: 1, pressureKpa: 100 }, null) // { shape: 'circle', widthM: 2, lengthM: 2, pressureKpa: 100, … }
 */
export function prepareFooting(footing: Footing, profile: SoilProfile | null, warnings?: string[]): PreparedFooting {
  if (profile === null) {
    if (footing.pressureBasis !== undefined && footing.pressureBasis !== 'net') {
      throw new RangeError(`A gross load needs the soil profile for the overburden removed; give the net load or pressure (footing ${footing.id})`);
    }
  }
  const shape = footing.shape ?? 'rectangle';
  const lengthM = shape === 'rectangle' ? (footing.lengthM ?? Number.NaN) : shape === 'strip' ? Infinity : footing.widthM;
  const base = { id: footing.id, shape, xM: footing.xM, yM: footing.yM, widthM: footing.widthM, lengthM, depthM: footing.depthM };
  if (profile === null) return { ...base, pressureKpa: footingPressureKpa(footing) };
  const net = netFootingPressure(footing, profile);
  warnings?.push(...net.warnings);
  if (net.grossPressureKpa === null || net.overburdenRemovedKpa === null) return { ...base, pressureKpa: net.netPressureKpa };
  return { ...base, pressureKpa: net.netPressureKpa, grossPressureKpa: net.grossPressureKpa, overburdenRemovedKpa: net.overburdenRemovedKpa };
}
