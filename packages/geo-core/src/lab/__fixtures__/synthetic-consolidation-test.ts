// Test support: builds a whole incremental-loading oedometer test from
// Terzaghi's theory with chosen parameters, so the analysis can be checked
// against known answers. Not part of the public API.
import { degreeOfConsolidation } from '../../time-curves/degree-of-consolidation.js';
import type { ConsolidationIncrementInput, ConsolidationTestInput, Drainage } from '../consolidation-test-input.js';

export interface SyntheticTestParameters {
  readonly seed: number;
  readonly initialHeightMm: number;
  readonly diameterMm: number;
  readonly specificGravity: number;
  readonly initialVoidRatio: number;
  /** Stress path in test order, kPa. */
  readonly stressesKpa: readonly number[];
  readonly compressionIndex: number;
  readonly recompressionIndex: number;
  readonly swellIndex: number;
  /** σ′p: where the recompression and virgin asymptotes meet, kPa. */
  readonly preconsolidationStressKpa: number;
  /** Width of the rounded knee between the two lines, decades of stress. */
  readonly kneeWidthDecades: number;
  /** The (virtual) effective stress at which the void ratio is e0, kPa. */
  readonly startingEffectiveStressKpa: number;
  readonly cvM2PerYr: number;
  /** Cα as a fraction of the increment's own compression slope (Mesri & Godlewski 1977: ≈ 0.04). */
  readonly secondaryToCompressionRatio: number;
  /** Secondary compression starts at this time factor (Tv = 2 ≈ 99.4 % primary). */
  readonly secondaryStartTimeFactor: number;
  /** Bedding of the stones at the first load, mm. */
  readonly seatingMm: number;
  /** Immediate compression at the moment of loading, as a fraction of the increment's compression. */
  readonly immediateFraction: number;
  /** Standard deviation of the Gaussian reading noise, mm. */
  readonly noiseMm: number;
  /** Reading times, min (the same for each increment). */
  readonly readingTimesMin: readonly number[];
  readonly drainage: Drainage;
}

export const STANDARD_READING_TIMES_MIN: readonly number[] = [0, 0.1, 0.25, 0.5, 1, 2, 4, 8, 15, 30, 60, 120, 240, 480, 1440];

/** `count` readings log-spaced from 0.01 min to `lastMin`, plus one at t = 0 (a logger record). */
export function denseReadingTimesMin(count: number, lastMin = 1440): number[] {
  const times = [0];
  const first = Math.log10(0.01);
  const span = Math.log10(lastMin) - first;
  for (let index = 0; index < count - 1; index += 1) times.push(10 ** (first + (span * index) / (count - 2)));
  return times;
}

export const DEFAULT_SYNTHETIC_PARAMETERS: SyntheticTestParameters = {
  seed: 1,
  initialHeightMm: 20,
  diameterMm: 63.5,
  specificGravity: 2.7,
  initialVoidRatio: 1.1,
  stressesKpa: [12.5, 25, 50, 100, 200, 400, 800, 200, 50, 200, 800, 1600, 400, 100, 25],
  compressionIndex: 0.45,
  recompressionIndex: 0.05,
  swellIndex: 0.07,
  preconsolidationStressKpa: 150,
  kneeWidthDecades: 0.1,
  startingEffectiveStressKpa: 5,
  cvM2PerYr: 1.5,
  secondaryToCompressionRatio: 0.03,
  secondaryStartTimeFactor: 2,
  seatingMm: 0.02,
  immediateFraction: 0.03,
  noiseMm: 0.001,
  readingTimesMin: STANDARD_READING_TIMES_MIN,
  drainage: 'double',
};

export interface SyntheticIncrementTruth {
  readonly index: number;
  readonly stressKpa: number;
  readonly voidRatioEnd: number;
  /** Cα built into this increment (0 for unloading). */
  readonly secondaryCompressionIndex: number;
  readonly cvM2PerYr: number;
}

export interface SyntheticTest {
  readonly input: ConsolidationTestInput;
  readonly heightOfSolidsMm: number;
  readonly increments: readonly SyntheticIncrementTruth[];
}

/** mulberry32: a small, well-mixed seeded PRNG so every run draws the same noise. */
function seededUniform(seed: number): () => number {
  let state = seed >>> 0;
  return () => {
    state = (state + 0x6d2b79f5) >>> 0;
    let t = state;
    t = Math.imul(t ^ (t >>> 15), t | 1);
    t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
}

/** Build a test from the parameters (defaults overridden by `overrides`). */
export function syntheticConsolidationTest(overrides: Partial<SyntheticTestParameters> = {}): SyntheticTest {
  const p: SyntheticTestParameters = { ...DEFAULT_SYNTHETIC_PARAMETERS, ...overrides };
  const uniform = seededUniform(p.seed);
  const gaussian = (): number => Math.sqrt(-2 * Math.log(1 - uniform())) * Math.cos(2 * Math.PI * uniform());
  const areaMm2 = (Math.PI * p.diameterMm * p.diameterMm) / 4;
  const heightOfSolidsMm = p.initialHeightMm / (1 + p.initialVoidRatio);
  const dryMassG = heightOfSolidsMm * p.specificGravity * 0.001 * areaMm2;
  const knee = (x: number): number => p.kneeWidthDecades * Math.log10(1 + 10 ** ((x - Math.log10(p.preconsolidationStressKpa)) / p.kneeWidthDecades));
  const startLog = Math.log10(p.startingEffectiveStressKpa);
  // First-loading curve: recompression line, a rounded knee, then the virgin line; e = e0 at the starting stress.
  const virginCurve = (stressKpa: number): number => {
    const x = Math.log10(stressKpa);
    return p.initialVoidRatio - p.recompressionIndex * (x - startLog) - (p.compressionIndex - p.recompressionIndex) * (knee(x) - knee(startLog));
  };
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
    increments: truths,
  };
}
