import {
  ImportMappingSchema,
  type CsvDelimiter,
  type DateOrder,
  type ImportMapping,
  type LengthUnit,
  type MappingGuess,
  type MappingSetting,
  type SheetLayout,
  type StressSource,
  type StressUnit,
  type TimeFormat,
  type TimeOrigin,
  type TimeUnit,
} from '@porestack/types';
import { numberOrNull } from '../../../lib/form-numbers';

/** The mapping form's state: every value as the inputs hold it ('' = not chosen yet). */
export type MappingDraft = {
  headerRow: string;
  delimiter: CsvDelimiter | null;
  decimalSeparator: '.' | ',';
  sheets: SheetLayout;
  stressFrom: StressSource;
  increment: string;
  stress: string;
  elapsedTime: string;
  deformation: string;
  stressUnit: StressUnit | '';
  timeUnit: TimeUnit | '';
  deformationUnit: LengthUnit | '';
  timeFormat: TimeFormat;
  timeOrigin: TimeOrigin;
  dateOrder: DateOrder | '';
  deformationKind: 'deformation' | 'dial';
  dialZero: string;
  /** No default: a wrong division imports wrong deformations without a sound. */
  dialDivision: string;
  /** No default, for the same reason. */
  dialDirection: 'increases' | 'decreases' | '';
};

export type MappingErrors = Partial<Record<MappingSetting, string>>;

/**
 * The form's start from the suggestion (a profile, or a guess): what was guessed is filled in,
 * and every setting the file does not tell (`open`) is left blank for the person to choose.
 */
export function draftFromGuess(guess: MappingGuess, open: readonly MappingSetting[] = []): MappingDraft {
  const blank = (setting: MappingSetting) => open.includes(setting);
  const dial = guess.deformationReading;
  return {
    headerRow: String(guess.headerRow),
    delimiter: guess.delimiter,
    decimalSeparator: guess.decimalSeparator,
    sheets: guess.sheets,
    stressFrom: guess.stressFrom,
    increment: guess.columns.increment ?? '',
    stress: guess.columns.stress ?? '',
    elapsedTime: guess.columns.elapsedTime ?? '',
    deformation: guess.columns.deformation ?? '',
    stressUnit: blank('stressUnit') ? '' : guess.units.stress,
    timeUnit: blank('timeUnit') ? '' : guess.units.time,
    deformationUnit: blank('deformationUnit') ? '' : guess.units.deformation,
    timeFormat: guess.time.format,
    timeOrigin: guess.time.origin,
    dateOrder: blank('dateOrder') ? '' : guess.time.dateOrder,
    deformationKind: dial.kind,
    dialZero: dial.zeroReading === null ? '' : String(dial.zeroReading),
    dialDivision: dial.divisionSize === null || blank('dialDivision') ? '' : String(dial.divisionSize),
    dialDirection: dial.increasesWithCompression === null || blank('dialDirection') ? '' : dial.increasesWithCompression ? 'increases' : 'decreases',
  };
}

const REQUIRED_COLUMNS: readonly ['stress' | 'elapsedTime' | 'deformation', string][] = [
  ['stress', 'Choose the column that holds the applied stress.'],
  ['elapsedTime', 'Choose the column that holds the time.'],
  ['deformation', 'Choose the column that holds the deformation or gauge reading.'],
];

/**
 * Checks a draft and turns it into the mapping the API takes. Beyond the shared schema it
 * refuses one column used for two fields, and asks for every unit, division and direction
 * the draft leaves blank, each under its own control.
 */
export function mappingFromDraft(draft: MappingDraft): { ok: true; mapping: ImportMapping } | { ok: false; errors: MappingErrors } {
  const errors: MappingErrors = {};
  const stressFromName = draft.stressFrom === 'sheetName';
  for (const [field, message] of REQUIRED_COLUMNS) if (draft[field] === '' && !(field === 'stress' && stressFromName)) errors[field] = message;
  const chosen = (['increment', 'stress', 'elapsedTime', 'deformation'] as const).filter((f) => !(f === 'stress' && stressFromName)).map((f) => [f, draft[f]] as const);
  chosen.forEach(([field, column], n) => {
    if (column === '' || errors[field]) return;
    if (chosen.slice(0, n).some(([, other]) => other === column)) errors[field] = `“${column}” is already chosen for another field; each field needs its own column.`;
  });
  const headerRow = numberOrNull(draft.headerRow);
  if (typeof headerRow !== 'number' || !Number.isInteger(headerRow) || headerRow < 1) errors.headerRow = 'Give the row of the column names as a whole number, 1 or more.';
  if (draft.stressUnit === '') errors.stressUnit = 'Choose the unit the stresses are written in.';
  if (draft.timeFormat === 'number' && draft.timeUnit === '') errors.timeUnit = 'Choose the unit the times are written in.';
  if (draft.timeFormat === 'datetime' && draft.dateOrder === '') errors.dateOrder = 'Say whether the dates put the day or the month first.';
  if (draft.deformationUnit === '') errors.deformationUnit = 'Choose the unit of the deformation (or of one gauge division).';
  let deformationReading: ImportMapping['deformationReading'] = { kind: 'deformation' };
  if (draft.deformationKind === 'dial') {
    const division = numberOrNull(draft.dialDivision);
    const zero = numberOrNull(draft.dialZero);
    if (typeof division !== 'number' || division <= 0) errors.dialDivision = 'Enter the size of one gauge division (1 when the gauge reads in mm or inches), e.g. 0.001.';
    if (zero !== null && typeof zero !== 'number') errors.dialZero = 'Enter the zero reading as a number, or leave it blank to use the first reading.';
    if (draft.dialDirection === '') errors.dialDirection = 'Say whether the reading rises or falls as the specimen compresses.';
    deformationReading = {
      kind: 'dial',
      divisionSize: typeof division === 'number' ? division : Number.NaN,
      increasesWithCompression: draft.dialDirection === 'increases',
      ...(typeof zero === 'number' ? { zeroReading: zero } : {}),
    };
  }
  if (Object.keys(errors).length > 0) return { ok: false, errors };
  const parsed = ImportMappingSchema.safeParse({
    ...(draft.delimiter ? { delimiter: draft.delimiter } : {}),
    decimalSeparator: draft.decimalSeparator,
    headerRow,
    sheets: draft.sheets,
    stressFrom: draft.stressFrom,
    columns: { increment: draft.increment === '' ? null : draft.increment, stress: stressFromName || draft.stress === '' ? null : draft.stress, elapsedTime: draft.elapsedTime, deformation: draft.deformation },
    units: { stress: draft.stressUnit, time: draft.timeUnit === '' ? 'min' : draft.timeUnit, deformation: draft.deformationUnit },
    time: { format: draft.timeFormat, origin: draft.timeOrigin, dateOrder: draft.dateOrder === '' ? 'dmy' : draft.dateOrder },
    deformationReading,
  });
  if (!parsed.success) {
    const first = parsed.error.issues[0];
    return { ok: false, errors: { [first?.path.at(-1) === 'stressFrom' ? 'stressFrom' : 'deformation']: first ? first.message : 'The mapping is not complete.' } };
  }
  return { ok: true, mapping: parsed.data };
}
