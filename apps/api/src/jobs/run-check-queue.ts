import type { EntityManager } from 'typeorm';
import { jobRuns } from '../modules/job-runs/job-runs.service.js';
import type { RunSnapshot } from '../modules/settlement-checks/check-runs.service.js';
import { jobQueue } from './boss.js';

export const RUN_SETTLEMENT_CHECK_QUEUE = 'run-settlement-check';

export interface RunCheckJobData {
  orgId: string;
  projectId: string;
  actorId: string;
  jobRunId: string;
  /** The draft as it was when the run was asked for. */
  snapshot: RunSnapshot;
}

let queueReady: Promise<void> | undefined;

/**
 * Queues a large check for the worker, in the caller's transaction: the job_runs row, the job
 * and the check's pending mark commit together or not at all.
 * @returns the job_runs id the page follows.
 */
export async function enqueueCheckRun(input: Omit<RunCheckJobData, 'jobRunId'>, manager: EntityManager): Promise<string> {
  const boss = await jobQueue();
  // pg-boss 10 refuses to send to a queue that does not exist yet (the worker may not have started).
  queueReady ??= boss.createQueue(RUN_SETTLEMENT_CHECK_QUEUE);
  await queueReady;
  const run = await jobRuns.create(
    { organisationId: input.orgId, kind: RUN_SETTLEMENT_CHECK_QUEUE, createdById: input.actorId, message: `Waiting for the worker to run ${input.snapshot.footings.length.toLocaleString('en-GB')} footings.` },
    manager,
  );
  const data: RunCheckJobData = { ...input, jobRunId: run.id };
  const db = { executeSql: async (text: string, values: unknown[]) => ({ rows: (await manager.query(text, values)) as unknown[] }) };
  // Not retried: a check that failed once fails the same way; the designer runs it again.
  const bossJobId = await boss.send(RUN_SETTLEMENT_CHECK_QUEUE, data, { retryLimit: 0, db });
  if (bossJobId) await jobRuns.update(run.id, { bossJobId }, manager);
  return run.id;
}
