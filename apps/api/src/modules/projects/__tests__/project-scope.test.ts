import type { IssuedTestSummary, ProjectDetail, ProjectResults, ProjectSummary, ReviewEvent, SoilRecordSummary, TestSummary } from '@porestack/types';
import { beforeAll, describe, expect, it } from 'vitest';
import { createApp } from '../../../app.js';
import { dataSource } from '../../../data-source.js';
import { listRoutes } from '../../../http/routes.js';
import { createMember, signedInBrowser, signUpAdmin, type Browser } from '../../../testing/browser.js';
import { analysedTest, approvedTest, draftTest, KNOWN_SOIL, placeOnProject, submittedTest, type LabFixture } from '../../../testing/lab-fixtures.js';
import { runAnalysis } from '../../analyses/analyses.service.js';
import { jobRuns } from '../../job-runs/job-runs.service.js';
import { requestChanges } from '../../reviews/reviews.service.js';

const app = createApp();

const CHANGE_REQUEST = 'Seating of increment 1 looks wrong: redo the bedding correction.';

/**
 * One laboratory with two projects and one other laboratory:
 * - P1: an approved test (its record), a draft, a submitted test, one sent back with a comment;
 *   designer D1 and client C1 are on it.
 * - P2: an approved test; client C2 is on it.
 * - Other organisation: an approved test.
 */
interface World {
  orgId: string;
  otherOrgId: string;
  p1: LabFixture & { recordId: string };
  p1Draft: LabFixture;
  p1Submitted: LabFixture;
  p1Returned: LabFixture;
  p2: LabFixture & { recordId: string };
  other: LabFixture & { recordId: string };
  technicianId: string;
  managerId: string;
  designer: Browser;
  client: Browser;
  technician: Browser;
}

async function buildWorld(): Promise<World> {
  const admin = await signUpAdmin(app, 'scope-lab');
  const orgId = admin.orgId;
  const technician = await createMember(orgId, 'technician', 'scope-tech');
  const manager = await createMember(orgId, 'lab_manager', 'scope-manager');
  const designer = await createMember(orgId, 'designer', 'scope-designer');
  const client = await createMember(orgId, 'client', 'scope-client');
  const otherClient = await createMember(orgId, 'client', 'scope-other-client');

  const p1 = await approvedTest(orgId, technician.userId, manager.userId, { designerIds: [designer.userId] });
  const p1Draft = await draftTest(orgId, technician.userId, { onSampleOf: p1 });
  const p1Submitted = await submittedTest(orgId, technician.userId, { onSampleOf: p1 });
  const p1Returned = await submittedTest(orgId, technician.userId, { onSampleOf: p1 });
  await requestChanges(orgId, p1Returned.testId, { id: manager.userId, name: 'Scope manager' }, CHANGE_REQUEST);
  await placeOnProject(orgId, p1.projectId, client.userId, 'client');

  const p2 = await approvedTest(orgId, technician.userId, manager.userId);
  await placeOnProject(orgId, p2.projectId, otherClient.userId, 'client');

  const otherAdmin = await signUpAdmin(app, 'scope-other-lab');
  const otherTech = await createMember(otherAdmin.orgId, 'technician', 'other-tech');
  const otherManager = await createMember(otherAdmin.orgId, 'lab_manager', 'other-manager');
  const other = await approvedTest(otherAdmin.orgId, otherTech.userId, otherManager.userId);

  return {
    orgId,
    otherOrgId: otherAdmin.orgId,
    p1,
    p1Draft,
    p1Submitted,
    p1Returned,
    p2,
    other,
    technicianId: technician.userId,
    managerId: manager.userId,
    designer: await signedInBrowser(app, designer.email),
    client: await signedInBrowser(app, client.email),
    technician: await signedInBrowser(app, technician.email),
  };
}

let w: World;
beforeAll(async () => {
  w = await buildWorld();
});

const api = (path: string) => `/api/orgs/${w.orgId}${path}`;

