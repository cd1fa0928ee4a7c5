import { z } from 'zod';
import { nonNegativeNumber, positiveNumber } from './design-fields.js';

/**
 * The footing schedule of a check: one row per footing, as a designer keeps it in a spreadsheet.
 * x and y are plan coordinates of the centre (m); B runs along x; L along y; depths are below
 * ground level.
 */

export const FOOTING_SHAPES = ['rectangle', 'square', 'circle', 'strip'] as const;
export const FootingShapeSchema = z.enum(FOOTING_SHAPES, { error: 'The shape must be rectangle, square, circle or strip.' });
export type FootingShape = z.infer<typeof FootingShapeSchema>;

/** A load in kN (kN per metre run for a strip) or a bearing pressure in kPa. */
export const LOAD_KINDS = ['load', 'pressure'] as const;
export const LoadKindSchema = z.enum(LOAD_KINDS, { error: 'Say whether the value is a load (kN) or a bearing pressure (kPa).' });
export type LoadKind = z.infer<typeof LoadKindSchema>;

/** Gross: the whole load on the base; net: less the weight of soil removed to found it. */
export const LOAD_BASES = ['gross', 'net'] as const;
export const LoadBasisSchema = z.enum(LOAD_BASES, { error: 'Say whether the load is gross or net of the soil removed.' });
export type LoadBasis = z.infer<typeof LoadBasisSchema>;

export const FootingRowSchema = z.object({
  id: z
    .string({ error: 'Give the footing a mark (e.g. F1).' })
    .trim()
    .min(1, { message: 'Give the footing a mark (e.g. F1).' })
    .max(40, { message: 'Keep the footing mark under 40 characters.' }),
  shape: FootingShapeSchema.default('rectangle'),
  /** B (the diameter of a circle, the width of a strip), m. */
  widthM: positiveNumber('width B', 'm').max(100, { message: 'A footing wider than 100 m is not a pad; model it as a raft with a uniform load.' }),
  /** L of a rectangle, m; ignored for the other shapes. */
  lengthM: positiveNumber('length L', 'm').max(1000).nullable().default(null),
  depthM: nonNegativeNumber('founding depth', 'm'),
  loadKind: LoadKindSchema.default('load'),
  /** kN (kN/m for a strip) or kPa, as loadKind says. */
  load: positiveNumber('load or bearing pressure', 'kN or kPa'),
  loadBasis: LoadBasisSchema.default('net'),
  xM: z.number({ error: 'Enter x as a number in metres.' }).min(-100_000).max(100_000),
  yM: z.number({ error: 'Enter y as a number in metres.' }).min(-100_000).max(100_000),
});
export type FootingRow = z.infer<typeof FootingRowSchema>;
export type FootingRowInput = z.input<typeof FootingRowSchema>;

export const FootingScheduleSchema = z.array(FootingRowSchema).max(2000, { message: 'A check holds at most 2,000 footings; split the building into parts.' });

/** The columns of an imported or pasted schedule, in the order a template lists them. */
export const FOOTING_COLUMNS = ['id', 'shape', 'widthM', 'lengthM', 'depthM', 'loadKind', 'load', 'loadBasis', 'xM', 'yM'] as const;
export const FOOTING_COLUMN_HEADINGS: Record<(typeof FOOTING_COLUMNS)[number], string> = {
  id: 'mark',
  shape: 'shape',
  widthM: 'B (m)',
  lengthM: 'L (m)',
  depthM: 'depth (m)',
  loadKind: 'load kind',
  load: 'load (kN) or pressure (kPa)',
  loadBasis: 'gross or net',
  xM: 'x (m)',
  yM: 'y (m)',
};

/** What an import or a paste gives back before anything is saved: the rows that read, and what is wrong with the others. */
export const FootingImportResultSchema = z.object({
  rows: z.array(FootingRowSchema),
  issues: z.array(z.object({ row: z.number().int(), column: z.string().nullable(), message: z.string() })),
  rowCount: z.number().int(),
});
export type FootingImportResult = z.infer<typeof FootingImportResultSchema>;

export const FootingPasteSchema = z.object({ text: z.string().min(1, { message: 'Paste at least one row.' }).max(2_000_000) });
export type FootingPaste = z.infer<typeof FootingPasteSchema>;
