import { convertUnit, dialReadingsToDeformation } from '@porestack/geo-core';
import type { ImportIssue, ImportMapping, StressUnit, TimeUnit } from '@porestack/types';
import { ImportProblem, MAXIMUM_LISTED_ISSUES } from './import-problem.js';
import { cellText, type Cell, type RawTable } from './raw-table.js';
import { headerOf } from './detect-layout.js';

/** The readings of a file, checked and in kPa, minutes and mm, as columns (compact for 500k rows). */
export interface ParsedReadings {
  readonly count: number;
  readonly incrementCount: number;
  readonly rowNumber: Int32Array;
  readonly incrementIndex: Int32Array;
  readonly stressKpa: Float64Array;
  readonly elapsedMin: Float64Array;
  readonly deformationMm: Float64Array;
}

/** Minutes per unit: geo-core's unit table has no time units, and these three are exact. */
const MINUTES_PER: Record<TimeUnit, number> = { min: 1, s: 1 / 60, h: 60 };
const STRESS_SYMBOL: Record<StressUnit, string> = { kPa: 'kPa', kgfPerCm2: 'kgf/cm²', tsf: 'tsf', psi: 'psi', MPa: 'MPa' };
const TIME_SYMBOL: Record<TimeUnit, string> = { min: 'minutes', s: 'seconds', h: 'hours' };
const NUMBER_PATTERN = /^[+-]?(\d+\.?\d*|\.\d+)([eE][+-]?\d+)?$/;

type Field = keyof ImportMapping['columns'];

/**
 * Reads the readings out of a file's rows with a mapping, and checks them strictly. Every
 * rejected row is listed with its row number, the column's name as in the file and the
 * reason: an empty or non-numeric cell, an increment that is not a whole number, stress not
 * above zero or changing within an increment, negative time, time going backwards or a
 * repeated reading within an increment, increments split apart or not numbered one after
 * another. Stress is converted to kPa, time to minutes, deformation (or a gauge reading,
 * through geo-core's dialReadingsToDeformation) to mm, compression positive.
 * @throws ImportProblem listing the problems; nothing is returned unless every row is good.
 */
