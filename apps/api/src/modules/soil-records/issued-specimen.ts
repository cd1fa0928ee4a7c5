import type { ConsolidationTestResult, IssuedSpecimen } from '@porestack/types';

/** Density of water, g/mm³ (1 g/cm³), to turn the solids' volume into a mass. */
const WATER_DENSITY_G_PER_MM3 = 0.001;

/**
 * The specimen as the approved analysis saw it, from that analysis' stored result alone — the
 * test's set-up may have been edited since, the result cannot. What the result does not carry is
 * recovered exactly from the definitions it was computed with (ASTM D2435/D2435M):
 * - diameter from the area A = πD²/4;
 * - Gs from the height of solids Hs = Ms/(Gs·ρw·A), so Gs = Ms/(Hs·A·ρw);
 * - water content from the degree of saturation S = w·Gs/e, so w = S·e/Gs (null when the lab gave no water content);
 * - final height H = Hs·(1 + e) at the final void ratio.
 */
export function issuedSpecimen(result: ConsolidationTestResult): IssuedSpecimen {
  const { specimen } = result;
  const specificGravity = specimen.dryMassG / (specimen.heightOfSolidsMm * specimen.areaMm2 * WATER_DENSITY_G_PER_MM3);
  const waterContent = (saturation: number | null, voidRatio: number) => (saturation === null ? null : (saturation * voidRatio) / specificGravity);
  return {
    initialHeightMm: specimen.initialHeightMm,
    diameterMm: 2 * Math.sqrt(specimen.areaMm2 / Math.PI),
    areaMm2: specimen.areaMm2,
    dryMassG: specimen.dryMassG,
    specificGravity,
    heightOfSolidsMm: specimen.heightOfSolidsMm,
    drainage: specimen.drainage,
    initialVoidRatio: result.initialVoidRatio,
    initialWaterContent: waterContent(specimen.initialDegreeOfSaturation, result.initialVoidRatio),
    initialDegreeOfSaturation: specimen.initialDegreeOfSaturation,
    finalHeightMm: specimen.heightOfSolidsMm * (1 + specimen.finalVoidRatio),
    finalVoidRatio: specimen.finalVoidRatio,
    finalWaterContent: waterContent(specimen.finalDegreeOfSaturation, specimen.finalVoidRatio),
    finalDegreeOfSaturation: specimen.finalDegreeOfSaturation,
  };
}
