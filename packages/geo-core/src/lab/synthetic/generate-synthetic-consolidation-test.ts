import { degreeOfConsolidation } from '../../time-curves/degree-of-consolidation.js';
import type { ConsolidationIncrementInput, ConsolidationTestInput } from '../consolidation-test-input.js';
import { firstLoadingVoidRatio } from './first-loading-void-ratio.js';
import { seededUniform } from './seeded-uniform.js';
import { DEFAULT_SYNTHETIC_CONSOLIDATION_PARAMETERS, type SyntheticConsolidationParameters } from './synthetic-consolidation-parameters.js';

export interface SyntheticIncrementTruth {
  readonly index: number;
  readonly stressKpa: number;
  readonly voidRatioEnd: number;
  /** Cα built into this increment (0 for unloading). */
  readonly secondaryCompressionIndex: number;
  readonly cvM2PerYr: number;
}

export interface SyntheticConsolidationTest {
  readonly input: ConsolidationTestInput;
  readonly heightOfSolidsMm: number;
  /** The specimen's dry mass, g (also in input.specimen, where the type leaves it optional). */
  readonly dryMassG: number;
  readonly increments: readonly SyntheticIncrementTruth[];
  readonly parameters: SyntheticConsolidationParameters;
}

/**
 * A whole incremental-loading oedometer test generated from chosen
 * parameters, for demonstration data and for checking the reduction against
 * known answers. Demo data only: invented, never a measurement.
 *
 * First loading follows firstLoadingVoidRatio (recompression line, a rounded
 * transition through σ′p, virgin line); unloading swells with Cs; reloading
 * below the old maximum recompresses with Cr and, past it, rejoins the virgin
 * curve. Each increment's readings follow Terzaghi's (1943) average degree of
 * consolidation U(Tv) for the chosen cv, with Hdr from the height at 50 %
 * (halved for double drainage), plus an immediate part at loading, seating at
 * the first load, secondary compression Cα·log10(t/tₛ) after Tv = 2 (Cα a
 * fraction of the increment's own slope) and seeded Gaussian reading noise.
 * Void ratios at the end of each increment lie on the chosen curve: the
 * primary part is solved for what the immediate and secondary parts leave.
 *
 * @param overrides parameters that differ from DEFAULT_SYNTHETIC_CONSOLIDATION_PARAMETERS.
 * @returns the input for analyzeConsolidationTest, the height of solids, the dry mass and each increment's truth.
 * @throws RangeError when the σ′p transition starts at or below the starting stress (from firstLoadingVoidRatio).
 * @example generateSyntheticConsolidationTest({ seed: 7 }).input.increments.length // 15
 */
