import { z } from 'zod';
import { CsvDelimiterSchema, ImportMappingSchema } from './import-mapping.js';
import { MappingSuggestionSchema } from './import-guess.js';

/**
 * One rejected row: spreadsheet row number (header = row 1), the column's name (null: whole
 * row), why; in a workbook of one sheet per increment, the sheet too.
 */
export const ImportIssueSchema = z.object({
  row: z.number().int(),
  column: z.string().nullable(),
  message: z.string(),
  sheet: z.string().optional(),
});
export type ImportIssue = z.infer<typeof ImportIssueSchema>;

/**
 * Something an import did with a row that the technician must know of, though the file was
 * imported: an exact duplicate row dropped, a second reading at the same time that replaced
 * the first (the later one is kept), or a check on the whole file (deformation implausible
 * for the specimen's height). Always listed on the upload, never silent.
 */
export const ImportNoteSchema = z.object({
  kind: z.enum(['dropped', 'replaced', 'check']),
  /** null for a note on the whole file. */
  row: z.number().int().nullable(),
  column: z.string().nullable(),
  message: z.string(),
  sheet: z.string().optional(),
});
export type ImportNote = z.infer<typeof ImportNoteSchema>;

/** Another test of the organisation that holds a file with the same SHA-256. */
export const SameFileSchema = z.object({
  testId: z.string(),
  testReference: z.string(),
  uploadId: z.string(),
  originalName: z.string(),
  uploadedAt: z.string(),
});
export type SameFile = z.infer<typeof SameFileSchema>;

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
  /** What the last import dropped, replaced or found implausible (first 200; `noteCount` is the total). */
  notes: z.array(ImportNoteSchema).default([]),
  noteCount: z.number().int().default(0),
  /** Other tests holding an upload of the very same bytes: most likely the wrong file here, or there. */
  sameFileIn: z.array(SameFileSchema).default([]),
});
export type Upload = z.infer<typeof UploadSchema>;

export const LayoutSchema = z.enum(['canonical', 'needs_mapping']);
export type Layout = z.infer<typeof LayoutSchema>;

const CellSchema = z.union([z.string(), z.number(), z.null()]);

/** A row as found: its number as a spreadsheet shows it, and its cells. */
export const PreviewRowSchema = z.object({ rowNumber: z.number().int(), cells: z.array(CellSchema) });
export type PreviewRow = z.infer<typeof PreviewRowSchema>;

/** The first rows of a file as found, for the mapping step. */
export const UploadPreviewSchema = z.object({
  uploadId: z.string(),
  detectedType: DetectedFileTypeSchema,
  layout: LayoutSchema,
  /** CSV only: the delimiter the rows were split with (the one asked for, or the one detected). */
  delimiter: CsvDelimiterSchema.nullable(),
  /** The row the column names are taken from: the one asked for, or the one detected. */
  headerRow: z.number().int(),
  /** The row that looks like the column names (below any title rows). */
  detectedHeaderRow: z.number().int(),
  /** The first rows of the (first) readings sheet from row 1, title rows included, to choose the header row from. */
  topRows: z.array(PreviewRowSchema),
  /** The names in the header row. */
  columns: z.array(z.string()),
  /** Rows below the header row (up to 20). */
  rows: z.array(z.array(CellSchema)),
  /** Sheets that may hold readings, in workbook order (not the "specimen" sheet); empty for a CSV. */
  sheets: z.array(z.string()),
  /** The mapping to start from: a matching saved profile, else a guess from the header and the values. */
  suggestion: MappingSuggestionSchema,
  /** Key/values of an XLSX "specimen" sheet. */
  specimen: z.record(z.string(), z.union([z.string(), z.number()])),
});
export type UploadPreview = z.infer<typeof UploadPreviewSchema>;

export const ReadingRowSchema = z.object({
  /** 0 for a CSV or a workbook's first sheet; the sheet's place in a workbook of one sheet per increment. */
  sheetIndex: z.number().int().default(0),
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

/** POST /uploads/:uploadId/trial: read the first increment with a mapping, before importing. */
export const ImportTrialRequestSchema = z.object({ mapping: ImportMappingSchema }).strict();
export type ImportTrialRequest = z.infer<typeof ImportTrialRequestSchema>;

/** One reading of the trial: the cells as written beside what they import as. */
export const TrialReadingSchema = z.object({
  rowNumber: z.number().int(),
  time: CellSchema,
  deformation: CellSchema,
  elapsedMin: z.number(),
  deformationMm: z.number(),
});
export type TrialReading = z.infer<typeof TrialReadingSchema>;

/**
 * The first increment of a file read with a mapping: its readings as written and in minutes
 * and millimetres (so a wrong division or direction shows before anything is imported), and
 * the problems and notes found in the rows read.
 */
export const ImportTrialSchema = z.object({
  increment: z
    .object({ index: z.number().int(), stressKpa: z.number(), sheet: z.string().nullable(), readings: z.array(TrialReadingSchema) })
    .nullable(),
  issues: z.array(ImportIssueSchema),
  issueCount: z.number().int(),
  notes: z.array(ImportNoteSchema),
});
export type ImportTrial = z.infer<typeof ImportTrialSchema>;
