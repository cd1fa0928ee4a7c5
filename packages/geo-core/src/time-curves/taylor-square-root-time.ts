import { abscissaAtDeformation } from './abscissa-at-deformation.js';
import { deformationAtAbscissa } from './deformation-at-abscissa.js';
import { firstCrossingOnSegment } from './first-crossing-on-segment.js';
import { leastSquaresLine } from './least-squares-line.js';
import { reduceTimeCurve } from './reduce-time-curve.js';
import type { TimeCurveLine, TimeCurveWarning, TimeDeformationReading, ValueSource } from './time-curve-types.js';

/** Taylor's ratio of abscissae: at U = 90 %, √Tv is 1.15 times the early straight line's. */
const TAYLOR_ABSCISSA_RATIO = 1.15;
/** Terzaghi's curve is straight on √t to about U = 60 %; the fit uses the points up to there. */
const STRAIGHT_PART_UPPER_DEGREE = 0.6;
/** First guess of the straight part before d100 is known: the first half of the record's deformation. */
const FIRST_GUESS_FRACTION_OF_RECORD = 0.5;
const MAXIMUM_REFINEMENTS = 6;

/** Reviewer overrides for one increment. */
export interface TaylorPicks {
  /** Time to 90 % consolidation read by the reviewer, min. */
  readonly t90Min?: number | undefined;
  /** Corrected zero read by the reviewer, mm (same datum as the readings). */
  readonly d0Mm?: number | undefined;
}

/** Taylor's construction, in the readings' own units so it overlays them. */
export interface TaylorConstruction {
  readonly d0Mm: number;
  readonly d0Source: ValueSource;
  readonly d90Mm: number;
  readonly d100Mm: number;
  readonly d50Mm: number;
  readonly t90Min: number;
  readonly t90Source: ValueSource;
  /** Time at d50 read off the curve, or null when the curve starts beyond d50. */
  readonly t50Min: number | null;
  /** Slope of the early straight line, mm per √min. */
  readonly initialSlopeMmPerRootMin: number;
  /** Number of (binned) readings the early straight line was fitted through. */
  readonly pointsOnInitialLine: number;
  /** The early straight line, from (0, d0) to √t90. */
  readonly initialLine: TimeCurveLine;
  /** The line from d0 with 1.15× the abscissae, ending where it meets the curve (t90, d90). */
  readonly offsetLine: TimeCurveLine;
}

export interface TaylorSquareRootTimeResult {
  readonly construction: TaylorConstruction | null;
  /** Plain-words reasons for a missing or weak construction. */
  readonly warnings: readonly TimeCurveWarning[];
}

/**
 * Taylor's (1948) square-root-of-time method for one load increment.
 *
 * Plot deformation against √t; fit the early straight part (least squares
 * through the readings up to 60 % of the primary deformation, found by
 * iterating from the first half of the record); its intercept at t = 0 is the
 * corrected zero d0. A second line from d0 with abscissae 1.15 times the first
 * meets the curve at √t90 (first crossing past the straight part, on the
 * monotone cubic through the readings);
 * d100 = d0 + (d90 − d0)/0.9, d50 = (d0 + d100)/2 and t50 is read off the curve.
 * cv = 0.848·Hdr²/t90 follows with coefficientOfConsolidationM2PerYr.
 *
 * Assumptions: Terzaghi's theory describes the primary part; readings at t > 0
 * include a few on the early straight part. Source: Taylor, D. W. (1948)
 * *Fundamentals of Soil Mechanics*, Wiley, §10.9; ASTM D2435/D2435M §12.3.2.
 *
 * @param readings one increment's readings (elapsed min, cumulative deformation mm), time non-decreasing.
 * @param picks optional reviewer t90 and/or d0; a t90 outside the readings is not applied (warning).
 * @returns the construction, or null with warnings saying why it could not be drawn.
 * @throws RangeError when times are negative, not finite or out of order, or a pick is not a positive finite number.
 * @example taylorSquareRootTime(readings).construction?.t90Min
 */
