import { GEO_CORE_VERSION } from '@porestack/geo-core';
import type { JobRun } from '@porestack/types';
import type PgBoss from 'pg-boss';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createApp } from '../../../app.js';
import { env } from '../../../config/env.js';
import { dataSource } from '../../../data-source.js';
import { analyseTestJob } from '../../../jobs/analyse-test.job.js';
import { stopJobQueue } from '../../../jobs/boss.js';
import { createMember, signedInBrowser, signUpAdmin, type Browser } from '../../../testing/browser.js';
import { draftTest, KNOWN_SOIL, KNOWN_TEST, submittedTest, uploadKnownReadings } from '../../../testing/lab-fixtures.js';
import { linkIn, waitForMail } from '../../../testing/mail-inbox.js';
import { startTestWorker } from '../../../testing/test-worker.js';

const app = createApp();
let boss: PgBoss;

/** Follows a job the way the test page does, until it has finished. */
async function waitForJob(browser: Browser, orgId: string, jobId: string): Promise<JobRun> {
  const deadline = Date.now() + 15_000;
  for (;;) {
    const res = await browser.get(`/api/orgs/${orgId}/jobs/${jobId}`).expect(200);
    const job = res.body as JobRun;
    if (job.state === 'succeeded' || job.state === 'failed') return job;
    if (Date.now() > deadline) throw new Error(`job ${jobId} still ${job.state} after 15 s`);
    await new Promise((resolve) => setTimeout(resolve, 100));
  }
}

function put(browser: Browser, url: string, body: object) {
  return browser.agent.put(url).set('x-csrf-token', browser.csrfToken).send(body);
}

