/** A hand-reading schedule, min after the load went on (the same for every increment). */
export const STANDARD_READING_TIMES_MIN: readonly number[] = [0, 0.1, 0.25, 0.5, 1, 2, 4, 8, 15, 30, 60, 120, 240, 480, 1440];

/**
 * A logger's reading times: one at t = 0, then count − 1 readings evenly spaced
 * in log t from 0.01 min to lastMin.
 *
 * @param count readings in all, at least three.
 * @param lastMin time of the last reading, min > 0.01.
 * @returns the times, min, increasing.
 * @throws RangeError when count < 3 or lastMin ≤ 0.01.
 * @example logSpacedReadingTimesMin(3, 1) // [0, 0.01, 1]
 */
export function logSpacedReadingTimesMin(count: number, lastMin = 1440): number[] {
  if (!(Number.isInteger(count) && count >= 3)) throw new RangeError('logSpacedReadingTimesMin requires a whole count of at least three');
  if (!(lastMin > 0.01 && Number.isFinite(lastMin))) throw new RangeError('logSpacedReadingTimesMin requires lastMin > 0.01 min');
  const first = Math.log10(0.01);
  const span = Math.log10(lastMin) - first;
  const times = [0];
  for (let index = 0; index < count - 1; index += 1) times.push(10 ** (first + (span * index) / (count - 2)));
  return times;
}
