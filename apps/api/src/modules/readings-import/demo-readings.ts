import { degreeOfConsolidation } from '@porestack/geo-core';

/** One reading in the canonical layout's units. */
export interface DemoReading {
  increment: number;
  stressKpa: number;
  elapsedMin: number;
  deformationMm: number;
}

/**
 * The invented clay behind every demo file: a 20 mm specimen, e0 1.05, yielding at
 * 120 kPa, Cr 0.04, Cc 0.38, Cs 0.05, cv 2 m²/yr, Cα 0.012, double drainage. The numbers
 * are chosen, not measured; nothing here is from a real site.
 */
export const DEMO_CLAY = {
  initialHeightMm: 20,
  initialVoidRatio: 1.05,
  preconsolidationKpa: 120,
  recompressionIndex: 0.04,
  compressionIndex: 0.38,
  swellIndex: 0.05,
  cvM2PerYr: 2,
  secondaryIndex: 0.012,
  seatingKpa: 5,
  stressesKpa: [12.5, 25, 50, 100, 200, 400, 800, 1600, 400, 100],
} as const;

/** Log-spaced reading times of one 24 h increment, as a logger set to "doubling" writes them. */
export const DEMO_TIMES_MIN = [0, 0.1, 0.25, 0.5, 1, 2, 4, 8, 15, 30, 60, 120, 240, 480, 1440];

const MINUTES_PER_YEAR = 365.25 * 24 * 60;

/** Void ratio at the end of primary consolidation under `stressKpa`, from the chosen indices. */
function voidRatioAt(stressKpa: number, unloading: boolean, maxStressKpa: number, eAtMax: number): number {
  const clay = DEMO_CLAY;
  if (unloading) return eAtMax + clay.swellIndex * Math.log10(maxStressKpa / stressKpa);
  const p = clay.preconsolidationKpa;
  if (stressKpa <= p) return clay.initialVoidRatio - clay.recompressionIndex * Math.log10(stressKpa / clay.seatingKpa);
  const eAtP = clay.initialVoidRatio - clay.recompressionIndex * Math.log10(p / clay.seatingKpa);
  return eAtP - clay.compressionIndex * Math.log10(stressKpa / p);
}

/** A deterministic pseudo-random sequence (LCG), so the demo files are the same every time. */
function noise(seed: number): () => number {
  let state = seed >>> 0;
  return () => {
    state = (Math.imul(state, 1664525) + 1013904223) >>> 0;
    return state / 2 ** 32 - 0.5;
  };
}

/**
 * Readings of the demo test: each increment settles by Terzaghi's average degree of
 * consolidation U(Tv), Tv = cv·t/Hdr² with Hdr half the current height, then creeps by
 * Cα per log cycle after t90 (a quarter of it below σ′p); a ±0.5 µm gauge noise is added.
 * @param times reading times of each increment, minutes (denser lists make bigger files).
 */
export function demoReadings(times: readonly number[] = DEMO_TIMES_MIN): DemoReading[] {
  const clay = DEMO_CLAY;
  const random = noise(20_240_611);
  const heightPerVoidRatio = clay.initialHeightMm / (1 + clay.initialVoidRatio);
  const cvMm2PerMin = (clay.cvM2PerYr * 1e6) / MINUTES_PER_YEAR;
  const readings: DemoReading[] = [];
  let maxStress = 0;
  let eAtMax: number = clay.initialVoidRatio;
  let previousE: number = clay.initialVoidRatio;
  let creepSoFarMm = 0;
  clay.stressesKpa.forEach((stressKpa, position) => {
    const unloading = stressKpa < maxStress;
    const targetE = voidRatioAt(stressKpa, unloading, maxStress, eAtMax);
    if (!unloading) {
      maxStress = stressKpa;
      eAtMax = targetE;
    }
    const startMm = (clay.initialVoidRatio - previousE) * heightPerVoidRatio + creepSoFarMm;
    const primaryMm = (previousE - targetE) * heightPerVoidRatio;
    const drainagePathMm = (clay.initialHeightMm - startMm) / 2;
    const t90 = (0.848 * drainagePathMm ** 2) / cvMm2PerMin;
    // Creep is slower on the recompression branch: a quarter of Cα below σ′p.
    const creepIndex = stressKpa > clay.preconsolidationKpa ? clay.secondaryIndex : clay.secondaryIndex / 4;
    let creepMm = 0;
    for (const elapsedMin of times) {
      const u = elapsedMin === 0 ? 0 : degreeOfConsolidation((cvMm2PerMin * elapsedMin) / drainagePathMm ** 2);
      creepMm = !unloading && elapsedMin > t90 ? creepIndex * heightPerVoidRatio * Math.log10(elapsedMin / t90) : 0;
      const deformationMm = startMm + u * primaryMm + creepMm + random() * 0.001;
      readings.push({ increment: position + 1, stressKpa, elapsedMin, deformationMm: Math.round(deformationMm * 10_000) / 10_000 });
    }
    creepSoFarMm += creepMm;
    previousE = targetE;
  });
  return readings;
}

/** The readings in the canonical CSV layout. */
export function demoReadingsCsv(readings: readonly DemoReading[]): string {
  const lines = ['increment,stress_kpa,elapsed_min,deformation_mm'];
  for (const r of readings) lines.push(`${r.increment},${r.stressKpa},${r.elapsedMin},${r.deformationMm}`);
  return `${lines.join('\n')}\n`;
}

/** Specimen values a template's "specimen" sheet carries (invented). */
export const DEMO_SPECIMEN: Record<string, number | string> = {
  initial_height_mm: DEMO_CLAY.initialHeightMm,
  diameter_mm: 50,
  specific_gravity: 2.7,
  dry_mass_g: 51.73,
  initial_water_content: 0.389,
  drainage: 'double',
};
