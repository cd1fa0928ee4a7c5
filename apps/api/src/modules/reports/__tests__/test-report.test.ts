import { createHash } from 'node:crypto';
import type { IssuedReport, JobRun } from '@porestack/types';
import type PgBoss from 'pg-boss';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createApp } from '../../../app.js';
import { dataSource } from '../../../data-source.js';
import { createBoss, stopJobQueue } from '../../../jobs/boss.js';
import { GENERATE_REPORT_QUEUE } from '../../../jobs/generate-report-queue.js';
import { generateReportJob } from '../../../jobs/generate-report.job.js';
import { registerJobs } from '../../../jobs/register-jobs.js';
import { createMember, signedInBrowser, signUpAdmin, type Browser } from '../../../testing/browser.js';
import { download } from '../../../testing/downloads.js';
import { submittedTest, type LabFixture } from '../../../testing/lab-fixtures.js';
import { pdfImageCount, pdfInfo, pdfText } from '../../../testing/pdf-reader.js';

const app = createApp();
let boss: PgBoss;

/** Follows the report's state the way the soil record page does, until it has settled. */
async function settledReport(browser: Browser, url: string): Promise<IssuedReport> {
  const deadline = Date.now() + 80_000;
  for (;;) {
    const report = (await browser.get(url).expect(200)).body as IssuedReport;
    if (report.state === 'ready' || report.state === 'failed') return report;
    if (Date.now() > deadline) throw new Error(`report still ${report.state} after 80 s`);
    await new Promise((resolve) => setTimeout(resolve, 200));
  }
}

/**
 * A job queue for this file. Other test files approve tests without working the report queue,
 * so its backlog is dropped first: otherwise this file's reports would wait behind theirs.
 */
async function startReportQueue(job: ReturnType<typeof generateReportJob>): Promise<PgBoss> {
  const started = createBoss();
  started.on('error', () => undefined);
  await started.start();
  await started.createQueue(GENERATE_REPORT_QUEUE);
  await started.purgeQueue(GENERATE_REPORT_QUEUE);
  await registerJobs(started, [job]);
  return started;
}

/** Printing takes seconds, and longer on a busy machine: these tests allow a minute and a half. */
const PRINTING_MS = 90_000;

/** Works the report queue with the given job definition (the real one, or one with a broken printer). */
async function workReportsWith(job: ReturnType<typeof generateReportJob>): Promise<void> {
  await boss.offWork(GENERATE_REPORT_QUEUE);
  await registerJobs(boss, [job]);
}

