import { z } from 'zod';

/** The four fields a reading needs; each is taken from one column of the file. */
export const IMPORT_FIELDS = ['increment', 'stress', 'elapsedTime', 'deformation'] as const;
export type ImportField = (typeof IMPORT_FIELDS)[number];

/** Units a file may use; readings are stored in kPa, minutes and millimetres. */
export const StressUnitSchema = z.enum(['kPa', 'kgfPerCm2', 'tsf', 'psi', 'MPa']);
export type StressUnit = z.infer<typeof StressUnitSchema>;
export const TimeUnitSchema = z.enum(['min', 's', 'h']);
export type TimeUnit = z.infer<typeof TimeUnitSchema>;
export const LengthUnitSchema = z.enum(['mm', 'in']);
export type LengthUnit = z.infer<typeof LengthUnitSchema>;

export const CsvDelimiterSchema = z.enum([',', ';', '\t', '|']);
export type CsvDelimiter = z.infer<typeof CsvDelimiterSchema>;

/**
 * How the deformation column reads: a deformation already (compression positive), or a
 * gauge reading turned into deformation with its zero, division size and direction.
 */
export const DeformationReadingSchema = z.discriminatedUnion('kind', [
  z.object({ kind: z.literal('deformation') }),
  z.object({
    kind: z.literal('dial'),
    /** The gauge reading at zero deformation; omitted: the file's first reading. */
    zeroReading: z.number().finite().optional(),
    /** One division of the gauge, in the deformation unit (0.001 for a 0.001 mm dial, 1 when it reads in mm). */
    divisionSize: z.number().positive({ message: 'enter the size of one gauge division, e.g. 0.001' }),
    /** true when the reading rises as the specimen compresses. */
    increasesWithCompression: z.boolean(),
  }),
]);
export type DeformationReading = z.infer<typeof DeformationReadingSchema>;

const columnName = z.string().trim().min(1, { message: 'choose a column' });

/** Which column holds each field, and the units — what an import profile saves. */
export const ImportMappingSchema = z.object({
  /** CSV only; omitted: detected from the file. */
  delimiter: CsvDelimiterSchema.optional(),
  decimalSeparator: z.enum(['.', ',']).default('.'),
  /** Row of the column names, as a spreadsheet numbers it (1 = first row). */
  headerRow: z.number().int().min(1).max(100).default(1),
  columns: z.object({
    /** null: a new increment starts wherever the stress changes. */
    increment: columnName.nullable(),
    stress: columnName,
    elapsedTime: columnName,
    deformation: columnName,
  }),
  units: z.object({
    stress: StressUnitSchema.default('kPa'),
    time: TimeUnitSchema.default('min'),
    deformation: LengthUnitSchema.default('mm'),
  }),
  deformationReading: DeformationReadingSchema.default({ kind: 'deformation' }),
});
export type ImportMapping = z.infer<typeof ImportMappingSchema>;
export type ImportMappingInput = z.input<typeof ImportMappingSchema>;

/** POST /uploads/:uploadId/import: a saved profile, or a mapping (optionally saved as a profile). */
export const ImportRequestSchema = z.union([
  z.object({ profileId: z.uuid({ message: 'choose a saved import profile' }) }).strict(),
  z
    .object({
      mapping: ImportMappingSchema,
      saveAsProfile: z.string().trim().min(1).max(80).optional(),
    })
    .strict(),
]);
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

/** One rejected row: spreadsheet row number (header = row 1), the column's name (null: whole row), why. */
export const ImportIssueSchema = z.object({
  row: z.number().int(),
  column: z.string().nullable(),
  message: z.string(),
});
export type ImportIssue = z.infer<typeof ImportIssueSchema>;

export const UploadStatusSchema = z.enum(['stored', 'needs_mapping', 'importing', 'imported', 'failed']);
export type UploadStatus = z.infer<typeof UploadStatusSchema>;

export const DetectedFileTypeSchema = z.enum(['csv', 'xlsx']);
export type DetectedFileType = z.infer<typeof DetectedFileTypeSchema>;

export const UploadSchema = z.object({
  id: z.string(),
  testId: z.string(),
  originalName: z.string(),
  sizeBytes: z.number(),
  sha256: z.string(),
  detectedType: DetectedFileTypeSchema,
  status: UploadStatusSchema,
  uploadedBy: z.object({ id: z.string(), name: z.string() }),
  createdAt: z.string(),
  /** Set once imported. */
  readingCount: z.number().nullable(),
  incrementCount: z.number().nullable(),
  /** Why the last import failed, and the rejected rows (first 200; `issueCount` is the total). */
  failure: z
    .object({ message: z.string(), issues: z.array(ImportIssueSchema), issueCount: z.number() })
    .nullable(),
  mapping: ImportMappingSchema.nullable(),
});
export type Upload = z.infer<typeof UploadSchema>;

export const LayoutSchema = z.enum(['canonical', 'needs_mapping']);
export type Layout = z.infer<typeof LayoutSchema>;

/** The first rows of a file as found, for the mapping step. */
export const UploadPreviewSchema = z.object({
  uploadId: z.string(),
  detectedType: DetectedFileTypeSchema,
  layout: LayoutSchema,
  /** CSV only. */
  delimiter: CsvDelimiterSchema.nullable(),
  columns: z.array(z.string()),
  rows: z.array(z.array(z.union([z.string(), z.number(), z.null()]))),
  /** A guess at the mapping from the column names, to start the form with. */
  suggestedMapping: ImportMappingSchema.nullable(),
  /** Key/values of an XLSX "specimen" sheet. */
  specimen: z.record(z.string(), z.union([z.string(), z.number()])),
});
export type UploadPreview = z.infer<typeof UploadPreviewSchema>;

export const ReadingRowSchema = z.object({
  rowNumber: z.number(),
  incrementIndex: z.number(),
  stressKpa: z.number(),
  elapsedMin: z.number(),
  deformationMm: z.number(),
});
export type ReadingRow = z.infer<typeof ReadingRowSchema>;

export const ReadingsPageSchema = z.object({
  total: z.number(),
  offset: z.number(),
  limit: z.number(),
  readings: z.array(ReadingRowSchema),
});
export type ReadingsPage = z.infer<typeof ReadingsPageSchema>;

export const ReadingsPageQuerySchema = z.object({
  offset: z.coerce.number().int().min(0).default(0),
  limit: z.coerce.number().int().min(1).max(5000).default(500),
});
export type ReadingsPageQuery = z.infer<typeof ReadingsPageQuerySchema>;
