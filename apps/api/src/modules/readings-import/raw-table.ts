import type { CsvDelimiter, DetectedFileType } from '@porestack/types';

/**
 * A cell as found: text from a CSV, a number or text from a workbook, null when empty. A
 * workbook's time cell arrives as text: a duration as `[h]:mm:ss`, a date-time as
 * `YYYY-MM-DD hh:mm:ss` (see spreadsheetDateText).
 */
export type Cell = string | number | null;

/** One row of the file with its number as a spreadsheet shows it (first row = 1). */
export interface RawRow {
  readonly rowNumber: number;
  readonly cells: readonly Cell[];
}

/** One sheet of readings: a workbook's sheet by its name, or the whole of a CSV (name null). */
export interface RawSheet {
  readonly name: string | null;
  readonly rows: readonly RawRow[];
}

/** The file's readings sheets as rows of cells, before any column is interpreted. */
export interface RawTable {
  readonly detectedType: DetectedFileType;
  /** CSV only: the delimiter used. */
  readonly delimiter: CsvDelimiter | null;
  /** The readings sheet (a CSV, or a workbook's first), or every sheet of one-sheet-per-increment workbook. */
  readonly sheets: readonly RawSheet[];
  /** Key/values of an XLSX sheet named "specimen"; empty otherwise. */
  readonly specimen: Readonly<Record<string, string | number>>;
}

/** Limits on what one upload may hold. */
export interface ImportLimits {
  readonly maxFileBytes: number;
  readonly maxRows: number;
}

export function cellText(cell: Cell | undefined): string {
  if (cell === null || cell === undefined) return '';
  return typeof cell === 'number' ? String(cell) : cell.trim();
}

/** The rows of the first readings sheet (empty when there is none). */
export function firstSheetRows(table: RawTable): readonly RawRow[] {
  return table.sheets[0]?.rows ?? [];
}

/** The column names in a sheet's header row, as written. */
export function headerOf(rows: readonly RawRow[], headerRow = 1): string[] {
  const row = rows.find((candidate) => candidate.rowNumber === headerRow);
  return row ? row.cells.map((cell) => cellText(cell)) : [];
}