describe('the PDF test report of an approved soil record version', () => {
  let orgId: string;
  let manager: Browser;
  let tech: Browser;
  let fixture: LabFixture;
  let base: string;
  let first: { bytes: Buffer; headers: Record<string, string> };
  let report: IssuedReport;

  beforeAll(async () => {
    boss = await startReportQueue(generateReportJob());
    const signedUp = await signUpAdmin(app, 'report-admin');
    orgId = signedUp.orgId;
    await signedUp.browser.agent
      .put(`/api/orgs/${orgId}/report-settings`)
      .set('x-csrf-token', signedUp.browser.csrfToken)
      .send({ address: '14 Kiln Yard, Westerby\nsoils@westerby-lab.invalid', testMethodStatement: 'Incremental loading to ASTM D2435/D2435M, Method B, specimens trimmed from the tube centre.' })
      .expect(200);
    const t = await createMember(orgId, 'technician', 'report-tech');
    const m = await createMember(orgId, 'lab_manager', 'report-manager');
    tech = await signedInBrowser(app, t.email);
    manager = await signedInBrowser(app, m.email);
    fixture = await submittedTest(orgId, t.userId);
  });

  afterAll(async () => {
    await boss.stop({ graceful: true, wait: true });
    await stopJobQueue();
  });

  it('when a lab manager approves the test, then the report is generated once by a job whose state is visible, and it is ready with its SHA-256', async () => {
    const approval = await manager.post(`/api/orgs/${orgId}/tests/${fixture.testId}/approve`, { comment: 'Constructions checked.' }).expect(200);
    base = `/api/orgs/${orgId}/soil-records/${approval.body.soilRecord.recordId}/versions/1/report`;
    report = await settledReport(manager, base);
    expect(report).toMatchObject({ kind: 'test-report', state: 'ready', message: null });
    expect(report.sha256).toMatch(/^[0-9a-f]{64}$/);
    const job = (await manager.get(`/api/orgs/${orgId}/jobs/${report.jobId}`).expect(200)).body as JobRun;
    expect(job).toMatchObject({ kind: 'generate-report', state: 'succeeded', testId: fixture.testId });
    expect(job.result).toMatchObject({ reportId: report.id, sha256: report.sha256 });
  }, PRINTING_MS);

  it('when the report is downloaded twice, then both downloads are the same file with the hash recorded at issue', async () => {
    first = await download(manager, `${base}/pdf`);
    const second = await download(tech, `${base}/pdf`);
    const hash = (bytes: Buffer) => createHash('sha256').update(bytes).digest('hex');
    expect(first.headers['content-type']).toBe('application/pdf');
    expect(first.headers['content-disposition']).toMatch(/^attachment; filename="oedometer-report-T-.+-v1\.pdf"$/);
    expect(hash(first.bytes)).toBe(report.sha256);
    expect(hash(second.bytes)).toBe(report.sha256);
    expect(first.headers['x-content-sha256']).toBe(report.sha256);
    expect(first.bytes.subarray(0, 5).toString()).toBe('%PDF-');
    expect(report.byteSize).toBe(first.bytes.length);
  });

  it('when the PDF is opened, then it has its pages, the sample, both σ′p, the adopted one, the method, the approver, page numbers and the caution as selectable text', async () => {
    const info = await pdfInfo(first.bytes);
    // Text pages (identification, increments), compression plots, coefficient plots, time curves of 11 increments.
    expect(Number(info['Pages'])).toBeGreaterThanOrEqual(6);
    expect(info['Page size']).toMatch(/\(A4\)$/);
    // The plots are drawn as vector paths and text: the PDF holds no raster image at all.
    expect(await pdfImageCount(first.bytes)).toBe(0);
    expect(info['Tagged']).toBe('yes');
    const text = await pdfText(first.bytes);
    const record = (await manager.get(base.replace(/\/report$/, '')).expect(200)).body as { preconsolidationAdoptedKpa: number; preconsolidationCasagrandeKpa: number; preconsolidationPachecoSilvaKpa: number; approvedByName: string };
    const flat = text.replace(/\s+/g, ' ');
    expect(flat).toContain('Sample U1');
    expect(flat).toContain(`Preconsolidation stress, adopted σ′p ${record.preconsolidationAdoptedKpa.toFixed(0)} kPa`);
    expect(flat).toContain(`Preconsolidation stress, Casagrande σ′p ${record.preconsolidationCasagrandeKpa.toFixed(0)} kPa`);
    expect(flat).toContain(`Preconsolidation stress, Pacheco Silva σ′p ${record.preconsolidationPachecoSilvaKpa.toFixed(0)} kPa`);
    expect(flat).toContain('Incremental loading to ASTM D2435/D2435M, Method B, specimens trimmed from the tube centre.');
    expect(flat).toContain('14 Kiln Yard, Westerby');
    expect(flat).toContain(`Approved for issue by ${record.approvedByName}`);
    expect(flat).toContain('Constructions checked.');
    expect(flat).toContain(`Page 1 of ${info['Pages']}`);
    expect(flat).toContain('for review by a qualified geotechnical engineer');
    expect(flat).toMatch(/Soil record version 1/);
  });

  it('when a lab manager asks to generate an issued report again, then 409: an issued report is final', async () => {
    const res = await manager.post(`${base}/retry`).expect(409);
    expect(res.body.message).toMatch(/already been issued/);
  });

  it('when anyone changes or deletes an issued report row with SQL, then the database refuses', async () => {
    await expect(dataSource.query(`UPDATE issued_reports SET sha256 = repeat('0', 64) WHERE id = $1`, [report.id])).rejects.toThrow(/final/);
    await expect(dataSource.query('DELETE FROM issued_reports WHERE id = $1', [report.id])).rejects.toThrow(/final/);
  });
});