export function taylorSquareRootTime(readings: readonly TimeDeformationReading[], picks: TaylorPicks = {}): TaylorSquareRootTimeResult {
  if (picks.t90Min !== undefined && !(picks.t90Min > 0 && Number.isFinite(picks.t90Min))) {
    throw new RangeError('taylorSquareRootTime requires a picked t90 to be a positive finite number of minutes');
  }
  if (picks.d0Mm !== undefined && !Number.isFinite(picks.d0Mm)) {
    throw new RangeError('taylorSquareRootTime requires a picked d0 to be a finite number of millimetres');
  }
  const warnings: TimeCurveWarning[] = [];
  const curve = reduceTimeCurve(readings);
  const count = curve.length;
  const roots = curve.rootTimes;
  const deformations = curve.deformationsMm;
  if (count < 3) {
    return { construction: null, warnings: [{ code: 'insufficient-readings', message: 'Taylor\'s method needs at least three readings after the load was applied.' }] };
  }
  const first = deformations[0] as number;
  const last = deformations[count - 1] as number;
  if (!(last > first)) {
    return { construction: null, warnings: [{ code: 'insufficient-readings', message: 'The specimen did not compress during this increment, so Taylor\'s method has no curve to work on.' }] };
  }
  const lastIndexAtOrBelow = (limitMm: number): number => {
    let index = 0;
    while (index + 1 < count && (deformations[index + 1] as number) <= limitMm) index += 1;
    return Math.max(1, index);
  };
  let windowEnd = lastIndexAtOrBelow(first + FIRST_GUESS_FRACTION_OF_RECORD * (last - first));
  let solution: { d0: number; slope: number; rootT90: number; d90: number; d100: number } | null = null;
  for (let refinement = 0; refinement < MAXIMUM_REFINEMENTS; refinement += 1) {
    const line = leastSquaresLine(roots, deformations, 0, windowEnd, picks.d0Mm);
    if (line === null || !(line.slope > 0)) {
      return { construction: null, warnings: [{ code: 'insufficient-readings', message: 'The early readings do not rise on the square-root-of-time plot, so Taylor\'s straight line cannot be drawn.' }] };
    }
    const offsetSlope = line.slope / TAYLOR_ABSCISSA_RATIO;
    // The crossing lies past the straight part; searching from its end keeps reading
    // noise near t = 0, where the two lines nearly coincide, from faking one.
    let crossing: number | null = null;
    let previousGap = (deformations[windowEnd] as number) - (line.intercept + offsetSlope * (roots[windowEnd] as number));
    for (let index = windowEnd + 1; index < count; index += 1) {
      const gap = (deformations[index] as number) - (line.intercept + offsetSlope * (roots[index] as number));
      if (previousGap > 0 && gap <= 0) {
        crossing = firstCrossingOnSegment(roots, deformations, index - 1, line.intercept, offsetSlope);
        break;
      }
      previousGap = gap;
    }
    if (crossing === null) {
      return { construction: null, warnings: [{ code: 'primary-not-reached', message: 'The curve never meets Taylor\'s 1.15× line, so 90 % consolidation was not reached in this increment; hold the load longer or pick t90.' }] };
    }
    const d90 = line.intercept + offsetSlope * crossing;
    const d100 = line.intercept + (d90 - line.intercept) / 0.9;
    solution = { d0: line.intercept, slope: line.slope, rootT90: crossing, d90, d100 };
    const nextEnd = lastIndexAtOrBelow(line.intercept + STRAIGHT_PART_UPPER_DEGREE * (d100 - line.intercept));
    if (nextEnd === windowEnd) break;
    windowEnd = nextEnd;
  }
  if (solution === null) return { construction: null, warnings: [{ code: 'insufficient-readings', message: 'Taylor\'s construction did not settle.' }] };
  let { rootT90, d90, d100 } = solution;
  const d0 = solution.d0;
  let t90Source: ValueSource = 'automatic';
  if (picks.t90Min !== undefined) {
    const pickedDeformation = deformationAtAbscissa(roots, deformations, Math.sqrt(picks.t90Min));
    if (pickedDeformation === null) {
      warnings.push({ code: 'pick-outside-data', message: `The picked t90 of ${picks.t90Min} min lies outside the readings of this increment, so it was not applied.` });
    } else {
      rootT90 = Math.sqrt(picks.t90Min);
      d90 = pickedDeformation;
      d100 = d0 + (d90 - d0) / 0.9;
      t90Source = 'pick';
    }
  }
  const d50 = (d0 + d100) / 2;
  const rootT50 = abscissaAtDeformation(roots, deformations, d50);
  // A picked t90 is returned exactly as entered, not squared back from its root.
  const t90Min = t90Source === 'pick' && picks.t90Min !== undefined ? picks.t90Min : rootT90 * rootT90;
  return {
    construction: {
      d0Mm: d0,
      d0Source: picks.d0Mm === undefined ? 'automatic' : 'pick',
      d90Mm: d90,
      d100Mm: d100,
      d50Mm: d50,
      t90Min,
      t90Source,
      t50Min: rootT50 === null ? null : rootT50 * rootT50,
      initialSlopeMmPerRootMin: solution.slope,
      pointsOnInitialLine: windowEnd + 1,
      initialLine: { start: { timeMin: 0, deformationMm: d0 }, end: { timeMin: t90Min, deformationMm: d0 + solution.slope * rootT90 } },
      offsetLine: { start: { timeMin: 0, deformationMm: d0 }, end: { timeMin: t90Min, deformationMm: d0 + (solution.slope / TAYLOR_ABSCISSA_RATIO) * rootT90 } },
    },
    warnings,
  };
}