export function readReadings(table: RawTable, mapping: ImportMapping): ParsedReadings {
  const header = headerOf(table, mapping.headerRow);
  if (header.length === 0) {
    throw new ImportProblem(`Row ${mapping.headerRow} should hold the column names, but the file has no such row. Check the header row in the import settings.`);
  }
  const positions = columnPositions(header, mapping);
  const dataRows = table.rows.filter((row) => row.rowNumber > mapping.headerRow);
  const issues: ImportIssue[] = [];
  let issueCount = 0;
  const report = (row: number, field: Field | null, message: string): void => {
    issueCount += 1;
    if (issues.length < MAXIMUM_LISTED_ISSUES) {
      const column = field === null ? null : (mapping.columns[field] ?? null);
      issues.push({ row, column, message: `Row ${row}${column ? `, column ${column}` : ''}: ${message}` });
    }
  };
  const capacity = dataRows.length;
  const rowNumber = new Int32Array(capacity);
  const incrementIndex = new Int32Array(capacity);
  const stressRaw = new Float64Array(capacity);
  const timeRaw = new Float64Array(capacity);
  const deformationRaw = new Float64Array(capacity);
  const decimalComma = mapping.decimalSeparator === ',';
  const hints = hintsFor(mapping);
  const seen = new Map<number, number>();
  let current: { index: number; stress: number; firstRow: number; lastTime: number; lastDeformation: number; lastRow: number } | null = null;
  let count = 0;
  let incrementCount = 0;

  for (const row of dataRows) {
    const cells = row.cells;
    if (
      isBlank(cells, positions.increment) &&
      isBlank(cells, positions.stress) &&
      isBlank(cells, positions.elapsedTime) &&
      isBlank(cells, positions.deformation)
    ) {
      continue;
    }
    let rowOk = true;
    // Hot loop (500,000 rows): no per-row allocation unless the row is rejected.
    const numeric = (field: Field): number => {
      const position = positions[field];
      if (position === null) return 0;
      const value = toNumber(cells[position], decimalComma);
      if (typeof value === 'number') return value;
      rowOk = false;
      report(row.rowNumber, field, value === 'empty' ? `the cell is empty; ${hints[field]}.` : `'${cellText(cells[position])}' is not a number; ${hints[field]}${value === 'decimal-comma' ? " (it has a decimal comma: choose ',' as the decimal separator in the import settings)" : ''}.`);
      return Number.NaN;
    };
    const numbers = { increment: numeric('increment'), stress: numeric('stress'), elapsedTime: numeric('elapsedTime'), deformation: numeric('deformation') };
    if (!rowOk) {
      // A row rejected only for its deformation still has a good time: keep it as the increment's
      // latest, so a later row that goes back in time is reported in this same pass.
      if (current !== null && Number.isNaN(numbers.deformation) && numbers.elapsedTime > current.lastTime
        && (positions.increment !== null ? numbers.increment === current.index : numbers.stress === current.stress)) {
        current.lastTime = numbers.elapsedTime;
        current.lastDeformation = Number.NaN;
        current.lastRow = row.rowNumber;
      }
      continue;
    }
    /** The cell as written, for messages. */
    const text = (field: Field): string => {
      const position = positions[field];
      return position === null ? '' : cellText(cells[position]);
    };
    const { stress, elapsedTime, deformation } = numbers;
    if (positions.increment !== null && (!Number.isInteger(numbers.increment) || numbers.increment < 0)) {
      report(row.rowNumber, 'increment', `'${text('increment')}' is not a whole number ≥ 0; ${hints.increment}.`);
      continue;
    }
    if (!(stress > 0)) {
      report(row.rowNumber, 'stress', `${text('stress')} ${STRESS_SYMBOL[mapping.units.stress]} is ${stress < 0 ? 'negative' : 'zero'}; the applied stress must be above zero — ${hints.stress}.`);
      continue;
    }
    if (elapsedTime < 0) {
      report(row.rowNumber, 'elapsedTime', `${text('elapsedTime')} is negative; ${hints.elapsedTime} (0 for the reading taken as the load goes on).`);
      continue;
    }
    const startsIncrement = current === null || (positions.increment !== null ? numbers.increment !== current.index : stress !== current.stress);
    if (startsIncrement) {
      const index: number = positions.increment !== null ? numbers.increment : (current?.index ?? 0) + 1;
      const earlier = seen.get(index);
      if (earlier !== undefined) {
        report(row.rowNumber, 'increment', `increment ${index} appears again after other increments (it started at row ${earlier}); keep all readings of an increment together, increments in test order.`);
        continue;
      }
      if (current !== null && index !== current.index + 1) {
        report(row.rowNumber, 'increment', `increment ${index} follows increment ${current.index} (row ${current.lastRow}); increments must be numbered one after another in test order (${current.index + 1} expected here).`);
      }
      seen.set(index, row.rowNumber);
      current = { index, stress, firstRow: row.rowNumber, lastTime: elapsedTime, lastDeformation: deformation, lastRow: row.rowNumber };
      incrementCount += 1;
    } else if (current !== null) {
      if (stress !== current.stress) {
        report(row.rowNumber, 'stress', `${text('stress')} ${STRESS_SYMBOL[mapping.units.stress]} differs from the ${current.stress} ${STRESS_SYMBOL[mapping.units.stress]} of increment ${current.index} (from row ${current.firstRow}); every row of an increment carries the same stress.`);
        continue;
      }
      if (elapsedTime === current.lastTime) {
        report(
          row.rowNumber,
          null,
          deformation === current.lastDeformation
            ? `repeats row ${current.lastRow} (increment ${current.index} at ${text('elapsedTime')}); remove the duplicate row.`
            : `a second reading of increment ${current.index} at ${text('elapsedTime')} (row ${current.lastRow} has one); keep one reading per time.`,
        );
        continue;
      }
      if (elapsedTime < current.lastTime) {
        report(row.rowNumber, 'elapsedTime', `time goes backwards within increment ${current.index}: ${text('elapsedTime')} after ${current.lastTime} at row ${current.lastRow}; list each increment's readings in time order.`);
        continue;
      }
      current.lastTime = elapsedTime;
      current.lastDeformation = deformation;
      current.lastRow = row.rowNumber;
    }
    if (current === null) continue;
    rowNumber[count] = row.rowNumber;
    incrementIndex[count] = current.index;
    stressRaw[count] = stress;
    timeRaw[count] = elapsedTime;
    deformationRaw[count] = deformation;
    count += 1;
  }

  if (issueCount === 0 && count === 0) {
    throw new ImportProblem(`The file has a header (row ${mapping.headerRow}) but no readings below it. Add one row per reading, or download a template to see the layout.`);
  }
  if (issueCount > 0) {
    const first = issues[0]?.message ?? '';
    throw new ImportProblem(
      `${issueCount.toLocaleString('en-GB')} problem${issueCount === 1 ? '' : 's'} found, so nothing was imported. ${issueCount > 1 ? 'The first — ' : ''}${first} Correct the file and upload it again.`,
      issues,
      issueCount,
    );
  }
  return {
    count,
    incrementCount,
    rowNumber: rowNumber.subarray(0, count),
    incrementIndex: incrementIndex.subarray(0, count),
    stressKpa: scaled(stressRaw.subarray(0, count), convertUnit(1, mapping.units.stress, 'kPa')),
    elapsedMin: scaled(timeRaw.subarray(0, count), MINUTES_PER[mapping.units.time]),
    deformationMm: deformationInMm(deformationRaw.subarray(0, count), timeRaw.subarray(0, count), mapping),
  };
}

