import { z } from 'zod';

/** The four fields a reading needs; each is taken from one column of the file (stress may come from a sheet's name). */
export const IMPORT_FIELDS = ['increment', 'stress', 'elapsedTime', 'deformation'] as const;
export type ImportField = (typeof IMPORT_FIELDS)[number];

/** Units a file may use; readings are stored in kPa, minutes and millimetres. */
export const StressUnitSchema = z.enum(['kPa', 'kgfPerCm2', 'tsf', 'psi', 'MPa']);
export type StressUnit = z.infer<typeof StressUnitSchema>;
export const TimeUnitSchema = z.enum(['min', 's', 'h', 'd']);
export type TimeUnit = z.infer<typeof TimeUnitSchema>;
export const LengthUnitSchema = z.enum(['mm', 'in']);
export type LengthUnit = z.infer<typeof LengthUnitSchema>;

export const CsvDelimiterSchema = z.enum([',', ';', '\t', '|']);
export type CsvDelimiter = z.infer<typeof CsvDelimiterSchema>;

/**
 * How the time column is written: a number in `units.time`; a duration `h:mm:ss` (also
 * `[h]:mm:ss` past a day, or a spreadsheet cell formatted as a time); or a date and time of
 * day (text such as 2024-03-05 14:30:00, or a spreadsheet date-time cell).
 */
export const TimeFormatSchema = z.enum(['number', 'duration', 'datetime']);
export type TimeFormat = z.infer<typeof TimeFormatSchema>;

/**
 * What the times count from: each increment's own start (the clock restarts with every
 * load), or the start of the test (a clock that runs on, so each increment's first reading
 * is its zero). Date-times always count from each increment's first reading.
 */
export const TimeOriginSchema = z.enum(['increment', 'test']);
export type TimeOrigin = z.infer<typeof TimeOriginSchema>;

/** Day before month (05.03.2024, 05/03/2024) or month before day (03/05/2024) in written dates. */
export const DateOrderSchema = z.enum(['dmy', 'mdy']);
export type DateOrder = z.infer<typeof DateOrderSchema>;

export const TimeReadingSchema = z.object({
  format: TimeFormatSchema.default('number'),
  origin: TimeOriginSchema.default('increment'),
  dateOrder: DateOrderSchema.default('dmy'),
});
export type TimeReading = z.infer<typeof TimeReadingSchema>;

/**
 * How the deformation column reads: a deformation already (compression positive), or a
 * gauge reading turned into deformation with its zero, division size and direction. A
 * gauge that reads in mm or inches has a division of 1. Neither the division nor the
 * direction has a default: a wrong one imports wrong deformations without a sound.
 */
export const DeformationReadingSchema = z.discriminatedUnion('kind', [
  z.object({ kind: z.literal('deformation') }),
  z.object({
    kind: z.literal('dial'),
    /** The gauge reading at zero deformation; omitted: the file's first reading. */
    zeroReading: z.number().finite().optional(),
    /** One division of the gauge, in the deformation unit (0.001 for a 0.001 mm dial, 1 when it reads in mm). */
    divisionSize: z.number({ message: 'enter the size of one gauge division, e.g. 0.001, or 1 when the gauge reads in mm or inches' }).positive({ message: 'enter the size of one gauge division, e.g. 0.001' }),
    /** true when the reading rises as the specimen compresses. */
    increasesWithCompression: z.boolean({ message: 'say whether the reading rises or falls as the specimen compresses' }),
  }),
]);
export type DeformationReading = z.infer<typeof DeformationReadingSchema>;

/** Where the readings are in a workbook: its first sheet, or one sheet per increment in test order. */
export const SheetLayoutSchema = z.enum(['first', 'each']);
export type SheetLayout = z.infer<typeof SheetLayoutSchema>;

/** Where an increment's stress is written: in a column, or in its sheet's name ("100 kPa"). */
export const StressSourceSchema = z.enum(['column', 'sheetName']);
export type StressSource = z.infer<typeof StressSourceSchema>;

const columnName = z.string().trim().min(1, { message: 'choose a column' });

/** Which column holds each field, and the units — what an import profile saves. */
export const ImportMappingSchema = z
  .object({
    /** CSV only; omitted: detected from the file. */
    delimiter: CsvDelimiterSchema.optional(),
    decimalSeparator: z.enum(['.', ',']).default('.'),
    /** Row of the column names, as a spreadsheet numbers it (1 = first row); the same on every sheet. */
    headerRow: z.number().int().min(1).max(100).default(1),
    sheets: SheetLayoutSchema.default('first'),
    stressFrom: StressSourceSchema.default('column'),
    columns: z.object({
      /** null: a new increment starts wherever the stress changes (or, sheet by sheet, with each sheet). */
      increment: columnName.nullable(),
      /** null only when the stress is read from each sheet's name. */
      stress: columnName.nullable(),
      elapsedTime: columnName,
      deformation: columnName,
    }),
    units: z.object({
      stress: StressUnitSchema.default('kPa'),
      time: TimeUnitSchema.default('min'),
      deformation: LengthUnitSchema.default('mm'),
    }),
    time: TimeReadingSchema.default({ format: 'number', origin: 'increment', dateOrder: 'dmy' }),
    deformationReading: DeformationReadingSchema.default({ kind: 'deformation' }),
  })
  .superRefine((mapping, context) => {
    if (mapping.stressFrom === 'column' && mapping.columns.stress === null) {
      context.addIssue({ code: 'custom', path: ['columns', 'stress'], message: 'choose the column that holds the applied stress, or read it from each sheet’s name' });
    }
    if (mapping.stressFrom === 'sheetName' && mapping.sheets !== 'each') {
      context.addIssue({ code: 'custom', path: ['stressFrom'], message: 'the stress can come from a sheet’s name only when each sheet holds one increment' });
    }
  });
export type ImportMapping = z.infer<typeof ImportMappingSchema>;
export type ImportMappingInput = z.input<typeof ImportMappingSchema>;

/**
 * POST /uploads/:uploadId/import: a saved profile, or a mapping (optionally saved as a
 * profile). One object rather than a union, so a wrong body is answered field by field.
 */
export const ImportRequestSchema = z
  .object({
    profileId: z.uuid({ message: 'choose a saved import profile' }).optional(),
    mapping: ImportMappingSchema.optional(),
    saveAsProfile: z.string().trim().min(1, { message: 'give the profile a name, or leave it out' }).max(80, { message: 'keep the name under 80 characters' }).optional(),
  })
  .strict()
  .superRefine((request, context) => {
    if ((request.profileId === undefined) === (request.mapping === undefined)) {
      context.addIssue({ code: 'custom', path: ['mapping'], message: 'send either a mapping or the profileId of a saved import profile (one of the two)' });
    }
    if (request.profileId !== undefined && request.saveAsProfile !== undefined) {
      context.addIssue({ code: 'custom', path: ['saveAsProfile'], message: 'a saved profile is already saved; send saveAsProfile only with a mapping' });
    }
  });
export type ImportRequest = z.infer<typeof ImportRequestSchema>;

export const ImportProfileCreateSchema = z.object({
  name: z.string().trim().min(1, { message: 'give the profile a name' }).max(80, { message: 'keep the name under 80 characters' }),
  mapping: ImportMappingSchema,
});
export type ImportProfileCreate = z.infer<typeof ImportProfileCreateSchema>;

export const ImportProfileSchema = z.object({
  id: z.string(),
  name: z.string(),
  mapping: ImportMappingSchema,
  createdAt: z.string(),
});
export type ImportProfile = z.infer<typeof ImportProfileSchema>;
