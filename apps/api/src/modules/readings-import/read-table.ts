import type { CsvDelimiter, DetectedFileType } from '@porestack/types';
import { parseCsvTable } from './parse-csv-table.js';
import type { ColumnsToKeep } from './keep-columns.js';
import type { ImportLimits, RawTable } from './raw-table.js';

export interface ReadTableOptions {
  delimiter?: CsvDelimiter | undefined;
  previewRows?: number | undefined;
  keepColumns?: ColumnsToKeep | undefined;
}

/**
 * The file's rows, whichever of the two types it is (the type comes from sniffFileType). The
 * workbook reader (exceljs, large) is loaded only when a workbook comes, so a parse thread
 * that reads CSV files starts quickly.
 */
export async function readTable(bytes: Buffer, type: DetectedFileType, limits: ImportLimits, options: ReadTableOptions = {}): Promise<RawTable> {
  if (type === 'xlsx') return (await import('./parse-xlsx-table.js')).parseXlsxTable(bytes, limits, { previewRows: options.previewRows, keepColumns: options.keepColumns });
  return parseCsvTable(bytes.toString('utf8'), limits, { delimiter: options.delimiter, previewRows: options.previewRows, keepColumns: options.keepColumns });
}