describe('a client of a project', () => {
  it('when the client lists projects, then only the project shared with them comes back, without its designers list, counting issued tests only', async () => {
    const listed = (await w.client.get(api('/projects')).expect(200)).body as ProjectSummary[];
    expect(listed.map((p) => p.id)).toEqual([w.p1.projectId]);
    expect(listed[0]?.designerIds).toEqual([]);
    // P1 has four tests; one has an approved version.
    expect(listed[0]?.testCount).toBe(1);
    const detail = (await w.client.get(api(`/projects/${w.p1.projectId}`)).expect(200)).body as ProjectDetail;
    expect(detail.designers).toEqual([]);
  });

  it('when the client opens another project of the laboratory or of another laboratory, then 404 on every read', async () => {
    for (const projectId of [w.p2.projectId, w.other.projectId]) {
      await w.client.get(api(`/projects/${projectId}`)).expect(404);
      await w.client.get(api(`/projects/${projectId}/boreholes`)).expect(404);
      await w.client.get(api(`/projects/${projectId}/results`)).expect(404);
      await w.client.get(api(`/soil-records?projectId=${projectId}`)).expect(404);
    }
    for (const boreholeId of [w.p2.boreholeId, w.other.boreholeId]) await w.client.get(api(`/boreholes/${boreholeId}/samples`)).expect(404);
    for (const recordId of [w.p2.recordId, w.other.recordId]) {
      await w.client.get(api(`/soil-records/${recordId}`)).expect(404);
      await w.client.get(api(`/soil-records/${recordId}/versions/1`)).expect(404);
      await w.client.get(api(`/soil-records/${recordId}/versions/1/summary`)).expect(404);
    }
    // The other laboratory's own address: not a member there.
    await w.client.get(`/api/orgs/${w.otherOrgId}/projects/${w.other.projectId}`).expect(404);
  });

  it('when the client reads soil records, then only their project’s approved versions come back, without the lab’s test status', async () => {
    const records = (await w.client.get(api('/soil-records')).expect(200)).body as SoilRecordSummary[];
    expect(records.map((r) => r.id)).toEqual([w.p1.recordId]);
    expect(records[0]?.testStatus).toBeNull();
  });

  it('when the client opens the project results, then the boreholes and samples come back with the approved test only: no drafts, no tests under review, no change-request comment', async () => {
    const res = await w.client.get(api(`/projects/${w.p1.projectId}/results`)).expect(200);
    const results = res.body as ProjectResults;
    expect(results.boreholes.map((b) => b.name)).toEqual(['BH1']);
    expect(results.boreholes[0]?.samples.map((s) => [s.reference, s.issuedTestCount])).toEqual([['U1', 1]]);
    expect(results.results.map((r) => r.testId)).toEqual([w.p1.testId]);
    const text = JSON.stringify(res.body);
    for (const hidden of [w.p1Draft.testId, w.p1Submitted.testId, w.p1Returned.testId, CHANGE_REQUEST]) expect(text).not.toContain(hidden);
  });

  it('when the client opens the approved version’s test summary, then the specimen is the one the approval used (Gs, diameter and height given to the fixture) and nothing of the lab’s work in hand', async () => {
    const res = await w.client.get(api(`/soil-records/${w.p1.recordId}/versions/1/summary`)).expect(200);
    const summary = res.body as IssuedTestSummary;
    expect(summary.test.id).toBe(w.p1.testId);
    expect(summary.version.version).toBe(1);
    // Recovered from the stored result by the definitions; the fixture's inputs are the expected values.
    expect(summary.specimen.specificGravity).toBeCloseTo(KNOWN_SOIL.specificGravity, 9);
    expect(summary.specimen.diameterMm).toBeCloseTo(KNOWN_SOIL.diameterMm, 9);
    expect(summary.specimen.initialHeightMm).toBeCloseTo(KNOWN_SOIL.initialHeightMm, 9);
    expect(summary.specimen.dryMassG).toBeCloseTo(w.p1.dryMassG, 6);
    expect(Array.isArray(summary.result['increments'])).toBe(true);
    expect(JSON.stringify(res.body)).not.toContain(CHANGE_REQUEST);
  });

  it('when the client asks for reports and exports, then their project’s answer and another project’s is 404', async () => {
    await w.client.get(api(`/projects/${w.p1.projectId}/parameters.xlsx`)).expect(200);
    await w.client.get(api(`/soil-records/${w.p1.recordId}/versions/1/data.xlsx`)).expect(200);
    for (const path of [
      `/projects/${w.p2.projectId}/parameters.xlsx`,
      `/soil-records/${w.p2.recordId}/versions/1/data.xlsx`,
      `/soil-records/${w.p2.recordId}/versions/1/report`,
      `/soil-records/${w.p2.recordId}/versions/1/report/pdf`,
      `/soil-records/${w.other.recordId}/versions/1/report/pdf`,
    ]) {
      const res = await w.client.get(api(path));
      expect({ path, status: res.status }).toEqual({ path, status: 404 });
    }
    await w.client.get(api(`/tests/${w.p1.testId}/data.xlsx`)).expect(403);
  });

  it('when the client asks for the lab’s own pages of a test on their project, then 403: clients read approved versions only', async () => {
    const jobId = (await jobRuns.latestFor(w.orgId, w.p1.testId, 'analyse-test'))?.id ?? w.p1.testId;
    for (const path of [
      '/tests',
      `/tests/${w.p1.testId}`,
      `/tests/${w.p1.testId}/analysis`,
      `/tests/${w.p1.testId}/readings`,
      `/tests/${w.p1.testId}/reviews`,
      `/tests/${w.p1.testId}/uploads`,
      `/jobs/${jobId}`,
      '/review-queue',
      '/import-profiles',
    ]) {
      const res = await w.client.get(api(path));
      expect({ path, status: res.status }).toEqual({ path, status: 403 });
    }
  });

  it('when the client calls any route that changes something, then 403', async () => {
    const mutating = listRoutes(app).filter((r) => r.method !== 'GET' && r.path.startsWith('/api/orgs/:orgId'));
    expect(mutating.length).toBeGreaterThan(15);
    const ids: Record<string, string> = {
      orgId: w.orgId,
      projectId: w.p1.projectId,
      boreholeId: w.p1.boreholeId,
      sampleId: w.p1.sampleId,
      testId: w.p1.testId,
      recordId: w.p1.recordId,
    };
    for (const route of mutating) {
      const path = route.path.replace(/:(\w+)/g, (_m, name: string) => ids[name] ?? w.p1.testId);
      const res =
        route.method === 'POST'
          ? await w.client.post(path, {})
          : route.method === 'PATCH'
            ? await w.client.patch(path, {})
            : route.method === 'PUT'
              ? await w.client.agent.put(path).set('x-csrf-token', w.client.csrfToken).send({})
              : await w.client.delete(path);
      expect({ route: `${route.method} ${route.path}`, status: res.status }).toEqual({ route: `${route.method} ${route.path}`, status: 403 });
    }
  });
});

