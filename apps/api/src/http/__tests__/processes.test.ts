import type { JobRun, Upload } from '@porestack/types';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createApp } from '../../app.js';
import { dataSource } from '../../data-source.js';
import { importExpirySeconds } from '../../jobs/import-readings-queue.js';
import { stopJobQueue } from '../../jobs/boss.js';
import { createMember, openBrowser, signedInBrowser, signUpAdmin, TEST_PASSWORD, type Browser } from '../../testing/browser.js';
import { freePort, startChild, type Child } from '../../testing/child-process.js';
import { finishedJob, readingCount, sendFile } from '../../testing/import-harness.js';
import { draftTest } from '../../testing/lab-fixtures.js';
import { fixture } from '../../modules/readings-import/__tests__/import-test-files.js';

/**
 * The portal as it scales past one process: API servers and job workers as separate
 * processes against one database and one bucket, started from the sources as the
 * deployment would start them, and killed as a crash would kill them.
 */
const app = createApp();
const children: Child[] = [];
let orgId: string;
let technicianId: string;
let technicianEmail: string;

async function child(entry: 'server' | 'worker', extra: Record<string, string> = {}): Promise<Child> {
  const started = await startChild(entry, extra);
  children.push(started);
  return started;
}

beforeAll(async () => {
  const admin = await signUpAdmin(app, 'processes-admin');
  orgId = admin.orgId;
  const tech = await createMember(orgId, 'technician', 'processes-tech');
  technicianId = tech.userId;
  technicianEmail = tech.email;
});

afterAll(async () => {
  await Promise.all(children.map((c) => c.kill()));
  // (pg-boss's schema exists once a worker has started: not when only the processes-behind-one-port test runs.)
  const [boss] = (await dataSource.query(`SELECT to_regclass('pgboss.job') IS NOT NULL AS exists`)) as Array<{ exists: boolean }>;
  if (boss?.exists) await dataSource.query(`DELETE FROM pgboss.job WHERE state IN ('created', 'retry') AND data->>'orgId' = $1`, [orgId]);
  await stopJobQueue();
});

describe('a worker killed in the middle of an import', () => {
  it('when its process dies while the import waits to write, then another worker retries it within a minute and the readings are there once', async () => {
    const technician = await signedInBrowser(app, technicianEmail);
    const { testId } = await draftTest(orgId, technicianId);
    // The test row is held locked, so the import stops just before it writes: mid-import.
    // NO KEY UPDATE still lets the upload's rows point at the test (foreign keys take KEY SHARE),
    // while the import's FOR UPDATE waits.
    const holder = dataSource.createQueryRunner();
    await holder.connect();
    await holder.startTransaction();
    await holder.query('SELECT id FROM consolidation_tests WHERE id = $1 FOR NO KEY UPDATE', [testId]);
    const first = await child('worker');
    const res = await sendFile(technician, orgId, testId, fixture('canonical.csv'), 'readings.csv');
    expect(res.status).toBe(201);
    const { job, upload } = res.body as { job: JobRun; upload: Upload };
    for (let polls = 0; ; polls += 1) {
      const [row] = (await dataSource.query('SELECT message FROM job_runs WHERE id = $1', [job.id])) as Array<{ message: string }>;
      if (row?.message.startsWith('Writing')) break;
      expect(polls).toBeLessThan(1200);
      await new Promise((resolve) => setTimeout(resolve, 50));
    }
    await first.kill();
    const killedAt = Date.now();
    await holder.rollbackTransaction();
    await holder.release();

    await child('worker');
    const done = await finishedJob(technician, orgId, job.id, 120_000);
    const retriedAfterSeconds = (Date.now() - killedAt) / 1000;
    expect(done.state).toBe('succeeded');
    expect(await readingCount(testId)).toBe(150);
    const [boss] = (await dataSource.query(
      'SELECT b.retry_count, extract(epoch FROM b.expire_in)::int AS expire_seconds FROM pgboss.job b JOIN job_runs r ON r.boss_job_id = b.id::text WHERE r.id = $1',
      [job.id],
    )) as Array<{ retry_count: number; expire_seconds: number }>;
    expect(boss?.retry_count).toBeGreaterThanOrEqual(1);
    // The mechanism behind "within a minute": the job's expiry, checked every 10 s.
    expect(boss?.expire_seconds).toBe(importExpirySeconds(upload.sizeBytes));
    expect((boss?.expire_seconds ?? 0) + 10).toBeLessThan(60);
    process.stdout.write(`killed worker: the import was done again by another worker ${retriedAfterSeconds.toFixed(1)} s after the kill\n`);
  }, 180_000);
});