describe('a version approved before reports were printed', () => {
  it('when its report is asked for, then 404 says a lab manager can print it, and the lab manager’s request prints it', async () => {
    const { orgId } = await signUpAdmin(app, 'report-legacy-admin');
    const t = await createMember(orgId, 'technician', 'report-legacy-tech');
    const m = await createMember(orgId, 'lab_manager', 'report-legacy-manager');
    const manager = await signedInBrowser(app, m.email);
    const fixture = await submittedTest(orgId, t.userId);
    const approval = await manager.post(`/api/orgs/${orgId}/tests/${fixture.testId}/approve`, {}).expect(200);
    // A version without a report, as every version approved before this feature: its queued row removed.
    await dataSource.query('DELETE FROM issued_reports WHERE test_id = $1', [fixture.testId]);
    const base = `/api/orgs/${orgId}/soil-records/${approval.body.soilRecord.recordId}/versions/1/report`;
    const missing = await manager.get(base).expect(404);
    expect(missing.body.message).toMatch(/A lab manager can print it/);
    boss = await startReportQueue(generateReportJob());
    try {
      expect((await manager.post(`${base}/retry`).expect(202)).body.state).toBe('queued');
      expect((await settledReport(manager, base)).state).toBe('ready');
    } finally {
      await boss.stop({ graceful: true, wait: true });
      await stopJobQueue();
    }
  }, PRINTING_MS);
});

describe('a report whose generation failed', () => {
  it('when the printer cannot start, then the report and its job say failed, the download answers 409, and a lab manager (not a technician) can retry it to a ready report', async () => {
    const { orgId } = await signUpAdmin(app, 'report-retry-admin');
    const t = await createMember(orgId, 'technician', 'report-retry-tech');
    const m = await createMember(orgId, 'lab_manager', 'report-retry-manager');
    const tech = await signedInBrowser(app, t.email);
    const manager = await signedInBrowser(app, m.email);
    const fixture = await submittedTest(orgId, t.userId);
    boss = await startReportQueue(generateReportJob({ executablePath: '/nonexistent/chromium' }));
    try {
      const approval = await manager.post(`/api/orgs/${orgId}/tests/${fixture.testId}/approve`, {}).expect(200);
      const base = `/api/orgs/${orgId}/soil-records/${approval.body.soilRecord.recordId}/versions/1/report`;
      const failed = await settledReport(manager, base);
      expect(failed.state).toBe('failed');
      expect(failed.message).toMatch(/A lab manager can try again/);
      expect(((await manager.get(`/api/orgs/${orgId}/jobs/${failed.jobId}`).expect(200)).body as JobRun).state).toBe('failed');
      const refused = await download(manager, `${base}/pdf`, 409);
      expect(JSON.parse(refused.bytes.toString()).code).toBe('report_not_ready');
      await tech.post(`${base}/retry`).expect(403);

      await workReportsWith(generateReportJob());
      const retried = (await manager.post(`${base}/retry`).expect(202)).body as IssuedReport;
      expect(retried.state).toBe('queued');
      expect(retried.jobId).not.toBe(failed.jobId);
      const ready = await settledReport(manager, base);
      expect(ready.state).toBe('ready');
      const file = await download(manager, `${base}/pdf`);
      expect(createHash('sha256').update(file.bytes).digest('hex')).toBe(ready.sha256);
    } finally {
      await boss.stop({ graceful: true, wait: true });
      await stopJobQueue();
    }
  }, PRINTING_MS);
});
