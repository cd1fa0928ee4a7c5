import { z } from 'zod';
import { CheckOptionsSchema } from './check-options.js';
import { ActorSchema, isoDateTime, positiveNumber } from './design-fields.js';
import { FootingRowSchema, FootingScheduleSchema } from './footing-schedule.js';
import { GroundModelContentSchema } from './ground-model.js';
import { SettlementCheckResultSchema, UniformLoadSettlementResultSchema } from './settlement-result.js';

/**
 * A settlement check: an editable draft (ground model, footing schedule, options) and the
 * immutable revisions its runs produced. A revision stores its inputs, the record and set
 * versions it pinned, the geo-core version and the whole result; it never changes afterwards.
 */

/** Saving or running with warnings (overlapping footings, implausible unit weights) needs this set, after the person has read them. */
const acceptWarnings = z.boolean().default(false);

export const SettlementCheckCreateSchema = z.object({
  name: z.string().trim().min(1, { message: 'Name the check (e.g. "Block A, column bases").' }).max(120),
  groundModelId: z.uuid({ message: 'Choose the ground model the check is run on.' }),
  footings: FootingScheduleSchema.default([]),
  options: CheckOptionsSchema.default(CheckOptionsSchema.parse({})),
  acceptWarnings,
});
export type SettlementCheckCreate = z.input<typeof SettlementCheckCreateSchema>;

export const SettlementCheckUpdateSchema = z.object({
  name: z.string().trim().min(1, { message: 'Name the check.' }).max(120).optional(),
  groundModelId: z.uuid({ message: 'Choose the ground model the check is run on.' }).optional(),
  footings: FootingScheduleSchema.optional(),
  options: CheckOptionsSchema.optional(),
  acceptWarnings,
});
export type SettlementCheckUpdate = z.input<typeof SettlementCheckUpdateSchema>;

export const RunCheckSchema = z.object({ acceptWarnings, reason: z.string().trim().max(300).optional() });
export type RunCheck = z.input<typeof RunCheckSchema>;

/** What changed in one pinned source since the run: the parameters that differ between the versions. */
export const SourceChangeSchema = z.object({
  layerIndex: z.number().int(),
  layerName: z.string(),
  kind: z.enum(['record', 'set']),
  label: z.string(),
  pinned: z.number().int(),
  current: z.number().int(),
  parameters: z.array(z.object({ name: z.string(), before: z.number().nullable(), after: z.number().nullable() })),
});
export type SourceChange = z.infer<typeof SourceChangeSchema>;

export const FreshnessSchema = z.object({
  newerParametersApproved: z.boolean(),
  changes: z.array(SourceChangeSchema),
});
export type Freshness = z.infer<typeof FreshnessSchema>;

export const RevisionListItemSchema = z.object({
  id: z.uuid(),
  revision: z.number().int(),
  reason: z.string(),
  createdBy: ActorSchema,
  createdAt: isoDateTime,
  footingCount: z.number().int(),
  /** Largest total settlement of the run, m. */
  maxTotalM: z.number(),
  pairsOverLimit: z.number().int(),
  footingsOverLimit: z.number().int(),
});
export type RevisionListItem = z.infer<typeof RevisionListItemSchema>;

export const SettlementCheckSummarySchema = z.object({
  id: z.uuid(),
  projectId: z.uuid(),
  projectName: z.string(),
  name: z.string(),
  groundModelId: z.uuid(),
  groundModelName: z.string(),
  footingCount: z.number().int(),
  latestRevision: z.number().int().nullable(),
  latestRunAt: isoDateTime.nullable(),
  /** A record or set version the latest run pinned has been superseded by a newer approved one. */
  newerParametersApproved: z.boolean(),
  updatedAt: isoDateTime,
});
export type SettlementCheckSummary = z.infer<typeof SettlementCheckSummarySchema>;

export const SettlementCheckDetailSchema = SettlementCheckSummarySchema.extend({
  footings: z.array(FootingRowSchema),
  options: CheckOptionsSchema,
  revisions: z.array(RevisionListItemSchema),
  freshness: FreshnessSchema,
  /** A queued or running job of this check, if any (large checks run in the background). */
  pendingJobId: z.uuid().nullable(),
});
export type SettlementCheckDetail = z.infer<typeof SettlementCheckDetailSchema>;

/** A footing as the engine took it: its net pressure and the overburden it was netted against. */
export const FootingAsRunSchema = z.object({
  id: z.string(),
  shape: z.string(),
  grossPressureKpa: z.number(),
  overburdenKpa: z.number(),
  netPressureKpa: z.number(),
});

