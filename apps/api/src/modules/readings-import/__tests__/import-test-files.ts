import { readFileSync } from 'node:fs';
import path from 'node:path';
import { fileURLToPath } from 'node:url';
import ExcelJS from 'exceljs';

/** The committed sample files (written by fixtures/generate-readings.ts). */
export function fixture(name: string): Buffer {
  return readFileSync(path.resolve(path.dirname(fileURLToPath(import.meta.url)), '../../../../../../fixtures/readings', name));
}

export const CANONICAL_HEADER = 'increment,stress_kpa,elapsed_min,deformation_mm';

/** A canonical CSV from rows written as text. */
export function csv(...rows: string[]): Buffer {
  return Buffer.from(`${[CANONICAL_HEADER, ...rows].join('\n')}\n`);
}

/** A workbook built cell by cell, for formula and merged-cell cases. */
export async function workbook(build: (sheet: ExcelJS.Worksheet) => void): Promise<Buffer> {
  const book = new ExcelJS.Workbook();
  const sheet = book.addWorksheet('readings');
  sheet.addRow(['increment', 'stress_kpa', 'elapsed_min', 'deformation_mm']);
  build(sheet);
  return Buffer.from(await book.xlsx.writeBuffer());
}
