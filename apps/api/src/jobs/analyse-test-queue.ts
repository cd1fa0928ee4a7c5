import type { EntityManager } from 'typeorm';
import { jobRuns } from '../modules/job-runs/job-runs.service.js';
import { jobQueue } from './boss.js';

export const ANALYSE_TEST_QUEUE = 'analyse-test';

export interface AnalyseTestJobData {
  orgId: string;
  testId: string;
  jobRunId: string;
  requestedById: string | null;
}

let queueReady: Promise<void> | undefined;

/**
 * Queues an analysis of the test. With a transaction's manager, the job_runs row and the
 * pg-boss job are written in that transaction: if it rolls back, no job is left behind, and
 * the worker cannot pick the job up before the change that asked for it is committed.
 * @returns the job_runs id the page follows.
 */
export async function enqueueAnalysis(
  orgId: string,
  testId: string,
  requestedById: string | null,
  manager?: EntityManager,
): Promise<string> {
  const boss = await jobQueue();
  // pg-boss 10 refuses to send to a queue that does not exist yet (the worker may not have started).
  queueReady ??= boss.createQueue(ANALYSE_TEST_QUEUE);
  await queueReady;
  const run = await jobRuns.create({ organisationId: orgId, kind: ANALYSE_TEST_QUEUE, testId, createdById: requestedById }, manager);
  const data: AnalyseTestJobData = { orgId, testId, jobRunId: run.id, requestedById };
  const db = manager ? { executeSql: async (text: string, values: unknown[]) => ({ rows: (await manager.query(text, values)) as unknown[] }) } : undefined;
  const bossJobId = await boss.send(ANALYSE_TEST_QUEUE, data, { retryLimit: 1, ...(db ? { db } : {}) });
  if (bossJobId) await jobRuns.update(run.id, { bossJobId }, manager);
  return run.id;
}
