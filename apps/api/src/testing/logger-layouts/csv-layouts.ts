import { convertUnit } from '@porestack/geo-core';
import { BASE_MAPPING, type LoggerLayout } from './layout-types.js';
import { LAYOUT_CLAYS, layoutTest, LOGGER_DAY_MIN } from './layout-clays.js';
import { hms, layoutReadings, written } from './layout-values.js';

const lines = (rows: readonly string[]): Buffer => Buffer.from(`${rows.join('\r\n')}\r\n`, 'utf8');

/** German logger: semicolons, decimal commas, kgf/cm², seconds, settlement in mm. */
const german = layoutTest(LAYOUT_CLAYS.germanCsv, LOGGER_DAY_MIN);
export const GERMAN_CSV: LoggerLayout = {
  fileName: 'semikolon-dezimalkomma.csv',
  traits: 'semicolons, decimal commas, German headers, kgf/cm² and seconds in brackets',
  specimen: german.specimen,
  truth: german.truth,
  mapping: { ...BASE_MAPPING, delimiter: ';', decimalSeparator: ',', columns: { increment: 'Laststufe', stress: 'Spannung [kgf/cm²]', elapsedTime: 'Zeit [s]', deformation: 'Setzung [mm]' }, units: { stress: 'kgfPerCm2', time: 's', deformation: 'mm' }, deformationReading: { kind: 'deformation' } },
  bytes: async () =>
    lines([
      'Laststufe;Spannung [kgf/cm²];Zeit [s];Setzung [mm]',
      ...layoutReadings(german.truth).map((r) => [r.increment, written(convertUnit(r.stressKpa, 'kPa', 'kgfPerCm2'), 6, true), written(r.elapsedMin * 60, 1, true), written(r.deformationMm, 4, true)].join(';')),
    ]),
};

/** US logger: tsf, hours, a dial in inches counting down; no increment column. */
const inches = layoutTest(LAYOUT_CLAYS.inchDial, LOGGER_DAY_MIN);
const DIAL_START_IN = 0.5;
export const INCH_DIAL_CSV: LoggerLayout = {
  fileName: 'inch-dial-falling.csv',
  traits: 'tsf, hours, a dial in inches that falls as the specimen compresses, no increment column',
  specimen: inches.specimen,
  truth: inches.truth,
  mapping: { ...BASE_MAPPING, delimiter: ',', columns: { increment: null, stress: 'Pressure (tsf)', elapsedTime: 'Elapsed (h)', deformation: 'Dial (in)' }, units: { stress: 'tsf', time: 'h', deformation: 'in' }, deformationReading: { kind: 'dial', divisionSize: 1, increasesWithCompression: false } },
  bytes: async () =>
    lines([
      'Pressure (tsf),Elapsed (h),Dial (in)',
      ...layoutReadings(inches.truth).map((r) => [written(convertUnit(r.stressKpa, 'kPa', 'tsf'), 5), written(r.elapsedMin / 60, 6), written(DIAL_START_IN - r.deformationMm / 25.4, 5)].join(',')),
    ]),
};

/** French sheet: a title above the names, decimal commas, times as h:mm:ss (past 24 h as 24:00:00). */
const french = layoutTest(LAYOUT_CLAYS.frenchClock);
export const FRENCH_CLOCK_CSV: LoggerLayout = {
  fileName: 'essai-hhmmss.csv',
  traits: 'a title row and a blank row above the names, decimal commas, French headers, times as h:mm:ss',
  specimen: french.specimen,
  truth: french.truth,
  mapping: { ...BASE_MAPPING, delimiter: ';', decimalSeparator: ',', headerRow: 3, columns: { increment: 'Palier', stress: 'Contrainte (kPa)', elapsedTime: 'Temps (hh:mm:ss)', deformation: 'Tassement (mm)' }, units: { stress: 'kPa', time: 'min', deformation: 'mm' }, time: { format: 'duration', origin: 'increment', dateOrder: 'dmy' }, deformationReading: { kind: 'deformation' } },
  bytes: async () =>
    lines([
      'Essai oedométrique – cellule 2 – éprouvette inventée',
      '',
      'Palier;Contrainte (kPa);Temps (hh:mm:ss);Tassement (mm)',
      ...layoutReadings(french.truth).map((r) => [r.increment, written(r.stressKpa, 1, true), hms(r.elapsedMin), written(r.deformationMm, 4, true)].join(';')),
    ]),
};

