import { z } from 'zod';
import { ProjectSummarySchema } from './lab/records.js';
import { TestStatusSchema } from './lab/states.js';
import { ReviewQueueItemSchema } from './lab/review.js';
import { AuditEntrySchema, InvitationSchema } from './organisations.js';
import { RoleSchema } from './roles.js';

const isoDateTime = z.iso.datetime({ offset: true });

/** Why a technician's test waits on them. */
export const WAITING_REASONS = ['changes_requested', 'needs_readings', 'analysis_failed', 'import_failed', 'ready_to_submit'] as const;
export const WaitingReasonSchema = z.enum(WAITING_REASONS);
export type WaitingReason = z.infer<typeof WaitingReasonSchema>;

/** A test as the home pages list it. */
export const HomeTestSchema = z.object({
  testId: z.uuid(),
  testReference: z.string(),
  status: TestStatusSchema,
  projectName: z.string(),
  boreholeName: z.string(),
  sampleReference: z.string(),
  topDepthM: z.number(),
  updatedAt: isoDateTime,
});
export type HomeTest = z.infer<typeof HomeTestSchema>;

export const WaitingTestSchema = HomeTestSchema.extend({
  reason: WaitingReasonSchema,
  /** The manager's comment, or the failed job's message. */
  detail: z.string().nullable(),
});
export type WaitingTest = z.infer<typeof WaitingTestSchema>;

/** An approved soil record version as the home pages list it. */
export const HomeApprovalSchema = z.object({
  recordId: z.uuid(),
  version: z.number().int(),
  testId: z.uuid(),
  testReference: z.string(),
  projectId: z.uuid(),
  projectName: z.string(),
  boreholeName: z.string(),
  sampleReference: z.string(),
  topDepthM: z.number(),
  approvedAt: isoDateTime,
  approvedByName: z.string(),
  compressionIndex: z.number().nullable(),
  preconsolidationAdoptedKpa: z.number().nullable(),
});
export type HomeApproval = z.infer<typeof HomeApprovalSchema>;

/** A test whose latest background job failed and has not been run again since. */
export const StuckTestSchema = HomeTestSchema.extend({
  jobKind: z.string(),
  message: z.string().nullable(),
  failedAt: isoDateTime,
  technicianName: z.string(),
});
export type StuckTest = z.infer<typeof StuckTestSchema>;

/**
 * GET /home — what the signed-in member's home page shows, one section per role they hold
 * (null for the roles they do not).
 */
export const HomeOverviewSchema = z.object({
  technician: z
    .object({
      /** How many of their tests are in each status. */
      countsByStatus: z.record(TestStatusSchema, z.number().int()),
      waiting: z.array(WaitingTestSchema),
    })
    .nullable(),
  labManager: z
    .object({
      reviewQueue: z.array(ReviewQueueItemSchema),
      recentApprovals: z.array(HomeApprovalSchema),
      stuckTests: z.array(StuckTestSchema),
    })
    .nullable(),
  designer: z.object({ projects: z.array(ProjectSummarySchema) }).nullable(),
  client: z.object({ projects: z.array(ProjectSummarySchema), recentResults: z.array(HomeApprovalSchema) }).nullable(),
  admin: z
    .object({
      /** How many members hold each role (a member with two roles counts under both). */
      memberCounts: z.record(RoleSchema, z.number().int()),
      memberTotal: z.number().int(),
      pendingInvitations: z.array(InvitationSchema),
      recentActivity: z.array(AuditEntrySchema),
    })
    .nullable(),
});
export type HomeOverview = z.infer<typeof HomeOverviewSchema>;
