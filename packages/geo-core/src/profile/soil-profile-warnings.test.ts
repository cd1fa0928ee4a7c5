import { describe, expect, it } from 'vitest';
import { soilProfileWarnings } from './soil-profile-warnings.js';
import type { SoilProfile } from './soil-profile.types.js';

const layer = { name: 'clay', thicknessM: 5, unitWeightKnPerM3: 18, saturatedUnitWeightKnPerM3: 19 };

describe('soilProfileWarnings(profile)', () => {
  it('has nothing to say about an ordinary profile', () => {
    expect(soilProfileWarnings({ groundLevelM: 0, waterTableDepthM: 2, layers: [layer] })).toEqual([]);
  });

  it('names a unit weight outside 12–24 kN/m³ (here lbf/ft³ typed as kN/m³)', () => {
    const warnings = soilProfileWarnings({ groundLevelM: 0, waterTableDepthM: 2, layers: [layer, { ...layer, name: 'fill', unitWeightKnPerM3: 115, saturatedUnitWeightKnPerM3: 125 }] });
    expect(warnings).toEqual([
      'Layer 2 (fill): a unit weight of 115 kN/m³ is outside the 12–24 kN/m³ of most soils (peat and organic soils go down to about 10). Check the value and its unit.',
      'Layer 2 (fill): a saturated unit weight of 125 kN/m³ is outside the 12–24 kN/m³ of most soils (peat and organic soils go down to about 10). Check the value and its unit.',
    ]);
  });

  it('names a saturated unit weight below the bulk one, and a water table below the profile', () => {
    const profile: SoilProfile = { groundLevelM: 0, waterTableDepthM: 7, layers: [{ ...layer, saturatedUnitWeightKnPerM3: 17 }] };
    expect(soilProfileWarnings(profile)).toEqual([
      'Layer 1 (clay): the saturated unit weight (17 kN/m³) is below the unit weight above the water table (18 kN/m³); a soil gains weight when its pores fill. Check the two values.',
      'The water table (7 m) lies below the bottom of the profile (5 m): the whole profile is taken as dry, with no pore pressure. Check the water table depth.',
    ]);
  });
});
