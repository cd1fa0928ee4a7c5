import { READINGS_CSV_HEADER } from '@porestack/geo-core';
import type { ImportMapping, Layout } from '@porestack/types';
import { firstSheetRows, headerOf, type RawTable } from './raw-table.js';

/** The mapping that reads the canonical layout: geo-core's readings CSV columns, kPa, min, mm. */
export const CANONICAL_MAPPING: ImportMapping = {
  decimalSeparator: '.',
  headerRow: 1,
  sheets: 'first',
  stressFrom: 'column',
  columns: { increment: 'increment', stress: 'stress_kpa', elapsedTime: 'elapsed_min', deformation: 'deformation_mm' },
  units: { stress: 'kPa', time: 'min', deformation: 'mm' },
  time: { format: 'number', origin: 'increment', dateOrder: 'dmy' },
  deformationReading: { kind: 'deformation' },
};

/**
 * 'canonical' when the first row is exactly `increment,stress_kpa,elapsed_min,deformation_mm`
 * (any case, surrounding spaces ignored): such a file imports with no questions.
 */
export function detectLayout(table: RawTable): Layout {
  const header = headerOf(firstSheetRows(table)).map((name) => name.toLowerCase());
  while (header.length > READINGS_CSV_HEADER.length && header[header.length - 1] === '') header.pop();
  const canonical = header.length === READINGS_CSV_HEADER.length && READINGS_CSV_HEADER.every((name, position) => header[position] === name);
  return canonical ? 'canonical' : 'needs_mapping';
}
