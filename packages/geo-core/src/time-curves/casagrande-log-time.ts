import { abscissaAtDeformation } from './abscissa-at-deformation.js';
import { deformationAtAbscissa } from './deformation-at-abscissa.js';
import { leastSquaresLine } from './least-squares-line.js';
import { logTimeCorrectedZero } from './log-time-corrected-zero.js';
import { reduceTimeCurve } from './reduce-time-curve.js';
import { steepestLogTimeTangent } from './steepest-log-time-tangent.js';
import type { TimeCurveLine, TimeCurveWarning, TimeDeformationReading, ValueSource } from './time-curve-types.js';

/**
 * The secondary tail starts 8 times the steepest point's time later: the
 * steepest point of Terzaghi's d–log t curve lies near Tv ≈ 0.3–0.4, and
 * 8 × that (Tv ≈ 2.5–3) is past 99.9 % of primary.
 */
const TAIL_START_FACTOR_DECADES = Math.log10(8);
/** A tail at least half as steep as the tangent is not a secondary line but primary still going. */
const MAXIMUM_TAIL_TO_TANGENT_SLOPE = 0.5;
/**
 * When the readings stop before 8× the steepest point's time: a run of last
 * readings whose every segment has flattened below a quarter of the tangent's
 * slope, starting at least twice the steepest point's time later, is taken as
 * the secondary line (with a warning) — what a person drawing the construction
 * by hand does with a short record.
 */
const SHORT_TAIL_SEGMENT_TO_TANGENT_SLOPE = 0.25;
const SHORT_TAIL_START_FACTOR_DECADES = Math.log10(2);

export interface CasagrandePicks {
  /** Time to 50 % consolidation read by the reviewer, min. */
  readonly t50Min?: number | undefined;
  /** Corrected zero, mm (same datum as the readings). */
  readonly d0Mm?: number | undefined;
  /** End of primary consolidation, mm (same datum as the readings). */
  readonly d100Mm?: number | undefined;
}

export interface CasagrandeConstruction {
  readonly d0Mm: number;
  readonly d0Source: ValueSource;
  /** The first pair of times t1, 4·t1 used for d0 = 2·d(t1) − d(4·t1). */
  readonly d0TimePairMin: { readonly firstMin: number; readonly secondMin: number };
  /** How many (binned) t1, 4·t1 pairs inside the parabolic part were averaged for d0. */
  readonly d0PairCount: number;
  /** End of primary (tangent meets secondary line), or null when primary was not reached and no pick was made. */
  readonly d100Mm: number | null;
  readonly d100Source: ValueSource;
  readonly t100Min: number | null;
  readonly d50Mm: number;
  readonly t50Min: number;
  readonly t50Source: ValueSource;
  /** Time of the steepest part of the d–log t curve, min. */
  readonly inflectionTimeMin: number;
  /** Tangent at the steepest part, or null when it could not be drawn. */
  readonly tangentLine: TimeCurveLine | null;
  /** Line through the secondary tail, or null when there is no tail. */
  readonly secondaryLine: TimeCurveLine | null;
  /** Slope of the secondary line, mm per log10 cycle of time (positive in compression), or null. */
  readonly secondarySlopeMmPerLogCycle: number | null;
}

export interface CasagrandeLogTimeResult {
  readonly construction: CasagrandeConstruction | null;
  readonly warnings: readonly TimeCurveWarning[];
}

/**
 * Casagrande & Fadum's (1940) logarithm-of-time method for one load increment.
 *
 * On deformation against log10 t: the tangent at the steepest part (least
 * squares over ±0.15 decade, at least one neighbour each side) meets the line
 * fitted through the secondary tail (times ≥ 8 × the steepest point's) at
 * d100. d0 = 2·d(t1) − d(4·t1), the parabola of the early curve, averaged over
 * every pair whose later time is still below 50 % primary. d50 = (d0 + d100)/2;
 * t50 is read off the curve. cv = 0.197·Hdr²/t50 follows with
 * coefficientOfConsolidationM2PerYr; the tail slope gives Cα.
 *
 * Short records: where fewer than two readings lie 8× past the steepest
 * point, the line is drawn through the last readings if at least two of them,
 * from twice the steepest time on, have every segment flatter than a quarter
 * of the tangent (on Terzaghi's curve that is past U ≈ 98 %), with a
 * 'short-secondary-line' warning — as the construction is drawn by hand on
 * such a record (the readings of Powrie, Soil Mechanics, Question 4.4, end at 5.4×). Otherwise
 * 'primary-not-reached'.
 *
 * Assumptions: Terzaghi's theory for primary, secondary compression linear in
 * log t after primary. Sources: Casagrande, A. & Fadum, R. E. (1940) Notes on
 * soil testing for engineering purposes, Harvard Soil Mechanics Series 8;
 * ASTM D2435/D2435M §12.3.1; Holtz & Kovacs, *An Introduction to Geotechnical
 * Engineering*, §9.5.
 *
 * @param readings one increment's readings, time non-decreasing.
 * @param picks optional reviewer t50, d0, d100; a t50 outside the readings is not applied (warning).
 * @returns the construction, or null with warnings saying why.
 * @throws RangeError when times are negative, not finite or out of order, or a pick is not finite (t50 also positive).
 * @example casagrandeLogTime(readings).construction?.t50Min
 */
