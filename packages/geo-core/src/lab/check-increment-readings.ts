import type { TimeDeformationReading } from '../time-curves/time-curve-types.js';
import type { LoadingKind } from './loading-kinds.js';

/** A drop below the running maximum larger than this is "going backwards" (mm), */
const BACKWARDS_TOLERANCE_MM = 0.002;
/** … or larger than this fraction of the increment's own deformation, whichever is larger. */
const BACKWARDS_TOLERANCE_FRACTION = 0.05;

export interface CheckedIncrementReadings {
  /** The readings in time order (the input itself when it already was). */
  readonly readings: readonly TimeDeformationReading[];
  readonly timeWasOutOfOrder: boolean;
  /** Largest drop of deformation below its running maximum under a loading or reloading stress, mm (0 when none). */
  readonly largestBackwardStepMm: number;
  readonly wentBackwards: boolean;
}

/**
 * Check one increment's readings before reduction: elapsed time must not
 * decrease (if it does, a time-sorted copy is returned and the caller warns —
 * a logger clock reset or rows pasted out of order), and under a loading or
 * reloading stress the specimen must not rebound by more than the larger of
 * 0.002 mm (two divisions of a 0.001 mm dial) and 5 % of the increment's
 * deformation (a slipping gauge, a swelling specimen or a mis-keyed reading).
 * One pass; the sort happens only when needed.
 *
 * @param readings the increment's readings.
 * @param kind loading, unloading or reloading.
 * @returns the readings in time order and what was found.
 * @throws RangeError when a time is negative or not finite, or a deformation is not finite.
 * @example checkIncrementReadings([{ elapsedMin: 1, deformationMm: 0.2 }, { elapsedMin: 0, deformationMm: 0 }], 'loading').timeWasOutOfOrder // true
 */
export function checkIncrementReadings(readings: readonly TimeDeformationReading[], kind: LoadingKind): CheckedIncrementReadings {
  let outOfOrder = false;
  let previousTime = -Infinity;
  for (const reading of readings) {
    if (!(reading.elapsedMin >= 0 && Number.isFinite(reading.elapsedMin)) || !Number.isFinite(reading.deformationMm)) {
      throw new RangeError('checkIncrementReadings requires finite elapsed times ≥ 0 and finite deformations');
    }
    if (reading.elapsedMin < previousTime) outOfOrder = true;
    previousTime = reading.elapsedMin;
  }
  const ordered = outOfOrder ? [...readings].sort((a, b) => a.elapsedMin - b.elapsedMin) : readings;
  let largestBackwardStepMm = 0;
  let wentBackwards = false;
  if (kind !== 'unloading' && ordered.length > 1) {
    const first = (ordered[0] as TimeDeformationReading).deformationMm;
    const last = (ordered[ordered.length - 1] as TimeDeformationReading).deformationMm;
    const tolerance = Math.max(BACKWARDS_TOLERANCE_MM, BACKWARDS_TOLERANCE_FRACTION * Math.abs(last - first));
    let runningMaximum = -Infinity;
    for (const reading of ordered) {
      runningMaximum = Math.max(runningMaximum, reading.deformationMm);
      largestBackwardStepMm = Math.max(largestBackwardStepMm, runningMaximum - reading.deformationMm);
    }
    wentBackwards = largestBackwardStepMm > tolerance;
  }
  return { readings: ordered, timeWasOutOfOrder: outOfOrder, largestBackwardStepMm, wentBackwards };
}
