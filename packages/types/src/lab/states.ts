import { z } from 'zod';

/**
 * Where a consolidation test stands. It moves only along
 * draft → readings_uploaded → analysed → submitted → approved | changes_requested,
 * with the way back that re-work needs (new readings, re-analysis); the server checks each move.
 * The one list of test states: the API, the web and the seed take them from here.
 */
export const TEST_STATUSES = ['draft', 'readings_uploaded', 'analysed', 'submitted', 'approved', 'changes_requested'] as const;
export const TestStatusSchema = z.enum(TEST_STATUSES);
export type TestStatus = z.infer<typeof TestStatusSchema>;

/** Our words for where a test stands: short enough for a badge, plain enough for a newcomer. */
export const TEST_STATUS_LABELS: Record<TestStatus, string> = {
  draft: 'Draft',
  readings_uploaded: 'Readings in',
  analysed: 'Reduced',
  submitted: 'Awaiting review',
  approved: 'Approved',
  changes_requested: 'Changes asked',
};

/** What each state means, in a sentence: for a tooltip, a screen reader or a refusal. */
export const TEST_STATUS_HINTS: Record<TestStatus, string> = {
  draft: 'Set up, waiting for a readings file.',
  readings_uploaded: 'Readings imported; the analysis has not finished yet.',
  analysed: 'Analysed; the technician can check the curves and submit.',
  submitted: 'With a lab manager for review.',
  approved: 'Approved; its parameters are a soil record version.',
  changes_requested: 'Sent back by a lab manager with a comment.',
};

/** States in which a test's readings cannot be replaced and the bench pages show it read-only: under review, or approved. */
export const FROZEN_TEST_STATUSES = ['submitted', 'approved'] as const satisfies readonly TestStatus[];

export function isFrozenTestStatus(status: TestStatus): boolean {
  return (FROZEN_TEST_STATUSES as readonly TestStatus[]).includes(status);
}

/** The moves a review records: a technician's submission and a lab manager's two decisions (each the state it leads to). */
export const REVIEW_DECISIONS = ['submitted', 'approved', 'changes_requested'] as const satisfies readonly TestStatus[];
export type ReviewDecision = (typeof REVIEW_DECISIONS)[number];
/** What a lab manager decides on a submitted test. */
export type ReviewOutcome = Exclude<ReviewDecision, 'submitted'>;

/** Where a background job (import, analysis) stands. */
export const JOB_STATES = ['queued', 'running', 'succeeded', 'failed'] as const;
export const JobStateSchema = z.enum(JOB_STATES);
export type JobState = z.infer<typeof JobStateSchema>;
