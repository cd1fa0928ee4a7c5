import { convertUnit, dialReadingsToDeformation } from '@porestack/geo-core';
import type { ImportField, ImportIssue, ImportMapping, ImportNote, TimeUnit } from '@porestack/types';
import { columnPositions, type ColumnPositions } from './column-positions.js';
import { ImportProblem, MAXIMUM_LISTED_ISSUES } from './import-problem.js';
import { cellText, headerOf, type Cell, type RawTable } from './raw-table.js';
import { numberIn, timeCellMinutes } from './read-time.js';
import { cellProblem, hintsFor, STRESS_SYMBOL } from './readings-messages.js';
import { stressFromSheetName } from './sheet-stress.js';

/** The readings of a file, checked and in kPa, minutes and mm, as columns (compact for 500k rows). */
export interface ParsedReadings {
  readonly count: number;
  readonly incrementCount: number;
  /** The sheet each reading came from, 0 for a CSV or a workbook's first sheet. */
  readonly sheetIndex: Int16Array;
  readonly rowNumber: Int32Array;
  readonly incrementIndex: Int32Array;
  readonly stressKpa: Float64Array;
  readonly elapsedMin: Float64Array;
  readonly deformationMm: Float64Array;
}

/** What reading the rows found: the readings kept, the rows refused, and what was dropped or replaced. */
export interface ReadingsInspection {
  readonly readings: ParsedReadings;
  readonly issues: ImportIssue[];
  readonly issueCount: number;
  readonly notes: ImportNote[];
  readonly noteCount: number;
}

/** Minutes per unit: geo-core's unit table has no time units, and these are exact. */
const MINUTES_PER: Record<TimeUnit, number> = { min: 1, s: 1 / 60, h: 60, d: 1440 };

interface Increment {
  index: number;
  stressKpa: number;
  firstRow: number;
  /** Minutes of the increment's first reading, subtracted when times count from the test's start. */
  originMin: number;
  lastTimeMin: number;
  lastTimeText: string;
  lastDeformation: number;
  lastRow: number;
}

/**
 * Reads the readings out of a file's rows with a mapping, and checks them strictly. Every
 * rejected row is listed with its row number (and sheet), the column's name as in the file
 * and the reason: an empty or unreadable cell, an increment that is not a whole number,
 * stress not above zero or changing within an increment, negative time, time going
 * backwards, increments split apart or not numbered one after another. A row repeating the
 * previous one exactly is dropped, and a second reading at the same time replaces the first
 * (the later is kept); both are listed as notes. Stress is converted to kPa, time to minutes
 * since the increment's start, deformation (or a gauge reading, through geo-core's
 * dialReadingsToDeformation) to mm, compression positive.
 * @param options.incrementLimit stop after this many increments (a trial of the mapping).
 * @throws ImportProblem when a mapped column is missing from the (first) header row.
 */
