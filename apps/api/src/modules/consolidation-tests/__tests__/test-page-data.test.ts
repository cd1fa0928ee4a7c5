import type { JobRun, ReadingsPage, TestDetail } from '@porestack/types';
import type PgBoss from 'pg-boss';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createApp } from '../../../app.js';
import { dataSource } from '../../../data-source.js';
import { analyseTestJob } from '../../../jobs/analyse-test.job.js';
import { stopJobQueue } from '../../../jobs/boss.js';
import { createMember, signedInBrowser, signUpAdmin, type Browser } from '../../../testing/browser.js';
import { analysedTest, draftTest, uploadKnownReadings } from '../../../testing/lab-fixtures.js';
import { startTestWorker } from '../../../testing/test-worker.js';
import { ConsolidationTestEntity } from '../consolidation-test.entity.js';

const app = createApp();
let boss: PgBoss;

async function waitForJob(browser: Browser, orgId: string, jobId: string): Promise<JobRun> {
  const deadline = Date.now() + 15_000;
  for (;;) {
    const job = (await browser.get(`/api/orgs/${orgId}/jobs/${jobId}`).expect(200)).body as JobRun;
    if (job.state === 'succeeded' || job.state === 'failed') return job;
    if (Date.now() > deadline) throw new Error(`job ${jobId} still ${job.state} after 15 s`);
    await new Promise((resolve) => setTimeout(resolve, 100));
  }
}

describe('what the test page reads: one increment of readings, the last analysis job', () => {
  let orgId: string;
  let techId: string;
  let tech: Browser;

  beforeAll(async () => {
    boss = await startTestWorker([analyseTestJob]);
    const admin = await signUpAdmin(app, 'page-data-admin');
    orgId = admin.orgId;
    const t = await createMember(orgId, 'technician', 'page-data-tech');
    techId = t.userId;
    tech = await signedInBrowser(app, t.email);
  });

  afterAll(async () => {
    await boss.stop({ graceful: true, wait: true });
    await stopJobQueue();
  });

  it('when ?increment=N is given, then only that increment comes back, counted and paged within it', async () => {
    const { testId } = await analysedTest(orgId, techId);
    const url = `/api/orgs/${orgId}/tests/${testId}/readings`;
    const all = (await tech.get(`${url}?limit=5000`).expect(200)).body as ReadingsPage;
    const second = all.readings.filter((r) => r.incrementIndex === all.readings[all.readings.length - 1]!.incrementIndex);
    const index = second[0]!.incrementIndex;

    const page = (await tech.get(`${url}?increment=${index}&limit=5000`).expect(200)).body as ReadingsPage;
    expect(page.total).toBe(second.length);
    expect(page.readings).toEqual(second);

    const tail = (await tech.get(`${url}?increment=${index}&offset=2&limit=3`).expect(200)).body as ReadingsPage;
    expect(tail.readings).toEqual(second.slice(2, 5));
    expect(tail.total).toBe(second.length);
  });

  it('when increment is not a whole number ≥ 0, then 400 names the parameter', async () => {
    const { testId } = await draftTest(orgId, techId);
    for (const bad of ['two', '-1', '1.5']) {
      const res = await tech.get(`/api/orgs/${orgId}/tests/${testId}/readings?increment=${bad}`).expect(400);
      expect(JSON.stringify(res.body)).toMatch(/increment/);
    }
  });

  it('when the analysis job failed for lack of a dry mass, then the test detail still shows that failure in plain words afterwards', async () => {
    const { testId } = await draftTest(orgId, techId);
    await dataSource.getRepository(ConsolidationTestEntity).update({ id: testId }, { dryMassG: null, wetMassG: null, initialWaterContent: null });
    const { analysisJobId } = await uploadKnownReadings(orgId, testId, techId);
    const job = await waitForJob(tech, orgId, analysisJobId);
    expect(job.state).toBe('failed');

    const detail = (await tech.get(`/api/orgs/${orgId}/tests/${testId}`).expect(200)).body as TestDetail;
    expect(detail.pendingJobId).toBeNull();
    expect(detail.latestAnalysisJob).toMatchObject({ id: analysisJobId, state: 'failed' });
    expect(detail.latestAnalysisJob?.message).toContain("Enter the specimen's dry mass, or its wet mass and initial water content, on the Set-up tab");
    expect(detail.latestAnalysisJob?.message).not.toMatch(/dryMassG|wetMassG|initialWaterContent/);
  });
});
