import { ImportMappingSchema, type CsvDelimiter, type ImportMapping, type LengthUnit, type StressUnit, type TimeUnit } from '@porestack/types';
import { numberOrNull } from '../../../lib/form-numbers';

/** The mapping form's state: every value as the inputs hold it (strings, '' = not chosen). */
export type MappingDraft = {
  increment: string;
  stress: string;
  elapsedTime: string;
  deformation: string;
  stressUnit: StressUnit;
  timeUnit: TimeUnit;
  deformationUnit: LengthUnit;
  deformationKind: 'deformation' | 'dial';
  dialZero: string;
  dialDivision: string;
  dialDirection: 'increases' | 'decreases';
  headerRow: string;
  decimalSeparator: '.' | ',';
  delimiter: CsvDelimiter | null;
};

export type MappingErrors = Partial<Record<keyof MappingDraft, string>>;

/** A draft from a saved or suggested mapping, or empty choices for the person to make. */
export function draftFromMapping(mapping: ImportMapping | null, delimiter: CsvDelimiter | null): MappingDraft {
  const dial = mapping?.deformationReading.kind === 'dial' ? mapping.deformationReading : null;
  return {
    increment: mapping?.columns.increment ?? '',
    stress: mapping?.columns.stress ?? '',
    elapsedTime: mapping?.columns.elapsedTime ?? '',
    deformation: mapping?.columns.deformation ?? '',
    stressUnit: mapping?.units.stress ?? 'kPa',
    timeUnit: mapping?.units.time ?? 'min',
    deformationUnit: mapping?.units.deformation ?? 'mm',
    deformationKind: dial ? 'dial' : 'deformation',
    dialZero: dial?.zeroReading === undefined ? '' : String(dial.zeroReading),
    dialDivision: dial ? String(dial.divisionSize) : '0.001',
    dialDirection: dial && !dial.increasesWithCompression ? 'decreases' : 'increases',
    headerRow: String(mapping?.headerRow ?? 1),
    decimalSeparator: mapping?.decimalSeparator ?? '.',
    delimiter: mapping?.delimiter ?? delimiter,
  };
}

const REQUIRED: readonly ['stress' | 'elapsedTime' | 'deformation', string][] = [
  ['stress', 'Choose the column that holds the applied stress.'],
  ['elapsedTime', 'Choose the column that holds the time since the load went on.'],
  ['deformation', 'Choose the column that holds the deformation or dial reading.'],
];

/**
 * Checks a draft and turns it into the mapping the API takes. Beyond the shared schema it
 * refuses one column used for two fields, which the schema cannot see.
 */
export function mappingFromDraft(draft: MappingDraft): { ok: true; mapping: ImportMapping } | { ok: false; errors: MappingErrors } {
  const errors: MappingErrors = {};
  for (const [field, message] of REQUIRED) if (draft[field] === '') errors[field] = message;
  const chosen: [keyof MappingDraft, string][] = (['increment', 'stress', 'elapsedTime', 'deformation'] as const).map((f) => [f, draft[f]]);
  chosen.forEach(([field, column], n) => {
    if (column === '' || errors[field]) return;
    const earlier = chosen.slice(0, n).find(([, other]) => other === column);
    if (earlier) errors[field] = `“${column}” is already chosen for another field; each field needs its own column.`;
  });
  const headerRow = numberOrNull(draft.headerRow);
  if (typeof headerRow !== 'number' || !Number.isInteger(headerRow) || headerRow < 1) errors.headerRow = 'Give the row of the column names as a whole number, 1 or more.';
  let deformationReading: ImportMapping['deformationReading'] = { kind: 'deformation' };
  if (draft.deformationKind === 'dial') {
    const division = numberOrNull(draft.dialDivision);
    const zero = numberOrNull(draft.dialZero);
    if (typeof division !== 'number' || division <= 0) errors.dialDivision = 'Enter the size of one gauge division, e.g. 0.001 (in the deformation unit).';
    if (zero !== null && typeof zero !== 'number') errors.dialZero = 'Enter the zero reading as a number, or leave it blank to use the first reading.';
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
    columns: { increment: draft.increment === '' ? null : draft.increment, stress: draft.stress, elapsedTime: draft.elapsedTime, deformation: draft.deformation },
    units: { stress: draft.stressUnit, time: draft.timeUnit, deformation: draft.deformationUnit },
    deformationReading,
  });
  if (!parsed.success) {
    const first = parsed.error.issues[0];
    return { ok: false, errors: { deformation: first ? first.message : 'The mapping is not complete.' } };
  }
  return { ok: true, mapping: parsed.data };
}