export function casagrandeLogTime(readings: readonly TimeDeformationReading[], picks: CasagrandePicks = {}): CasagrandeLogTimeResult {
  if (picks.t50Min !== undefined && !(picks.t50Min > 0 && Number.isFinite(picks.t50Min))) {
    throw new RangeError('casagrandeLogTime requires a picked t50 to be a positive finite number of minutes');
  }
  if ((picks.d0Mm !== undefined && !Number.isFinite(picks.d0Mm)) || (picks.d100Mm !== undefined && !Number.isFinite(picks.d100Mm))) {
    throw new RangeError('casagrandeLogTime requires picked d0 and d100 to be finite numbers of millimetres');
  }
  const warnings: TimeCurveWarning[] = [];
  const curve = reduceTimeCurve(readings);
  const count = curve.length;
  const logs = curve.logTimes;
  const deformations = curve.deformationsMm;
  if (count < 4) {
    return { construction: null, warnings: [{ code: 'insufficient-readings', message: 'Casagrande\'s log-time method needs at least four readings after the load was applied.' }] };
  }

  const tangent = steepestLogTimeTangent(logs, deformations);
  if (tangent === null) {
    return { construction: null, warnings: [{ code: 'insufficient-readings', message: 'The log-time curve never steepens in compression, so Casagrande\'s tangent cannot be drawn.' }] };
  }
  const { slope: steepestSlope, index: steepestIndex, centroidLogTime: tangentCentroidX, centroidDeformationMm: tangentCentroidY } = tangent;
  const inflectionLog = logs[steepestIndex] as number;

  let tail: { slope: number; centroidX: number; centroidY: number } | null = null;
  let tailStart = steepestIndex + 1;
  // The 1e-9 decade keeps a reading exactly 8× later (8 → 64, 15 → 120 min) in the tail however the times are scaled.
  while (tailStart < count && (logs[tailStart] as number) < inflectionLog + TAIL_START_FACTOR_DECADES - 1e-9) tailStart += 1;
  let primaryNote: TimeCurveWarning | null = null;
  const shortTailStart = count - tailStart < 2 ? flattenedLastRunStart(logs, deformations, inflectionLog, steepestSlope) : null;
  if (shortTailStart !== null) {
    const line = leastSquaresLine(logs, deformations, shortTailStart, count - 1);
    if (line !== null) {
      tail = line;
      const reach = 10 ** ((logs[count - 1] as number) - inflectionLog);
      warnings.push({
        code: 'short-secondary-line',
        message: `The readings end at ${reach.toFixed(1)} times the steepest point's time, short of the 8 times where the secondary line is normally drawn; the line rests on the last ${count - shortTailStart} readings, which have flattened to under a quarter of the tangent's slope. Check d100 on the drawn construction, or hold the load longer.`,
      });
    }
  }
  if (tail === null && count - tailStart < 2) {
    primaryNote = { code: 'primary-not-reached', message: 'The readings stop too soon after the steepest part of the log-time curve to show a secondary-compression line, so primary consolidation was not reached (or not shown) in this increment; hold the load longer or pick d100.' };
  } else if (tail === null) {
    const line = leastSquaresLine(logs, deformations, tailStart, count - 1);
    if (line === null || line.slope >= MAXIMUM_TAIL_TO_TANGENT_SLOPE * steepestSlope) {
      primaryNote = { code: 'primary-not-reached', message: 'The last readings are still falling steeply on the log-time plot, so primary consolidation was not reached in this increment; hold the load longer or pick d100.' };
    } else {
      tail = line;
    }
  }

  let d100: number | null = null;
  let log100: number | null = null;
  if (tail !== null) {
    log100 = (tail.centroidY - tangentCentroidY + steepestSlope * tangentCentroidX - tail.slope * tail.centroidX) / (steepestSlope - tail.slope);
    d100 = tangentCentroidY + steepestSlope * (log100 - tangentCentroidX);
  }
  let d100Source: ValueSource = 'automatic';
  if (picks.d100Mm !== undefined) {
    d100 = picks.d100Mm;
    d100Source = 'pick';
    const pickedLog = abscissaAtDeformation(logs, deformations, d100);
    log100 = pickedLog;
    if (pickedLog === null) warnings.push({ code: 'pick-outside-data', message: `The picked d100 of ${picks.d100Mm} mm is not reached by the readings of this increment.` });
  }

  const firstLog = logs[0] as number;
  const lastLog = logs[count - 1] as number;
  const zero = logTimeCorrectedZero(logs, deformations, d100);
  if (zero === null) {
    return { construction: null, warnings: [{ code: 'insufficient-readings', message: 'The readings do not span a factor of four in time after the first one, so the corrected zero d0 of the log-time method cannot be found.' }] };
  }
  let d0 = zero.d0Mm;
  const pairCount = zero.pairCount;
  const d0Source: ValueSource = picks.d0Mm === undefined ? 'automatic' : 'pick';
  if (picks.d0Mm !== undefined) d0 = picks.d0Mm;

  let d50: number;
  let log50: number | null;
  let t50Source: ValueSource = 'automatic';
  const pickedT50Log = picks.t50Min === undefined ? null : Math.log10(picks.t50Min);
  const pickedT50Deformation = pickedT50Log === null ? null : deformationAtAbscissa(logs, deformations, pickedT50Log);
  if (picks.t50Min !== undefined && pickedT50Deformation === null) {
    warnings.push({ code: 'pick-outside-data', message: `The picked t50 of ${picks.t50Min} min lies outside the readings of this increment, so it was not applied.` });
  }
  if (pickedT50Log !== null && pickedT50Deformation !== null) {
    d50 = pickedT50Deformation;
    log50 = pickedT50Log;
    t50Source = 'pick';
  } else {
    if (d100 === null) return { construction: null, warnings: [...warnings, primaryNote ?? { code: 'primary-not-reached', message: 'The end of primary consolidation could not be found; pick d100 or t50.' }] };
    d50 = (d0 + d100) / 2;
    log50 = abscissaAtDeformation(logs, deformations, d50);
    if (log50 === null) {
      return { construction: null, warnings: [...warnings, { code: 'insufficient-readings', message: 'The first reading is already past 50 % consolidation, so t50 cannot be read; take earlier readings or pick t50.' }] };
    }
  }
  if (primaryNote !== null && d100Source === 'automatic') warnings.push(primaryNote);

  const point = (logTime: number, deformationMm: number) => ({ timeMin: 10 ** logTime, deformationMm });
  const tangentEndLog = log100 ?? lastLog;
  const tangentStartLog = Math.max(firstLog, tangentCentroidX - 0.5);
  return {
    construction: {
      d0Mm: d0,
      d0Source,
      d0TimePairMin: { firstMin: curve.timesMin[0] as number, secondMin: 4 * (curve.timesMin[0] as number) },
      d0PairCount: pairCount,
      d100Mm: d100,
      d100Source,
      t100Min: log100 === null ? null : 10 ** log100,
      d50Mm: d50,
      t50Min: 10 ** log50,
      t50Source,
      inflectionTimeMin: curve.timesMin[steepestIndex] as number,
      tangentLine: {
        start: point(tangentStartLog, tangentCentroidY + steepestSlope * (tangentStartLog - tangentCentroidX)),
        end: point(tangentEndLog, tangentCentroidY + steepestSlope * (tangentEndLog - tangentCentroidX)),
      },
      secondaryLine:
        tail === null
          ? null
          : {
              start: point(log100 ?? tail.centroidX, tail.centroidY + tail.slope * ((log100 ?? tail.centroidX) - tail.centroidX)),
              end: point(lastLog, tail.centroidY + tail.slope * (lastLog - tail.centroidX)),
            },
      secondarySlopeMmPerLogCycle: tail === null ? null : tail.slope,
    },
    warnings,
  };
}

/**
 * Start of the longest run of last readings (two at least) whose every
 * segment is flatter than a quarter of the tangent's slope and which begins at
 * least twice the steepest point's time later; null when there is none.
 */
function flattenedLastRunStart(logs: Float64Array, deformations: Float64Array, inflectionLog: number, steepestSlope: number): number | null {
  const count = logs.length;
  let start = count - 1;
  while (start > 0) {
    const segmentSlope = ((deformations[start] as number) - (deformations[start - 1] as number)) / ((logs[start] as number) - (logs[start - 1] as number));
    if (!(segmentSlope < SHORT_TAIL_SEGMENT_TO_TANGENT_SLOPE * steepestSlope) || (logs[start - 1] as number) < inflectionLog + SHORT_TAIL_START_FACTOR_DECADES - 1e-9) break;
    start -= 1;
  }
  return count - 1 - start >= 1 ? start : null;
}