describe('two API processes and two workers on one database and one bucket', () => {
  let apis: [string, string];

  beforeAll(async () => {
    const ports = [await freePort(), await freePort()];
    await Promise.all([
      ...ports.map((port) => child('server', { PORT: String(port), TRUST_PROXY: 'loopback' })),
      child('worker'),
      child('worker'),
    ]);
    apis = [`http://127.0.0.1:${ports[0]}`, `http://127.0.0.1:${ports[1]}`];
  }, 180_000);

  it('when a person signs in on one, then the session works on the other, and signing out on either ends it on both', async () => {
    const onFirst = await signedInBrowser(apis[0], technicianEmail);
    await onFirst.get('/api/auth/session').expect(200);
    const jar = onFirst.agent.jar.getCookie('porestack_session', { domain: '127.0.0.1', path: '/', secure: false, script: false });
    const onSecond = await openBrowser(apis[1]);
    onSecond.agent.jar.setCookie(`porestack_session=${jar?.value}`, '127.0.0.1', '/');
    await onSecond.get('/api/auth/session').expect(200);
    await onSecond.post('/api/auth/sign-out').expect(204);
    await onFirst.get('/api/auth/session').expect(401);
  }, 60_000);

  it('when failed sign-ins alternate between the two, then they count together (the limit holds across processes)', async () => {
    const victim = await createMember(orgId, 'designer', 'processes-target');
    const address = '10.200.0.1';
    const browsers = [await openBrowser(apis[0], address), await openBrowser(apis[1], address)];
    // vitest.config.ts: SIGN_IN_RATE_LIMIT=5, passed on to the children.
    for (let i = 0; i < 5; i += 1) await (browsers[i % 2] as Browser).post('/api/auth/sign-in', { email: victim.email, password: `wrong-${i}` }).expect(401);
    for (const browser of browsers) await browser.post('/api/auth/sign-in', { email: victim.email, password: TEST_PASSWORD }).expect(429);
  }, 60_000);

  it('when files are uploaded through both APIs, then each import is done exactly once, by one of the two workers', async () => {
    const technicians = [await signedInBrowser(apis[0], technicianEmail), await signedInBrowser(apis[1], technicianEmail)];
    const sent: Array<{ testId: string; jobId: string; browser: Browser }> = [];
    for (let i = 0; i < 8; i += 1) {
      const browser = technicians[i % 2] as Browser;
      const { testId } = await draftTest(orgId, technicianId);
      const res = await sendFile(browser, orgId, testId, fixture('canonical.csv'), `readings-${i}.csv`);
      expect(res.status).toBe(201);
      sent.push({ testId, jobId: (res.body as { job: JobRun }).job.id, browser });
    }
    for (const { testId, jobId, browser } of sent) {
      expect((await finishedJob(browser, orgId, jobId, 120_000)).state).toBe('succeeded');
      expect(await readingCount(testId)).toBe(150);
    }
    const rows = (await dataSource.query(
      `SELECT b.state, b.retry_count FROM pgboss.job b JOIN job_runs r ON r.boss_job_id = b.id::text WHERE r.id = ANY($1)`,
      [sent.map((s) => s.jobId)],
    )) as Array<{ state: string; retry_count: number }>;
    expect(rows).toHaveLength(8);
    for (const row of rows) expect(row).toEqual({ state: 'completed', retry_count: 0 });
  }, 240_000);
});

describe('API_PROCESSES: several API processes behind one port', () => {
  /** The pids of the API processes that said they listen, in the order they said it. */
  const listening = (api: Child): number[] =>
    api
      .output()
      .split('\n')
      .filter((line) => line.includes('Porestack API listening'))
      .map((line) => (JSON.parse(line) as { pid: number }).pid);

  it('when API_PROCESSES is 2, then two processes serve the port; one killed is replaced while the other answers', async () => {
    const port = await freePort();
    const api = await child('server', { PORT: String(port), API_PROCESSES: '2' });
    for (let polls = 0; listening(api).length < 2; polls += 1) {
      expect(polls, api.output()).toBeLessThan(600);
      await new Promise((resolve) => setTimeout(resolve, 100));
    }
    const [victim, survivor] = listening(api) as [number, number];
    expect(victim).not.toBe(survivor);
    expect(victim).not.toBe(api.process.pid);

    process.kill(victim, 'SIGKILL');
    // Once the first process has seen it go (a connection handed to it before then is lost, as in any crash),
    // the other serves every request.
    for (let polls = 0; !api.output().includes('an API process ended'); polls += 1) {
      expect(polls, api.output()).toBeLessThan(200);
      await new Promise((resolve) => setTimeout(resolve, 50));
    }
    const health = () => fetch(`http://127.0.0.1:${port}/api/health`, { signal: AbortSignal.timeout(10_000) });
    for (let i = 0; i < 10; i += 1) expect((await health()).status).toBe(200);
    for (let polls = 0; listening(api).length < 3; polls += 1) {
      expect(polls, api.output()).toBeLessThan(600);
      await new Promise((resolve) => setTimeout(resolve, 100));
    }
    expect((await health()).status).toBe(200);

    // A signal ends every process and then the first.
    await api.stop();
    expect(api.process.exitCode).toBe(0);
    for (const pid of listening(api)) expect(() => process.kill(pid, 0)).toThrow();
  }, 120_000);
});
