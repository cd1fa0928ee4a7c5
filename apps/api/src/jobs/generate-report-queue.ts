import type { EntityManager } from 'typeorm';
import { jobRuns } from '../modules/job-runs/job-runs.service.js';
import { jobQueue } from './boss.js';

export const GENERATE_REPORT_QUEUE = 'generate-report';

export interface GenerateReportJobData {
  orgId: string;
  reportId: string;
  jobRunId: string;
}

let queueReady: Promise<void> | undefined;

/**
 * Queues the generation of an issued report, inside the caller's transaction: the job exists
 * only if the approval (or the retry) that asked for it commits. Not retried by pg-boss: a
 * failure stays visible on the report and a lab manager asks for it again.
 * @returns the job_runs id.
 */
export async function enqueueReportGeneration(input: { orgId: string; reportId: string; testId: string | null; requestedById: string }, manager: EntityManager): Promise<string> {
  const boss = await jobQueue();
  // pg-boss 10 refuses to send to a queue that does not exist yet (the worker may not have started).
  queueReady ??= boss.createQueue(GENERATE_REPORT_QUEUE);
  await queueReady;
  const run = await jobRuns.create(
    { organisationId: input.orgId, kind: GENERATE_REPORT_QUEUE, testId: input.testId, createdById: input.requestedById, message: 'Waiting for the worker to print the report.' },
    manager,
  );
  const data: GenerateReportJobData = { orgId: input.orgId, reportId: input.reportId, jobRunId: run.id };
  const db = { executeSql: async (text: string, values: unknown[]) => ({ rows: (await manager.query(text, values)) as unknown[] }) };
  const bossJobId = await boss.send(GENERATE_REPORT_QUEUE, data, { retryLimit: 0, db });
  if (bossJobId) await jobRuns.update(run.id, { bossJobId }, manager);
  return run.id;
}
