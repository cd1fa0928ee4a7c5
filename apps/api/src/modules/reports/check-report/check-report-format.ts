import { fixed, significant } from '../report-format.js';

/** Settlement in metres as the summary prints it: millimetres to one decimal. */
export function mmText(metres: number | null | undefined): string {
  return fixed(metres === null || metres === undefined ? null : metres * 1000, 1);
}

/** A time in years to three significant figures. */
export function yearsText(years: number | null | undefined): string {
  return significant(years, 3);
}

/** An angular distortion as engineers state it, 1/n. */
export function distortionText(angularDistortion: number): string {
  return angularDistortion > 0 ? `1/${Math.round(1 / angularDistortion)}` : '0';
}
