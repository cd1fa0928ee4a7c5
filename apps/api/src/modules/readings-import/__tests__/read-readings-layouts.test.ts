import type { ImportMapping } from '@porestack/types';
import ExcelJS from 'exceljs';
import { describe, expect, it } from 'vitest';
import { deformationCheck } from '../deformation-check.js';
import { CANONICAL_MAPPING } from '../detect-layout.js';
import { parseCsvTable } from '../parse-csv-table.js';
import { parseXlsxTable } from '../parse-xlsx-table.js';
import { inspectReadings, readReadings } from '../read-readings.js';
import { dateTimeMinutes, durationMinutes } from '../read-time.js';
import { spreadsheetDateText } from '../spreadsheet-date-text.js';
import { trialOf } from '../trial-of.js';

const LIMITS = { maxFileBytes: 40 * 1024 * 1024, maxRows: 500_000 };
const csvTable = (text: string) => parseCsvTable(text, LIMITS);
const columns = { increment: 'inc', stress: 'p', elapsedTime: 't', deformation: 'd' };

/** A workbook of one sheet per increment, named after its stress, with a summary sheet at the end. */
async function perIncrementWorkbook(): Promise<Buffer> {
  const book = new ExcelJS.Workbook();
  book.addWorksheet('specimen').addRow(['initial_height_mm', 20]);
  for (const [name, rows] of [
    ['25 kPa', [[0, 0], [1, 0.1], [2, 0.15]]],
    ['50 kPa', [[0, 0.15], [1, 0.3], [2, 0.35]]],
  ] as const) {
    const sheet = book.addWorksheet(name);
    sheet.addRow(['Time (min)', 'Deformation (mm)']);
    for (const row of rows) sheet.addRow([...row]);
  }
  book.addWorksheet('Summary').addRow(['Stress', 'Void ratio']);
  return Buffer.from(await book.xlsx.writeBuffer());
}

const BY_SHEET: ImportMapping = {
  ...CANONICAL_MAPPING,
  sheets: 'each',
  stressFrom: 'sheetName',
  columns: { increment: null, stress: null, elapsedTime: 'Time (min)', deformation: 'Deformation (mm)' },
};

describe('readReadings(table, mapping) with one sheet per increment', () => {
  it('reads each sheet as the next increment with the stress of its name, passing over a sheet of something else with a note', async () => {
    // The writer stores the zip's parts in varying orders: read it a few times.
    for (let attempt = 0; attempt < 3; attempt += 1) {
      const table = await parseXlsxTable(await perIncrementWorkbook(), LIMITS, { sheets: 'each' });
      const { readings, notes } = readReadings(table, BY_SHEET);
      expect(Array.from(readings.incrementIndex)).toEqual([1, 1, 1, 2, 2, 2]);
      expect(Array.from(readings.stressKpa)).toEqual([25, 25, 25, 50, 50, 50]);
      expect(Array.from(readings.sheetIndex)).toEqual([0, 0, 0, 1, 1, 1]);
      expect(Array.from(readings.rowNumber)).toEqual([2, 3, 4, 2, 3, 4]);
      expect(notes).toEqual([
        {
          kind: 'dropped',
          row: null,
          column: null,
          sheet: 'Summary',
          message: "Sheet 'Summary' was not read as an increment: The column 'Time (min)' chosen for the elapsed time is not in row 1 of sheet 'Summary' (found 'Stress', 'Void ratio').",
        },
      ]);
      expect(table.specimen).toEqual({ initial_height_mm: 20 });
    }
  });

  it('names the sheet whose name holds no stress', async () => {
    const book = new ExcelJS.Workbook();
    const sheet = book.addWorksheet('first load');
    sheet.addRow(['Time (min)', 'Deformation (mm)']);
    sheet.addRow([0, 0]);
    const { issues } = inspectReadings(await parseXlsxTable(Buffer.from(await book.xlsx.writeBuffer()), LIMITS, { sheets: 'each' }), BY_SHEET);
    expect(issues[0]?.message).toBe("Sheet 'first load', row 1: the sheet's name 'first load' holds no stress above zero; name the sheet after its stress, e.g. '100 kPa', or read the stress from a column.");
  });
});

