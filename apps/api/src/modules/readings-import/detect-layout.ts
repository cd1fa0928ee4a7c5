import { READINGS_CSV_HEADER } from '@porestack/geo-core';
import type { ImportMapping, Layout, StressUnit, TimeUnit } from '@porestack/types';
import { cellText, type RawTable } from './raw-table.js';

/** The mapping that reads the canonical layout: geo-core's readings CSV columns, kPa, min, mm. */
export const CANONICAL_MAPPING: ImportMapping = {
  decimalSeparator: '.',
  headerRow: 1,
  columns: { increment: 'increment', stress: 'stress_kpa', elapsedTime: 'elapsed_min', deformation: 'deformation_mm' },
  units: { stress: 'kPa', time: 'min', deformation: 'mm' },
  deformationReading: { kind: 'deformation' },
};

/** The column names of the header row, as written. */
export function headerOf(table: RawTable, headerRow = 1): string[] {
  const row = table.rows.find((candidate) => candidate.rowNumber === headerRow);
  return row ? row.cells.map((cell) => cellText(cell)) : [];
}

/**
 * 'canonical' when the first row is exactly `increment,stress_kpa,elapsed_min,deformation_mm`
 * (any case, surrounding spaces ignored): such a file imports with no questions.
 */
export function detectLayout(table: RawTable): Layout {
  const header = headerOf(table).map((name) => name.toLowerCase());
  while (header.length > READINGS_CSV_HEADER.length && header[header.length - 1] === '') header.pop();
  const canonical = header.length === READINGS_CSV_HEADER.length && READINGS_CSV_HEADER.every((name, position) => header[position] === name);
  return canonical ? 'canonical' : 'needs_mapping';
}

const STRESS_UNITS: Array<[RegExp, StressUnit]> = [
  [/kgf|kg\/cm/i, 'kgfPerCm2'],
  [/tsf|ton/i, 'tsf'],
  [/psi/i, 'psi'],
  [/mpa/i, 'MPa'],
];
const TIME_UNITS: Array<[RegExp, TimeUnit]> = [
  [/\bsec|\(s\)|_s\b|\[s\]/i, 's'],
  [/hour|\(h\)|_h\b|\[h\]|\bhrs?\b/i, 'h'],
];

/**
 * A first guess at the mapping from the column names (e.g. "Load (kgf/cm2)", "Time (s)",
 * "Dial (div)"), for the mapping form to start from; the person confirms or corrects it.
 */
export function suggestMapping(header: readonly string[]): ImportMapping | null {
  const find = (pattern: RegExp, taken: Set<string>): string | null => header.find((name) => name !== '' && !taken.has(name) && pattern.test(name)) ?? null;
  const taken = new Set<string>();
  const take = (pattern: RegExp): string | null => {
    const found = find(pattern, taken);
    if (found) taken.add(found);
    return found;
  };
  const increment = take(/incr|stage|step|load ?(no|#|number)|^inc\b/i);
  const elapsedTime = take(/time|elapsed|\bmin|\bsec|\bt\b/i);
  const dial = take(/dial|gauge|gage|reading|lvdt/i);
  const deformation = dial ?? take(/deform|settle|displ|compress|strain|height|\bd\b/i);
  const stress = take(/stress|load|press|σ|sigma/i);
  if (!stress || !elapsedTime || !deformation) return null;
  const stressUnit = STRESS_UNITS.find(([pattern]) => pattern.test(stress))?.[1] ?? 'kPa';
  const timeUnit = TIME_UNITS.find(([pattern]) => pattern.test(elapsedTime))?.[1] ?? 'min';
  const deformationUnit = /\bin\b|inch|"/i.test(deformation) ? 'in' : 'mm';
  return {
    decimalSeparator: '.',
    headerRow: 1,
    columns: { increment, stress, elapsedTime, deformation },
    units: { stress: stressUnit, time: timeUnit, deformation: deformationUnit },
    deformationReading: dial ? { kind: 'dial', divisionSize: deformationUnit === 'in' ? 0.0001 : 0.001, increasesWithCompression: true } : { kind: 'deformation' },
  };
}
