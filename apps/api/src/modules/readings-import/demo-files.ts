import { convertUnit } from '@porestack/geo-core';
import type { ImportMapping } from '@porestack/types';
import ExcelJS from 'exceljs';
import { DEMO_SPECIMEN, demoReadings, demoReadingsCsv, type DemoReading } from './demo-readings.js';

/** The canonical CSV with the demo numbers: what GET /templates/readings.csv answers. */
export function canonicalCsvTemplate(readings: readonly DemoReading[] = demoReadings()): string {
  return demoReadingsCsv(readings);
}

/** The canonical layout on the first sheet, and the demo specimen on a sheet named "specimen". */
export async function canonicalXlsxTemplate(readings: readonly DemoReading[] = demoReadings()): Promise<Buffer> {
  const workbook = new ExcelJS.Workbook();
  workbook.creator = 'Porestack';
  const sheet = workbook.addWorksheet('readings');
  sheet.addRow(['increment', 'stress_kpa', 'elapsed_min', 'deformation_mm']);
  for (const r of readings) sheet.addRow([r.increment, r.stressKpa, r.elapsedMin, r.deformationMm]);
  const specimen = workbook.addWorksheet('specimen');
  specimen.addRow(['key', 'value']);
  for (const [key, value] of Object.entries(DEMO_SPECIMEN)) specimen.addRow([key, value]);
  return Buffer.from(await workbook.xlsx.writeBuffer());
}

/**
 * The gauge of the "bench logger" layout: 0.001 mm divisions, reading 5000 at the start and
 * falling as the specimen compresses.
 */
export const LOGGER_DIAL = { zeroReading: 5000, divisionSize: 0.001, increasesWithCompression: false } as const;

/** The mapping that reads the logger layout (what a person picks in the mapping step). */
export const LOGGER_MAPPING: ImportMapping = {
  decimalSeparator: '.',
  headerRow: 1,
  sheets: 'first',
  stressFrom: 'column',
  time: { format: 'number', origin: 'increment', dateOrder: 'dmy' },
  columns: { increment: 'Stage', stress: 'Load (kgf/cm2)', elapsedTime: 'Time (s)', deformation: 'Dial (div)' },
  units: { stress: 'kgfPerCm2', time: 's', deformation: 'mm' },
  deformationReading: { kind: 'dial', ...LOGGER_DIAL },
};

/** Rows of an invented bench logger: stage, load in kgf/cm², seconds, raw dial divisions. */
function loggerRows(readings: readonly DemoReading[]): Array<[number, number, number, number]> {
  return readings.map((r) => [
    r.increment,
    Math.round(convertUnit(r.stressKpa, 'kPa', 'kgfPerCm2') * 1e6) / 1e6,
    Math.round(r.elapsedMin * 60 * 1000) / 1000,
    Math.round(LOGGER_DIAL.zeroReading - r.deformationMm / LOGGER_DIAL.divisionSize),
  ]);
}

/** A layout that needs the mapping step: other column names, seconds, kgf/cm², dial divisions. */
export async function loggerLayoutXlsx(readings: readonly DemoReading[] = demoReadings()): Promise<Buffer> {
  const workbook = new ExcelJS.Workbook();
  const sheet = workbook.addWorksheet('Log');
  sheet.addRow(['Stage', 'Load (kgf/cm2)', 'Time (s)', 'Dial (div)']);
  for (const row of loggerRows(readings)) sheet.addRow(row);
  return Buffer.from(await workbook.xlsx.writeBuffer());
}

export function loggerLayoutCsv(readings: readonly DemoReading[] = demoReadings()): string {
  return `${['Stage;Load (kgf/cm2);Time (s);Dial (div)', ...loggerRows(readings).map((row) => row.join(';'))].join('\n')}\n`;
}
