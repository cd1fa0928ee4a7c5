import { FRENCH_CLOCK_CSV, GERMAN_CSV, INCH_DIAL_CSV, ITALIAN_REPEATS_CSV, RUNNING_CLOCK_CSV } from './csv-layouts.js';
import type { LoggerLayout } from './layout-types.js';
import { PORTUGUESE_DATES_XLSX, SHEET_PER_INCREMENT_XLSX, SPANISH_TIME_CELLS_XLSX, TITLE_ROWS_XLSX } from './xlsx-layouts.js';

export type { LayoutSpecimen, LayoutTruth, LoggerLayout } from './layout-types.js';
export { ITALIAN_REPEATED, ITALIAN_REREAD } from './csv-layouts.js';
export { SWELLING_FIRST_CSV } from './swelling-layout.js';

/**
 * Logger layouts made from geo-core's synthetic tests, each with its truth (e0 and Cc as
 * chosen) and the mapping a technician would set: title rows, units in headers, decimal
 * commas, one sheet per increment, h:mm:ss, spreadsheet time and date-time cells, a dial in
 * inches counting down, extra columns, repeated rows and times, a clock running on through
 * the test. All are guessed whole from the file; SWELLING_FIRST_CSV (apart) is the one
 * whose gauge direction is guessed wrong.
 */
export const LOGGER_LAYOUTS: readonly LoggerLayout[] = [
  TITLE_ROWS_XLSX,
  GERMAN_CSV,
  INCH_DIAL_CSV,
  SHEET_PER_INCREMENT_XLSX,
  FRENCH_CLOCK_CSV,
  SPANISH_TIME_CELLS_XLSX,
  PORTUGUESE_DATES_XLSX,
  ITALIAN_REPEATS_CSV,
  RUNNING_CLOCK_CSV,
];
