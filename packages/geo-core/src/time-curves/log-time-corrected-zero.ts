import { deformationAtAbscissa } from './deformation-at-abscissa.js';

/** d0 pairs are used while the later reading of the pair is within the parabolic part (U ≤ 50 %). */
const PARABOLIC_UPPER_DEGREE = 0.5;
const LOG_FOUR = Math.log10(4);

/** The corrected zero of the log-time method and how many pairs gave it. */
export interface LogTimeCorrectedZero {
  readonly d0Mm: number;
  readonly pairCount: number;
}

/**
 * Casagrande & Fadum's (1940) corrected zero: the early curve is a parabola
 * (d ∝ √t), so d0 = 2·d(t1) − d(4·t1). The first pair (t1 the first reading)
 * always counts; when d100 is known, every later pair whose 4·t1 reading is
 * still within the parabolic part (under 50 % of primary from the first
 * pair's d0) is averaged in, which steadies d0 on a noisy logger record.
 * d(4·t1) is read on the monotone cubic through the (binned) readings.
 *
 * @param logs log10 of the (binned) times, increasing.
 * @param deformations deformation at each, mm.
 * @param d100Mm end of primary, mm, or null when not found.
 * @returns d0 and the pair count, or null when the readings do not span a factor of four in time after the first.
 * @example logTimeCorrectedZero(Float64Array.of(0, Math.log10(4)), Float64Array.of(0.1, 0.15), null)?.d0Mm // 0.05
 */
export function logTimeCorrectedZero(logs: Float64Array, deformations: Float64Array, d100Mm: number | null): LogTimeCorrectedZero | null {
  const count = logs.length;
  const lastLog = logs[count - 1] as number;
  const firstLater = deformationAtAbscissa(logs, deformations, (logs[0] as number) + LOG_FOUR);
  if (firstLater === null) return null;
  const firstPair = 2 * (deformations[0] as number) - firstLater;
  if (d100Mm === null || !(d100Mm > firstPair)) return { d0Mm: firstPair, pairCount: 1 };
  let sum = firstPair;
  let pairCount = 1;
  for (let index = 1; index < count && (logs[index] as number) + LOG_FOUR <= lastLog; index += 1) {
    const later = deformationAtAbscissa(logs, deformations, (logs[index] as number) + LOG_FOUR) as number;
    if ((later - firstPair) / (d100Mm - firstPair) > PARABOLIC_UPPER_DEGREE) break;
    sum += 2 * (deformations[index] as number) - later;
    pairCount += 1;
  }
  return { d0Mm: sum / pairCount, pairCount };
}
