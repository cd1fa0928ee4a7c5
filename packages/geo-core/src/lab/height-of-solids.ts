/** Density of water, g/mm³ (1 g/cm³): the ASTM D2435 value at laboratory temperature. */
const WATER_DENSITY_G_PER_MM3 = 0.001;

/**
 * Height of solids Hs — the height the specimen's solids would occupy with no
 * voids: Hs = Ms/(Gs·ρw·A), A = π·D²/4.
 *
 * Source: ASTM D2435/D2435M-11 (2020) §12.2.2; Holtz & Kovacs, *An
 * Introduction to Geotechnical Engineering*, §8.5.
 *
 * @param dryMassG oven-dry mass of the solids, g (> 0).
 * @param specificGravity Gs of the solids (> 0).
 * @param diameterMm ring diameter, mm (> 0).
 * @returns Hs in mm.
 * @throws RangeError when any argument is not positive and finite.
 * @example heightOfSolidsMm(112.3, 2.7, 63.5) // ≈ 13.133
 */
export function heightOfSolidsMm(dryMassG: number, specificGravity: number, diameterMm: number): number {
  for (const value of [dryMassG, specificGravity, diameterMm]) {
    if (!(value > 0 && Number.isFinite(value))) {
      throw new RangeError('heightOfSolidsMm requires a positive finite dry mass, specific gravity and diameter');
    }
  }
  const areaMm2 = (Math.PI * diameterMm * diameterMm) / 4;
  return dryMassG / (specificGravity * WATER_DENSITY_G_PER_MM3 * areaMm2);
}
