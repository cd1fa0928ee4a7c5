import type { ConsolidationIncrementInput } from '../lab/consolidation-test-input.js';

/** The canonical header, in this order. */
export const READINGS_CSV_HEADER = ['increment', 'stress_kpa', 'elapsed_min', 'deformation_mm'] as const;

/** Beyond this many problems the file is plainly not in this format; the rest are counted, not listed. */
const MAXIMUM_LISTED_ERRORS = 100;

/** One problem in the file. Rows are numbered as a spreadsheet shows them: the header is row 1. */
export interface ReadingsCsvError {
  readonly row: number;
  /** The column's header name, or null for a problem with the whole row. */
  readonly column: (typeof READINGS_CSV_HEADER)[number] | null;
  readonly message: string;
}

export type ReadingsCsvResult =
  | { readonly ok: true; readonly increments: ConsolidationIncrementInput[]; readonly readingCount: number }
  | { readonly ok: false; readonly errors: readonly ReadingsCsvError[]; readonly errorCount: number };

const NUMBER_PATTERN = /^[+-]?(\d+\.?\d*|\.\d+)([eE][+-]?\d+)?$/;

const HINTS: Record<(typeof READINGS_CSV_HEADER)[number], string> = {
  increment: 'enter the increment number, e.g. 3',
  stress_kpa: 'enter the applied stress in kPa, e.g. 200',
  elapsed_min: 'enter minutes since the load was applied, e.g. 0.25',
  deformation_mm: 'enter the deformation in mm since the start of the test, compression positive, e.g. 0.412',
};

/**
 * Parse the canonical readings CSV — header `increment,stress_kpa,elapsed_min,deformation_mm`,
 * one reading a row, increments in test order — into analyzeConsolidationTest's increments.
 *
 * Never throws on bad content: it returns `{ ok: false, errors }` listing every
 * problem (up to 100, with the total count) as `{ row, column, message }`, each
 * message saying what is wrong and what to enter, e.g. "Row 14, column
 * elapsed_min: 'abc' is not a number; enter minutes since the load was applied,
 * e.g. 0.25." Rows are numbered as a spreadsheet shows them (header = row 1);
 * blank lines are skipped, a UTF-8 byte-order mark and CRLF line ends are
 * accepted, the header is matched without regard to case or surrounding spaces.
 * Checks: four columns; increment a whole number ≥ 0; stress > 0 and the same on
 * every row of an increment; elapsed time ≥ 0; deformation a number; all rows
 * of an increment together. Time order within an increment is left to the
 * analysis, which warns and sorts.
 *
 * @param text the file's content.
 * @returns the increments, or the list of problems.
 * @example readingsFromCsv('increment,stress_kpa,elapsed_min,deformation_mm\n1,25,0,0\n1,25,1,0.05').ok // true
 */
export function readingsFromCsv(text: string): ReadingsCsvResult {
  const lines = text.replace(/^\uFEFF/, '').split(/\r\n|\n|\r/);
  const errors: ReadingsCsvError[] = [];
  let errorCount = 0;
  const report = (row: number, column: ReadingsCsvError['column'], message: string): void => {
    errorCount += 1;
    if (errors.length < MAXIMUM_LISTED_ERRORS) errors.push({ row, column, message });
  };
  const headerLine = lines[0] ?? '';
  const header = headerLine.split(',').map((cell) => cell.trim().replace(/^"|"$/g, '').toLowerCase());
  if (header.length !== READINGS_CSV_HEADER.length || header.some((name, position) => name !== READINGS_CSV_HEADER[position])) {
    return {
      ok: false,
      errors: [{ row: 1, column: null, message: `Row 1: the header reads '${headerLine.trim()}'; the first row must be exactly increment,stress_kpa,elapsed_min,deformation_mm.` }],
      errorCount: 1,
    };
  }
  const increments: { index: number; stressKpa: number; firstRow: number; readings: { elapsedMin: number; deformationMm: number }[] }[] = [];
  const finished = new Map<number, number>();
  let readingCount = 0;
  for (let position = 1; position < lines.length; position += 1) {
    const line = lines[position] as string;
    const row = position + 1;
    if (line.trim() === '') continue;
    const cells = line.split(',').map((cell) => cell.trim().replace(/^"|"$/g, ''));
    if (cells.length !== READINGS_CSV_HEADER.length) {
      report(row, null, `Row ${row}: found ${cells.length} values; each row needs 4 — increment, stress_kpa, elapsed_min, deformation_mm — separated by commas (use a point, not a comma, for decimals).`);
      continue;
    }
    const values: number[] = [];
    let rowOk = true;
    READINGS_CSV_HEADER.forEach((column, columnPosition) => {
      const cell = cells[columnPosition] as string;
      if (cell === '') {
        report(row, column, `Row ${row}, column ${column}: the cell is empty; ${HINTS[column]}.`);
        rowOk = false;
      } else if (!NUMBER_PATTERN.test(cell)) {
        report(row, column, `Row ${row}, column ${column}: '${cell}' is not a number; ${HINTS[column]}.`);
        rowOk = false;
      }
      values.push(Number(cell));
    });
    if (!rowOk) continue;
    const [index, stressKpa, elapsedMin, deformationMm] = values as [number, number, number, number];
    if (!Number.isInteger(index) || index < 0) {
      report(row, 'increment', `Row ${row}, column increment: '${cells[0]}' is not a whole number ≥ 0; ${HINTS.increment}.`);
      continue;
    }
    if (!(stressKpa > 0) || !Number.isFinite(stressKpa)) {
      report(row, 'stress_kpa', `Row ${row}, column stress_kpa: ${cells[1]} kPa is not a positive stress; ${HINTS.stress_kpa}.`);
      continue;
    }
    if (!(elapsedMin >= 0) || !Number.isFinite(elapsedMin)) {
      report(row, 'elapsed_min', `Row ${row}, column elapsed_min: ${cells[2]} is negative; ${HINTS.elapsed_min} (0 for the reading taken as the load goes on).`);
      continue;
    }
    if (!Number.isFinite(deformationMm)) {
      report(row, 'deformation_mm', `Row ${row}, column deformation_mm: '${cells[3]}' is too large to be a deformation; ${HINTS.deformation_mm}.`);
      continue;
    }
    const current = increments[increments.length - 1];
    if (current === undefined || current.index !== index) {
      const earlierRow = finished.get(index);
      if (earlierRow !== undefined) {
        report(row, 'increment', `Row ${row}, column increment: increment ${index} appears again after other increments (it started at row ${earlierRow}); keep all readings of one increment together, increments in test order.`);
        continue;
      }
      if (current !== undefined) finished.set(current.index, current.firstRow);
      increments.push({ index, stressKpa, firstRow: row, readings: [] });
      finished.set(index, row);
    } else if (current.stressKpa !== stressKpa) {
      report(row, 'stress_kpa', `Row ${row}, column stress_kpa: ${cells[1]} kPa differs from the ${current.stressKpa} kPa given for increment ${index} at row ${current.firstRow}; every row of an increment carries the same stress.`);
      continue;
    }
    (increments[increments.length - 1] as (typeof increments)[number]).readings.push({ elapsedMin, deformationMm });
    readingCount += 1;
  }
  if (errorCount === 0 && readingCount === 0) {
    return { ok: false, errors: [{ row: 2, column: null, message: 'The file has a header but no readings; add one row per reading below the header.' }], errorCount: 1 };
  }
  if (errorCount > 0) return { ok: false, errors, errorCount };
  return { ok: true, increments: increments.map(({ index, stressKpa, readings }) => ({ index, stressKpa, readings })), readingCount };
}
