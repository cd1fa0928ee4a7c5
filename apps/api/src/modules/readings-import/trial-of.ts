import type { ImportMapping, ImportTrial } from '@porestack/types';
import { ImportProblem } from './import-problem.js';
import type { RawRow, RawTable } from './raw-table.js';
import { headerOf } from './raw-table.js';
import { inspectReadings } from './read-readings.js';

/** Readings of the first increment shown in a trial; a logger's first day can have thousands. */
const TRIAL_READINGS = 200;

/**
 * The first increment read with a mapping, from the rows a preview holds: each reading's
 * time and deformation cells as written beside the minutes and millimetres they import as,
 * so a wrong division, direction or time setting shows before the import. Problems in those
 * rows are listed, not thrown; a missing column is one problem.
 */
export function trialOf(table: RawTable, mapping: ImportMapping): ImportTrial {
  let inspection;
  try {
    inspection = inspectReadings(table, mapping, { incrementLimit: 1 });
  } catch (error) {
    if (!(error instanceof ImportProblem)) throw error;
    return { increment: null, issues: error.issues.length > 0 ? [...error.issues] : [{ row: mapping.headerRow, column: null, message: error.message }], issueCount: Math.max(1, error.issueCount), notes: [] };
  }
  const { readings, issues, issueCount, notes } = inspection;
  if (readings.count === 0) return { increment: null, issues, issueCount, notes };
  const sheet = table.sheets[readings.sheetIndex[0] as number];
  const rows = new Map<number, RawRow>((sheet?.rows ?? []).map((row) => [row.rowNumber, row]));
  const header = headerOf(sheet?.rows ?? [], mapping.headerRow);
  const position = (name: string) => {
    const exact = header.indexOf(name);
    return exact !== -1 ? exact : header.findIndex((candidate) => candidate.trim().toLowerCase() === name.trim().toLowerCase());
  };
  const timeAt = position(mapping.columns.elapsedTime);
  const deformationAt = position(mapping.columns.deformation);
  const shown = Math.min(readings.count, TRIAL_READINGS);
  const trialReadings = Array.from({ length: shown }, (_, i) => {
    const row = rows.get(readings.rowNumber[i] as number);
    return {
      rowNumber: readings.rowNumber[i] as number,
      time: row?.cells[timeAt] ?? null,
      deformation: row?.cells[deformationAt] ?? null,
      elapsedMin: readings.elapsedMin[i] as number,
      deformationMm: readings.deformationMm[i] as number,
    };
  });
  return {
    increment: { index: readings.incrementIndex[0] as number, stressKpa: readings.stressKpa[0] as number, sheet: mapping.sheets === 'each' ? (sheet?.name ?? null) : null, readings: trialReadings },
    issues,
    issueCount,
    notes,
  };
}
