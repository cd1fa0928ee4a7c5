import { degreeOfConsolidation, READINGS_CSV_HEADER, type ConsolidationIncrementInput } from '@porestack/geo-core';

/** The soil and the specimen a synthetic oedometer test is built from. */
export interface SyntheticSoil {
  initialHeightMm: number;
  diameterMm: number;
  specificGravity: number;
  initialVoidRatio: number;
  compressionIndex: number;
  /** Slope of first loading below σ′p and of reloading. */
  recompressionIndex: number;
  swellIndex: number;
  preconsolidationStressKpa: number;
  cvM2PerYr: number;
  /** Cα/Cc on the virgin line (about 0.04 for many clays). */
  secondaryRatio: number;
  /** The effective stress the specimen is at, on the recompression line, when e = e0 (kPa). */
  seatingStressKpa: number;
  stressesKpa: readonly number[];
}

export const READING_TIMES_MIN: readonly number[] = [0, 0.1, 0.25, 0.5, 1, 2, 4, 8, 15, 30, 60, 120, 240, 480, 1440];

const MM2_PER_MIN_PER_M2_PER_YR = 1e6 / (365.25 * 24 * 60);
/** Secondary compression starts at Tv = 2, where primary is over 99 % complete. */
const SECONDARY_START_TIME_FACTOR = 2;

/**
 * Readings of an incremental-loading test on an ideal clay, from Terzaghi's one-dimensional
 * theory: each increment's end void ratio lies on a bilinear e–log σ′ curve (Cr up to σ′p,
 * Cc beyond, Cs on unloading, Cr on reloading up to the previous maximum); its primary part
 * follows U(Tv) with Tv = cv·t/Hdr² (double drainage, Hdr half the height at the start of the
 * increment), and loading on the virgin line adds secondary compression Cα·log(t/ts) after
 * Tv = 2. Deterministic: no noise, so the seed gives the same numbers every time.
 */
export function syntheticIncrements(soil: SyntheticSoil): { increments: ConsolidationIncrementInput[]; dryMassG: number } {
  const areaMm2 = (Math.PI * soil.diameterMm ** 2) / 4;
  const solidsHeightMm = soil.initialHeightMm / (1 + soil.initialVoidRatio);
  const dryMassG = solidsHeightMm * areaMm2 * soil.specificGravity * 1e-3;
  const cvMm2PerMin = soil.cvM2PerYr * MM2_PER_MIN_PER_M2_PER_YR;
  const pLog = Math.log10(soil.preconsolidationStressKpa);
  const virginAt = (stressKpa: number) =>
    soil.initialVoidRatio - soil.recompressionIndex * (pLog - Math.log10(soil.seatingStressKpa)) - soil.compressionIndex * (Math.log10(stressKpa) - pLog);
  let voidRatio = soil.initialVoidRatio;
  let previousKpa = soil.seatingStressKpa;
  let maximumKpa = soil.preconsolidationStressKpa;
  let deformationMm = 0;
  const increments = soil.stressesKpa.map((stressKpa, position) => {
    let endVoidRatio: number;
    let onVirginLine = false;
    if (stressKpa < previousKpa) endVoidRatio = voidRatio + soil.swellIndex * Math.log10(previousKpa / stressKpa);
    else if (stressKpa <= maximumKpa) endVoidRatio = voidRatio - soil.recompressionIndex * Math.log10(stressKpa / previousKpa);
    else {
      const toMaximum = previousKpa < maximumKpa ? soil.recompressionIndex * Math.log10(maximumKpa / previousKpa) : 0;
      endVoidRatio = Math.min(voidRatio - toMaximum, virginAt(maximumKpa)) - soil.compressionIndex * Math.log10(stressKpa / maximumKpa);
      onVirginLine = true;
    }
    const totalMm = (voidRatio - endVoidRatio) * solidsHeightMm;
    const drainagePathMm = (soil.initialHeightMm - deformationMm) / 2;
    const secondaryStartMin = (SECONDARY_START_TIME_FACTOR * drainagePathMm ** 2) / cvMm2PerMin;
    const secondaryMmPerDecade = onVirginLine ? soil.secondaryRatio * soil.compressionIndex * solidsHeightMm : 0;
    const startMm = deformationMm;
    const secondaryAt = (elapsedMin: number) => (elapsedMin > secondaryStartMin ? secondaryMmPerDecade * Math.log10(elapsedMin / secondaryStartMin) : 0);
    // The end point lies on the chosen curve: primary is what the secondary part leaves.
    const primaryMm = totalMm - secondaryAt(READING_TIMES_MIN[READING_TIMES_MIN.length - 1] as number);
    const readings = READING_TIMES_MIN.map((elapsedMin) => {
      const degree = degreeOfConsolidation((cvMm2PerMin * elapsedMin) / drainagePathMm ** 2);
      return { elapsedMin, deformationMm: Number((startMm + degree * primaryMm + secondaryAt(elapsedMin)).toFixed(5)) };
    });
    deformationMm = (readings[readings.length - 1] as { deformationMm: number }).deformationMm;
    voidRatio = soil.initialVoidRatio - deformationMm / solidsHeightMm;
    previousKpa = stressKpa;
    maximumKpa = Math.max(maximumKpa, stressKpa);
    return { index: position + 1, stressKpa, readings };
  });
  return { increments, dryMassG };
}

/** The increments as geo-core's canonical readings CSV (what a technician would upload). */
export function incrementsToCsv(increments: readonly ConsolidationIncrementInput[]): string {
  const lines = [READINGS_CSV_HEADER.join(',')];
  for (const increment of increments) {
    for (const reading of increment.readings) lines.push(`${increment.index},${increment.stressKpa},${reading.elapsedMin},${reading.deformationMm}`);
  }
  return `${lines.join('\n')}\n`;
}
