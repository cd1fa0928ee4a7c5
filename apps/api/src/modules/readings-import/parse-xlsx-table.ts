import { Readable } from 'node:stream';
import ExcelJS from 'exceljs';
import { ImportProblem } from './import-problem.js';
import { columnKeeper, type ColumnsToKeep } from './keep-columns.js';
import { MAX_COLUMNS, tooWide } from './max-columns.js';
import type { Cell, ImportLimits, RawRow, RawTable } from './raw-table.js';
import { readMergedRanges } from './read-merged-ranges.js';

export interface XlsxParseOptions {
  /** Stop after this many rows of the readings sheet (a preview). */
  previewRows?: number | undefined;
  /** Keep only these columns' cells below the header row (an import). */
  keepColumns?: ColumnsToKeep | undefined;
}

const SPECIMEN_SHEET = /^specimen$/i;

/**
 * Reads an XLSX workbook with exceljs's streaming reader (memory stays flat for large
 * logs): the first sheet not named "specimen" holds the readings; a sheet named "specimen"
 * holds key/value pairs in its first two columns. A formula's saved result is used; a
 * formula without one, an error value or merged cells are refused with the cell named.
 * @throws ImportProblem
 */
export async function parseXlsxTable(bytes: Buffer, limits: ImportLimits, options: XlsxParseOptions = {}): Promise<RawTable> {
  const reader = new ExcelJS.stream.xlsx.WorkbookReader(Readable.from([bytes]), {
    worksheets: 'emit',
    sharedStrings: 'cache',
    hyperlinks: 'ignore',
    styles: 'cache',
    entries: 'ignore',
  });
  const rows: RawRow[] = [];
  const specimen: Record<string, string | number> = {};
  let readingsSheet: string | null = null;
  let previewFull = false;
  const keep = columnKeeper(options.keepColumns);
  try {
    for await (const worksheet of reader) {
      const sheet = worksheet as unknown as WorksheetStream;
      const name = sheet.name ?? `Sheet${sheet.id}`;
      const isSpecimen = SPECIMEN_SHEET.test(name.trim());
      if (!isSpecimen && readingsSheet !== null) {
        // Later sheets are not read, but the zip stream must still be drained.
        for await (const _row of sheet) void _row;
        continue;
      }
      if (!isSpecimen) readingsSheet = name;
      const merges = readMergedRanges(sheet);
      for await (const row of sheet) {
        const cells = rowCells(row as unknown as ExcelJS.Row, name);
        if (cells.every((cell) => cell === null)) continue;
        if (isSpecimen) {
          const key = typeof cells[0] === 'string' ? cells[0].trim() : cells[0] === null ? '' : String(cells[0]);
          const value = cells[1];
          if (key !== '' && value !== null && value !== undefined) specimen[key] = value;
          continue;
        }
        // A preview stops reading the sheet once it has its rows (merged cells, listed after the
        // rows, are then not checked: the import does that).
        if (options.previewRows !== undefined && rows.length >= options.previewRows) {
          previewFull = true;
          break;
        }
        if (rows.length >= limits.maxRows + 1) {
          throw new ImportProblem(
            `Sheet '${name}' has more than ${limits.maxRows.toLocaleString('en-GB')} rows of readings, the most one upload may hold. Split the test's readings into a file of fewer rows and upload that.`,
          );
        }
        const rowNumber = (row as unknown as ExcelJS.Row).number;
        const kept = keep(rowNumber, cells);
        if (kept !== null) rows.push({ rowNumber, cells: kept });
      }
      const ranges = previewFull ? [] : merges();
      if (ranges.length > 0) {
        const listed = ranges.slice(0, 5).join(', ');
        throw new ImportProblem(
          `Sheet '${name}' has merged cells (${listed}${ranges.length > 5 ? ` and ${ranges.length - 5} more` : ''}). Readings need one value per cell: unmerge the cells, fill in each row's value, save and upload again.`,
          ranges.map((range) => ({ row: firstRowOf(range), column: range, message: `Cells ${range} are merged; unmerge them and give each row its own value.` })),
        );
      }
    }
  } catch (error) {
    if (error instanceof ImportProblem) throw error;
    throw new ImportProblem(
      `The workbook could not be read (${error instanceof Error ? error.message : 'unknown reason'}). Open it in Excel or LibreOffice, save it again as .xlsx and upload that.`,
    );
  }
  if (readingsSheet === null) {
    throw new ImportProblem('The workbook has no sheet of readings. Put the readings on the first sheet (and specimen values, if any, on a sheet named "specimen").');
  }
  return { detectedType: 'xlsx', delimiter: null, rows, specimen };
}

interface WorksheetStream extends AsyncIterable<unknown> {
  id: number | string;
  name?: string;
  iterator: AsyncIterable<unknown>;
}

function firstRowOf(range: string): number {
  const match = /\d+/.exec(range);
  return match ? Number(match[0]) : 1;
}

/** The row's cells from column A to its last value, refused beyond MAX_COLUMNS. */
function rowCells(row: ExcelJS.Row, sheetName: string): Cell[] {
  // values is 1-based with a hole at 0, and as long as the row's rightmost cell.
  const values = row.values as unknown[];
  let last = values.length - 1;
  while (last > 0 && (values[last] === null || values[last] === undefined)) last -= 1;
  if (last > MAX_COLUMNS) throw tooWide(row.number, last, `Sheet '${sheetName}'`);
  const cells: Cell[] = [];
  for (let column = 1; column <= last; column += 1) {
    cells.push(cellValue(values[column], `${columnLetter(column)}${row.number}`, sheetName));
  }
  return cells;
}

function cellValue(value: unknown, address: string, sheetName: string): Cell {
  if (value === null || value === undefined) return null;
  if (typeof value === 'number' || typeof value === 'string') return value;
  if (typeof value === 'boolean') return value ? 'TRUE' : 'FALSE';
  if (value instanceof Date) return value.toISOString();
  if (typeof value === 'object') {
    if ('formula' in value || 'sharedFormula' in value) {
      const { result } = value as { result?: unknown };
      if (typeof result === 'number' || typeof result === 'string') return result;
      const formula = (value as { formula?: string }).formula;
      throw new ImportProblem(
        `Sheet '${sheetName}', cell ${address} holds a formula${formula ? ` (=${formula})` : ''} with no saved result. Open the workbook in Excel or LibreOffice and save it (so results are stored), or paste the values instead of formulas, then upload again.`,
        [{ row: Number(/\d+/.exec(address)?.[0] ?? 1), column: address, message: 'A formula without a saved result; save the workbook from a spreadsheet program or paste values.' }],
      );
    }
    if ('error' in value) {
      throw new ImportProblem(`Sheet '${sheetName}', cell ${address} shows the error ${String((value as { error: unknown }).error)}. Correct the cell and upload again.`, [
        { row: Number(/\d+/.exec(address)?.[0] ?? 1), column: address, message: `The cell shows the error ${String((value as { error: unknown }).error)}.` },
      ]);
    }
    if ('richText' in value) return (value as { richText: Array<{ text: string }> }).richText.map((part) => part.text).join('');
    if ('text' in value) return String((value as { text: unknown }).text);
  }
  return String(value);
}

export function columnLetter(column: number): string {
  let letters = '';
  for (let n = column; n > 0; n = Math.floor((n - 1) / 26)) letters = String.fromCharCode(65 + ((n - 1) % 26)) + letters;
  return letters;
}
