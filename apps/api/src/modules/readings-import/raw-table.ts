import type { CsvDelimiter, DetectedFileType } from '@porestack/types';

/** A cell as found: text from a CSV, a number or text from a workbook, null when empty. */
export type Cell = string | number | null;

/** One row of the file with its number as a spreadsheet shows it (first row = 1). */
export interface RawRow {
  readonly rowNumber: number;
  readonly cells: readonly Cell[];
}

/** The file's readings sheet as rows of cells, before any column is interpreted. */
export interface RawTable {
  readonly detectedType: DetectedFileType;
  /** CSV only: the delimiter used. */
  readonly delimiter: CsvDelimiter | null;
  readonly rows: readonly RawRow[];
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