describe('readReadings(table, mapping) with times written as durations and date-times', () => {
  it('reads h:mm:ss and [h]:mm:ss as minutes, and says what is wrong with a time that is neither', () => {
    const mapping: ImportMapping = { ...CANONICAL_MAPPING, columns, time: { format: 'duration', origin: 'increment', dateOrder: 'dmy' } };
    const { readings } = readReadings(csvTable('inc,p,t,d\n1,25,0:00:00,0\n1,25,0:00:06,0.01\n1,25,26:30:00,0.2\n'), mapping);
    expect(Array.from(readings.elapsedMin)).toEqual([0, 0.1, 1590]);
    const { issues } = inspectReadings(csvTable('inc,p,t,d\n1,25,0:00:00,0\n1,25,0:75:00,0.01\n'), mapping);
    expect(issues[0]?.message).toBe("Row 3, column t: '0:75:00' is not a time written as h:mm:ss; enter the time since the load was applied as h:mm:ss, e.g. 0:15:00 (or 26:00:00 past a day).");
  });

  it('counts date-times from each increment’s first reading, day first or month first as chosen', () => {
    const mapping = (dateOrder: 'dmy' | 'mdy'): ImportMapping => ({ ...CANONICAL_MAPPING, columns, time: { format: 'datetime', origin: 'test', dateOrder } });
    const file = 'inc,p,t,d\n1,25,02/03/2024 23:59:00,0\n1,25,03/03/2024 00:01:30,0.1\n2,50,03/03/2024 00:01:30,0.1\n2,50,03/03/2024 01:01:30,0.3\n';
    expect(Array.from(readReadings(csvTable(file), mapping('dmy')).readings.elapsedMin)).toEqual([0, 2.5, 0, 60]);
    // Month first, 3 February 23:59 → 3 March 00:01:30 (2024 is a leap year: 29 days in February) is 28 days and 2.5 minutes.
    expect(readReadings(csvTable(file), mapping('mdy')).readings.elapsedMin[1]).toBe(28 * 1440 + 2.5);
  });

  it('subtracts each increment’s first reading when the clock runs on from the start of the test', () => {
    const mapping: ImportMapping = { ...CANONICAL_MAPPING, columns, units: { ...CANONICAL_MAPPING.units, time: 'h' }, time: { format: 'number', origin: 'test', dateOrder: 'dmy' } };
    const { readings } = readReadings(csvTable('inc,p,t,d\n1,25,0,0\n1,25,24,0.1\n2,50,24,0.1\n2,50,25.5,0.3\n'), mapping);
    expect(Array.from(readings.elapsedMin)).toEqual([0, 1440, 0, 90]);
  });
});

describe('the time parsers', () => {
  it('durationMinutes and dateTimeMinutes read what loggers write, and refuse what is not a time or a calendar date', () => {
    expect(durationMinutes('1:02:03.5')).toBeCloseTo(62 + 3.5 / 60, 12);
    expect(durationMinutes('12:30')).toBeNull();
    expect(dateTimeMinutes('2024-03-05 14:30:00', 'dmy')).toBe(Date.UTC(2024, 2, 5, 14, 30) / 60_000);
    expect(dateTimeMinutes('05.03.2024 14:30', 'mdy')).toBe(Date.UTC(2024, 2, 5, 14, 30) / 60_000);
    expect(dateTimeMinutes('31/04/2024 10:00:00', 'dmy')).toBeNull();
    expect(dateTimeMinutes('14:30:00', 'dmy')).toBeNull();
  });

  it('spreadsheetDateText writes a time cell as a duration and a date cell as a date-time', () => {
    expect(spreadsheetDateText(new Date(Date.UTC(1899, 11, 30, 0, 0, 6)))).toBe('0:00:06');
    expect(spreadsheetDateText(new Date(Date.UTC(1899, 11, 31, 12, 0, 0, 250)))).toBe('36:00:00.25');
    expect(spreadsheetDateText(new Date(Date.UTC(2024, 2, 5, 9, 5, 7)))).toBe('2024-03-05 09:05:07');
  });
});

describe('deformationCheck(readings, heightMm)', () => {
  const readingsOf = (deformations: string) => readReadings(csvTable(`inc,p,t,d\n${deformations.split(' ').map((d, i) => `1,25,${i},${d}`).join('\n')}\n`), { ...CANONICAL_MAPPING, columns }).readings;

  it('says nothing of a compression of 0.1–60 % of the height, and doubts one outside it (20 mm specimen: 0.02 and 12 mm)', () => {
    expect(deformationCheck(readingsOf('0 0.5 2.4'), 20)).toBeNull();
    expect(deformationCheck(readingsOf('0 0.01 0.019'), 20)?.message).toContain('The largest compression is 0.019 mm, 0.095 % of the specimen');
    expect(deformationCheck(readingsOf('0 5 12.1'), 20)?.message).toContain('The largest compression is 12.1 mm, 61 % of the specimen');
    expect(deformationCheck(readingsOf('0 0.01 0.019'), null)).toBeNull();
  });

  it('says the gauge is read backwards when the specimen swells more than it compresses, height known or not', () => {
    expect(deformationCheck(readingsOf('0 0.05 -1.2 -2.5'), null)?.message).toContain("the gauge's direction is likely the wrong way round");
  });
});

describe('trialOf(table, mapping)', () => {
  it('shows the first increment’s cells as written beside the minutes and millimetres they import as', () => {
    const mapping: ImportMapping = { ...CANONICAL_MAPPING, columns, units: { ...CANONICAL_MAPPING.units, time: 's' }, deformationReading: { kind: 'dial', divisionSize: 0.01, increasesWithCompression: false } };
    const trial = trialOf(csvTable('inc,p,t,d\n1,25,0,1000\n1,25,30,990\n1,25,60,985\n2,50,0,985\n2,50,60,900\n'), mapping);
    expect(trial).toEqual({
      increment: {
        index: 1,
        stressKpa: 25,
        sheet: null,
        readings: [
          { rowNumber: 2, time: '0', deformation: '1000', elapsedMin: 0, deformationMm: 0 },
          { rowNumber: 3, time: '30', deformation: '990', elapsedMin: 0.5, deformationMm: 0.1 },
          { rowNumber: 4, time: '60', deformation: '985', elapsedMin: 1, deformationMm: 0.15 },
        ],
      },
      issues: [],
      issueCount: 0,
      notes: [],
    });
  });
});