describe('a designer of a project', () => {
  it('when the designer lists tests, then only the approved tests of their project come back', async () => {
    const listed = (await w.designer.get(api('/tests')).expect(200)).body as TestSummary[];
    expect(listed.map((t) => t.id)).toEqual([w.p1.testId]);
  });

  it('when the designer opens the approved test, then its detail, analysis, readings and approvals come back without the lab’s job messages or change requests', async () => {
    const detail = (await w.designer.get(api(`/tests/${w.p1.testId}`)).expect(200)).body as { latestUploadId: string | null; latestAnalysisJob: unknown; status: string };
    expect(detail.status).toBe('approved');
    expect(detail.latestUploadId).toBeNull();
    expect(detail.latestAnalysisJob).toBeNull();
    await w.designer.get(api(`/tests/${w.p1.testId}/analysis`)).expect(200);
    const readings = (await w.designer.get(api(`/tests/${w.p1.testId}/readings?limit=5`)).expect(200)).body as { total: number };
    expect(readings.total).toBeGreaterThan(0);
    const reviews = (await w.designer.get(api(`/tests/${w.p1.testId}/reviews`)).expect(200)).body as ReviewEvent[];
    expect(reviews.map((r) => r.decision)).toEqual(['approved']);
  });

  it('when the designer opens a draft, a submitted or a returned test of their own project, then 404 like a missing test', async () => {
    await w.designer.get(api(`/tests/${w.p1.testId}/data.xlsx`)).expect(200);
    for (const fixture of [w.p1Draft, w.p1Submitted, w.p1Returned]) {
      for (const part of ['', '/analysis', '/readings', '/reviews', '/data.xlsx']) {
        const res = await w.designer.get(api(`/tests/${fixture.testId}${part}`));
        expect({ part, status: res.status }).toEqual({ part, status: 404 });
      }
    }
  });

  it('when the designer opens another project’s or another laboratory’s ids, then 404', async () => {
    await w.designer.get(api(`/projects/${w.p2.projectId}`)).expect(404);
    await w.designer.get(api(`/tests?projectId=${w.p2.projectId}`)).expect(404);
    await w.designer.get(api(`/tests/${w.p2.testId}`)).expect(404);
    await w.designer.get(api(`/tests/${w.other.testId}`)).expect(404);
    await w.designer.get(api(`/soil-records/${w.p2.recordId}`)).expect(404);
    await w.designer.get(api(`/soil-records/${w.other.recordId}/versions/1/summary`)).expect(404);
    await w.designer.get(api(`/boreholes/${w.other.boreholeId}/samples`)).expect(404);
    const records = (await w.designer.get(api('/soil-records')).expect(200)).body as SoilRecordSummary[];
    expect(records.map((r) => r.id)).toEqual([w.p1.recordId]);
  });

  it('when the designer follows a job, then only the jobs they started; the lab’s analysis jobs answer 404', async () => {
    const labJob = await jobRuns.latestFor(w.orgId, w.p1.testId, 'analyse-test');
    const [designerRow] = (await dataSource.query('SELECT user_id FROM project_members WHERE project_id = $1 AND role = $2', [w.p1.projectId, 'designer'])) as Array<{ user_id: string }>;
    const own = await jobRuns.create({ organisationId: w.orgId, kind: 'designer-owned', createdById: designerRow?.user_id ?? null });
    if (labJob) await w.designer.get(api(`/jobs/${labJob.id}`)).expect(404);
    await w.designer.get(api(`/jobs/${own.id}`)).expect(200);
  });

  it('when the designer calls a route that changes the lab’s records, then 403', async () => {
    const calls: Array<[string, string]> = [
      ['post', '/projects'],
      ['patch', `/projects/${w.p1.projectId}`],
      ['post', `/projects/${w.p1.projectId}/boreholes`],
      ['post', `/boreholes/${w.p1.boreholeId}/samples`],
      ['post', `/samples/${w.p1.sampleId}/tests`],
      ['patch', `/tests/${w.p1.testId}`],
      ['post', `/tests/${w.p1.testId}/analysis`],
      ['post', `/tests/${w.p1.testId}/submit`],
      ['post', `/tests/${w.p1.testId}/approve`],
      ['post', `/tests/${w.p1.testId}/request-changes`],
      ['post', `/tests/${w.p1.testId}/uploads`],
      ['post', `/projects/${w.p1.projectId}/clients`],
      ['post', '/invitations'],
    ];
    for (const [method, path] of calls) {
      const res = method === 'post' ? await w.designer.post(api(path), {}) : await w.designer.patch(api(path), {});
      expect({ path, status: res.status }).toEqual({ path, status: 403 });
    }
  });

  it('when the lab re-works an approved test, then the designer no longer opens the test, and still reads the approved version and its summary', async () => {
    const reworked = await approvedTest(w.orgId, w.technicianId, w.managerId, { onSampleOf: w.p1 });
    await dataSource.query(`UPDATE consolidation_tests SET picks = '{"preconsolidationStressKpa": 90}' WHERE id = $1`, [reworked.testId]);
    await runAnalysis(w.orgId, reworked.testId, w.technicianId);
    await w.designer.get(api(`/tests/${reworked.testId}`)).expect(404);
    await w.designer.get(api(`/tests/${reworked.testId}/analysis`)).expect(404);
    await w.designer.get(api(`/soil-records/${reworked.recordId}`)).expect(200);
    const summary = (await w.designer.get(api(`/soil-records/${reworked.recordId}/versions/1/summary`)).expect(200)).body as IssuedTestSummary;
    // The version's own analysis, not the re-analysis with the new pick.
    expect((summary.result['preconsolidation'] as { adoptedFrom: string }).adoptedFrom).not.toBe('pick');
  });
});

