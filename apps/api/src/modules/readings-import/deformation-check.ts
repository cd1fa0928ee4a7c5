import type { ImportNote } from '@porestack/types';
import type { ParsedReadings } from './read-readings.js';

/** Compressions of a consolidation test lie between these fractions of the specimen's height. */
export const PLAUSIBLE_STRAIN = { least: 0.001, most: 0.6 } as const;

const mm = (value: number): string => `${Number(value.toPrecision(3))} mm`;
const percent = (fraction: number): string => `${Number((fraction * 100).toPrecision(2))} %`;

/**
 * Whether the imported deformations are plausible for the specimen: the largest
 * compression under 0.1 % of its height is too small to be a consolidation test (a reading
 * in inches or mm taken as gauge divisions), over 60 % more than a specimen can give
 * (divisions taken as mm); a specimen that swells more than it compresses has its gauge read
 * the wrong way round.
 * Answers a note for the upload (the file is still imported), or null when the deformations
 * look right or the height is not known.
 */
export function deformationCheck(readings: ParsedReadings, specimenHeightMm: number | null): ImportNote | null {
  if (readings.count === 0) return null;
  let largest = -Infinity;
  let smallest = Infinity;
  for (let i = 0; i < readings.count; i += 1) {
    const value = readings.deformationMm[i] as number;
    if (value > largest) largest = value;
    if (value < smallest) smallest = value;
  }
  const check = (message: string): ImportNote => ({ kind: 'check', row: null, column: null, message });
  // A specimen compresses over a test far more than it ever swells: the other way round, the gauge is read backwards.
  if (smallest < 0 && -smallest > largest) {
    return check(`The readings show the specimen swelling by up to ${mm(-smallest)} and compressing by at most ${mm(Math.max(largest, 0))}: the gauge's direction is likely the wrong way round. Check whether its reading rises or falls as the specimen compresses, in the mapping, and import again.`);
  }
  if (specimenHeightMm === null || !(specimenHeightMm > 0)) return null;
  const strain = largest / specimenHeightMm;
  if (strain < PLAUSIBLE_STRAIN.least) {
    return check(`The largest compression is ${mm(largest)}, ${percent(strain)} of the specimen's ${mm(specimenHeightMm)} height — too little for a consolidation test. Check the gauge's division size and the deformation unit in the mapping (a reading in mm or inches taken as divisions gives this), then import again.`);
  }
  if (strain > PLAUSIBLE_STRAIN.most) {
    return check(`The largest compression is ${mm(largest)}, ${percent(strain)} of the specimen's ${mm(specimenHeightMm)} height — more than a specimen can compress. Check the gauge's division size and the deformation unit in the mapping (divisions taken as mm give this), then import again.`);
  }
  return null;
}
