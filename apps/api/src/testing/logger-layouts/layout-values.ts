import type { LayoutTruth } from './layout-types.js';

/** One reading of a layout's test, with the running clock of the test beside the increment's own. */
export interface LayoutReading {
  readonly increment: number;
  readonly stressKpa: number;
  readonly elapsedMin: number;
  /** Minutes since the test began: each increment starts when the one before ended. */
  readonly testMin: number;
  readonly deformationMm: number;
}

export function layoutReadings(truth: LayoutTruth): LayoutReading[] {
  const out: LayoutReading[] = [];
  let start = 0;
  for (const increment of truth.increments) {
    let last = 0;
    for (const reading of increment.readings) {
      out.push({ increment: increment.index, stressKpa: increment.stressKpa, elapsedMin: reading.elapsedMin, testMin: start + reading.elapsedMin, deformationMm: reading.deformationMm });
      last = reading.elapsedMin;
    }
    start += last;
  }
  return out;
}

/** A number to `digits` decimals, as text with a decimal comma or point. */
export function written(value: number, digits: number, comma = false): string {
  const text = value.toFixed(digits);
  return comma ? text.replace('.', ',') : text;
}

/** Minutes as [h]:mm:ss to whole seconds (hours run past 24). */
export function hms(minutes: number): string {
  const seconds = Math.round(minutes * 60);
  const h = Math.floor(seconds / 3600);
  const m = Math.floor((seconds % 3600) / 60);
  const s = seconds % 60;
  return `${h}:${String(m).padStart(2, '0')}:${String(s).padStart(2, '0')}`;
}

/** Minutes rounded to whole seconds, as Excel's serial days. */
export function excelDays(minutes: number): number {
  return Math.round(minutes * 60) / 86_400;
}
