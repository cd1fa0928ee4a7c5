import { ImportProblem } from './import-problem.js';

/**
 * The widest row a file of readings may have. Loggers write a handful of columns; a value
 * far to the right (a stray cell in column XFD, a line of commas) would otherwise make
 * every row thousands of cells wide in memory.
 */
export const MAX_COLUMNS = 256;

export function tooWide(rowNumber: number, width: number, where = 'The file'): ImportProblem {
  return new ImportProblem(
    `${where} has a value in column ${width} of row ${rowNumber}; a file of readings may be at most ${MAX_COLUMNS} columns wide. Delete the columns to the right of the readings (or move that value) and upload again.`,
    [{ row: rowNumber, column: null, message: `A value in column ${width}, beyond column ${MAX_COLUMNS}.` }],
  );
}
