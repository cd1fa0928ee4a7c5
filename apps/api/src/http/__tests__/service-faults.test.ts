import { createServer } from 'node:net';
import type { JobRun, Upload } from '@porestack/types';
import express from 'express';
import pg from 'pg';
import type PgBoss from 'pg-boss';
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createApp } from '../../app.js';
import { env } from '../../config/env.js';
import { dataSource } from '../../data-source.js';
import { analyseTestJob } from '../../jobs/analyse-test.job.js';
import { createBoss, stopJobQueue } from '../../jobs/boss.js';
import { importReadingsJob } from '../../jobs/import-readings.job.js';
import { registerJobs } from '../../jobs/register-jobs.js';
import { jobRuns } from '../../modules/job-runs/job-runs.service.js';
import { forgetStorageClient } from '../../storage/storage.js';
import { createMember, signedInBrowser, signUpAdmin, type Browser } from '../../testing/browser.js';
import { readingCount, sendFile, stopImportWorker, uploadRowCount } from '../../testing/import-harness.js';
import { draftTest } from '../../testing/lab-fixtures.js';
import { fixture } from '../../modules/readings-import/__tests__/import-test-files.js';
import { errorMiddleware } from '../error-middleware.js';

const app = createApp();
let orgId: string;
let technician: Browser;
let technicianId: string;

/** A port nothing listens on: connections to it are refused at once. */
async function closedPort(): Promise<number> {
  const server = createServer();
  await new Promise<void>((resolve) => server.listen(0, '127.0.0.1', resolve));
  const address = server.address();
  await new Promise<void>((resolve) => server.close(() => resolve()));
  return typeof address === 'object' && address ? address.port : 1;
}

/** Runs `work` with the file storage unreachable (its endpoint moved to a closed port), then brings it back. */
async function withStorageDown<T>(work: () => Promise<T>): Promise<T> {
  const settings = env() as { S3_ENDPOINT: string };
  const working = settings.S3_ENDPOINT;
  settings.S3_ENDPOINT = `http://127.0.0.1:${await closedPort()}`;
  forgetStorageClient();
  try {
    return await work();
  } finally {
    settings.S3_ENDPOINT = working;
    forgetStorageClient();
  }
}

beforeAll(async () => {
  const admin = await signUpAdmin(app, 'faults-admin');
  orgId = admin.orgId;
  const tech = await createMember(orgId, 'technician', 'faults-tech');
  technicianId = tech.userId;
  technician = await signedInBrowser(app, tech.email);
});

afterAll(async () => {
  await stopJobQueue();
});

describe('bodies a client sent wrong', () => {
  it('when a multipart body is cut off or malformed, then 400 says how to send the file, not 500', async () => {
    const { testId } = await draftTest(orgId, technicianId);
    const boundary = 'porestack-boundary';
    const cutOff = `--${boundary}\r\nContent-Disposition: form-data; name="file"; filename="readings.csv"\r\nContent-Type: text/csv\r\n\r\nincrement,stress_kpa`;
    for (const body of [cutOff, `--${boundary}\r\nnot a header line at all\r\n\r\n`]) {
      const res = await technician.agent
        .post(`/api/orgs/${orgId}/tests/${testId}/uploads`)
        .set('x-csrf-token', technician.csrfToken)
        .set('content-type', `multipart/form-data; boundary=${boundary}`)
        .send(body);
      expect(res.status).toBe(400);
      expect(res.body).toMatchObject({ code: 'validation_failed', issues: [{ path: 'file', message: 'Send one file, with a plain name, in the field "file".' }] });
    }
    expect(await uploadRowCount(testId)).toBe(0);
  });

  it('when the file name holds a NUL, then 400 asks for a plain name and nothing is stored', async () => {
    const { testId } = await draftTest(orgId, technicianId);
    const res = await sendFile(technician, orgId, testId, fixture('canonical.csv'), 'read\u0000ings.csv');
    expect(res.status).toBe(400);
    expect(res.body.message).toMatch(/the file name holds control characters \(such as NUL\)\. Give the file a plain name and send it again/);
    expect(await uploadRowCount(testId)).toBe(0);
  });
});

