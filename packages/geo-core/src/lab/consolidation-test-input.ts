import type { CasagrandePicks } from '../time-curves/casagrande-log-time.js';
import type { TaylorPicks } from '../time-curves/taylor-square-root-time.js';
import type { TimeDeformationReading } from '../time-curves/time-curve-types.js';

// Optional properties also accept `undefined` so that objects parsed by zod
// (whose optional keys are `T | undefined`) can be passed straight in under
// exactOptionalPropertyTypes.

/** Drainage of the specimen: through both porous stones, or one. */
export type Drainage = 'double' | 'single';

/**
 * The specimen as set up. Either `dryMassG`, or `initialWaterContent` with
 * `wetMassG` (dry mass = wet mass / (1 + w0)), must be given.
 */
export interface ConsolidationSpecimenInput {
  /** Initial height H0 in the ring, mm. */
  readonly initialHeightMm: number;
  /** Inside diameter of the ring, mm. */
  readonly diameterMm: number;
  /** Specific gravity of solids Gs, dimensionless. */
  readonly specificGravity: number;
  readonly drainage: Drainage;
  /** Oven-dry mass of the specimen's solids, g. */
  readonly dryMassG?: number | undefined;
  /** Initial water content w0 as a fraction (0.45, not 45 %). */
  readonly initialWaterContent?: number | undefined;
  /** Initial wet mass of the specimen, g. */
  readonly wetMassG?: number | undefined;
  /** Water content at the end of the test as a fraction. */
  readonly finalWaterContent?: number | undefined;
  /** In-situ vertical effective stress at the sample's depth, kPa (for OCR and sample quality). */
  readonly inSituVerticalEffectiveStressKpa?: number | undefined;
}

/** One load increment in test order. */
export interface ConsolidationIncrementInput {
  /** The lab's increment number, as written on the sheet (used in picks and warnings). */
  readonly index: number;
  /** Total applied vertical stress during the increment, kPa (> 0). */
  readonly stressKpa: number;
  /** Readings: minutes since this increment was applied, cumulative deformation since the test began (mm, compression positive). */
  readonly readings: readonly TimeDeformationReading[];
}

/** A point of the apparatus calibration (steel dummy): stress → apparatus deflection. */
export interface ComplianceCalibrationPoint {
  readonly stressKpa: number;
  readonly deflectionMm: number;
}

/** A reviewer's overrides for one increment's time curves. */
export interface IncrementPicks {
  readonly index: number;
  readonly taylor?: TaylorPicks | undefined;
  readonly casagrande?: CasagrandePicks | undefined;
}

/** An increment the reviewer leaves out of the analysis, and why (kept in the readings and the result). */
export interface IncrementExclusion {
  readonly index: number;
  /** In the reviewer's words, e.g. "the gauge slipped at 3 h"; printed with the result. */
  readonly reason: string;
}

/** Overrides of automatic choices; every one is echoed in the result and marked. */
export interface ConsolidationPicks {
  /** Preconsolidation stress adopted for OCR, Cr and sample quality, kPa. */
  readonly preconsolidationStressKpa?: number | undefined;
  /** Increments (by index, inclusive) whose end points define the virgin compression line. */
  readonly virginLine?: { readonly firstIncrementIndex: number; readonly lastIncrementIndex: number } | undefined;
  readonly increments?: readonly IncrementPicks[] | undefined;
  /**
   * Increments left out of the analysis: no time curves, not on the compression curve that
   * σ′p, Cc, Cr and Cs are read from, not the base of the next increment's mv. Their
   * readings, heights and void ratios are still reported, marked with the reason.
   */
  readonly excludedIncrements?: readonly IncrementExclusion[] | undefined;
}

/** Everything analyzeConsolidationTest needs. */
export interface ConsolidationTestInput {
  readonly specimen: ConsolidationSpecimenInput;
  readonly increments: readonly ConsolidationIncrementInput[];
  readonly compliance?: readonly ComplianceCalibrationPoint[] | undefined;
  readonly picks?: ConsolidationPicks | undefined;
}
