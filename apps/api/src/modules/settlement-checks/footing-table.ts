import { FOOTING_COLUMN_HEADINGS, FOOTING_COLUMNS, FootingRowSchema, type FootingImportResult } from '@porestack/types';

type Column = (typeof FOOTING_COLUMNS)[number];
/** A row as a spreadsheet shows it: its number (first row = 1) and its cells as text. */
export interface TableRow {
  rowNumber: number;
  cells: string[];
}

/** Words a schedule's heading may use for each column (lower case, units and punctuation ignored). */
const HEADING_WORDS: Record<Column, readonly string[]> = {
  id: ['mark', 'id', 'footing', 'name', 'ref', 'reference'],
  shape: ['shape', 'type'],
  widthM: ['b', 'width', 'diameter', 'bm', 'widthm'],
  lengthM: ['l', 'length', 'lm', 'lengthm'],
  depthM: ['depth', 'df', 'foundingdepth', 'depthm', 'level'],
  loadKind: ['loadkind', 'kind'],
  load: ['load', 'q', 'p', 'pressure', 'loadorpressure', 'bearingpressure', 'value'],
  loadBasis: ['basis', 'grossornet', 'grossnet', 'netgross'],
  xM: ['x', 'xm', 'easting'],
  yM: ['y', 'ym', 'northing'],
};

const squash = (text: string) => text.toLowerCase().replace(/\(.*?\)/g, '').replace(/[^a-z]/g, '');

/** Which column each heading names, or null when the first row is not a heading row. */
function columnsOf(first: readonly string[]): Array<Column | null> | null {
  const columns = first.map((heading) => {
    const word = squash(heading);
    return (Object.keys(HEADING_WORDS) as Column[]).find((column) => HEADING_WORDS[column].includes(word)) ?? null;
  });
  const named = columns.filter((c) => c !== null);
  return named.length >= 3 && named.includes('widthM') ? columns : null;
}

const NUMBER_COLUMNS = new Set<Column>(['widthM', 'lengthM', 'depthM', 'load', 'xM', 'yM']);

function cellValue(column: Column, text: string): unknown {
  const trimmed = text.trim();
  if (trimmed === '') return column === 'lengthM' ? null : undefined;
  if (NUMBER_COLUMNS.has(column)) {
    const number = Number(trimmed.replace(/\s/g, '').replace(/,(?=\d{1,2}$)/, '.'));
    return Number.isNaN(number) ? trimmed : number;
  }
  return column === 'id' ? trimmed : trimmed.toLowerCase();
}

/**
 * Rows of a footing schedule from a table (a pasted block, a CSV or a sheet). A first row of
 * headings ("mark", "B (m)", "x" …) says which column is which; without one the columns are
 * taken in the template's order (mark, shape, B, L, depth, load kind, load, basis, x, y).
 * Each row is checked with the shared schema; a bad row is listed with its row number, the
 * column as the sheet names it and what to do, and is left out.
 */
export function footingRowsFromTable(rows: readonly TableRow[]): FootingImportResult {
  const nonBlank = rows.filter((row) => row.cells.some((cell) => cell.trim() !== ''));
  const first = nonBlank[0];
  const headings = first ? columnsOf(first.cells) : null;
  const columns: Array<Column | null> = headings ?? [...FOOTING_COLUMNS];
  const body = headings ? nonBlank.slice(1) : nonBlank;
  const result: FootingImportResult = { rows: [], issues: [], rowCount: body.length };
  const seen = new Map<string, number>();
  for (const row of body) {
    const raw: Partial<Record<Column, unknown>> = {};
    columns.forEach((column, index) => {
      if (column !== null) raw[column] = cellValue(column, row.cells[index] ?? '');
    });
    const parsed = FootingRowSchema.safeParse(raw);
    const label = typeof raw.id === 'string' && raw.id !== '' ? `Row ${row.rowNumber} (${raw.id})` : `Row ${row.rowNumber}`;
    if (!parsed.success) {
      for (const issue of parsed.error.issues) {
        const column = issue.path[0] as Column | undefined;
        const heading = column ? (headings && first ? (first.cells[columns.indexOf(column)] ?? FOOTING_COLUMN_HEADINGS[column]) : FOOTING_COLUMN_HEADINGS[column]) : null;
        result.issues.push({ row: row.rowNumber, column: heading, message: `${label}${heading ? `, ${heading}` : ''}: ${issue.message}` });
      }
      continue;
    }
    const earlier = seen.get(parsed.data.id);
    if (earlier !== undefined) {
      result.issues.push({ row: row.rowNumber, column: 'mark', message: `${label}: the mark ${parsed.data.id} is already used in row ${earlier}. Give each footing its own mark.` });
      continue;
    }
    seen.set(parsed.data.id, row.rowNumber);
    result.rows.push(parsed.data);
  }
  if (body.length === 0) result.issues.push({ row: 1, column: null, message: 'No footing rows were found. Give one footing per row under a heading row: mark, shape, B (m), L (m), depth (m), load kind, load, gross or net, x (m), y (m).' });
  return result;
}
