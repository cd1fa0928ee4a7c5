import { WATER_UNIT_WEIGHT_KN_PER_M3 } from '../constants/water-unit-weight.js';
import type { SoilProfile } from './soil-profile.types.js';

/**
 * The unit weight of water a profile is worked out with: its own
 * waterUnitWeightKnPerM3, else WATER_UNIT_WEIGHT_KN_PER_M3 (9.81 kN/m³).
 * One place for the default, so the profile, the settlement model and their
 * messages cannot disagree.
 *
 * @param profile the ground model
 * @returns γw in kN/m³
 * @example waterUnitWeightOf({ groundLevelM: 0, waterTableDepthM: 1, layers: [] }) // 9.81
 */
export function waterUnitWeightOf(profile: SoilProfile): number {
  return profile.waterUnitWeightKnPerM3 ?? WATER_UNIT_WEIGHT_KN_PER_M3;
}
