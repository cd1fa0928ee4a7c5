import type { Drainage } from '../consolidation-test-input.js';
import { STANDARD_READING_TIMES_MIN } from './log-spaced-reading-times.js';

/** The chosen truth of a synthetic oedometer test. */
export interface SyntheticConsolidationParameters {
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
  /** Half-width of the rounded transition through σ′p, decades of stress (0: a sharp kink); see firstLoadingVoidRatio. */
  readonly transitionHalfWidthDecades: number;
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

/** A soft clay loaded in doubling steps with an unload–reload loop and a final unloading. */
export const DEFAULT_SYNTHETIC_CONSOLIDATION_PARAMETERS: SyntheticConsolidationParameters = {
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
  transitionHalfWidthDecades: 0.2,
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
