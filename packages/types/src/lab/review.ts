import { z } from 'zod';
import { KeyParametersSchema } from './records.js';
import { REVIEW_DECISIONS, TestStatusSchema } from './states.js';

export const ReviewQueueItemSchema = z.object({
  testId: z.uuid(),
  testReference: z.string(),
  projectId: z.uuid(),
  projectName: z.string(),
  sampleReference: z.string(),
  boreholeName: z.string(),
  topDepthM: z.number(),
  bottomDepthM: z.number(),
  technicianId: z.uuid(),
  technicianName: z.string(),
  submittedAt: z.iso.datetime({ offset: true }),
  keyParameters: KeyParametersSchema,
  warningCount: z.number().int(),
});
export type ReviewQueueItem = z.infer<typeof ReviewQueueItemSchema>;

export const ChangeRequestSchema = z.object({
  comment: z.string().trim().min(3, { message: 'Tell the technician what to change (a few words at least).' }).max(4000),
});
export type ChangeRequest = z.infer<typeof ChangeRequestSchema>;

export const ApprovalSchema = z.object({ comment: z.string().trim().max(4000).optional() });
export type Approval = z.infer<typeof ApprovalSchema>;

export const ReviewEventSchema = z.object({
  id: z.uuid(),
  decision: z.enum(REVIEW_DECISIONS),
  comment: z.string().nullable(),
  actorId: z.uuid(),
  actorName: z.string(),
  analysisId: z.uuid().nullable(),
  at: z.iso.datetime({ offset: true }),
});
export type ReviewEvent = z.infer<typeof ReviewEventSchema>;

export const SoilRecordVersionSchema = z.object({
  id: z.uuid(),
  recordId: z.uuid(),
  version: z.number().int(),
  testId: z.uuid(),
  analysisId: z.uuid(),
  uploadId: z.uuid().nullable(),
  uploadSha256: z.string().nullable(),
  geoCoreVersion: z.string(),
  initialVoidRatio: z.number(),
  compressionIndex: z.number().nullable(),
  recompressionIndex: z.number().nullable(),
  swellIndex: z.number().nullable(),
  preconsolidationCasagrandeKpa: z.number().nullable(),
  preconsolidationPachecoSilvaKpa: z.number().nullable(),
  preconsolidationAdoptedKpa: z.number().nullable(),
  preconsolidationAdoptedFrom: z.string().nullable(),
  overconsolidationRatio: z.number().nullable(),
  cvMinM2PerYr: z.number().nullable(),
  cvMaxM2PerYr: z.number().nullable(),
  secondaryCompressionIndex: z.number().nullable(),
  sampleQuality: z.string().nullable(),
  approvedById: z.uuid(),
  approvedByName: z.string(),
  approvedAt: z.iso.datetime({ offset: true }),
  supersededAt: z.iso.datetime({ offset: true }).nullable(),
  supersededByVersion: z.number().int().nullable(),
});
export type SoilRecordVersion = z.infer<typeof SoilRecordVersionSchema>;

export const SoilRecordSummarySchema = z.object({
  id: z.uuid(),
  testId: z.uuid(),
  testReference: z.string(),
  /** Where the test stands in the lab now; null for a client, who follows approved versions only. */
  testStatus: TestStatusSchema.nullable(),
  projectId: z.uuid(),
  projectName: z.string(),
  boreholeName: z.string(),
  sampleReference: z.string(),
  topDepthM: z.number(),
  currentVersion: z.number().int(),
  current: SoilRecordVersionSchema,
});
export type SoilRecordSummary = z.infer<typeof SoilRecordSummarySchema>;

export const SoilRecordDetailSchema = SoilRecordSummarySchema.extend({
  versions: z.array(SoilRecordVersionSchema),
});
export type SoilRecordDetail = z.infer<typeof SoilRecordDetailSchema>;

export const SoilRecordListQuerySchema = z.object({ projectId: z.uuid().optional() });