describe('services down', () => {
  it('when the file storage is down, then an upload answers 503, nothing is recorded, health says storage is down; once it is back, the upload works', async () => {
    const { testId } = await draftTest(orgId, technicianId);
    await withStorageDown(async () => {
      const res = await sendFile(technician, orgId, testId, fixture('canonical.csv'), 'readings.csv');
      expect(res.status).toBe(503);
      expect(res.body.code).toBe('service_unavailable');
      expect(res.body.message).toMatch(/^A service Porestack needs \(its database or its file storage\) is not answering/);
      expect(await uploadRowCount(testId)).toBe(0);
      const health = await request(app).get('/api/health').expect(503);
      expect(health.body).toEqual({ status: 'degraded', database: 'ok', storage: 'down' });
    });
    expect((await request(app).get('/api/health').expect(200)).body).toEqual({ status: 'ok', database: 'ok', storage: 'ok' });
    expect((await sendFile(technician, orgId, testId, fixture('canonical.csv'), 'readings.csv')).status).toBe(201);
  });

  it('when the database connection is refused, then the error middleware answers 503, not 500', async () => {
    const client = new pg.Client({ host: '127.0.0.1', port: await closedPort(), user: 'app', database: 'none', connectionTimeoutMillis: 2000 });
    const refused = await client.connect().then(
      () => null,
      (error: unknown) => error,
    );
    expect(refused).not.toBeNull();
    const probe = express();
    probe.get('/fails', () => {
      throw refused;
    });
    probe.use(errorMiddleware);
    const res = await request(probe).get('/fails').expect(503);
    expect(res.body.code).toBe('service_unavailable');
  });

  it('when the storage is down while an import runs, then the import fails for now and is tried again, and goes through once the storage is back', async () => {
    const { testId } = await draftTest(orgId, technicianId);
    // The file is stored while storage is up; the worker starts only once it is down.
    const res = await sendFile(technician, orgId, testId, fixture('canonical.csv'), 'readings.csv');
    expect(res.status).toBe(201);
    const { job } = res.body as { upload: Upload; job: JobRun };
    let worker: PgBoss | undefined;
    await withStorageDown(async () => {
      worker = createBoss();
      worker.on('error', () => undefined);
      await worker.start();
      await registerJobs(worker, [importReadingsJob, analyseTestJob]);
      for (let polls = 0; ; polls += 1) {
        const now = (await technician.get(`/api/orgs/${orgId}/jobs/${job.id}`).expect(200)).body as JobRun;
        if (now.state === 'failed') {
          expect(now.message).toMatch(/problem on our side; no readings were changed\. It is tried again/);
          break;
        }
        expect(polls).toBeLessThan(300);
        await new Promise((resolve) => setTimeout(resolve, 50));
      }
    });
    const done = await finishedJobAfterRetry(job.id);
    expect(done.state).toBe('succeeded');
    expect(await readingCount(testId)).toBe(150);
    if (worker) await stopImportWorker(worker, [orgId]);
  }, 60_000);
});

/** Waits past the failed attempt for the retried one to finish. */
async function finishedJobAfterRetry(jobId: string): Promise<JobRun> {
  const deadline = Date.now() + 45_000;
  for (;;) {
    const now = (await technician.get(`/api/orgs/${orgId}/jobs/${jobId}`).expect(200)).body as JobRun;
    if (now.state === 'succeeded') return now;
    if (Date.now() > deadline) return now;
    await new Promise((resolve) => setTimeout(resolve, 200));
  }
}

describe('job progress', () => {
  it('when a progress write arrives after the job has finished, then the finished job keeps its outcome', async () => {
    const { testId } = await draftTest(orgId, technicianId);
    const run = await jobRuns.create({ organisationId: orgId, kind: 'import-readings', testId });
    await jobRuns.update(run.id, { state: 'succeeded', progress: 1, message: 'Imported 150 readings.' });
    await jobRuns.update(run.id, { progress: 0.9, message: 'Writing readings: 80 % sent.' });
    const [row] = (await dataSource.query('SELECT state, progress, message FROM job_runs WHERE id = $1', [run.id])) as Array<{ state: string; progress: number; message: string }>;
    expect(row).toEqual({ state: 'succeeded', progress: 1, message: 'Imported 150 readings.' });
  });
});
