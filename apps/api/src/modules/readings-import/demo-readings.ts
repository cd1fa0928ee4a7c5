import {
  DEFAULT_SYNTHETIC_CONSOLIDATION_PARAMETERS,
  generateSyntheticConsolidationTest,
  STANDARD_READING_TIMES_MIN,
  type SyntheticConsolidationParameters,
} from '@porestack/geo-core';

/** One reading in the canonical layout's units. */
export interface DemoReading {
  increment: number;
  stressKpa: number;
  elapsedMin: number;
  deformationMm: number;
}

/**
 * The invented clay behind every demo file, for geo-core's synthetic-test generator: a 20 mm
 * specimen, e0 1.05, yielding at 120 kPa, Cr 0.04, Cc 0.38, Cs 0.05, cv 2 m²/yr, Cα 3 % of
 * each increment's own slope (≈ 0.011 on the virgin line), double drainage. The numbers are
 * chosen, not measured; nothing here is from a real site. Seating, immediate compression and
 * the rounded σ′p transition are the generator's defaults.
 */
export const DEMO_CLAY: SyntheticConsolidationParameters = {
  ...DEFAULT_SYNTHETIC_CONSOLIDATION_PARAMETERS,
  seed: 20_240_611,
  initialHeightMm: 20,
  diameterMm: 50,
  specificGravity: 2.7,
  initialVoidRatio: 1.05,
  startingEffectiveStressKpa: 5,
  preconsolidationStressKpa: 120,
  recompressionIndex: 0.04,
  compressionIndex: 0.38,
  swellIndex: 0.05,
  cvM2PerYr: 2,
  secondaryToCompressionRatio: 0.03,
  // About the rounding error of a dial read to 0.001 mm (0.001/√12).
  noiseMm: 0.0003,
  drainage: 'double',
  stressesKpa: [12.5, 25, 50, 100, 200, 400, 800, 1600, 400, 100],
};

/** Deformation as the demo files write it: to 0.0001 mm, as a logger does. */
const roundToTenthMicron = (mm: number): number => Math.round(mm * 10_000) / 10_000;

/**
 * Readings of the demo test, from geo-core's generateSyntheticConsolidationTest with DEMO_CLAY.
 * @param times reading times of each increment, minutes (denser lists make bigger files).
 */
export function demoReadings(times: readonly number[] = STANDARD_READING_TIMES_MIN): DemoReading[] {
  const { input } = generateSyntheticConsolidationTest({ ...DEMO_CLAY, readingTimesMin: times });
  return input.increments.flatMap((increment) =>
    increment.readings.map((reading) => ({
      increment: increment.index,
      stressKpa: increment.stressKpa,
      elapsedMin: reading.elapsedMin,
      deformationMm: roundToTenthMicron(reading.deformationMm),
    })),
  );
}

/** The readings in the canonical CSV layout. */
export function demoReadingsCsv(readings: readonly DemoReading[]): string {
  const lines = ['increment,stress_kpa,elapsed_min,deformation_mm'];
  for (const r of readings) lines.push(`${r.increment},${r.stressKpa},${r.elapsedMin},${r.deformationMm}`);
  return `${lines.join('\n')}\n`;
}

/** Specimen values a template's "specimen" sheet carries (invented; w0·Gs ≈ e0: a saturated specimen). */
export const DEMO_SPECIMEN: Record<string, number | string> = {
  initial_height_mm: DEMO_CLAY.initialHeightMm,
  diameter_mm: DEMO_CLAY.diameterMm,
  specific_gravity: DEMO_CLAY.specificGravity,
  dry_mass_g: Number(generateSyntheticConsolidationTest(DEMO_CLAY).dryMassG.toFixed(2)),
  initial_water_content: 0.389,
  drainage: DEMO_CLAY.drainage,
};
