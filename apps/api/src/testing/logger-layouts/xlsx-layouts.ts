import ExcelJS from 'exceljs';
import { BASE_MAPPING, type LoggerLayout } from './layout-types.js';
import { LAYOUT_CLAYS, layoutTest, LOGGER_DAY_MIN } from './layout-clays.js';
import { excelDays, layoutReadings } from './layout-values.js';

const round = (value: number, digits: number) => Number(value.toFixed(digits));

async function bookBytes(book: ExcelJS.Workbook): Promise<Buffer> {
  return Buffer.from(await book.xlsx.writeBuffer());
}

/** An English export with a report heading above the names and a temperature column. */
const titled = layoutTest(LAYOUT_CLAYS.titleRows, LOGGER_DAY_MIN);
export const TITLE_ROWS_XLSX: LoggerLayout = {
  fileName: 'title-rows.xlsx',
  traits: 'three title rows and a blank row above the names, an extra temperature column',
  specimen: titled.specimen,
  truth: titled.truth,
  mapping: { ...BASE_MAPPING, headerRow: 5, columns: { increment: 'Increment', stress: 'Vertical stress (kPa)', elapsedTime: 'Elapsed time (min)', deformation: 'Settlement (mm)' }, units: { stress: 'kPa', time: 'min', deformation: 'mm' }, deformationReading: { kind: 'deformation' } },
  bytes: async () => {
    const book = new ExcelJS.Workbook();
    const sheet = book.addWorksheet('Log');
    sheet.addRow(['Oedometer log — frame 3 (invented)']);
    sheet.addRow(['Sample', 'BH-07 U4']);
    sheet.addRow(['Started', '2024-03-04']);
    sheet.addRow([]);
    sheet.addRow(['Increment', 'Vertical stress (kPa)', 'Elapsed time (min)', 'Settlement (mm)', 'Temperature (°C)']);
    layoutReadings(titled.truth).forEach((r, n) => sheet.addRow([r.increment, r.stressKpa, round(r.elapsedMin, 4), round(r.deformationMm, 4), round(20.5 + 0.2 * Math.cos(n / 30), 1)]));
    return bookBytes(book);
  },
};

/** One sheet per increment named after its stress, with a specimen sheet first. */
const perSheet = layoutTest(LAYOUT_CLAYS.sheetPerIncrement, LOGGER_DAY_MIN);
export const SHEET_PER_INCREMENT_XLSX: LoggerLayout = {
  fileName: 'sheet-per-increment.xlsx',
  traits: 'one sheet per increment named "Step n – σ kPa", no stress column, a specimen sheet',
  specimen: perSheet.specimen,
  truth: perSheet.truth,
  mapping: { ...BASE_MAPPING, sheets: 'each', stressFrom: 'sheetName', columns: { increment: null, stress: null, elapsedTime: 'Time (min)', deformation: 'Deformation (mm)' }, units: { stress: 'kPa', time: 'min', deformation: 'mm' }, deformationReading: { kind: 'deformation' } },
  bytes: async () => {
    const book = new ExcelJS.Workbook();
    const specimen = book.addWorksheet('specimen');
    specimen.addRow(['key', 'value']);
    for (const [key, value] of Object.entries({ initial_height_mm: perSheet.specimen.initialHeightMm, diameter_mm: perSheet.specimen.diameterMm, specific_gravity: perSheet.specimen.specificGravity, dry_mass_g: perSheet.specimen.dryMassG, drainage: perSheet.specimen.drainage })) specimen.addRow([key, value]);
    for (const increment of perSheet.truth.increments) {
      const sheet = book.addWorksheet(`Step ${increment.index} – ${increment.stressKpa} kPa`);
      sheet.addRow(['Time (min)', 'Deformation (mm)']);
      for (const reading of increment.readings) sheet.addRow([round(reading.elapsedMin, 4), round(reading.deformationMm, 4)]);
    }
    return bookBytes(book);
  },
};

/** Spanish: time as spreadsheet [h]:mm:ss cells, a dial in 0.01 mm divisions that rises with compression. */
const spanish = layoutTest(LAYOUT_CLAYS.spanishTimeCells);
const DIAL_START = 1000;
export const SPANISH_TIME_CELLS_XLSX: LoggerLayout = {
  fileName: 'celdas-de-tiempo.xlsx',
  traits: 'time in spreadsheet time cells ([h]:mm:ss), Spanish headers, a dial in 0.01 mm divisions rising with compression',
  specimen: spanish.specimen,
  truth: spanish.truth,
  mapping: { ...BASE_MAPPING, columns: { increment: 'Escalón', stress: 'Presión [kPa]', elapsedTime: 'Tiempo', deformation: 'Lectura [0,01 mm]' }, units: { stress: 'kPa', time: 'min', deformation: 'mm' }, time: { format: 'duration', origin: 'increment', dateOrder: 'dmy' }, deformationReading: { kind: 'dial', divisionSize: 0.01, increasesWithCompression: true } },
  bytes: async () => {
    const book = new ExcelJS.Workbook();
    const sheet = book.addWorksheet('Lecturas');
    sheet.addRow(['Escalón', 'Presión [kPa]', 'Tiempo', 'Lectura [0,01 mm]']);
    for (const r of layoutReadings(spanish.truth)) sheet.addRow([r.increment, r.stressKpa, excelDays(r.elapsedMin), round(DIAL_START + r.deformationMm / 0.01, 1)]);
    sheet.getColumn(3).numFmt = '[h]:mm:ss';
    return bookBytes(book);
  },
};

/** Portuguese: date-time cells of the logger's clock, running through the whole test. */
const portuguese = layoutTest(LAYOUT_CLAYS.portugueseDates, LOGGER_DAY_MIN);
export const PORTUGUESE_DATES_XLSX: LoggerLayout = {
  fileName: 'datas-e-horas.xlsx',
  traits: 'date-time cells of the logger’s clock instead of elapsed time, Portuguese headers',
  specimen: portuguese.specimen,
  truth: portuguese.truth,
  mapping: { ...BASE_MAPPING, columns: { increment: 'Estágio', stress: 'Tensão (kPa)', elapsedTime: 'Data/hora', deformation: 'Recalque (mm)' }, units: { stress: 'kPa', time: 'min', deformation: 'mm' }, time: { format: 'datetime', origin: 'test', dateOrder: 'dmy' }, deformationReading: { kind: 'deformation' } },
  bytes: async () => {
    const book = new ExcelJS.Workbook();
    const sheet = book.addWorksheet('Leituras');
    sheet.addRow(['Estágio', 'Tensão (kPa)', 'Data/hora', 'Recalque (mm)']);
    const start = Date.UTC(2024, 2, 4, 9, 0, 0);
    for (const r of layoutReadings(portuguese.truth)) sheet.addRow([r.increment, r.stressKpa, new Date(start + Math.round(r.testMin * 60_000)), round(r.deformationMm, 4)]);
    sheet.getColumn(3).numFmt = 'dd/mm/yyyy hh:mm:ss.000';
    return bookBytes(book);
  },
};
