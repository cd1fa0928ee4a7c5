import type { ImportMapping } from '@porestack/types';
import type { EntityManager } from 'typeorm';
import { jobRuns } from '../modules/job-runs/job-runs.service.js';
import { jobQueue } from './boss.js';

export const IMPORT_READINGS_QUEUE = 'import-readings';

export interface ImportReadingsJobData {
  orgId: string;
  testId: string;
  uploadId: string;
  jobRunId: string;
  actorId: string;
  /** null: the file must be in the canonical layout, or it waits for a mapping. */
  mapping: ImportMapping | null;
}

let queueReady: Promise<void> | undefined;

/**
 * Queues the parse-and-import of an upload. Written with the transaction's manager, so the
 * job_runs row and the pg-boss job exist only if the upload (or import request) committed.
 * @returns the job_runs id the page follows.
 */
export async function enqueueImport(
  input: Omit<ImportReadingsJobData, 'jobRunId'>,
  manager: EntityManager,
): Promise<string> {
  const boss = await jobQueue();
  // pg-boss 10 refuses to send to a queue that does not exist yet (the worker may not have started).
  queueReady ??= boss.createQueue(IMPORT_READINGS_QUEUE);
  await queueReady;
  const run = await jobRuns.create(
    { organisationId: input.orgId, kind: IMPORT_READINGS_QUEUE, testId: input.testId, uploadId: input.uploadId, createdById: input.actorId, message: 'Waiting for the worker to read the file.' },
    manager,
  );
  const data: ImportReadingsJobData = { ...input, jobRunId: run.id };
  const db = { executeSql: async (text: string, values: unknown[]) => ({ rows: (await manager.query(text, values)) as unknown[] }) };
  // Retried on our failures only (storage or database down): the import replaces the readings in one transaction, so a retry never duplicates.
  const bossJobId = await boss.send(IMPORT_READINGS_QUEUE, data, { retryLimit: 2, retryDelay: 2, db });
  if (bossJobId) await jobRuns.update(run.id, { bossJobId }, manager);
  return run.id;
}