/**
 * Italian logger: a row counter, date and clock columns, temperature and notes beside the
 * readings, decimal commas, and the repeats fast loggers write: three rows written twice,
 * two times read twice with different values (the later is the one to keep).
 */
const italian = layoutTest(LAYOUT_CLAYS.italianRepeats, LOGGER_DAY_MIN);
/** Readings (by position) written twice exactly, and ones written twice with a second, later value. */
export const ITALIAN_REPEATED = [70, 250, 430] as const;
export const ITALIAN_REREAD = [130, 370] as const;
const REREAD_SHIFT_MM = 0.0004;
export const ITALIAN_REPEATS_CSV: LoggerLayout = {
  fileName: 'registratore-ripetizioni.csv',
  traits: 'extra columns (counter, date, clock, temperature, notes), decimal commas, Italian headers, repeated rows and repeated times',
  specimen: italian.specimen,
  truth: italian.truth,
  mapping: { ...BASE_MAPPING, delimiter: ';', decimalSeparator: ',', columns: { increment: 'Gradino', stress: 'Carico (kPa)', elapsedTime: 'Tempo trascorso (s)', deformation: 'Cedimento (mm)' }, units: { stress: 'kPa', time: 's', deformation: 'mm' }, deformationReading: { kind: 'deformation' } },
  bytes: async () => {
    const start = Date.UTC(2024, 2, 4, 9, 0, 0);
    const rows: string[] = ['N.;Data;Ora;Gradino;Carico (kPa);Tempo trascorso (s);Cedimento (mm);Temperatura (°C);Note'];
    let counter = 0;
    const write = (r: ReturnType<typeof layoutReadings>[number], deformationMm: number, note: string) => {
      counter += 1;
      const at = new Date(start + Math.round(r.testMin * 60) * 1000);
      const date = `${String(at.getUTCDate()).padStart(2, '0')}/${String(at.getUTCMonth() + 1).padStart(2, '0')}/${at.getUTCFullYear()}`;
      const clock = at.toISOString().slice(11, 19);
      rows.push([counter, date, clock, r.increment, written(r.stressKpa, 1, true), written(r.elapsedMin * 60, 2, true), written(deformationMm, 4, true), written(20.4 + 0.3 * Math.sin(counter / 40), 1, true), note].join(';'));
    };
    layoutReadings(italian.truth).forEach((r, position) => {
      if ((ITALIAN_REREAD as readonly number[]).includes(position)) write(r, r.deformationMm - REREAD_SHIFT_MM, '');
      write(r, r.deformationMm, position === 0 ? 'avvio' : '');
      if ((ITALIAN_REPEATED as readonly number[]).includes(position)) write(r, r.deformationMm, '');
    });
    return lines(rows);
  },
};

/** A clock that runs on from the start of the test, in hours; psi; displacement in mm. */
const running = layoutTest(LAYOUT_CLAYS.runningClock, LOGGER_DAY_MIN);
export const RUNNING_CLOCK_CSV: LoggerLayout = {
  fileName: 'clock-runs-on.csv',
  traits: 'time counted from the start of the test (hours), psi, an LVDT displacement',
  specimen: running.specimen,
  truth: running.truth,
  mapping: { ...BASE_MAPPING, delimiter: ',', columns: { increment: 'Step', stress: 'Load (psi)', elapsedTime: 'Time since start (h)', deformation: 'Displacement (mm)' }, units: { stress: 'psi', time: 'h', deformation: 'mm' }, time: { format: 'number', origin: 'test', dateOrder: 'dmy' }, deformationReading: { kind: 'deformation' } },
  bytes: async () =>
    lines([
      'Step,Load (psi),Time since start (h),Displacement (mm)',
      ...layoutReadings(running.truth).map((r) => [r.increment, written(convertUnit(r.stressKpa, 'kPa', 'psi'), 4), written(r.testMin / 60, 6), written(r.deformationMm, 4)].join(',')),
    ]),
};
