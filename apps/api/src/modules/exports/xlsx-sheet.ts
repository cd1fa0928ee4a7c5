import type ExcelJS from 'exceljs';

/** A column of an export: its header (with the unit), width and number format. */
export interface ExportColumn<Row> {
  header: string;
  width?: number;
  /** Excel number format for numbers, e.g. '0.000' or '0.00E+00'. */
  format?: string;
  value: (row: Row) => string | number | Date | null;
}

/**
 * Text that a spreadsheet program could take for a formula (=, +, - or @ first — e.g. a
 * project named "=HYPERLINK(…)"), or that it would re-read as one once edited.
 */
export function looksLikeFormula(text: string): boolean {
  return /^[=+\-@\t\r]/.test(text);
}

/**
 * Writes one cell. Text is always a plain string value (exceljs writes a shared string, never
 * a formula element); formula-looking text also gets the Text number format ('@'), so editing
 * the cell in a spreadsheet program keeps it text. Numbers stay numbers.
 */
export function setCell(cell: ExcelJS.Cell, value: string | number | Date | null, format?: string): void {
  if (value === null || (typeof value === 'number' && !Number.isFinite(value))) {
    cell.value = null;
    return;
  }
  cell.value = value;
  if (typeof value === 'string') {
    if (looksLikeFormula(value)) cell.numFmt = '@';
  } else if (format) {
    cell.numFmt = format;
  }
}

/** A sheet with a bold, frozen header row and one row per item. */
export function addTableSheet<Row>(workbook: ExcelJS.Workbook, name: string, columns: readonly ExportColumn<Row>[], rows: readonly Row[]): ExcelJS.Worksheet {
  const sheet = workbook.addWorksheet(name, { views: [{ state: 'frozen', ySplit: 1 }] });
  sheet.columns = columns.map((c) => ({ width: c.width ?? Math.max(10, Math.min(40, c.header.length + 2)) }));
  const header = sheet.getRow(1);
  columns.forEach((c, i) => setCell(header.getCell(i + 1), c.header));
  header.font = { bold: true };
  rows.forEach((row, r) => {
    const line = sheet.getRow(r + 2);
    columns.forEach((c, i) => setCell(line.getCell(i + 1), c.value(row), c.format));
  });
  return sheet;
}

/** A two-column sheet of labelled values (what the export is, where it came from, the caution). */
export function addFactsSheet(workbook: ExcelJS.Workbook, name: string, facts: ReadonlyArray<readonly [string, string | number | Date | null, string?]>): ExcelJS.Worksheet {
  const sheet = workbook.addWorksheet(name);
  sheet.columns = [{ width: 38 }, { width: 70 }];
  facts.forEach(([label, value, format], r) => {
    const row = sheet.getRow(r + 1);
    setCell(row.getCell(1), label);
    row.getCell(1).font = { bold: true };
    setCell(row.getCell(2), value, format);
    row.getCell(2).alignment = { wrapText: true, vertical: 'top' };
  });
  return sheet;
}
