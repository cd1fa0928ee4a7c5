import type { ReducedTimeCurve, TimeDeformationReading } from './time-curve-types.js';

/**
 * Bin width on log10 t. 0.02 decade (a 4.7 % step in time) is finer than any
 * hand-reading schedule, so such readings pass through one per bin, yet it
 * caps a dense logger record at 50 points a decade.
 */
const BIN_WIDTH_DECADES = 0.02;

/**
 * Reduce one increment's readings to the curve the graphical methods use.
 *
 * Readings at t > 0 are averaged (deformation arithmetically, time
 * geometrically) in bins of 0.02 decade of log t, anchored at the first
 * positive time so that scaling every time by a constant moves no reading to
 * another bin (cv then scales exactly by the inverse). Readings at t = 0 are
 * averaged separately. One pass, no sorting: the readings must already be in
 * non-decreasing time (analyzeConsolidationTest sorts a copy and warns when
 * they are not).
 *
 * @param readings the increment's readings, elapsed time non-decreasing.
 * @returns the reduced curve (typed arrays, bins in time order).
 * @throws RangeError when a time is negative, not finite, or out of order, or a deformation is not finite.
 * @example reduceTimeCurve([{ elapsedMin: 0, deformationMm: 0 }, { elapsedMin: 1, deformationMm: 0.1 }]).length // 1
 */
export function reduceTimeCurve(readings: readonly TimeDeformationReading[]): ReducedTimeCurve {
  const count = readings.length;
  const times = new Float64Array(count);
  const logs = new Float64Array(count);
  const deformations = new Float64Array(count);
  let zeroSum = 0;
  let zeroCount = 0;
  let bins = 0;
  let anchorLog = 0;
  let currentBin = -1;
  let binLogSum = 0;
  let binDeformationSum = 0;
  let binCount = 0;
  let previousTime = 0;
  const closeBin = (): void => {
    const meanLog = binLogSum / binCount;
    logs[bins] = meanLog;
    times[bins] = 10 ** meanLog;
    deformations[bins] = binDeformationSum / binCount;
    bins += 1;
  };
  for (let index = 0; index < count; index += 1) {
    const reading = readings[index] as TimeDeformationReading;
    const time = reading.elapsedMin;
    const deformation = reading.deformationMm;
    if (!Number.isFinite(time) || time < 0 || time < previousTime) {
      throw new RangeError('reduceTimeCurve requires finite, non-negative, non-decreasing elapsed times');
    }
    if (!Number.isFinite(deformation)) throw new RangeError('reduceTimeCurve requires finite deformations');
    previousTime = time;
    if (time === 0) {
      zeroSum += deformation;
      zeroCount += 1;
      continue;
    }
    const logTime = Math.log10(time);
    if (currentBin < 0) anchorLog = logTime;
    // The small offset keeps a reading that sits on a bin edge in the same bin after rounding.
    const bin = Math.floor((logTime - anchorLog) / BIN_WIDTH_DECADES + 1e-9);
    if (bin !== currentBin) {
      if (binCount > 0) closeBin();
      currentBin = bin;
      binLogSum = 0;
      binDeformationSum = 0;
      binCount = 0;
    }
    binLogSum += logTime;
    binDeformationSum += deformation;
    binCount += 1;
  }
  if (binCount > 0) closeBin();
  const rootTimes = new Float64Array(bins);
  for (let index = 0; index < bins; index += 1) rootTimes[index] = Math.sqrt(times[index] as number);
  return {
    zeroTimeDeformationMm: zeroCount > 0 ? zeroSum / zeroCount : null,
    timesMin: times.slice(0, bins),
    rootTimes,
    logTimes: logs.slice(0, bins),
    deformationsMm: deformations.slice(0, bins),
    length: bins,
  };
}
