import type { SheetLayout, StressSource, StressUnit } from '@porestack/types';
import type { GuessedColumns } from './guess-columns.js';
import { headerOf, type RawTable } from './raw-table.js';
import { stressFromSheetName } from './sheet-stress.js';

export interface GuessedSheets {
  readonly layout: SheetLayout;
  readonly stressFrom: StressSource;
  /** The stress unit the sheet names give, when they give one. */
  readonly sheetUnit: StressUnit | null;
  readonly reason: string | null;
  readonly stressReason: string | null;
}

/**
 * Whether a workbook holds one increment a sheet: two or more sheets whose header row has
 * the time and deformation columns of the first. Then the stress comes from a column when
 * the header has one, else from the sheet names when every such sheet's name holds a number.
 */
export function guessSheets(table: RawTable, headerRow: number, columns: GuessedColumns): GuessedSheets {
  const single: GuessedSheets = { layout: 'first', stressFrom: 'column', sheetUnit: null, reason: null, stressReason: null };
  const wanted = [columns.elapsedTime?.name, columns.deformation?.name].filter((name): name is string => name !== undefined);
  if (table.sheets.length < 2 || wanted.length < 2) return single;
  const alike = table.sheets.filter((sheet) => {
    const header = headerOf(sheet.rows, headerRow);
    return wanted.every((name) => header.includes(name));
  });
  if (alike.length < 2) return single;
  const names = alike.map((sheet) => sheet.name ?? '');
  const listed = `${names.slice(0, 3).map((name) => `'${name}'`).join(', ')}${names.length > 3 ? ', …' : ''}`;
  const reason = `${alike.length} sheets (${listed}) have the same columns: each is one increment, in workbook order.`;
  if (columns.stress !== null) return { layout: 'each', stressFrom: 'column', sheetUnit: null, reason, stressReason: `From the column '${columns.stress.name}'.` };
  const stresses = names.map(stressFromSheetName);
  if (stresses.some((stress) => stress === null)) return { layout: 'each', stressFrom: 'column', sheetUnit: null, reason, stressReason: null };
  const sheetUnit = stresses.find((stress) => stress?.unit)?.unit ?? null;
  return { layout: 'each', stressFrom: 'sheetName', sheetUnit, reason, stressReason: `No stress column; the sheet names carry the stress (${listed}).` };
}
