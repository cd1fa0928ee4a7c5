import type { ImportMapping } from '@porestack/types';
import type { EntityManager } from 'typeorm';
import { dataSource } from '../data-source.js';
import { jobRuns } from '../modules/job-runs/job-runs.service.js';
import { parseDeadlineMs } from '../modules/readings-import/import-limits.js';
import { jobQueue } from './boss.js';

export const IMPORT_READINGS_QUEUE = 'import-readings';

export interface ImportReadingsJobData {
  orgId: string;
  testId: string;
  uploadId: string;
  jobRunId: string;
  actorId: string;
  /** Size of the stored file: the job's expiry follows it. */
  sizeBytes: number;
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
  const priority = await importPriority(manager, input.orgId);
  const run = await jobRuns.create(
    { organisationId: input.orgId, kind: IMPORT_READINGS_QUEUE, testId: input.testId, uploadId: input.uploadId, createdById: input.actorId, message: 'Waiting for the worker to read the file.' },
    manager,
  );
  const data: ImportReadingsJobData = { ...input, jobRunId: run.id };
  const db = { executeSql: async (text: string, values: unknown[]) => ({ rows: (await manager.query(text, values)) as unknown[] }) };
  const bossJobId = await boss.send(IMPORT_READINGS_QUEUE, data, { ...sendOptions(data), priority, db });
  if (bossJobId) await jobRuns.update(run.id, { bossJobId }, manager);
  return run.id;
}

/**
 * Puts an import back in the queue for a little later, under the same job_runs row the page
 * follows, when its organisation has no free slot (claimImportSlot).
 */
export async function requeueImport(data: ImportReadingsJobData): Promise<void> {
  const boss = await jobQueue();
  const priority = await importPriority(dataSource.manager, data.orgId);
  const bossJobId = await boss.send(IMPORT_READINGS_QUEUE, data, { ...sendOptions(data), priority, startAfter: 2 });
  await jobRuns.update(data.jobRunId, {
    ...(bossJobId ? { bossJobId } : {}),
    message: `Waiting: your organisation already has ${IMPORTS_PER_ORGANISATION} imports running; this one starts when one of them ends.`,
  });
}

/**
 * Retried on our failures only (storage or database down), with a growing pause — 5 s, then
 * 10, 20 … about eleven minutes in all — so an import that met a service being restarted goes
 * through once it is back. The import replaces the readings in one transaction, so a retry
 * never duplicates.
 */
function sendOptions(data: ImportReadingsJobData) {
  return { retryLimit: 7, retryDelay: 5, retryBackoff: true, expireInSeconds: importExpirySeconds(data.sizeBytes) };
}

/** Imports one worker process works at once; below the parse threads of a process (PARSE_THREADS). */
export const IMPORT_CONCURRENCY = 3;

/**
 * Imports of one organisation running at once, over every worker. Below the concurrency of
 * one worker, so that a lab importing many files — or damaged ones that run to their
 * deadline — always leaves a slot for the other organisations.
 */
export const IMPORTS_PER_ORGANISATION = 2;

/**
 * A running import whose row has not moved for this long is taken to be dead (its worker
 * stopped) and does not count against its organisation's slots: longer than the slowest
 * parse of the largest file allowed (pg-boss retries the job itself after its expiry).
 */
const STALE_RUNNING_MINUTES = 5;

/**
 * pg-boss picks the highest priority first, then the oldest. An import is sent at minus the
 * number of its organisation's imports already waiting or running, so one organisation's
 * tenth file queues behind another organisation's first.
 */
export async function importPriority(manager: EntityManager, orgId: string): Promise<number> {
  const [row] = (await manager.query(
    "SELECT count(*)::int AS pending FROM job_runs WHERE organisation_id = $1 AND kind = $2 AND state IN ('queued', 'running')",
    [orgId, IMPORT_READINGS_QUEUE],
  )) as Array<{ pending: number }>;
  return -(row?.pending ?? 0);
}

/**
 * How long pg-boss lets an import run before it takes its worker for dead and retries it:
 * the parse deadline and the write (COPY of 500,000 readings takes about 3 s), with a margin.
 * A small file's import is retried within about 40 s of its worker dying (with the 10 s
 * maintenance of boss.ts).
 */
export function importExpirySeconds(sizeBytes: number): number {
  const megabytes = sizeBytes / (1024 * 1024);
  return Math.ceil(parseDeadlineMs(sizeBytes, 'import') / 1000 + 10 + 3 * megabytes);
}

/**
 * Marks the import running if its organisation has a free slot. The count and the update
 * are serialised per organisation (a transaction-level advisory lock), so two workers
 * cannot both take the last slot.
 * @returns false when the organisation already runs IMPORTS_PER_ORGANISATION imports.
 */
export async function claimImportSlot(orgId: string, jobRunId: string): Promise<boolean> {
  return dataSource.transaction(async (manager) => {
    await manager.query("SELECT pg_advisory_xact_lock(hashtext('import-slots'), hashtext($1))", [orgId]);
    const [row] = (await manager.query(
      `SELECT count(*)::int AS running FROM job_runs
        WHERE organisation_id = $1 AND kind = $2 AND state = 'running' AND id <> $3
          AND updated_at > now() - make_interval(mins => $4)`,
      [orgId, IMPORT_READINGS_QUEUE, jobRunId, STALE_RUNNING_MINUTES],
    )) as Array<{ running: number }>;
    if ((row?.running ?? 0) >= IMPORTS_PER_ORGANISATION) return false;
    await manager.query("UPDATE job_runs SET state = 'running', progress = 0.02, message = 'Starting the import.', updated_at = now() WHERE id = $1", [jobRunId]);
    return true;
  });
}
