import type { ImportField, MappingGuess, MappingSetting } from '@porestack/types';
import { detectHeaderRow } from './detect-header-row.js';
import { guessColumns, namesAGauge, type GuessedColumn } from './guess-columns.js';
import { guessSheets } from './guess-sheets.js';
import { columnCells, guessDecimalSeparator, guessTimeFormat, numbersOf, trendOf } from './guess-values.js';
import { lengthUnitOf, stressUnitOf, timeUnitOf } from './header-units.js';
import { guessTimeOrigin } from './guess-time-origin.js';
import { headerOf, type RawTable } from './raw-table.js';

/** A guess with what it rests on and what it leaves to the person. */
export interface GuessedMapping {
  readonly detectedHeaderRow: number;
  readonly guess: MappingGuess;
  readonly reasons: Partial<Record<MappingSetting, string>>;
  readonly open: MappingSetting[];
}

const FIELD_WORD: Record<ImportField, string> = { increment: 'the increment number', stress: 'the stress', elapsedTime: 'the time', deformation: 'the deformation' };

/**
 * Guesses the whole mapping from a preview of the file: the header row below any title
 * rows (or the one chosen), each field's column and unit from the header's words, the
 * decimal mark, time format and origin, the gauge's division and direction from the values,
 * and, in a workbook, whether each sheet is one increment with its stress in the sheet's
 * name. Nothing is guessed without a reason given; what cannot be told from the file is
 * left open: a unit not written in the header, a gauge division given only as "div", a
 * gauge that does not move over the first increment.
 */
export function guessMapping(table: RawTable, chosenHeaderRow: number | null): GuessedMapping {
  const rows = table.sheets[0]?.rows ?? [];
  const detectedHeaderRow = detectHeaderRow(rows);
  const headerRow = chosenHeaderRow ?? detectedHeaderRow;
  const header = headerOf(rows, headerRow);
  const dataRows = rows.filter((row) => row.rowNumber > headerRow);
  const reasons: Partial<Record<MappingSetting, string>> = {};
  const open: MappingSetting[] = [];
  reasons.headerRow = chosenHeaderRow !== null ? `Row ${headerRow}, as chosen.` : headerRow === 1 ? 'The first row holds the column names.' : `Row ${headerRow} looks like the column names; the rows above it look like titles.`;

  const columns = guessColumns(header);
  for (const field of ['increment', 'stress', 'elapsedTime', 'deformation'] as const) {
    const column = columns[field];
    if (column) reasons[field] = `From the header '${column.name}'.`;
  }
  const cellsOf = (column: GuessedColumn | null) => (column ? columnCells(dataRows, header.indexOf(column.name)) : []);

  const decimal = table.delimiter === ',' ? { separator: '.' as const, example: null } : guessDecimalSeparator([...cellsOf(columns.stress), ...cellsOf(columns.elapsedTime), ...cellsOf(columns.deformation)]);
  reasons.decimalSeparator = decimal.example !== null ? `Values such as '${decimal.example}' have a decimal comma.` : 'Values are written with a decimal point.';
  const decimalComma = decimal.separator === ',';

  const sheets = guessSheets(table, headerRow, columns);
  if (sheets.reason) reasons.sheets = sheets.reason;
  if (sheets.stressReason) reasons.stressFrom = sheets.stressReason;

  // Stress unit: from the header, else from the sheet names.
  let stressUnit = columns.stress?.parts.unit ? stressUnitOf(columns.stress.parts.unit) : null;
  if (stressUnit) reasons.stressUnit = `The header '${columns.stress?.name}' gives the unit.`;
  else if (sheets.stressFrom === 'sheetName' && sheets.sheetUnit) {
    stressUnit = sheets.sheetUnit;
    reasons.stressUnit = 'The sheet names give the unit.';
  } else open.push('stressUnit');

  const timeCells = cellsOf(columns.elapsedTime);
  const timeFormat = guessTimeFormat(timeCells);
  const headerTimeUnit = columns.elapsedTime?.parts.unit ? timeUnitOf(columns.elapsedTime.parts.unit) : null;
  const format = timeFormat.format !== 'number' ? timeFormat.format : headerTimeUnit === 'duration' ? 'duration' : 'number';
  const timeUnit = headerTimeUnit === null || headerTimeUnit === 'duration' ? null : headerTimeUnit;
  reasons.timeFormat = format === 'duration' ? `Times are written as h:mm:ss${timeFormat.example ? ` ('${timeFormat.example}')` : ''}.` : format === 'datetime' ? `Times are dates with a time of day ('${timeFormat.example}').` : 'Times are numbers.';
  if (format === 'number') {
    if (timeUnit) reasons.timeUnit = `The header '${columns.elapsedTime?.name}' gives the unit.`;
    else open.push('timeUnit');
  }
  if (format === 'datetime') {
    if (timeFormat.dateOrderKnown) reasons.dateOrder = timeFormat.dateOrder === 'dmy' ? 'The dates put the day first.' : 'The dates put the month first.';
    else open.push('dateOrder');
  }

  const origin = guessTimeOrigin(table, header, headerRow, columns, sheets.layout, { format, minutesPerUnit: 1, decimalComma, dateOrder: timeFormat.dateOrder });
  reasons.timeOrigin = origin.reason;

  // Over the rows read a specimen compresses, whatever a first, light load did (some swell).
  const deformation = guessDeformation(columns.deformation, numbersOf(cellsOf(columns.deformation), decimalComma), reasons, open);

  for (const field of ['stress', 'elapsedTime', 'deformation'] as const) {
    if (columns[field] === null && !(field === 'stress' && sheets.stressFrom === 'sheetName')) {
      open.push(field);
      reasons[field] = `No column's name says it holds ${FIELD_WORD[field]}: choose it.`;
    }
  }
  if (columns.increment === null) reasons.increment = sheets.layout === 'each' ? 'Each sheet is one increment.' : 'No increment column: a new increment starts wherever the stress changes.';

  const guess: MappingGuess = {
    delimiter: table.delimiter,
    decimalSeparator: decimal.separator,
    headerRow,
    sheets: sheets.layout,
    stressFrom: sheets.stressFrom,
    columns: { increment: columns.increment?.name ?? null, stress: sheets.stressFrom === 'sheetName' ? null : (columns.stress?.name ?? null), elapsedTime: columns.elapsedTime?.name ?? null, deformation: columns.deformation?.name ?? null },
    units: { stress: stressUnit ?? 'kPa', time: timeUnit ?? 'min', deformation: deformation.unit },
    time: { format, origin: origin.origin, dateOrder: timeFormat.dateOrder },
    deformationReading: deformation.reading,
  };
  return { detectedHeaderRow, guess, reasons, open };
}

