import type { CsvDelimiter } from '@porestack/types';
import Papa from 'papaparse';
import { ImportProblem } from './import-problem.js';
import { columnKeeper, type ColumnsToKeep } from './keep-columns.js';
import { MAX_COLUMNS, tooWide } from './max-columns.js';
import type { ImportLimits, RawRow, RawTable } from './raw-table.js';

const CHUNK_CHARACTERS = 1 << 20;
const DELIMITERS: CsvDelimiter[] = [',', ';', '\t', '|'];
const DELIMITER_NAMES: Record<string, string> = { ',': "','", ';': "';'", '\t': 'tab', '|': "'|'", ':': "':'", ' ': 'spaces' };

export interface CsvParseOptions {
  /** Omitted: detected from the first lines. */
  delimiter?: CsvDelimiter | undefined;
  /** Stop after this many rows (a preview); the row limit is not checked then. */
  previewRows?: number | undefined;
  /** Keep only these columns' cells below the header row (an import). */
  keepColumns?: ColumnsToKeep | undefined;
}

/**
 * Splits CSV text into rows of text cells with papaparse (quotes, CRLF, a byte-order mark).
 * Blank lines (and lines of empty cells only) are dropped but keep their place in the
 * numbering, so row numbers match what a spreadsheet shows for the same file. Rows are
 * taken one at a time and trailing empty cells are cut, so memory follows the rows kept,
 * not the file's blank lines or empty columns.
 * @throws ImportProblem when the file has only one column (a wrong or unusual delimiter),
 *   a row wider than MAX_COLUMNS, or more rows than the limit.
 */
export function parseCsvTable(text: string, limits: ImportLimits, options: CsvParseOptions = {}): RawTable {
  const content = text.replace(/^\uFEFF/, '');
  const rows: RawRow[] = [];
  let widest = 0;
  let lineIndex = 0;
  let problem: ImportProblem | null = null;
  let guessed: string | undefined;
  const keep = columnKeeper(options.keepColumns);
  Papa.parse<string[]>(content, {
    delimiter: options.delimiter ?? '',
    delimitersToGuess: DELIMITERS,
    skipEmptyLines: false,
    // In slices: papaparse splits a whole slice into lines at once, so a file of blank
    // lines parsed in one piece would hold millions of empty strings.
    chunkSize: CHUNK_CHARACTERS,
    step: (result, parser) => {
      guessed ??= result.meta.delimiter;
      const rowNumber = (lineIndex += 1);
      const cells = withoutTrailingEmpty(result.data);
      if (cells.length === 0) return;
      if (cells.length > MAX_COLUMNS) {
        problem = tooWide(rowNumber, cells.length);
        parser.abort();
        return;
      }
      if (options.previewRows !== undefined && rows.length >= options.previewRows) {
        parser.abort();
        return;
      }
      if (options.previewRows === undefined && rows.length >= limits.maxRows + 1) {
        problem = new ImportProblem(
          `The file has more than ${limits.maxRows.toLocaleString('en-GB')} rows of readings, the most one upload may hold. Split the test's readings into a file of fewer rows (e.g. thin out the logger's fastest readings) and upload that.`,
        );
        parser.abort();
        return;
      }
      const kept = keep(rowNumber, cells);
      if (kept === null) return;
      rows.push({ rowNumber, cells: kept });
      if (cells.length > widest) widest = cells.length;
    },
  });
  if (problem) throw problem;
  const delimiter = guessed !== undefined && (DELIMITERS as string[]).includes(guessed) ? (guessed as CsvDelimiter) : ',';
  if (rows.length > 0 && widest === 1) throw oneColumnProblem(String(rows[0]?.cells[0] ?? ''), options.delimiter ?? null);
  return { detectedType: 'csv', delimiter, rows, specimen: {} };
}

/** The row without the empty cells at its end (all of them for a blank line). */
function withoutTrailingEmpty(cells: string[]): string[] {
  let end = cells.length;
  while (end > 0 && (cells[end - 1] as string).trim() === '') end -= 1;
  return end === cells.length ? cells : cells.slice(0, end);
}

/** Names the delimiter the first line seems to use instead. */
function oneColumnProblem(firstLine: string, chosen: CsvDelimiter | null): ImportProblem {
  const counts = Object.keys(DELIMITER_NAMES)
    .filter((candidate) => candidate !== chosen)
    .map((candidate) => ({ candidate, count: firstLine.split(candidate).length - 1 }))
    .filter(({ count }) => count > 0)
    .sort((a, b) => b.count - a.count);
  const likely = counts[0];
  const used = chosen ? `with ${DELIMITER_NAMES[chosen]} as the delimiter ` : '';
  const hint = likely
    ? `the file may use ${DELIMITER_NAMES[likely.candidate]} between values — choose that delimiter in the import settings${likely.candidate === ':' || likely.candidate === ' ' ? ' (or save the file again with commas)' : ''}.`
    : 'check that the values of a row are separated by commas, semicolons or tabs, and choose the delimiter in the import settings.';
  return new ImportProblem(`Row 1: reading the file ${used}found only one column ('${firstLine.slice(0, 80)}'): ${hint}`, [
    { row: 1, column: null, message: `Only one column found; ${hint}` },
  ]);
}
