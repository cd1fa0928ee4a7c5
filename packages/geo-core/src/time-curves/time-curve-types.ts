/** One reading of an increment: time since the load went on, cumulative deformation. */
export interface TimeDeformationReading {
  /** Minutes since the increment was applied, ≥ 0. */
  readonly elapsedMin: number;
  /** Cumulative specimen deformation since the start of the test, mm, compression positive. */
  readonly deformationMm: number;
}

/**
 * A point of a graphical construction, in the units of the readings so it can
 * be drawn over them: a line given by two such points is straight on the
 * method's own time axis (√t for Taylor, log t for Casagrande).
 */
export interface TimeCurvePoint {
  readonly timeMin: number;
  readonly deformationMm: number;
}

/** A construction line, drawn between its two points (extend as the plot needs). */
export interface TimeCurveLine {
  readonly start: TimeCurvePoint;
  readonly end: TimeCurvePoint;
}

/** Where a value came from: found by the method, or overridden by a reviewer. */
export type ValueSource = 'automatic' | 'pick';

/**
 * One increment's readings reduced for the graphical methods: readings at
 * t > 0 averaged in bins of equal width on log t (see reduceTimeCurve), so a
 * logger's 50,000 noisy readings and a technician's 15 hand readings go
 * through the same constructions.
 */
export interface ReducedTimeCurve {
  /** Mean deformation of the readings taken at t = 0, or null when there are none. */
  readonly zeroTimeDeformationMm: number | null;
  readonly timesMin: Float64Array;
  readonly rootTimes: Float64Array;
  readonly logTimes: Float64Array;
  readonly deformationsMm: Float64Array;
  readonly length: number;
}

/** Why a time-curve construction is missing or weak, in plain words for the reviewer. */
export interface TimeCurveWarning {
  readonly code: 'primary-not-reached' | 'insufficient-readings' | 'pick-outside-data' | 'short-secondary-line';
  readonly message: string;
}
