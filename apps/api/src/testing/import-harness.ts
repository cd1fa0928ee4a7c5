import type { JobRun, Upload } from '@porestack/types';
import type PgBoss from 'pg-boss';
import type request from 'supertest';
import { dataSource } from '../data-source.js';
import { analyseTestJob } from '../jobs/analyse-test.job.js';
import { BOSS_SCHEMA, createBoss } from '../jobs/boss.js';
import { importReadingsJob } from '../jobs/import-readings.job.js';
import type { JobDefinition } from '../jobs/job-definition.js';
import { registerJobs } from '../jobs/register-jobs.js';
import { warmParsePool } from '../modules/readings-import/parse-pool.js';
import { bucketName, ensureBucket, storage } from '../storage/storage.js';
import type { Browser } from './browser.js';

/** A pg-boss worker in this process working the given queues, as the worker process does. */
export async function startWorker(jobs: JobDefinition[]): Promise<PgBoss> {
  await ensureBucket();
  await warmParsePool();
  const boss = createBoss();
  boss.on('error', () => undefined);
  await boss.start();
  await registerJobs(boss, jobs);
  return boss;
}

/** A worker of the import and analysis queues. */
export function startImportWorker(): Promise<PgBoss> {
  return startWorker([importReadingsJob, analyseTestJob]);
}

/**
 * Stops the worker and drops the jobs of these organisations still waiting in the queue
 * (analyses queued by the last imports), so the next test file's worker does not inherit them.
 */
export async function stopImportWorker(boss: PgBoss, orgIds: string[]): Promise<void> {
  await boss.stop({ graceful: true, wait: true });
  await dataSource.query(`DELETE FROM ${BOSS_SCHEMA}.job WHERE state IN ('created', 'retry') AND data->>'orgId' = ANY($1)`, [orgIds]);
}

/** supertest's parser for a binary body (a download), collected into a Buffer. */
export const binary: Parameters<request.Test['parse']>[0] = (res, done) => {
  // In Node, superagent hands the parser the response stream itself.
  const stream = res as unknown as NodeJS.ReadableStream;
  const chunks: Buffer[] = [];
  stream.on('data', (chunk: Buffer) => chunks.push(chunk));
  stream.on('end', () => done(null, Buffer.concat(chunks)));
};

/** Sends a file as the web page does: multipart field `file`, with the CSRF header. */
export function sendFile(browser: Browser, orgId: string, testId: string, bytes: Buffer, name: string) {
  return browser.agent.post(`/api/orgs/${orgId}/tests/${testId}/uploads`).set('x-csrf-token', browser.csrfToken).attach('file', bytes, name);
}

/** Polls GET /jobs/:jobId until the job has finished. */
/** Generous: on a loaded two-core machine a parse thread takes seconds to start from the sources. */
export async function finishedJob(browser: Browser, orgId: string, jobId: string, timeoutMs = 60_000): Promise<JobRun> {
  const deadline = Date.now() + timeoutMs;
  for (;;) {
    const res = await browser.get(`/api/orgs/${orgId}/jobs/${jobId}`).expect(200);
    const job = res.body as JobRun;
    if (job.state === 'succeeded' || job.state === 'failed') return job;
    if (Date.now() > deadline) throw new Error(`job ${jobId} still ${job.state} after ${timeoutMs} ms: ${job.message}`);
    await new Promise((resolve) => setTimeout(resolve, 50));
  }
}

/** Uploads a file and waits for its import job. */
export async function uploadAndWait(browser: Browser, orgId: string, testId: string, bytes: Buffer, name: string): Promise<{ upload: Upload; job: JobRun }> {
  const res = await sendFile(browser, orgId, testId, bytes, name);
  if (res.status !== 201) throw new Error(`upload answered ${res.status}: ${JSON.stringify(res.body)}`);
  const { upload, job } = res.body as { upload: Upload; job: JobRun };
  return { upload, job: await finishedJob(browser, orgId, job.id) };
}

export async function readingCount(testId: string): Promise<number> {
  const [row] = (await dataSource.query('SELECT count(*)::int AS n FROM readings WHERE test_id = $1', [testId])) as Array<{ n: number }>;
  return row?.n ?? 0;
}

export async function uploadRowCount(testId: string): Promise<number> {
  const [row] = (await dataSource.query('SELECT count(*)::int AS n FROM uploads WHERE test_id = $1', [testId])) as Array<{ n: number }>;
  return row?.n ?? 0;
}

/** Objects stored under the test's prefix. */
export async function storedObjectCount(orgId: string, testId: string): Promise<number> {
  let count = 0;
  for await (const _item of storage().listObjectsV2(bucketName(), `orgs/${orgId}/tests/${testId}/`, true)) count += 1;
  return count;
}