/**
 * The deformation column's unit, kind, division and direction. A gauge (by its words, its
 * unit µm or "0.01 mm", or values that fall as the specimen compresses) reads from a zero
 * with a division and a direction; the direction is the trend over the rows read (a test
 * compresses its specimen far more than a first light load may swell it). A
 * deformation written in mm or inches that rises is taken as it is.
 */
function guessDeformation(column: GuessedColumn | null, firstValues: readonly number[], reasons: Partial<Record<MappingSetting, string>>, open: MappingSetting[]): { unit: 'mm' | 'in'; reading: MappingGuess['deformationReading'] } {
  const unitText = column?.parts.unit ?? null;
  const length = unitText ? lengthUnitOf(unitText) : null;
  const unit = length?.unit ?? 'mm';
  if (!column) return { unit, reading: { kind: 'deformation', zeroReading: null, divisionSize: null, increasesWithCompression: null } };
  if (length && length.division !== null) reasons.deformationUnit = `The header '${column.name}' gives the unit.`;
  else if (!length) open.push('deformationUnit');
  const gauge = namesAGauge(column);
  const trend = trendOf(firstValues);
  if (!gauge && length?.division === 1 && trend !== 'falls') {
    reasons.deformationKind = trend === 'rises' ? `'${column.name}' grows as the loads go on: a deformation, compression positive.` : `'${column.name}' names a deformation.`;
    return { unit, reading: { kind: 'deformation', zeroReading: null, divisionSize: null, increasesWithCompression: null } };
  }
  reasons.deformationKind = gauge ? `'${column.name}' names a gauge reading.` : `'${column.name}' is read like a gauge: its values ${trend === 'falls' ? 'fall as the loads go on' : `are in ${unitText}`}.`;
  // A deformation-like column counts from zero; a gauge from its first reading.
  const zeroReading = gauge ? null : 0;
  reasons.dialZero = gauge ? 'The first reading of the file is the zero.' : 'The column counts from zero.';
  let divisionSize: number | null = length?.division ?? null;
  if (divisionSize !== null) reasons.dialDivision = divisionSize === 1 ? `The gauge reads in ${unit === 'in' ? 'inches' : 'mm'} ('${column.name}'): one division is 1 ${unit}.` : `The header '${column.name}' gives one division as ${divisionSize} ${unit}.`;
  else {
    open.push('dialDivision');
    divisionSize = null;
  }
  let increasesWithCompression: boolean | null = null;
  if (trend === 'flat') open.push('dialDirection');
  else {
    increasesWithCompression = trend === 'rises';
    reasons.dialDirection = `The reading ${trend === 'rises' ? 'rises' : 'falls'} from the first rows to the last rows read (${firstValues.length.toLocaleString('en-GB')} readings); check the first increment's deformations below.`;
  }
  return { unit, reading: { kind: 'dial', zeroReading, divisionSize, increasesWithCompression } };
}