function columnPositions(header: readonly string[], mapping: ImportMapping): Record<Field, number | null> {
  const positionOf = (field: Field): number | null => {
    const name = mapping.columns[field];
    if (name === null || name === undefined) return null;
    let position = header.indexOf(name);
    if (position === -1) position = header.findIndex((candidate) => candidate.trim().toLowerCase() === name.trim().toLowerCase());
    if (position === -1) {
      const found = header.filter((candidate) => candidate !== '').map((candidate) => `'${candidate}'`).join(', ');
      throw new ImportProblem(
        `The column '${name}' chosen for ${FIELD_LABEL[field]} is not in row ${mapping.headerRow} of the file (found ${found || 'no column names'}). Choose one of the columns found, or the row that holds the column names.`,
        [{ row: mapping.headerRow, column: name, message: `No column named '${name}'.` }],
      );
    }
    return position;
  };
  return { increment: positionOf('increment'), stress: positionOf('stress'), elapsedTime: positionOf('elapsedTime'), deformation: positionOf('deformation') };
}

const FIELD_LABEL: Record<Field, string> = { increment: 'the increment number', stress: 'the stress', elapsedTime: 'the elapsed time', deformation: 'the deformation' };

function hintsFor(mapping: ImportMapping): Record<Field, string> {
  return {
    increment: 'enter the increment number, e.g. 3',
    stress: `enter the applied stress in ${STRESS_SYMBOL[mapping.units.stress]}, e.g. ${mapping.units.stress === 'kPa' ? '200' : '2'}`,
    elapsedTime: `enter the time since the load was applied, in ${TIME_SYMBOL[mapping.units.time]}, e.g. 15`,
    deformation:
      mapping.deformationReading.kind === 'dial'
        ? 'enter the gauge reading, e.g. 1254'
        : `enter the deformation in ${mapping.units.deformation} since the start of the test, compression positive, e.g. 0.412`,
  };
}

function isBlank(cells: readonly Cell[], position: number | null): boolean {
  if (position === null) return true;
  const cell = cells[position];
  return cell === null || cell === undefined || (typeof cell === 'string' && cell.trim() === '');
}

function toNumber(cell: Cell | undefined, decimalComma: boolean): number | 'empty' | 'text' | 'decimal-comma' {
  if (cell === null || cell === undefined) return 'empty';
  if (typeof cell === 'number') return Number.isFinite(cell) ? cell : 'text';
  let text = cell.trim();
  if (text === '') return 'empty';
  if (decimalComma) text = text.replace(',', '.');
  if (NUMBER_PATTERN.test(text)) {
    const value = Number(text);
    return Number.isFinite(value) ? value : 'text';
  }
  return !decimalComma && /^[+-]?\d+,\d+$/.test(text) ? 'decimal-comma' : 'text';
}

function scaled(values: Float64Array, factor: number): Float64Array {
  if (factor === 1) return values;
  const out = new Float64Array(values.length);
  for (let i = 0; i < values.length; i += 1) out[i] = (values[i] as number) * factor;
  return out;
}

function deformationInMm(values: Float64Array, times: Float64Array, mapping: ImportMapping): Float64Array {
  const mmPerUnit = convertUnit(1, mapping.units.deformation, 'mm');
  const reading = mapping.deformationReading;
  if (reading.kind === 'deformation') return scaled(values, mmPerUnit);
  const gauge = {
    zeroReading: reading.zeroReading ?? (values[0] as number),
    mmPerDivision: reading.divisionSize * mmPerUnit,
    compressionIncreasesReading: reading.increasesWithCompression,
  };
  const readings = Array.from(values, (dialReading, i) => ({ elapsedMin: times[i] as number, dialReading }));
  return Float64Array.from(dialReadingsToDeformation(readings, gauge), (converted) => converted.deformationMm);
}
