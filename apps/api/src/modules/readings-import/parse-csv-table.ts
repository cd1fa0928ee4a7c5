import type { CsvDelimiter } from '@porestack/types';
import Papa from 'papaparse';
import { ImportProblem } from './import-problem.js';
import type { ImportLimits, RawRow, RawTable } from './raw-table.js';

const DELIMITERS: CsvDelimiter[] = [',', ';', '\t', '|'];
const DELIMITER_NAMES: Record<string, string> = { ',': "','", ';': "';'", '\t': 'tab', '|': "'|'", ':': "':'", ' ': 'spaces' };

export interface CsvParseOptions {
  /** Omitted: detected from the first lines. */
  delimiter?: CsvDelimiter | undefined;
  /** Stop after this many rows (a preview); the row limit is not checked then. */
  previewRows?: number | undefined;
}

/**
 * Splits CSV text into rows of text cells with papaparse (quotes, CRLF, a byte-order mark).
 * Blank lines are dropped but keep their place in the numbering, so row numbers match what
 * a spreadsheet shows for the same file.
 * @throws ImportProblem when the file has only one column (a wrong or unusual delimiter),
 *   or more rows than the limit.
 */
export function parseCsvTable(text: string, limits: ImportLimits, options: CsvParseOptions = {}): RawTable {
  const content = text.replace(/^\uFEFF/, '');
  const result = Papa.parse<string[]>(content, {
    delimiter: options.delimiter ?? '',
    delimitersToGuess: DELIMITERS,
    skipEmptyLines: false,
    preview: options.previewRows ?? 0,
  });
  const delimiter = (DELIMITERS as string[]).includes(result.meta.delimiter) ? (result.meta.delimiter as CsvDelimiter) : ',';
  const rows: RawRow[] = [];
  let widest = 0;
  for (let index = 0; index < result.data.length; index += 1) {
    const cells = result.data[index] as string[];
    if (cells.length === 1 && (cells[0] ?? '').trim() === '') continue;
    const dataRows = rows.length;
    if (options.previewRows === undefined && dataRows >= limits.maxRows + 1) {
      throw new ImportProblem(
        `The file has more than ${limits.maxRows.toLocaleString('en-GB')} rows of readings, the most one upload may hold. Split the test's readings into a file of fewer rows (e.g. thin out the logger's fastest readings) and upload that.`,
      );
    }
    rows.push({ rowNumber: index + 1, cells });
    if (cells.length > widest) widest = cells.length;
  }
  if (rows.length > 0 && widest === 1) throw oneColumnProblem(String(rows[0]?.cells[0] ?? ''), options.delimiter ?? null);
  return { detectedType: 'csv', delimiter, rows, specimen: {} };
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