describe('lab workflow: readings → analysis → review → soil record versions', () => {
  let orgId: string;
  let admin: Browser;
  let tech: Browser;
  let techId: string;
  let techEmail: string;
  let manager: Browser;
  let managerId: string;
  let managerEmail: string;
  let manager2: Browser;
  let manager2Email: string;
  let designerEmail: string;
  let designerId: string;
  let testId: string;
  let projectId: string;
  let recordId: string;

  beforeAll(async () => {
    // The real worker, in this process, on the real queue.
    boss = await startTestWorker([analyseTestJob]);
    const signedUp = await signUpAdmin(app, 'lab-admin');
    orgId = signedUp.orgId;
    admin = signedUp.browser;
    const t = await createMember(orgId, 'technician', 'lab-tech');
    const m = await createMember(orgId, 'lab_manager', 'lab-manager');
    const m2 = await createMember(orgId, 'lab_manager', 'lab-manager-two');
    const d = await createMember(orgId, 'designer', 'lab-designer');
    [techId, techEmail, managerId, managerEmail, manager2Email, designerEmail, designerId] = [t.userId, t.email, m.userId, m.email, m2.email, d.email, d.userId];
    tech = await signedInBrowser(app, t.email);
    manager = await signedInBrowser(app, m.email);
    manager2 = await signedInBrowser(app, m2.email);
  });

  afterAll(async () => {
    await boss.stop({ graceful: true, wait: true });
    await stopJobQueue();
  });

  it('when an admin creates a project with a designer and the technician records borehole, sample and test, then each is readable with the in-situ stress estimated', async () => {
    const project = await admin
      .post(`/api/orgs/${orgId}/projects`, { name: 'Quarry Lane Culvert', reference: 'QLC-01', clientName: 'Brindlecombe Works', designerIds: [designerId] })
      .expect(201);
    projectId = project.body.id;
    expect(project.body.designers).toEqual([expect.objectContaining({ userId: designerId })]);
    const borehole = await tech.post(`/api/orgs/${orgId}/projects/${projectId}/boreholes`, { name: 'BH3', waterTableDepthM: 1.5 }).expect(201);
    const sample = await tech
      .post(`/api/orgs/${orgId}/boreholes/${borehole.body.id}/samples`, { reference: 'U4', topDepthM: 6, bottomDepthM: 6.5, bulkUnitWeightKnPerM3: 18 })
      .expect(201);
    // σ′v = 18 × 6.25 − 9.81 × (6.25 − 1.5) = 112.5 − 46.5975 = 65.9025 kPa
    expect(sample.body.inSituStressKpa).toBeCloseTo(65.9025, 4);
    expect(sample.body.inSituStressSource).toBe('estimated');
    const { dryMassG } = KNOWN_TEST;
    const test = await tech
      .post(`/api/orgs/${orgId}/samples/${sample.body.id}/tests`, {
        reference: 'QLC-OED-1',
        specimen: { initialHeightMm: 20, diameterMm: 75, specificGravity: 2.68, dryMassG, drainage: 'double' },
        apparatusName: 'Frame 1',
        startedOn: '2026-02-01',
      })
      .expect(201);
    testId = test.body.id;
    expect(test.body).toMatchObject({ status: 'draft', technicianId: techId, latestAnalysis: null });
  });

  it('when a draft test is submitted, then 409 says to upload the readings first', async () => {
    const res = await tech.post(`/api/orgs/${orgId}/tests/${testId}/submit`).expect(409);
    expect(res.body).toMatchObject({ code: 'invalid_transition' });
    expect(res.body.message).toMatch(/Upload the readings/);
  });

  it('when readings are imported, then the analysis runs through the queue, its progress is visible, and the known parameters come back', async () => {
    const { analysisJobId } = await uploadKnownReadings(orgId, testId, techId);
    const job = await waitForJob(tech, orgId, analysisJobId);
    expect(job).toMatchObject({ state: 'succeeded', progress: 1, testId });
    const detail = (await tech.get(`/api/orgs/${orgId}/tests/${testId}`).expect(200)).body;
    expect(detail.status).toBe('analysed');
    expect(detail.latestAnalysis.id).toBe(job.result?.['analysisId']);
    expect(detail.latestAnalysis.keyParameters.compressionIndex).toBeCloseTo(KNOWN_SOIL.compressionIndex, 2);
    expect(detail.latestAnalysis.keyParameters.swellIndex).toBeCloseTo(KNOWN_SOIL.swellIndex, 2);
    expect(detail.latestAnalysis.keyParameters.cvMinM2PerYr).toBeGreaterThan(1.7);
    const analysis = (await tech.get(`/api/orgs/${orgId}/tests/${testId}/analysis`).expect(200)).body;
    expect(analysis.geoCoreVersion).toBe(GEO_CORE_VERSION);
    expect(analysis.inputsHash).toMatch(/^[0-9a-f]{64}$/);
    expect(analysis.result.increments).toHaveLength(KNOWN_SOIL.stressesKpa.length);
  });

  it('when the analysis is re-run on the same inputs, then it is a new analysis with the same hash and exactly the same result', async () => {
    const first = (await tech.get(`/api/orgs/${orgId}/tests/${testId}/analysis`).expect(200)).body;
    const res = await tech.post(`/api/orgs/${orgId}/tests/${testId}/analysis`).expect(202);
    expect((await waitForJob(tech, orgId, res.body.job.id)).state).toBe('succeeded');
    const second = (await tech.get(`/api/orgs/${orgId}/tests/${testId}/analysis`).expect(200)).body;
    expect(second.id).not.toBe(first.id);
    expect(second.inputsHash).toBe(first.inputsHash);
    expect(second.result).toEqual(first.result);
  });

  it('when picks are sent without a reason, then 400 asks for one and nothing changes', async () => {
    const res = await put(tech, `/api/orgs/${orgId}/tests/${testId}/picks`, { picks: { preconsolidationStressKpa: 150 } }).expect(400);
    expect(res.body.message).toMatch(/reason/);
    const detail = (await tech.get(`/api/orgs/${orgId}/tests/${testId}`).expect(200)).body;
    expect(detail.picks).toEqual({});
  });

  it('when the technician overrides σ′p and a t90 with a reason, then the analysis re-runs with them, stores them, and the change is audited', async () => {
    const picks = { preconsolidationStressKpa: 130, increments: [{ index: 5, taylor: { t90Min: 9 } }] };
    const res = await put(tech, `/api/orgs/${orgId}/tests/${testId}/picks`, { picks, reason: 'Knee read from the strain plot' }).expect(202);
    expect((await waitForJob(tech, orgId, res.body.job.id)).state).toBe('succeeded');
    const analysis = (await tech.get(`/api/orgs/${orgId}/tests/${testId}/analysis`).expect(200)).body;
    expect(analysis.picks).toEqual(picks);
    expect(analysis.pickReason).toBe('Knee read from the strain plot');
    expect(analysis.result.preconsolidation).toMatchObject({ adoptedKpa: 130, adoptedFrom: 'pick' });
    const log = (await admin.get(`/api/orgs/${orgId}/audit`).expect(200)).body as Array<{ action: string; details: Record<string, unknown> }>;
    expect(log.find((e) => e.action === 'test.picks_changed')?.details).toMatchObject({ reason: 'Knee read from the strain plot', to: picks });
  });

  it('when the technician submits, then every lab manager is e-mailed a link to the test, and it waits in the review queue with its key parameters', async () => {
    await tech.post(`/api/orgs/${orgId}/tests/${testId}/submit`).expect(200);
    const link = `${env().PUBLIC_URL.replace(/\/$/, '')}/orgs/${orgId}/tests/${testId}`;
    for (const address of [managerEmail, manager2Email]) {
      const mail = await waitForMail(address);
      expect(mail.subject).toContain('QLC-OED-1');
      expect(linkIn(mail, link)).toContain(testId);
    }
    const queue = (await manager.get(`/api/orgs/${orgId}/review-queue`).expect(200)).body;
    expect(queue).toEqual([
      expect.objectContaining({ testId, projectName: 'Quarry Lane Culvert', sampleReference: 'U4', topDepthM: 6, technicianId: techId, warningCount: expect.any(Number) }),
    ]);
    expect(queue[0].keyParameters.preconsolidationStressKpa).toBe(130);
  });

  it('when the test is with the manager, then its specimen and picks cannot change (409)', async () => {
    await tech.patch(`/api/orgs/${orgId}/tests/${testId}`, { specimen: { initialHeightMm: 19 } }).expect(409);
    await put(tech, `/api/orgs/${orgId}/tests/${testId}/picks`, { picks: {}, reason: 'undo my picks' }).expect(409);
  });

  it('when the manager requests changes, then the technician is e-mailed the comment and sees it on the test', async () => {
    await manager.post(`/api/orgs/${orgId}/tests/${testId}/request-changes`, {}).expect(400);
    await manager.post(`/api/orgs/${orgId}/tests/${testId}/request-changes`, { comment: 'Check the seating of increment 1 and re-run.' }).expect(200);
    const mail = await waitForMail(techEmail);
    expect(mail.text).toContain('Check the seating of increment 1 and re-run.');
    const detail = (await tech.get(`/api/orgs/${orgId}/tests/${testId}`).expect(200)).body;
    expect(detail).toMatchObject({ status: 'changes_requested', changesRequestedComment: 'Check the seating of increment 1 and re-run.' });
  });

  it('when the test is re-analysed, resubmitted and approved, then version 1 of its soil record holds the parameters, and technician and designer are e-mailed', async () => {
    const rerun = await tech.post(`/api/orgs/${orgId}/tests/${testId}/analysis`).expect(202);
    expect((await waitForJob(tech, orgId, rerun.body.job.id)).state).toBe('succeeded');
    await tech.post(`/api/orgs/${orgId}/tests/${testId}/submit`).expect(200);
    const res = await manager.post(`/api/orgs/${orgId}/tests/${testId}/approve`, { comment: 'Fine.' }).expect(200);
    expect(res.body.test.status).toBe('approved');
    expect(res.body.soilRecord.version).toBe(1);
    recordId = res.body.soilRecord.recordId;
    const record = (await manager.get(`/api/orgs/${orgId}/soil-records/${recordId}`).expect(200)).body;
    expect(record.current).toMatchObject({ version: 1, testId, approvedById: managerId, preconsolidationAdoptedKpa: 130, preconsolidationAdoptedFrom: 'pick', supersededAt: null });
    expect(record.current.compressionIndex).toBeCloseTo(0.42, 2);
    expect(record.current.preconsolidationCasagrandeKpa).toBeGreaterThan(100);
    expect(record.current.preconsolidationPachecoSilvaKpa).toBeGreaterThan(100);
    expect(record.current.uploadSha256).toMatch(/^[0-9a-f]{64}$/);
    expect((await waitForMail(techEmail, 2)).subject).toMatch(/^Approved/);
    const designerMail = await waitForMail(designerEmail);
    expect(linkIn(designerMail, `${env().PUBLIC_URL.replace(/\/$/, '')}/orgs/${orgId}/soil-records/${recordId}`)).toContain('version=1');
    const reviews = (await tech.get(`/api/orgs/${orgId}/tests/${testId}/reviews`).expect(200)).body;
    expect(reviews.map((r: { decision: string }) => r.decision)).toEqual(['submitted', 'changes_requested', 'submitted', 'approved']);
  });

  it('when an approved test is re-analysed with new picks and approved again, then version 2 is current, version 1 is superseded, and both stay readable', async () => {
    const res = await put(tech, `/api/orgs/${orgId}/tests/${testId}/picks`, { picks: {}, reason: 'Back to the automatic constructions' }).expect(202);
    expect((await waitForJob(tech, orgId, res.body.job.id)).state).toBe('succeeded');
    await tech.post(`/api/orgs/${orgId}/tests/${testId}/submit`).expect(200);
    const approval = await manager2.post(`/api/orgs/${orgId}/tests/${testId}/approve`, {}).expect(200);
    expect(approval.body.soilRecord).toEqual({ recordId, version: 2 });
    const record = (await tech.get(`/api/orgs/${orgId}/soil-records/${recordId}`).expect(200)).body;
    expect(record.currentVersion).toBe(2);
    expect(record.versions.map((v: { version: number }) => v.version)).toEqual([2, 1]);
    const v1 = (await tech.get(`/api/orgs/${orgId}/soil-records/${recordId}/versions/1`).expect(200)).body;
    expect(v1).toMatchObject({ version: 1, preconsolidationAdoptedKpa: 130, supersededByVersion: 2 });
    expect(v1.supersededAt).not.toBeNull();
    expect(record.current.preconsolidationAdoptedFrom).toBe('casagrande');
    expect((await waitForMail(designerEmail, 2)).text).toMatch(/replaces version 1/);
  });

  it('when anyone changes or deletes an approved version with raw SQL, then the database refuses', async () => {
    await expect(dataSource.query('UPDATE soil_record_versions SET compression_index = 9 WHERE record_id = $1', [recordId])).rejects.toThrow(/immutable/);
    await expect(dataSource.query('DELETE FROM soil_record_versions WHERE record_id = $1', [recordId])).rejects.toThrow(/immutable/);
    await expect(dataSource.query("UPDATE soil_record_supersessions SET superseded_at = now() - interval '1 year'")).rejects.toThrow(/immutable/);
    await expect(dataSource.query('TRUNCATE soil_record_versions CASCADE')).rejects.toThrow(/immutable/);
    const [row] = (await dataSource.query('SELECT compression_index FROM soil_record_versions WHERE record_id = $1 AND version = 1', [recordId])) as Array<{ compression_index: number }>;
    expect(row?.compression_index).toBeCloseTo(0.42, 2);
  });

  it('when a lab manager ran a test themselves, then they may not approve it (403 with the reason), and another manager may', async () => {
    const hands = await createMember(orgId, ['lab_manager', 'technician'], 'hands-on-manager');
    const handsOn = await signedInBrowser(app, hands.email);
    const own = await submittedTest(orgId, hands.userId);
    const res = await handsOn.post(`/api/orgs/${orgId}/tests/${own.testId}/approve`, {}).expect(403);
    expect(res.body).toMatchObject({ code: 'own_test' });
    expect(res.body.message).toMatch(/you ran or submitted yourself/);
    await handsOn.post(`/api/orgs/${orgId}/tests/${own.testId}/request-changes`, { comment: 'Looks fine to me' }).expect(403);
    await manager2.post(`/api/orgs/${orgId}/tests/${own.testId}/approve`, {}).expect(200);
  });

  it('when a lab manager set a test up for another technician and overrode its σ′p, then they may not approve it: their changes are named; another manager may', async () => {
    const setUp = await draftTest(orgId, techId);
    // The manager, not the technician, changes the set-up and the picks.
    await manager.patch(`/api/orgs/${orgId}/tests/${setUp.testId}`, { apparatusName: 'Frame 9' }).expect(200);
    const first = await uploadKnownReadings(orgId, setUp.testId, techId);
    await waitForJob(tech, orgId, first.analysisJobId);
    const picked = await put(manager, `/api/orgs/${orgId}/tests/${setUp.testId}/picks`, { picks: { preconsolidationStressKpa: 999 }, reason: 'Read from the plot' }).expect(202);
    expect((await waitForJob(manager, orgId, picked.body.job.id)).state).toBe('succeeded');
    await tech.post(`/api/orgs/${orgId}/tests/${setUp.testId}/submit`).expect(200);

    const refused = await manager.post(`/api/orgs/${orgId}/tests/${setUp.testId}/approve`, {}).expect(403);
    expect(refused.body.code).toBe('own_test');
    expect(refused.body.message).toMatch(/^You changed this test's picks and set-up since it was last approved \(last on \d{4}-\d{2}-\d{2}\), so you cannot approve or send it back\. Ask another lab manager to review it\.$/);
    expect((await manager.get(`/api/orgs/${orgId}/tests/${setUp.testId}`).expect(200)).body.status).toBe('submitted');
    // The history cannot be rewritten to slip past the rule.
    await expect(dataSource.query('DELETE FROM test_contributions WHERE test_id = $1', [setUp.testId])).rejects.toThrow(/insert-only/);
    await manager2.post(`/api/orgs/${orgId}/tests/${setUp.testId}/approve`, {}).expect(200);
  });

  it('when a test is given a technician who does not hold the technician role (a client), then 400 names the field and nothing changes', async () => {
    const client = await createMember(orgId, 'client', 'not-a-technician');
    const fixture = await draftTest(orgId, techId);
    const res = await manager.patch(`/api/orgs/${orgId}/tests/${fixture.testId}`, { technicianId: client.userId }).expect(400);
    expect(res.body.issues).toEqual([{ path: 'technicianId', message: 'This member is not a technician.' }]);
    const detail = (await manager.get(`/api/orgs/${orgId}/tests/${fixture.testId}`).expect(200)).body;
    expect(detail.technicianId ?? detail.technician?.id).toBe(techId);
  });

  it('when an administrator who is also lab manager ran a test, then she may not approve it (403 with the reason), and another admin and lab manager may', async () => {
    const first = await createMember(orgId, ['admin', 'lab_manager', 'technician'], 'small-lab-head');
    const second = await createMember(orgId, ['admin', 'lab_manager'], 'small-lab-deputy');
    const own = await submittedTest(orgId, first.userId);
    const firstBrowser = await signedInBrowser(app, first.email);
    const res = await firstBrowser.post(`/api/orgs/${orgId}/tests/${own.testId}/approve`, {}).expect(403);
    expect(res.body).toMatchObject({ code: 'own_test' });
    expect(res.body.message).toMatch(/you ran or submitted yourself/);
    const secondBrowser = await signedInBrowser(app, second.email);
    const approved = await secondBrowser.post(`/api/orgs/${orgId}/tests/${own.testId}/approve`, {}).expect(200);
    expect(approved.body.test.status).toBe('approved');
  });

  it('when a technician asks to approve, then 403: only lab managers review', async () => {
    const other = await submittedTest(orgId, techId);
    await tech.post(`/api/orgs/${orgId}/tests/${other.testId}/approve`, {}).expect(403);
    const detail = (await manager.get(`/api/orgs/${orgId}/tests/${other.testId}`).expect(200)).body;
    expect(detail.status).toBe('submitted');
  });

  it('when a test gets new readings after analysis, then the old analysis is stale until the new one runs, and every move is in the audit log', async () => {
    const fixture = await draftTest(orgId, techId);
    const first = await uploadKnownReadings(orgId, fixture.testId, techId);
    await waitForJob(tech, orgId, first.analysisJobId);
    const second = await uploadKnownReadings(orgId, fixture.testId, techId);
    const between = (await tech.get(`/api/orgs/${orgId}/tests/${fixture.testId}`).expect(200)).body;
    expect(between.latestUploadId).toBe(second.uploadId);
    await waitForJob(tech, orgId, second.analysisJobId);
    const log = (await admin.get(`/api/orgs/${orgId}/audit`).expect(200)).body as Array<{ action: string; objectId: string }>;
    const moves = log.filter((e) => e.objectId === fixture.testId).map((e) => e.action).reverse();
    expect(moves).toEqual(['test.created', 'test.readings_uploaded', 'test.analysed', 'test.readings_uploaded', 'test.analysed']);
  });
});

describe('lab records across organisations', () => {
  it('when a member of another organisation asks for a project, borehole, sample, test, analysis, job or soil record of this one under their own organisation, then 404', async () => {
    const home = await signUpAdmin(app, 'lab-home');
    const tech = await createMember(home.orgId, 'technician', 'lab-home-tech');
    const fixture = await draftTest(home.orgId, tech.userId);
    const { analysisJobId } = await uploadKnownReadings(home.orgId, fixture.testId, tech.userId);
    const other = await signUpAdmin(app, 'lab-other');
    const o = other.orgId;
    for (const path of [
      `/projects/${fixture.projectId}`,
      `/projects/${fixture.projectId}/boreholes`,
      `/boreholes/${fixture.boreholeId}/samples`,
      `/tests/${fixture.testId}`,
      `/tests/${fixture.testId}/analysis`,
      `/tests/${fixture.testId}/reviews`,
      `/jobs/${analysisJobId}`,
    ]) {
      const res = await other.browser.get(`/api/orgs/${o}${path}`);
      expect({ path, status: res.status }).toEqual({ path, status: 404 });
    }
    const otherTech = await signedInBrowser(app, (await createMember(o, 'technician', 'lab-other-tech')).email);
    await otherTech.post(`/api/orgs/${o}/samples/${fixture.sampleId}/tests`, { reference: 'X' }).expect(404);
    await otherTech.patch(`/api/orgs/${o}/tests/${fixture.testId}`, { apparatusName: 'X' }).expect(404);
    await otherTech.post(`/api/orgs/${o}/tests/${fixture.testId}/submit`).expect(404);
    expect((await other.browser.get(`/api/orgs/${o}/tests`).expect(200)).body).toEqual([]);
    expect((await other.browser.get(`/api/orgs/${o}/soil-records`).expect(200)).body).toEqual([]);
  });
});
