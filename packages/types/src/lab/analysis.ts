import { z } from 'zod';
import { ConsolidationTestResultSchema } from './consolidation-result.js';
import { JobStateSchema } from './states.js';

/** Overrides of the automatic choices, as geo-core's ConsolidationPicks. */
export const IncrementPicksSchema = z.object({
  index: z.number().int(),
  taylor: z.object({ t90Min: z.number().positive().optional(), d0Mm: z.number().optional() }).optional(),
  casagrande: z.object({ t50Min: z.number().positive().optional(), d0Mm: z.number().optional(), d100Mm: z.number().optional() }).optional(),
});
export type IncrementPicksInput = z.infer<typeof IncrementPicksSchema>;

export const PicksSchema = z.object({
  preconsolidationStressKpa: z.number().positive({ message: 'The preconsolidation stress must be greater than zero (kPa).' }).optional(),
  virginLine: z
    .object({ firstIncrementIndex: z.number().int(), lastIncrementIndex: z.number().int() })
    .refine((v) => v.lastIncrementIndex > v.firstIncrementIndex, { message: 'The virgin line needs at least two increments: the last must come after the first.' })
    .optional(),
  increments: z.array(IncrementPicksSchema).max(200).optional(),
});
export type Picks = z.infer<typeof PicksSchema>;

export const PicksUpdateSchema = z.object({
  picks: PicksSchema,
  reason: z.string().trim().min(3, { message: 'Say why the automatic choice is being overridden (a few words at least).' }).max(1000),
});
export type PicksUpdate = z.infer<typeof PicksUpdateSchema>;

/** A stored analysis: geo-core's full result kept as it was produced. */
export const AnalysisSchema = z.object({
  id: z.uuid(),
  testId: z.uuid(),
  createdAt: z.iso.datetime({ offset: true }),
  geoCoreVersion: z.string(),
  /** SHA-256 of the canonical input (specimen, increments, compliance, picks) and the geo-core version. */
  inputsHash: z.string(),
  picks: PicksSchema,
  pickReason: z.string().nullable(),
  uploadId: z.uuid().nullable(),
  warningCount: z.number().int(),
  /** geo-core's ConsolidationTestResult, as the contract in consolidation-result.ts describes it. */
  result: ConsolidationTestResultSchema,
});
export type Analysis = z.infer<typeof AnalysisSchema>;


/** A background job as the page follows it (GET /api/orgs/:orgId/jobs/:jobId). */
export const JobRunSchema = z.object({
  id: z.uuid(),
  kind: z.string(),
  state: JobStateSchema,
  /** fraction 0–1 */
  progress: z.number().min(0).max(1),
  message: z.string().nullable(),
  testId: z.uuid().nullable(),
  /** What the job produced, e.g. { analysisId } or { importedReadings }. */
  result: z.record(z.string(), z.unknown()).nullable(),
  createdAt: z.iso.datetime({ offset: true }),
  updatedAt: z.iso.datetime({ offset: true }),
});
export type JobRun = z.infer<typeof JobRunSchema>;
