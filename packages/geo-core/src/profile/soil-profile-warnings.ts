import type { SoilProfile } from './soil-profile.types.js';

/** Unit weights of soils lie in about this range, kN/m³; outside it a value is more likely a slip than a soil. */
const PLAUSIBLE_UNIT_WEIGHT_KN_PER_M3 = { lowest: 12, highest: 24 } as const;

/**
 * Things in a valid ground model that deserve a second look, in plain words:
 * a unit weight outside 12–24 kN/m³ (soils lie within it; peat and organic
 * soils go down to about 10, so a low value may be right — or kN/m³ confused
 * with another unit), a saturated unit weight below the bulk one, and a water
 * table below the profile (the whole profile then dry). Nothing here stops a
 * calculation; validateSoilProfile does that for values that cannot be used.
 *
 * Source: typical unit weights of soils, Das, *Principles of Geotechnical
 * Engineering*, ch. "Weight–volume relationships" (tables of typical values).
 *
 * @param profile the ground model (m, kN/m³)
 * @returns warnings, each naming the layer and the field
 * @example soilProfileWarnings({ groundLevelM: 0, waterTableDepthM: 1, layers: [{ name: 'fill', thicknessM: 2, unitWeightKnPerM3: 118, saturatedUnitWeightKnPerM3: 120 }] }) // two warnings for layer 1 (fill)
 */
export function soilProfileWarnings(profile: SoilProfile): string[] {
  const warnings: string[] = [];
  const { lowest, highest } = PLAUSIBLE_UNIT_WEIGHT_KN_PER_M3;
  let bottomM = 0;
  profile.layers.forEach((layer, index) => {
    const where = `Layer ${index + 1} (${layer.name})`;
    for (const [field, value] of [['unit weight', layer.unitWeightKnPerM3], ['saturated unit weight', layer.saturatedUnitWeightKnPerM3]] as const) {
      if (value < lowest || value > highest) {
        warnings.push(`${where}: a ${field} of ${value} kN/m³ is outside the ${lowest}–${highest} kN/m³ of most soils (peat and organic soils go down to about 10). Check the value and its unit.`);
      }
    }
    if (layer.saturatedUnitWeightKnPerM3 < layer.unitWeightKnPerM3) {
      warnings.push(`${where}: the saturated unit weight (${layer.saturatedUnitWeightKnPerM3} kN/m³) is below the unit weight above the water table (${layer.unitWeightKnPerM3} kN/m³); a soil gains weight when its pores fill. Check the two values.`);
    }
    bottomM += layer.thicknessM;
  });
  if (profile.waterTableDepthM > bottomM) {
    warnings.push(`The water table (${profile.waterTableDepthM} m) lies below the bottom of the profile (${bottomM} m): the whole profile is taken as dry, with no pore pressure. Check the water table depth.`);
  }
  return warnings;
}
