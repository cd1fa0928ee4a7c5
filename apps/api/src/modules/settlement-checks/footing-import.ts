import ExcelJS from 'exceljs';
import Papa from 'papaparse';
import type { FootingImportResult } from '@porestack/types';
import { DomainError } from '../../errors/domain-error.js';
import { footingRowsFromTable, type TableRow } from './footing-table.js';

const ZIP_MAGIC = Buffer.from([0x50, 0x4b, 0x03, 0x04]);
/** A schedule of 2,000 footings is a few hundred kB; more than this is not a schedule. */
export const FOOTING_FILE_MAX_BYTES = 5 * 1024 * 1024;

/** Rows of pasted or CSV text: tabs (a spreadsheet's clipboard), commas or semicolons. */
export function tableFromText(text: string): TableRow[] {
  const parsed = Papa.parse<string[]>(text.replace(/^\uFEFF/, ''), { delimiter: '', delimitersToGuess: ['\t', ',', ';'], skipEmptyLines: false });
  return parsed.data.map((cells, index) => ({ rowNumber: index + 1, cells: cells.map(String) }));
}

async function tableFromWorkbook(bytes: Buffer): Promise<TableRow[]> {
  const workbook = new ExcelJS.Workbook();
  try {
    await workbook.xlsx.load(bytes as unknown as ArrayBuffer);
  } catch {
    throw new DomainError('invalid_file', 'The workbook could not be read. Open it in Excel or LibreOffice, save it again as .xlsx and import that.');
  }
  const sheet = workbook.worksheets[0];
  if (!sheet) throw new DomainError('invalid_file', 'The workbook has no sheet. Put the footing schedule on its first sheet.');
  const rows: TableRow[] = [];
  sheet.eachRow({ includeEmpty: false }, (row, rowNumber) => {
    const cells: string[] = [];
    row.eachCell({ includeEmpty: true }, (cell, column) => {
      const value = cell.value;
      const plain = value !== null && typeof value === 'object' && 'result' in value ? value.result : value;
      cells[column - 1] = plain === null || plain === undefined ? '' : typeof plain === 'object' && 'richText' in plain ? plain.richText.map((r) => r.text).join('') : String(plain);
    });
    rows.push({ rowNumber, cells: Array.from(cells, (cell) => cell ?? '') });
  });
  return rows;
}

/**
 * A footing schedule from an uploaded CSV or XLSX file (told apart by content, not by name):
 * the rows that read and a message for every row that does not. Nothing is saved.
 */
export async function importFootingFile(bytes: Buffer | undefined): Promise<FootingImportResult> {
  if (!bytes || bytes.length === 0) throw new DomainError('invalid_file', 'The file is empty. Choose a CSV or XLSX file with one footing per row.');
  if (bytes.length > FOOTING_FILE_MAX_BYTES) throw new DomainError('payload_too_large', 'The file is larger than 5 MB, far more than a footing schedule. Choose the schedule itself.');
  if (bytes.subarray(0, 4).equals(ZIP_MAGIC)) return footingRowsFromTable(await tableFromWorkbook(bytes));
  if (bytes.includes(0)) throw new DomainError('unsupported_file', 'The file is neither CSV text nor an XLSX workbook. Save the schedule as CSV or .xlsx and import that.');
  return footingRowsFromTable(tableFromText(bytes.toString('utf8')));
}