describe('a member holding the designer and the client role', () => {
  it('when they are a designer on one project and a client of another, then each project reads by the place held on it', async () => {
    const both = await createMember(w.orgId, ['designer', 'client'], 'scope-both');
    await placeOnProject(w.orgId, w.p1.projectId, both.userId, 'designer');
    await placeOnProject(w.orgId, w.p2.projectId, both.userId, 'client');
    const browser = await signedInBrowser(app, both.email);
    const projects = (await browser.get(api('/projects')).expect(200)).body as ProjectSummary[];
    expect(projects.map((p) => p.id).sort()).toEqual([w.p1.projectId, w.p2.projectId].sort());
    // Designer on P1: its approved test opens; client of P2: its approved test does not, its record does, without the lab's status.
    await browser.get(api(`/tests/${w.p1.testId}`)).expect(200);
    await browser.get(api(`/tests/${w.p2.testId}`)).expect(404);
    const records = (await browser.get(api('/soil-records')).expect(200)).body as SoilRecordSummary[];
    const statusOf = Object.fromEntries(records.map((r) => [r.id, r.testStatus]));
    expect([statusOf[w.p1.recordId], statusOf[w.p2.recordId]]).toEqual(['approved', null]);
    expect(records.every((r) => r.projectId === w.p1.projectId || r.projectId === w.p2.projectId)).toBe(true);
    expect(((await browser.get(api(`/projects/${w.p2.projectId}`)).expect(200)).body as ProjectDetail).designers).toEqual([]);
  });

  it('when a lab member also holds the designer role, then they see the whole laboratory', async () => {
    const both = await createMember(w.orgId, ['technician', 'designer'], 'scope-tech-designer');
    const browser = await signedInBrowser(app, both.email);
    await browser.get(api(`/tests/${w.p1Draft.testId}`)).expect(200);
    await browser.get(api(`/projects/${w.p2.projectId}`)).expect(200);
  });
});

