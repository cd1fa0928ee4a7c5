import { z } from 'zod';
import { isoDateTime } from './design-fields.js';

/**
 * Where a layer parameter came from, one step at a time: record → version → test → approver →
 * readings file hash; a set's adopted value and the versions behind it; or "entered by hand".
 */

export const RecordVersionTraceSchema = z.object({
  kind: z.literal('record'),
  recordId: z.uuid(),
  boreholeName: z.string(),
  sampleReference: z.string(),
  sampleDepthM: z.number(),
  version: z.number().int(),
  versionId: z.uuid(),
  currentVersion: z.number().int(),
  testId: z.uuid(),
  testReference: z.string(),
  analysisId: z.uuid(),
  geoCoreVersion: z.string(),
  approvedByName: z.string(),
  approvedAt: isoDateTime,
  readingsFileName: z.string().nullable(),
  readingsSha256: z.string().nullable(),
});
export type RecordVersionTrace = z.infer<typeof RecordVersionTraceSchema>;

export const SetRevisionTraceSchema = z.object({
  kind: z.literal('set'),
  setId: z.uuid(),
  setRevisionId: z.uuid(),
  name: z.string(),
  revision: z.number().int(),
  currentRevision: z.number().int(),
  createdByName: z.string(),
  createdAt: isoDateTime,
  adopted: z.record(z.string(), z.object({ value: z.number().nullable(), basis: z.string(), note: z.string() })),
  members: z.array(RecordVersionTraceSchema),
});
export type SetRevisionTrace = z.infer<typeof SetRevisionTraceSchema>;

/** An approved soil record of the project as the designer picks it: the current version, sample mid-depth. */
export const DesignRecordSchema = z.object({
  recordId: z.uuid(),
  versionId: z.uuid(),
  version: z.number().int(),
  boreholeName: z.string(),
  sampleReference: z.string(),
  testReference: z.string(),
  depthM: z.number(),
  e0: z.number(),
  cc: z.number().nullable(),
  cr: z.number().nullable(),
  cs: z.number().nullable(),
  preconsolidationKpa: z.number().nullable(),
  ocr: z.number().nullable(),
  cvMinM2PerYr: z.number().nullable(),
  cvMaxM2PerYr: z.number().nullable(),
  cAlpha: z.number().nullable(),
  sampleQuality: z.string().nullable(),
  approvedAt: isoDateTime,
});
export type DesignRecord = z.infer<typeof DesignRecordSchema>;

export const DesignRecordQuerySchema = z.object({
  borehole: z.string().trim().max(60).optional(),
  minDepthM: z.coerce.number().min(0).optional(),
  maxDepthM: z.coerce.number().min(0).optional(),
});
export type DesignRecordQuery = z.infer<typeof DesignRecordQuerySchema>;