export function generateSyntheticConsolidationTest(overrides: Partial<SyntheticConsolidationParameters> = {}): SyntheticConsolidationTest {
  const p: SyntheticConsolidationParameters = { ...DEFAULT_SYNTHETIC_CONSOLIDATION_PARAMETERS, ...overrides };
  const uniform = seededUniform(p.seed);
  const gaussian = (): number => Math.sqrt(-2 * Math.log(1 - uniform())) * Math.cos(2 * Math.PI * uniform());
  const areaMm2 = (Math.PI * p.diameterMm * p.diameterMm) / 4;
  const heightOfSolidsMm = p.initialHeightMm / (1 + p.initialVoidRatio);
  const dryMassG = heightOfSolidsMm * p.specificGravity * 0.001 * areaMm2;
  const virginCurve = (stressKpa: number): number => firstLoadingVoidRatio(p, stressKpa);
  const cvMm2PerMin = p.cvM2PerYr / 0.52596;
  const lastTime = p.readingTimesMin[p.readingTimesMin.length - 1] as number;
  let soilVoidRatio = p.initialVoidRatio;
  let previousStress = p.startingEffectiveStressKpa;
  let maximumStress = p.startingEffectiveStressKpa;
  let deformationMm = 0;
  const increments: ConsolidationIncrementInput[] = [];
  const truths: SyntheticIncrementTruth[] = [];
  p.stressesKpa.forEach((stressKpa, position) => {
    let nextVoidRatio: number;
    if (stressKpa < previousStress) nextVoidRatio = soilVoidRatio + p.swellIndex * Math.log10(previousStress / stressKpa);
    else if (stressKpa <= maximumStress) nextVoidRatio = soilVoidRatio - p.recompressionIndex * Math.log10(stressKpa / previousStress);
    // Beyond the old maximum the curve rejoins the virgin curve, as real clays do.
    else nextVoidRatio = virginCurve(stressKpa);
    const totalMm = (soilVoidRatio - nextVoidRatio) * heightOfSolidsMm;
    const loading = totalMm > 0;
    const seatingMm = position === 0 ? p.seatingMm : 0;
    const immediateMm = loading ? p.immediateFraction * totalMm : 0;
    const localSlope = Math.abs(soilVoidRatio - nextVoidRatio) / Math.abs(Math.log10(stressKpa / previousStress));
    const secondaryIndex = loading ? p.secondaryToCompressionRatio * localSlope : 0;
    const heightBeforeMm = p.initialHeightMm - deformationMm;
    const secondaryAt = (elapsedMin: number, startMin: number): number =>
      elapsedMin > startMin ? secondaryIndex * heightOfSolidsMm * Math.log10(elapsedMin / startMin) : 0;
    // The end-of-increment void ratio lies on the chosen curve: primary is what the
    // immediate and secondary parts leave; the drainage path depends on it, so iterate.
    let primaryMm = totalMm - immediateMm;
    let drainagePathMm = 1;
    let secondaryStartMin = 0;
    for (let pass = 0; pass < 4; pass += 1) {
      const heightAtHalfMm = heightBeforeMm - seatingMm - immediateMm - primaryMm / 2;
      drainagePathMm = p.drainage === 'double' ? heightAtHalfMm / 2 : heightAtHalfMm;
      secondaryStartMin = (p.secondaryStartTimeFactor * drainagePathMm * drainagePathMm) / cvMm2PerMin;
      const endDegree = degreeOfConsolidation((cvMm2PerMin * lastTime) / (drainagePathMm * drainagePathMm));
      primaryMm = (totalMm - immediateMm - secondaryAt(lastTime, secondaryStartMin)) / endDegree;
    }
    const startMm = deformationMm;
    const readings = p.readingTimesMin.map((elapsedMin) => {
      const u = degreeOfConsolidation((cvMm2PerMin * elapsedMin) / (drainagePathMm * drainagePathMm));
      const onLoadMm = elapsedMin > 0 ? seatingMm + immediateMm : 0;
      const deformation = startMm + onLoadMm + u * primaryMm + secondaryAt(elapsedMin, secondaryStartMin) + p.noiseMm * gaussian();
      return { elapsedMin, deformationMm: deformation };
    });
    // Seating is bedding of the stones, not soil: it shifts every later void ratio but not the soil curve.
    deformationMm = startMm + seatingMm + totalMm;
    soilVoidRatio = nextVoidRatio;
    increments.push({ index: position + 1, stressKpa, readings });
    truths.push({
      index: position + 1,
      stressKpa,
      voidRatioEnd: p.initialVoidRatio - deformationMm / heightOfSolidsMm,
      secondaryCompressionIndex: secondaryIndex,
      cvM2PerYr: p.cvM2PerYr,
    });
    previousStress = stressKpa;
    maximumStress = Math.max(maximumStress, stressKpa);
  });
  return {
    input: {
      specimen: { initialHeightMm: p.initialHeightMm, diameterMm: p.diameterMm, specificGravity: p.specificGravity, dryMassG, drainage: p.drainage },
      increments,
    },
    heightOfSolidsMm,
    dryMassG,
    increments: truths,
    parameters: p,
  };
}