export const CheckRunResultSchema = z.discriminatedUnion('kind', [
  z.object({ kind: z.literal('footings'), check: SettlementCheckResultSchema }),
  z.object({ kind: z.literal('uniform'), check: UniformLoadSettlementResultSchema }),
]);
export type CheckRunResult = z.infer<typeof CheckRunResultSchema>;

export const CheckRevisionSchema = z.object({
  id: z.uuid(),
  checkId: z.uuid(),
  projectId: z.uuid(),
  checkName: z.string(),
  revision: z.number().int(),
  reason: z.string(),
  createdBy: ActorSchema,
  createdAt: isoDateTime,
  geoCoreVersion: z.string(),
  durationMs: z.number(),
  groundModel: z.object({ id: z.uuid(), name: z.string(), revisionId: z.uuid(), revision: z.number().int(), content: GroundModelContentSchema }),
  footings: z.array(FootingRowSchema),
  options: CheckOptionsSchema,
  footingsAsRun: z.array(FootingAsRunSchema),
  /** With detail 'summary', each footing's sublayers and time curve are left out (fetch a footing for them). */
  detail: z.enum(['summary', 'full']),
  result: CheckRunResultSchema,
  warnings: z.array(z.string()),
  caution: z.string(),
});
export type CheckRevision = z.infer<typeof CheckRevisionSchema>;

export const RunCheckAnswerSchema = z.discriminatedUnion('kind', [
  z.object({ kind: z.literal('done'), revision: z.number().int(), revisionId: z.uuid() }),
  z.object({ kind: z.literal('queued'), jobId: z.uuid() }),
]);
export type RunCheckAnswer = z.infer<typeof RunCheckAnswerSchema>;

export const CompareQuerySchema = z.object({
  a: z.coerce.number().int().min(1, { message: 'Choose the first revision to compare.' }),
  b: z.coerce.number().int().min(1, { message: 'Choose the second revision to compare.' }),
});

export const RevisionComparisonSchema = z.object({
  a: z.object({ revision: z.number().int(), createdAt: isoDateTime, reason: z.string() }),
  b: z.object({ revision: z.number().int(), createdAt: isoDateTime, reason: z.string() }),
  inputs: z.array(z.object({ what: z.string(), a: z.string(), b: z.string() })),
  footings: z.array(z.object({ id: z.string(), aTotalM: z.number().nullable(), bTotalM: z.number().nullable(), changeM: z.number().nullable() })),
});
export type RevisionComparison = z.infer<typeof RevisionComparisonSchema>;

export const SizingRequestSchema = z
  .object({
    footingId: z.string().min(1, { message: 'Choose the footing to size.' }),
    target: z.enum(['settlement', 'match']),
    targetTotalMm: positiveNumber('target settlement', 'mm').nullable().default(null),
    matchFootingId: z.string().nullable().default(null),
    minWidthM: positiveNumber('smallest width to try', 'm').default(0.5),
    maxWidthM: positiveNumber('largest width to try', 'm').default(6),
  })
  .refine((s) => s.maxWidthM > s.minWidthM, { message: 'The largest width must be greater than the smallest.', path: ['maxWidthM'] })
  .refine((s) => s.target !== 'settlement' || s.targetTotalMm !== null, { message: 'Enter the target settlement in mm.', path: ['targetTotalMm'] })
  .refine((s) => s.target !== 'match' || (s.matchFootingId !== null && s.matchFootingId !== s.footingId), {
    message: 'Choose another footing whose settlement this one should match.',
    path: ['matchFootingId'],
  });
export type SizingRequest = z.input<typeof SizingRequestSchema>;

export const SizingAnswerSchema = z.object({
  footingId: z.string(),
  status: z.enum(['found', 'minimum-width-suffices', 'no-width-within-bounds']),
  widthM: z.number().nullable(),
  lengthM: z.number().nullable(),
  settlementM: z.number().nullable(),
  targetSettlementM: z.number(),
  settlementAtMinWidthM: z.number(),
  settlementAtMaxWidthM: z.number(),
  /** The answer in one or two plain sentences. */
  message: z.string(),
  warnings: z.array(z.string()),
});
export type SizingAnswer = z.infer<typeof SizingAnswerSchema>;

export const SizingApplySchema = z.object({
  footingId: z.string().min(1),
  widthM: positiveNumber('width B', 'm'),
  lengthM: positiveNumber('length L', 'm').nullable().default(null),
  reason: z.string().trim().max(300).default(''),
  acceptWarnings,
});
export type SizingApply = z.input<typeof SizingApplySchema>;