export function inspectReadings(table: RawTable, mapping: ImportMapping, options: { incrementLimit?: number } = {}): ReadingsInspection {
  const bySheet = mapping.sheets === 'each';
  const sheets = bySheet ? table.sheets : table.sheets.slice(0, 1);
  const capacity = sheets.reduce((sum, sheet) => sum + sheet.rows.length, 0);
  const sheetIndex = new Int16Array(capacity);
  const rowNumber = new Int32Array(capacity);
  const incrementIndex = new Int32Array(capacity);
  const stressKpa = new Float64Array(capacity);
  const elapsedMin = new Float64Array(capacity);
  const deformationRaw = new Float64Array(capacity);
  const issues: ImportIssue[] = [];
  const notes: ImportNote[] = [];
  let issueCount = 0;
  let noteCount = 0;
  const decimalComma = mapping.decimalSeparator === ',';
  const hints = hintsFor(mapping);
  const stressFactor = convertUnit(1, mapping.units.stress, 'kPa');
  const minutesPerUnit = MINUTES_PER[mapping.units.time];
  const fromFirstReading = mapping.time.origin === 'test' || mapping.time.format === 'datetime';
  const seen = new Map<number, number>();
  let current: Increment | null = null;
  // In an object: TypeScript would narrow a plain `let` to null across the loop.
  const started: { last: Increment | null } = { last: null };
  let count = 0;
  let incrementCount = 0;
  let sheetsRead = 0;

  for (let s = 0; s < sheets.length; s += 1) {
    const sheet = sheets[s] as RawTable['sheets'][number];
    const sheetName = bySheet ? sheet.name : null;
    const where = (row: number) => `${sheetName === null ? '' : `Sheet '${sheetName}', row`}${sheetName === null ? `Row ${row}` : ` ${row}`}`;
    const report = (row: number, field: ImportField | null, message: string): void => {
      issueCount += 1;
      if (issues.length >= MAXIMUM_LISTED_ISSUES) return;
      const column = field === null ? null : (mapping.columns[field] ?? null);
      issues.push({ row, column, message: `${where(row)}${column ? `, column ${column}` : ''}: ${message}`, ...(sheetName === null ? {} : { sheet: sheetName }) });
    };
    const note = (kind: ImportNote['kind'], row: number | null, column: string | null, message: string): void => {
      noteCount += 1;
      if (notes.length < MAXIMUM_LISTED_ISSUES) notes.push({ kind, row, column, message, ...(sheetName === null ? {} : { sheet: sheetName }) });
    };
    const header = headerOf(sheet.rows, mapping.headerRow);
    let positions: ColumnPositions;
    try {
      if (header.length === 0) {
        throw new ImportProblem(`Row ${mapping.headerRow}${sheetName === null ? '' : ` of sheet '${sheetName}'`} should hold the column names, but there is no such row. Check the header row in the import settings.`);
      }
      positions = columnPositions(header, mapping, sheetName);
    } catch (error) {
      // In a workbook of one increment a sheet, a sheet of something else (a summary) is passed over, and said so.
      if (!(error instanceof ImportProblem) || !bySheet || s === 0) throw error;
      note('dropped', null, null, `Sheet '${sheet.name}' was not read as an increment: ${error.message.replace(/ Choose one of .*$/, '')}`);
      continue;
    }
    sheetsRead += 1;
    let sheetStressKpa: number | null = null;
    if (mapping.stressFrom === 'sheetName') {
      const named = stressFromSheetName(sheet.name ?? '');
      if (named === null || !(named.value > 0)) {
        report(mapping.headerRow, null, `the sheet's name '${sheet.name}' holds no stress above zero; name the sheet after its stress, e.g. '100 kPa', or read the stress from a column.`);
        continue;
      }
      sheetStressKpa = named.value * convertUnit(1, named.unit ?? mapping.units.stress, 'kPa');
    }
    // Each sheet is its own increment: the next one starts with the sheet.
    if (bySheet) current = null;

    for (const row of sheet.rows) {
      if (row.rowNumber <= mapping.headerRow) continue;
      const cells = row.cells;
      if (isBlank(cells, positions.increment) && isBlank(cells, positions.stress) && isBlank(cells, positions.elapsedTime) && isBlank(cells, positions.deformation)) continue;
      let rowOk = true;
      // Hot loop (500,000 rows): no per-row allocation unless the row is rejected.
      const numeric = (field: 'increment' | 'stress' | 'deformation'): number => {
        const position = positions[field];
        if (position === null) return field === 'stress' && sheetStressKpa !== null ? sheetStressKpa / stressFactor : 0;
        const value = numberIn(cells[position], decimalComma);
        if (typeof value === 'number') return value;
        rowOk = false;
        report(row.rowNumber, field, cellProblem(value, cellText(cells[position]), hints[field]));
        return Number.NaN;
      };
      const increment = numeric('increment');
      const stress = numeric('stress') * stressFactor;
      const timePosition = positions.elapsedTime as number;
      const timeValue = timeCellMinutes(cells[timePosition], mapping.time.format, minutesPerUnit, decimalComma, mapping.time.dateOrder);
      let minutes = Number.NaN;
      if (typeof timeValue === 'number') minutes = timeValue;
      else {
        rowOk = false;
        report(row.rowNumber, 'elapsedTime', cellProblem(timeValue, cellText(cells[timePosition]), hints.elapsedTime));
      }
      const deformation = numeric('deformation');
      const sameIncrement = (at: Increment) => (positions.increment !== null ? increment === at.index : stress === at.stressKpa);
      if (!rowOk) {
        // A row rejected only for its deformation still has a good time: keep it as the increment's
        // latest, so a later row that goes back in time is reported in this same pass.
        if (current !== null && Number.isNaN(deformation) && minutes > current.lastTimeMin && sameIncrement(current)) {
          current.lastTimeMin = minutes;
          current.lastTimeText = cellText(cells[timePosition]);
          current.lastDeformation = Number.NaN;
          current.lastRow = row.rowNumber;
        }
        continue;
      }
      const text = (field: ImportField): string => {
        const position = positions[field];
        return position === null ? '' : cellText(cells[position]);
      };
      if (positions.increment !== null && (!Number.isInteger(increment) || increment < 0)) {
        report(row.rowNumber, 'increment', `'${text('increment')}' is not a whole number ≥ 0; ${hints.increment}.`);
        continue;
      }
      if (!(stress > 0)) {
        report(row.rowNumber, 'stress', `${text('stress')} ${STRESS_SYMBOL[mapping.units.stress]} is ${stress < 0 ? 'negative' : 'zero'}; the applied stress must be above zero — ${hints.stress}.`);
        continue;
      }
      if (minutes < 0 && mapping.time.format !== 'datetime') {
        report(row.rowNumber, 'elapsedTime', `${text('elapsedTime')} is negative; ${hints.elapsedTime} (0 for the reading taken as the load goes on).`);
        continue;
      }
      const startsIncrement = current === null || (!bySheet && !sameIncrement(current));
      if (startsIncrement) {
        if (options.incrementLimit !== undefined && incrementCount >= options.incrementLimit) break;
        const index: number = positions.increment !== null ? increment : (started.last?.index ?? 0) + 1;
        const earlier = seen.get(index);
        if (earlier !== undefined) {
          report(row.rowNumber, 'increment', `increment ${index} appears again after other increments (it started at row ${earlier}); keep all readings of an increment together, increments in test order.`);
          continue;
        }
        const previous = started.last;
        if (previous !== null && index !== previous.index + 1) {
          report(row.rowNumber, 'increment', `increment ${index} follows increment ${previous.index} (row ${previous.lastRow}); increments must be numbered one after another in test order (${previous.index + 1} expected here).`);
        }
        seen.set(index, row.rowNumber);
        current = { index, stressKpa: stress, firstRow: row.rowNumber, originMin: minutes, lastTimeMin: minutes, lastTimeText: text('elapsedTime'), lastDeformation: deformation, lastRow: row.rowNumber };
        started.last = current;
        incrementCount += 1;
      } else if (current !== null) {
        if (bySheet && positions.increment !== null && increment !== current.index) {
          report(row.rowNumber, 'increment', `increment ${increment} on the sheet of increment ${current.index} (from row ${current.firstRow}); each sheet holds one increment.`);
          continue;
        }
        if (stress !== current.stressKpa) {
          report(row.rowNumber, 'stress', `${text('stress')} ${STRESS_SYMBOL[mapping.units.stress]} differs from the ${Number((current.stressKpa / stressFactor).toPrecision(12))} ${STRESS_SYMBOL[mapping.units.stress]} of increment ${current.index} (from row ${current.firstRow}); every row of an increment carries the same stress.`);
          continue;
        }
        if (minutes === current.lastTimeMin) {
          if (deformation === current.lastDeformation) {
            note('dropped', row.rowNumber, null, `${where(row.rowNumber)} repeats row ${current.lastRow} exactly (increment ${current.index} at ${text('elapsedTime')}); the repeat was dropped.`);
          } else if (!Number.isNaN(current.lastDeformation) && count > 0) {
            note('replaced', row.rowNumber, mapping.columns.deformation, `${where(row.rowNumber)} is a second reading of increment ${current.index} at ${text('elapsedTime')} (${text('deformation')}; row ${current.lastRow} read ${current.lastDeformation}); the later reading was kept.`);
            rowNumber[count - 1] = row.rowNumber;
            deformationRaw[count - 1] = deformation;
            current.lastDeformation = deformation;
            current.lastRow = row.rowNumber;
          }
          continue;
        }
        if (minutes < current.lastTimeMin) {
          report(row.rowNumber, 'elapsedTime', `time goes backwards within increment ${current.index}: ${text('elapsedTime')} after ${current.lastTimeText} at row ${current.lastRow}; list each increment's readings in time order.`);
          continue;
        }
        current.lastTimeMin = minutes;
        current.lastTimeText = text('elapsedTime');
        current.lastDeformation = deformation;
        current.lastRow = row.rowNumber;
      }
      if (current === null) continue;
      sheetIndex[count] = s;
      rowNumber[count] = row.rowNumber;
      incrementIndex[count] = current.index;
      stressKpa[count] = stress;
      elapsedMin[count] = fromFirstReading ? minutes - current.originMin : minutes;
      deformationRaw[count] = deformation;
      count += 1;
    }
    if (options.incrementLimit !== undefined && incrementCount >= options.incrementLimit) break;
  }
  if (sheetsRead === 0 && issueCount === 0) throw new ImportProblem('No sheet of the workbook has the columns chosen. Check the row of the column names and the columns.');
  const readings: ParsedReadings = {
    count,
    incrementCount,
    sheetIndex: sheetIndex.subarray(0, count),
    rowNumber: rowNumber.subarray(0, count),
    incrementIndex: incrementIndex.subarray(0, count),
    stressKpa: stressKpa.subarray(0, count),
    elapsedMin: elapsedMin.subarray(0, count),
    deformationMm: deformationInMm(deformationRaw.subarray(0, count), elapsedMin.subarray(0, count), mapping),
  };
  return { readings, issues, issueCount, notes, noteCount };
}

/**
 * The readings of a file, every row checked (inspectReadings).
 * @throws ImportProblem listing the problems; nothing is returned unless every row is good.
 */
export function readReadings(table: RawTable, mapping: ImportMapping): Omit<ReadingsInspection, 'issues' | 'issueCount'> {
  const { readings, issues, issueCount, notes, noteCount } = inspectReadings(table, mapping);
  if (issueCount === 0 && readings.count === 0) {
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
  return { readings, notes, noteCount };
}

function isBlank(cells: readonly Cell[], position: number | null): boolean {
  if (position === null) return true;
  const cell = cells[position];
  return cell === null || cell === undefined || (typeof cell === 'string' && cell.trim() === '');
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
  // `+ 0` turns the −0 of a falling gauge at its zero into 0.
  return Float64Array.from(dialReadingsToDeformation(readings, gauge), (converted) => converted.deformationMm + 0);
}