describe('lab staff', () => {
  it('when a technician lists tests and projects, then every project of the organisation, and only of it', async () => {
    const tests = (await w.technician.get(api('/tests')).expect(200)).body as TestSummary[];
    const ids = tests.map((t) => t.id);
    expect(ids).toEqual(expect.arrayContaining([w.p1.testId, w.p1Draft.testId, w.p2.testId]));
    expect(ids).not.toContain(w.other.testId);
    await w.technician.get(api(`/tests/${w.p1Draft.testId}`)).expect(200);
    await w.technician.get(api(`/tests/${w.other.testId}`)).expect(404);
    const projects = (await w.technician.get(api('/projects')).expect(200)).body as ProjectSummary[];
    expect(projects.map((p) => p.id)).toEqual(expect.arrayContaining([w.p1.projectId, w.p2.projectId]));
  });
});

describe('an analysed test is not a result', () => {
  it('when a project has only analysed tests, then its client reads no results', async () => {
    const admin = await signUpAdmin(app, 'scope-analysed');
    const tech = await createMember(admin.orgId, 'technician');
    const client = await createMember(admin.orgId, 'client');
    const fixture = await analysedTest(admin.orgId, tech.userId);
    await placeOnProject(admin.orgId, fixture.projectId, client.userId, 'client');
    const browser = await signedInBrowser(app, client.email);
    const results = (await browser.get(`/api/orgs/${admin.orgId}/projects/${fixture.projectId}/results`).expect(200)).body as ProjectResults;
    expect(results.results).toEqual([]);
    expect(results.boreholes[0]?.samples[0]?.issuedTestCount).toBe(0);
  });
});
