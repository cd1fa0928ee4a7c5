import { ROLES, type Role } from '@porestack/types';
import { beforeAll, describe, expect, it } from 'vitest';
import { createApp } from '../../app.js';
import { dataSource } from '../../data-source.js';
import { InvitationEntity } from '../../modules/invitations/invitation.entity.js';
import { openBrowser, signedInBrowser, signUpAdmin, createMember, uniqueEmail, type Browser } from '../../testing/browser.js';
import { listRoutes, type Access } from '../routes.js';
import { jobRuns } from '../../modules/job-runs/job-runs.service.js';
import { approveTest } from '../../modules/reviews/reviews.service.js';
import { generateReport } from '../../jobs/generate-report.job.js';
import { analysedTest, draftTest, placeOnProject, submittedTest, type LabFixture } from '../../testing/lab-fixtures.js';
import { canonicalCsvTemplate, LOGGER_MAPPING } from '../../modules/readings-import/demo-files.js';
import { DESIGN_READERS, DESIGN_WRITERS } from '../../modules/projects/design-roles.js';
import { designContext, type DesignContext } from '../../testing/design-policy-context.js';

const app = createApp();

/**
 * The access every route must have: the specification, written independently of the
 * routers. A new route without a row here fails the first test below.
 */
interface Sample {
  path: string;
  body?: object;
  /** Sent as multipart field `file` instead of a JSON body. */
  file?: { bytes: Buffer; name: string };
}
interface Context {
  orgId: string;
  adminId: string;
  newMemberId: () => Promise<string>;
  newInvitationId: () => Promise<string>;
  lab: {
    technicianId: string;
    draft: LabFixture;
    analysed: LabFixture;
    /** A job the designer started: designers follow only their own jobs. */
    designerJobId: string;
    recordId: string;
    /** The approved test: designers open a test only as approved. */
    approvedTestId: string;
    approvedProjectId: string;
    /** Prints the approved record's report once (no worker runs in this file). */
    issueReport: () => Promise<void>;
    /** A newly approved record whose report generation failed (the printer could not start). */
    newFailedReportRecordId: () => Promise<string>;
    newAnalysedTestId: () => Promise<string>;
    newSubmittedTestId: () => Promise<string>;
  };
  design: DesignContext;
}
// The expected access, written out here rather than imported from the routers' lists, so a
// changed list in the code fails this test instead of changing what it expects.
const ADMIN: readonly Role[] = ['admin'];
const LAB_READERS: readonly Role[] = ['admin', 'technician', 'lab_manager', 'designer'];
const PROJECT_EDITORS: readonly Role[] = ['admin', 'lab_manager'];
const LAB_WORKERS: readonly Role[] = ['technician', 'lab_manager'];
const REVIEWERS: readonly Role[] = ['lab_manager'];
const RECORD_READERS: readonly Role[] = ['admin', 'technician', 'lab_manager', 'designer', 'client'];
const PROJECT_READERS: readonly Role[] = ['admin', 'technician', 'lab_manager', 'designer', 'client'];
const IMPORTERS: readonly Role[] = ['technician'];
const UPLOAD_READERS: readonly Role[] = ['technician', 'lab_manager', 'admin'];
const PROFILE_EDITORS: readonly Role[] = ['technician', 'lab_manager'];
const SPEC: Record<string, { access: Access; sample: (ctx: Context) => Promise<Sample> | Sample; signsOut?: true }> = {
  'GET /api/health': { access: 'public', sample: () => ({ path: '/api/health' }) },
  'GET /api/auth/csrf': { access: 'public', sample: () => ({ path: '/api/auth/csrf' }) },
  'POST /api/auth/sign-up': { access: 'public', sample: () => ({ path: '/api/auth/sign-up', body: {} }) },
  'POST /api/auth/sign-up/confirm': { access: 'public', sample: () => ({ path: '/api/auth/sign-up/confirm', body: {} }) },
  'POST /api/auth/sign-in': { access: 'public', sample: () => ({ path: '/api/auth/sign-in', body: { email: uniqueEmail('x'), password: 'x' } }) },
  'POST /api/auth/sign-out': { access: 'public', sample: () => ({ path: '/api/auth/sign-out' }), signsOut: true },
  'GET /api/auth/session': { access: 'signed-in', sample: () => ({ path: '/api/auth/session' }) },
  'POST /api/auth/password-reset/request': {
    access: 'public',
    sample: () => ({ path: '/api/auth/password-reset/request', body: { email: uniqueEmail('nobody') } }),
  },
  'POST /api/auth/password-reset/confirm': {
    access: 'public',
    sample: () => ({ path: '/api/auth/password-reset/confirm', body: { token: 'not-a-real-token', password: 'long-enough-password' } }),
  },
  'GET /api/invitations/:token': { access: 'public', sample: () => ({ path: '/api/invitations/not-a-real-token' }) },
  'POST /api/invitations/:token/accept': {
    access: 'public',
    sample: () => ({ path: '/api/invitations/not-a-real-token/accept', body: { password: 'x' } }),
  },
  'GET /api/orgs/:orgId/invitations': { access: ADMIN, sample: (c) => ({ path: `/api/orgs/${c.orgId}/invitations` }) },
  'POST /api/orgs/:orgId/invitations': {
    access: ADMIN,
    sample: (c) => ({ path: `/api/orgs/${c.orgId}/invitations`, body: { email: uniqueEmail('invitee'), roles: ['client'] } }),
  },
  'DELETE /api/orgs/:orgId/invitations/:invitationId': {
    access: ADMIN,
    sample: async (c) => ({ path: `/api/orgs/${c.orgId}/invitations/${await c.newInvitationId()}` }),
  },
  'GET /api/orgs/:orgId/members': { access: ADMIN, sample: (c) => ({ path: `/api/orgs/${c.orgId}/members` }) },
  'PATCH /api/orgs/:orgId/members/:userId': {
    access: ADMIN,
    sample: async (c) => ({ path: `/api/orgs/${c.orgId}/members/${await c.newMemberId()}`, body: { roles: ['designer'] } }),
  },
  'DELETE /api/orgs/:orgId/members/:userId': {
    access: ADMIN,
    sample: async (c) => ({ path: `/api/orgs/${c.orgId}/members/${await c.newMemberId()}` }),
  },
  'GET /api/orgs/:orgId/home': { access: ROLES, sample: (c) => ({ path: `/api/orgs/${c.orgId}/home` }) },
  'GET /api/orgs/:orgId/audit': { access: ADMIN, sample: (c) => ({ path: `/api/orgs/${c.orgId}/audit` }) },
  'GET /api/orgs/:orgId/report-settings': { access: ['admin', 'lab_manager'], sample: (c) => ({ path: `/api/orgs/${c.orgId}/report-settings` }) },
  'PUT /api/orgs/:orgId/report-settings': {
    access: ['admin'],
    sample: (c) => ({ path: `/api/orgs/${c.orgId}/report-settings`, body: { address: '1 Invented Road, Nowhere', testMethodStatement: null } }),
  },
  'GET /api/orgs/:orgId/designers': { access: PROJECT_EDITORS, sample: (c) => ({ path: `/api/orgs/${c.orgId}/designers` }) },
  'GET /api/orgs/:orgId/projects': { access: PROJECT_READERS, sample: (c) => ({ path: `/api/orgs/${c.orgId}/projects` }) },
  'POST /api/orgs/:orgId/projects': {
    access: PROJECT_EDITORS,
    sample: (c) => ({ path: `/api/orgs/${c.orgId}/projects`, body: { name: 'Policy project', reference: `PP-${Math.random()}`, clientName: 'Policy client' } }),
  },
  'GET /api/orgs/:orgId/projects/:projectId': { access: PROJECT_READERS, sample: (c) => ({ path: `/api/orgs/${c.orgId}/projects/${c.lab.draft.projectId}` }) },
  'PATCH /api/orgs/:orgId/projects/:projectId': {
    access: PROJECT_EDITORS,
    sample: (c) => ({ path: `/api/orgs/${c.orgId}/projects/${c.lab.draft.projectId}`, body: { siteName: 'Renamed site' } }),
  },
  'GET /api/orgs/:orgId/projects/:projectId/boreholes': {
    access: PROJECT_READERS,
    sample: (c) => ({ path: `/api/orgs/${c.orgId}/projects/${c.lab.draft.projectId}/boreholes` }),
  },
  'POST /api/orgs/:orgId/projects/:projectId/boreholes': {
    access: LAB_WORKERS,
    sample: (c) => ({ path: `/api/orgs/${c.orgId}/projects/${c.lab.draft.projectId}/boreholes`, body: { name: `BH-${Math.random()}` } }),
  },
  'GET /api/orgs/:orgId/boreholes/:boreholeId/samples': {
    access: PROJECT_READERS,
    sample: (c) => ({ path: `/api/orgs/${c.orgId}/boreholes/${c.lab.draft.boreholeId}/samples` }),
  },
  'POST /api/orgs/:orgId/boreholes/:boreholeId/samples': {
    access: LAB_WORKERS,
    sample: (c) => ({ path: `/api/orgs/${c.orgId}/boreholes/${c.lab.draft.boreholeId}/samples`, body: { reference: `S-${Math.random()}`, topDepthM: 2, bottomDepthM: 2.4 } }),
  },
  'POST /api/orgs/:orgId/samples/:sampleId/tests': {
    access: LAB_WORKERS,
    sample: (c) => ({ path: `/api/orgs/${c.orgId}/samples/${c.lab.draft.sampleId}/tests`, body: { reference: `T-${Math.random()}`, technicianId: c.lab.technicianId } }),
  },
  'GET /api/orgs/:orgId/tests': { access: LAB_READERS, sample: (c) => ({ path: `/api/orgs/${c.orgId}/tests?status=draft` }) },
  'GET /api/orgs/:orgId/tests/:testId': { access: LAB_READERS, sample: (c) => ({ path: `/api/orgs/${c.orgId}/tests/${c.lab.approvedTestId}` }) },
  'PATCH /api/orgs/:orgId/tests/:testId': {
    access: LAB_WORKERS,
    sample: (c) => ({ path: `/api/orgs/${c.orgId}/tests/${c.lab.draft.testId}`, body: { apparatusName: 'Frame 3' } }),
  },
  'GET /api/orgs/:orgId/tests/:testId/analysis': { access: LAB_READERS, sample: (c) => ({ path: `/api/orgs/${c.orgId}/tests/${c.lab.approvedTestId}/analysis` }) },
  'POST /api/orgs/:orgId/tests/:testId/analysis': { access: LAB_WORKERS, sample: (c) => ({ path: `/api/orgs/${c.orgId}/tests/${c.lab.analysed.testId}/analysis` }) },
  'PUT /api/orgs/:orgId/tests/:testId/picks': {
    access: LAB_WORKERS,
    sample: (c) => ({ path: `/api/orgs/${c.orgId}/tests/${c.lab.analysed.testId}/picks`, body: { picks: { preconsolidationStressKpa: 125 }, reason: 'policy check' } }),
  },
  'POST /api/orgs/:orgId/tests/:testId/submit': {
    access: LAB_WORKERS,
    sample: async (c) => ({ path: `/api/orgs/${c.orgId}/tests/${await c.lab.newAnalysedTestId()}/submit` }),
  },
  'GET /api/orgs/:orgId/review-queue': { access: REVIEWERS, sample: (c) => ({ path: `/api/orgs/${c.orgId}/review-queue` }) },
  'POST /api/orgs/:orgId/tests/:testId/approve': {
    access: REVIEWERS,
    sample: async (c) => ({ path: `/api/orgs/${c.orgId}/tests/${await c.lab.newSubmittedTestId()}/approve`, body: {} }),
  },
  'POST /api/orgs/:orgId/tests/:testId/request-changes': {
    access: REVIEWERS,
    sample: async (c) => ({ path: `/api/orgs/${c.orgId}/tests/${await c.lab.newSubmittedTestId()}/request-changes`, body: { comment: 'Please check.' } }),
  },
  'GET /api/orgs/:orgId/tests/:testId/reviews': { access: LAB_READERS, sample: (c) => ({ path: `/api/orgs/${c.orgId}/tests/${c.lab.approvedTestId}/reviews` }) },
  'GET /api/orgs/:orgId/soil-records': { access: RECORD_READERS, sample: (c) => ({ path: `/api/orgs/${c.orgId}/soil-records` }) },
  'GET /api/orgs/:orgId/soil-records/:recordId': { access: RECORD_READERS, sample: (c) => ({ path: `/api/orgs/${c.orgId}/soil-records/${c.lab.recordId}` }) },
  'GET /api/orgs/:orgId/soil-records/:recordId/versions/:version': {
    access: RECORD_READERS,
    sample: (c) => ({ path: `/api/orgs/${c.orgId}/soil-records/${c.lab.recordId}/versions/1` }),
  },
  'GET /api/orgs/:orgId/jobs/:jobId': { access: LAB_READERS, sample: (c) => ({ path: `/api/orgs/${c.orgId}/jobs/${c.lab.designerJobId}` }) },
  'GET /api/orgs/:orgId/projects/:projectId/results': {
    access: RECORD_READERS,
    sample: (c) => ({ path: `/api/orgs/${c.orgId}/projects/${c.lab.draft.projectId}/results` }),
  },
  'GET /api/orgs/:orgId/soil-records/:recordId/versions/:version/summary': {
    access: RECORD_READERS,
    sample: (c) => ({ path: `/api/orgs/${c.orgId}/soil-records/${c.lab.recordId}/versions/1/summary` }),
  },
  'GET /api/orgs/:orgId/projects/:projectId/clients': {
    access: PROJECT_EDITORS,
    sample: (c) => ({ path: `/api/orgs/${c.orgId}/projects/${c.lab.draft.projectId}/clients` }),
  },
  'POST /api/orgs/:orgId/projects/:projectId/clients': {
    access: PROJECT_EDITORS,
    sample: (c) => ({ path: `/api/orgs/${c.orgId}/projects/${c.lab.draft.projectId}/clients`, body: { email: uniqueEmail('shared') } }),
  },
  'DELETE /api/orgs/:orgId/projects/:projectId/clients/:userId': {
    access: PROJECT_EDITORS,
    sample: async (c) => {
      const client = await createMember(c.orgId, 'client', 'withdrawn');
      await placeOnProject(c.orgId, c.lab.draft.projectId, client.userId, 'client');
      return { path: `/api/orgs/${c.orgId}/projects/${c.lab.draft.projectId}/clients/${client.userId}` };
    },
  },
  'DELETE /api/orgs/:orgId/projects/:projectId/client-invitations/:invitationId': {
    access: PROJECT_EDITORS,
    sample: async (c) => {
      const invitationId = await c.newInvitationId();
      await dataSource.query('INSERT INTO invitation_projects (organisation_id, invitation_id, project_id) VALUES ($1, $2, $3)', [c.orgId, invitationId, c.lab.draft.projectId]);
      return { path: `/api/orgs/${c.orgId}/projects/${c.lab.draft.projectId}/client-invitations/${invitationId}` };
    },
  },
  'POST /api/orgs/:orgId/tests/:testId/uploads': {
    access: IMPORTERS,
    sample: (c) => ({ path: `/api/orgs/${c.orgId}/tests/${c.lab.draft.testId}/uploads`, file: { bytes: Buffer.from(canonicalCsvTemplate()), name: 'policy.csv' } }),
  },
  'GET /api/orgs/:orgId/tests/:testId/uploads': { access: UPLOAD_READERS, sample: (c) => ({ path: `/api/orgs/${c.orgId}/tests/${c.lab.analysed.testId}/uploads` }) },
  'GET /api/orgs/:orgId/uploads/:uploadId': { access: UPLOAD_READERS, sample: async (c) => ({ path: `/api/orgs/${c.orgId}/uploads/${await uploadOf(c.lab.analysed.testId)}` }) },
  'GET /api/orgs/:orgId/uploads/:uploadId/download': {
    access: UPLOAD_READERS,
    sample: async (c) => ({ path: `/api/orgs/${c.orgId}/uploads/${await uploadOf(c.lab.analysed.testId)}/download` }),
  },
  'GET /api/orgs/:orgId/uploads/:uploadId/preview': {
    access: UPLOAD_READERS,
    sample: async (c) => ({ path: `/api/orgs/${c.orgId}/uploads/${await uploadOf(c.lab.analysed.testId)}/preview` }),
  },
  'POST /api/orgs/:orgId/uploads/:uploadId/import': {
    access: IMPORTERS,
    // A fresh upload each call: an upload whose import is queued refuses another until it ends.
    sample: async (c) => ({ path: `/api/orgs/${c.orgId}/uploads/${await copyOfUpload(c.lab.analysed.testId)}/import`, body: { mapping: LOGGER_MAPPING } }),
  },
  'POST /api/orgs/:orgId/uploads/:uploadId/trial': {
    access: IMPORTERS,
    sample: async (c) => ({ path: `/api/orgs/${c.orgId}/uploads/${await uploadOf(c.lab.analysed.testId)}/trial`, body: { mapping: LOGGER_MAPPING } }),
  },
  'GET /api/orgs/:orgId/import-profiles': { access: UPLOAD_READERS, sample: (c) => ({ path: `/api/orgs/${c.orgId}/import-profiles` }) },
  'POST /api/orgs/:orgId/import-profiles': {
    access: PROFILE_EDITORS,
    sample: (c) => ({ path: `/api/orgs/${c.orgId}/import-profiles`, body: { name: `Policy ${Math.random()}`, mapping: LOGGER_MAPPING } }),
  },
  'GET /api/orgs/:orgId/tests/:testId/readings': { access: LAB_READERS, sample: (c) => ({ path: `/api/orgs/${c.orgId}/tests/${c.lab.approvedTestId}/readings` }) },
  'GET /api/orgs/:orgId/templates/readings.csv': { access: UPLOAD_READERS, sample: (c) => ({ path: `/api/orgs/${c.orgId}/templates/readings.csv` }) },
  'GET /api/orgs/:orgId/templates/readings.xlsx': { access: UPLOAD_READERS, sample: (c) => ({ path: `/api/orgs/${c.orgId}/templates/readings.xlsx` }) },
  'GET /api/orgs/:orgId/settlement-checks': { access: DESIGN_READERS, sample: (c) => ({ path: `/api/orgs/${c.orgId}/settlement-checks?newerParametersApproved=true` }) },
  'GET /api/orgs/:orgId/projects/:projectId/design/records': { access: DESIGN_READERS, sample: (c) => ({ path: `${c.design.base}/design/records?borehole=BH` }) },
  'GET /api/orgs/:orgId/projects/:projectId/design/record-versions/:versionId/trace': {
    access: DESIGN_READERS,
    sample: (c) => ({ path: `${c.design.base}/design/record-versions/${c.design.versionId}/trace` }),
  },
  'GET /api/orgs/:orgId/projects/:projectId/design/set-revisions/:revisionId/trace': {
    access: DESIGN_READERS,
    sample: (c) => ({ path: `${c.design.base}/design/set-revisions/${c.design.setRevisionId}/trace` }),
  },
  'GET /api/orgs/:orgId/projects/:projectId/ground-models': { access: DESIGN_READERS, sample: (c) => ({ path: `${c.design.base}/ground-models` }) },
  'POST /api/orgs/:orgId/projects/:projectId/ground-models': { access: DESIGN_WRITERS, sample: (c) => ({ path: `${c.design.base}/ground-models`, body: c.design.groundModelBody }) },
  'POST /api/orgs/:orgId/projects/:projectId/ground-models/preview': { access: DESIGN_WRITERS, sample: (c) => ({ path: `${c.design.base}/ground-models/preview`, body: c.design.groundModelBody }) },
  'GET /api/orgs/:orgId/projects/:projectId/ground-models/:modelId': { access: DESIGN_READERS, sample: (c) => ({ path: `${c.design.base}/ground-models/${c.design.groundModelId}` }) },
  'POST /api/orgs/:orgId/projects/:projectId/ground-models/:modelId/revisions': {
    access: DESIGN_WRITERS,
    sample: (c) => ({ path: `${c.design.base}/ground-models/${c.design.groundModelId}/revisions`, body: c.design.groundModelBody }),
  },
  'GET /api/orgs/:orgId/projects/:projectId/characteristic-sets': { access: DESIGN_READERS, sample: (c) => ({ path: `${c.design.base}/characteristic-sets` }) },
  'POST /api/orgs/:orgId/projects/:projectId/characteristic-sets': { access: DESIGN_WRITERS, sample: (c) => ({ path: `${c.design.base}/characteristic-sets`, body: c.design.setBody }) },
  'POST /api/orgs/:orgId/projects/:projectId/characteristic-sets/statistics': {
    access: DESIGN_READERS,
    sample: (c) => ({ path: `${c.design.base}/characteristic-sets/statistics`, body: { versionIds: c.design.setBody.versionIds } }),
  },
  'GET /api/orgs/:orgId/projects/:projectId/characteristic-sets/:setId': { access: DESIGN_READERS, sample: (c) => ({ path: `${c.design.base}/characteristic-sets/${c.design.setId}` }) },
  'POST /api/orgs/:orgId/projects/:projectId/characteristic-sets/:setId/revisions': {
    access: DESIGN_WRITERS,
    sample: (c) => ({ path: `${c.design.base}/characteristic-sets/${c.design.setId}/revisions`, body: c.design.setBody }),
  },
  'GET /api/orgs/:orgId/projects/:projectId/settlement-checks': { access: DESIGN_READERS, sample: (c) => ({ path: `${c.design.base}/settlement-checks` }) },
  'POST /api/orgs/:orgId/projects/:projectId/settlement-checks': { access: DESIGN_WRITERS, sample: (c) => ({ path: `${c.design.base}/settlement-checks`, body: c.design.checkBody }) },
  'POST /api/orgs/:orgId/projects/:projectId/settlement-checks/footings/import': {
    access: DESIGN_WRITERS,
    sample: (c) => ({ path: `${c.design.base}/settlement-checks/footings/import`, file: { bytes: Buffer.from('mark,B (m),depth (m),load,x,y\nF1,2,1,500,0,0\n'), name: 'schedule.csv' } }),
  },
  'POST /api/orgs/:orgId/projects/:projectId/settlement-checks/footings/paste': {
    access: DESIGN_WRITERS,
    sample: (c) => ({ path: `${c.design.base}/settlement-checks/footings/paste`, body: { text: 'F1\tsquare\t2\t\t1\tload\t500\tnet\t0\t0' } }),
  },
  'GET /api/orgs/:orgId/projects/:projectId/settlement-checks/:checkId': { access: DESIGN_READERS, sample: (c) => ({ path: `${c.design.checkPath}` }) },
  'PATCH /api/orgs/:orgId/projects/:projectId/settlement-checks/:checkId': { access: DESIGN_WRITERS, sample: (c) => ({ path: `${c.design.checkPath}`, body: { name: 'Renamed check' } }) },
  'POST /api/orgs/:orgId/projects/:projectId/settlement-checks/:checkId/runs': { access: DESIGN_WRITERS, sample: (c) => ({ path: `${c.design.checkPath}/runs` }) },
  'POST /api/orgs/:orgId/projects/:projectId/settlement-checks/:checkId/rerun-with-newer-parameters': {
    access: DESIGN_WRITERS,
    sample: async (c) => ({ path: `${await c.design.newFlaggedCheckPath()}/rerun-with-newer-parameters` }),
  },
  'GET /api/orgs/:orgId/projects/:projectId/settlement-checks/:checkId/revisions/:revision': { access: DESIGN_READERS, sample: (c) => ({ path: `${c.design.checkPath}/revisions/1` }) },
  'GET /api/orgs/:orgId/projects/:projectId/settlement-checks/:checkId/revisions/:revision/result': { access: DESIGN_READERS, sample: (c) => ({ path: `${c.design.checkPath}/revisions/1/result` }) },
  'GET /api/orgs/:orgId/projects/:projectId/settlement-checks/:checkId/revisions/:revision/footings/:footingId': {
    access: DESIGN_READERS,
    sample: (c) => ({ path: `${c.design.checkPath}/revisions/1/footings/F1` }),
  },
  'GET /api/orgs/:orgId/projects/:projectId/settlement-checks/:checkId/revisions/:revision/workbook.xlsx': {
    access: DESIGN_READERS,
    sample: (c) => ({ path: `${c.design.checkPath}/revisions/1/workbook.xlsx` }),
  },
  'GET /api/orgs/:orgId/projects/:projectId/settlement-checks/:checkId/compare': { access: DESIGN_READERS, sample: (c) => ({ path: `${c.design.checkPath}/compare?a=1&b=1` }) },
  'POST /api/orgs/:orgId/projects/:projectId/settlement-checks/:checkId/sizing': {
    access: DESIGN_WRITERS,
    sample: (c) => ({ path: `${c.design.checkPath}/sizing`, body: { footingId: 'F1', target: 'settlement', targetTotalMm: 25 } }),
  },
  'POST /api/orgs/:orgId/projects/:projectId/settlement-checks/:checkId/sizing/apply': {
    access: DESIGN_WRITERS,
    sample: (c) => ({ path: `${c.design.checkPath}/sizing/apply`, body: { footingId: 'F1', widthM: 2.2 } }),
  },
  // Issued settlement checks: a designer of the project issues a revision once (and asks again for a failed print);
  // design readers and the project's clients read what was issued.
  'GET /api/orgs/:orgId/projects/:projectId/issued-checks': {
    access: ['admin', 'lab_manager', 'designer', 'client'],
    sample: (c) => ({ path: `${c.design.base}/issued-checks` }),
  },
  'POST /api/orgs/:orgId/projects/:projectId/settlement-checks/:checkId/revisions/:revision/issue': {
    access: ['designer'],
    sample: async (c) => ({ path: `${await c.design.newRevisionPath()}/issue` }),
  },
  'GET /api/orgs/:orgId/projects/:projectId/settlement-checks/:checkId/revisions/:revision/report': {
    access: ['admin', 'lab_manager', 'designer', 'client'],
    sample: async (c) => ({ path: `${await c.design.issuedRevisionPath()}/report` }),
  },
  'GET /api/orgs/:orgId/projects/:projectId/settlement-checks/:checkId/revisions/:revision/report/pdf': {
    access: ['admin', 'lab_manager', 'designer', 'client'],
    sample: async (c) => ({ path: `${await c.design.issuedRevisionPath()}/report/pdf` }),
  },
  'POST /api/orgs/:orgId/projects/:projectId/settlement-checks/:checkId/revisions/:revision/report/retry': {
    access: ['designer'],
    sample: async (c) => ({ path: `${await c.design.newFailedIssuedRevisionPath()}/report/retry` }),
  },
  // Issued reports and exports: everyone who reads soil records (within their project scope), retry by lab managers only.
  'GET /api/orgs/:orgId/soil-records/:recordId/versions/:version/report': {
    access: ['admin', 'technician', 'lab_manager', 'designer', 'client'],
    sample: (c) => ({ path: `/api/orgs/${c.orgId}/soil-records/${c.lab.recordId}/versions/1/report` }),
  },
  'GET /api/orgs/:orgId/soil-records/:recordId/versions/:version/report/pdf': {
    access: ['admin', 'technician', 'lab_manager', 'designer', 'client'],
    sample: async (c) => {
      await c.lab.issueReport();
      return { path: `/api/orgs/${c.orgId}/soil-records/${c.lab.recordId}/versions/1/report/pdf` };
    },
  },
  'POST /api/orgs/:orgId/soil-records/:recordId/versions/:version/report/retry': {
    access: ['lab_manager'],
    sample: async (c) => ({ path: `/api/orgs/${c.orgId}/soil-records/${await c.lab.newFailedReportRecordId()}/versions/1/report/retry` }),
  },
  'GET /api/orgs/:orgId/projects/:projectId/parameters.xlsx': {
    access: ['admin', 'technician', 'lab_manager', 'designer', 'client'],
    sample: (c) => ({ path: `/api/orgs/${c.orgId}/projects/${c.lab.approvedProjectId}/parameters.xlsx` }),
  },
  'GET /api/orgs/:orgId/soil-records/:recordId/versions/:version/data.xlsx': {
    access: ['admin', 'technician', 'lab_manager', 'designer', 'client'],
    sample: (c) => ({ path: `/api/orgs/${c.orgId}/soil-records/${c.lab.recordId}/versions/1/data.xlsx` }),
  },
  'GET /api/orgs/:orgId/tests/:testId/data.xlsx': {
    access: ['admin', 'technician', 'lab_manager', 'designer'],
    sample: (c) => ({ path: `/api/orgs/${c.orgId}/tests/${c.lab.approvedTestId}/data.xlsx` }),
  },
};

/** A new upload row like the one behind a fixture test's readings (same stored object). */
async function copyOfUpload(testId: string): Promise<string> {
  const [row] = (await dataSource.query(
    `INSERT INTO uploads (organisation_id, test_id, object_key, original_name, sha256, size_bytes, detected_type, status, uploaded_by_id)
     SELECT organisation_id, test_id, object_key, original_name, sha256, size_bytes, detected_type, 'failed', uploaded_by_id
       FROM uploads WHERE id = $1 RETURNING id`,
    [await uploadOf(testId)],
  )) as Array<{ id: string }>;
  if (!row) throw new Error(`could not copy the upload of test ${testId}`);
  return row.id;
}

/** The upload behind a fixture test's readings. */
async function uploadOf(testId: string): Promise<string> {
  const [row] = (await dataSource.query('SELECT id FROM uploads WHERE test_id = $1 ORDER BY created_at LIMIT 1', [testId])) as Array<{ id: string }>;
  if (!row) throw new Error(`no upload for test ${testId}`);
  return row.id;
}

describe('route policies', () => {
  it('when the app is built, then every registered route declares its access', () => {
    const routes = listRoutes(app);
    expect(routes.length).toBeGreaterThan(10);
    const undeclared = routes.filter((route) => route.access === undefined).map((r) => `${r.method} ${r.path}`);
    expect(undeclared).toEqual([]);
  });

  it('when the app is built, then every API route is in the role table with the access the table specifies', () => {
    const declared = Object.fromEntries(
      listRoutes(app)
        .filter((route) => route.path.startsWith('/api/'))
        .map((route) => [`${route.method} ${route.path}`, route.access]),
    );
    const specified = Object.fromEntries(Object.entries(SPEC).map(([key, row]) => [key, row.access]));
    expect(declared).toEqual(specified);
  });
});

/**
 * Who calls: a member holding one role, a member holding two (a small lab's head, or a
 * technician who also designs), a signed-in user of another organisation, or nobody.
 */
type Persona = Role | 'admin+lab_manager' | 'technician+designer' | 'outsider' | 'anonymous';

/** The roles each member persona holds; the combined ones are let in where either role is. */
const HELD: Record<Exclude<Persona, 'outsider' | 'anonymous'>, readonly Role[]> = {
  admin: ['admin'],
  technician: ['technician'],
  lab_manager: ['lab_manager'],
  designer: ['designer'],
  client: ['client'],
  'admin+lab_manager': ['admin', 'lab_manager'],
  'technician+designer': ['technician', 'designer'],
};

async function userIdOf(email: string): Promise<string> {
  const [row] = (await dataSource.query('SELECT id FROM users WHERE email = $1', [email])) as Array<{ id: string }>;
  if (!row) throw new Error(`no user ${email}`);
  return row.id;
}

/** Lab records for the lab routes: a draft test, an analysed one, an approved record, and fresh tests on demand. */
async function labContext(orgId: string, emails: Record<Persona, string>): Promise<Context['lab']> {
  const technicianId = await userIdOf(emails.technician);
  const managerId = await userIdOf(emails.lab_manager);
  // The designer and the client are on every fixture project: the policy is about roles; scope has its own tests.
  const designerId = await userIdOf(emails.designer);
  const clientId = await userIdOf(emails.client);
  const onProject = { designerIds: [designerId] };
  const shared = async <T extends LabFixture>(fixture: T): Promise<T> => {
    await placeOnProject(orgId, fixture.projectId, clientId, 'client');
    return fixture;
  };
  const draft = await shared(await draftTest(orgId, technicianId, onProject));
  const analysed = await shared(await analysedTest(orgId, technicianId, onProject));
  const approved = await shared(await submittedTest(orgId, technicianId, onProject));
  const { recordId } = await approveTest(orgId, approved.testId, { id: managerId, name: 'Policy manager' }, null);
  const designerJob = await jobRuns.create({ organisationId: orgId, kind: 'policy-check', createdById: designerId });
  const generate = async (testId: string, options: { executablePath?: string } = {}) => {
    const [report] = (await dataSource.query('SELECT id, job_run_id FROM issued_reports WHERE organisation_id = $1 AND test_id = $2', [orgId, testId])) as Array<{ id: string; job_run_id: string }>;
    if (!report) throw new Error(`no report queued for test ${testId}`);
    await generateReport({ orgId, reportId: report.id, jobRunId: report.job_run_id }, options);
  };
  let issued: Promise<void> | undefined;
  return {
    technicianId,
    draft,
    analysed,
    designerJobId: designerJob.id,
    recordId,
    approvedTestId: approved.testId,
    approvedProjectId: approved.projectId,
    issueReport: () => (issued ??= generate(approved.testId)),
    newFailedReportRecordId: async () => {
      const { testId } = await submittedTest(orgId, technicianId, onProject);
      const outcome = await approveTest(orgId, testId, { id: managerId, name: 'Policy manager' }, null);
      await generate(testId, { executablePath: '/nonexistent/chromium' });
      return outcome.recordId;
    },
    newAnalysedTestId: async () => (await analysedTest(orgId, technicianId, onProject)).testId,
    newSubmittedTestId: async () => (await submittedTest(orgId, technicianId, onProject)).testId,
  };
}
const PERSONAS: Persona[] = [...ROLES, 'admin+lab_manager', 'technician+designer', 'outsider', 'anonymous'];

/** What the guard must answer for this persona under this access, or 'allowed'. */
function expectedOutcome(access: Access, persona: Persona): 'allowed' | 401 | 403 | 404 {
  if (access === 'public') return 'allowed';
  if (persona === 'anonymous') return 401;
  if (access === 'signed-in') return 'allowed';
  if (persona === 'outsider') return 404;
  return HELD[persona].some((role) => access.includes(role)) ? 'allowed' : 403;
}

describe('every role on every route', () => {
  const emails = {} as Record<Persona, string>;
  const browsers = {} as Record<Persona, Browser>;
  let ctx: Context;

  beforeAll(async () => {
    const admin = await signUpAdmin(app, 'policy-admin');
    const outsider = await signUpAdmin(app, 'policy-outsider');
    browsers.admin = admin.browser;
    emails.admin = admin.email;
    browsers.outsider = outsider.browser;
    emails.outsider = outsider.email;
    browsers.anonymous = await openBrowser(app);
    for (const persona of ['technician', 'lab_manager', 'designer', 'client', 'admin+lab_manager', 'technician+designer'] as const) {
      emails[persona] = (await createMember(admin.orgId, HELD[persona])).email;
      browsers[persona] = await signedInBrowser(app, emails[persona]);
    }
    ctx = {
      orgId: admin.orgId,
      adminId: admin.session.user.id,
      newMemberId: async () => (await createMember(admin.orgId, 'client', 'target')).userId,
      newInvitationId: async () => {
        const row = await dataSource.getRepository(InvitationEntity).save({
          organisationId: admin.orgId,
          email: uniqueEmail('pending'),
          roles: ['client'],
          tokenHash: `hash-${Math.random()}`,
          invitedById: admin.session.user.id,
          expiresAt: new Date(Date.now() + 3600_000),
        });
        return row.id;
      },
      lab: await labContext(admin.orgId, emails),
      design: undefined as unknown as DesignContext,
    };
    ctx.design = await designContext(app, admin.orgId, {
      designerId: await userIdOf(emails.designer),
      designerEmail: emails.designer,
      technicianId: await userIdOf(emails.technician),
      managerId: await userIdOf(emails.lab_manager),
      managerEmail: emails.lab_manager,
      clientId: await userIdOf(emails.client),
    });
  });

  const cases = Object.entries(SPEC).flatMap(([key, row]) => PERSONAS.map((persona) => ({ key, row, persona })));

  it.each(cases)('when $persona calls $key, then the guard answers as the policy says', async ({ key, row, persona }) => {
    const [method, ...rest] = key.split(' ');
    expect(rest.length).toBe(1);
    const browser = row.signsOut
      ? persona === 'anonymous' || persona === 'outsider' || persona === 'admin'
        ? await openBrowser(app)
        : await signedInBrowser(app, emails[persona])
      : browsers[persona];
    const sample = await row.sample(ctx);
    const res =
      method === 'GET'
        ? await browser.get(sample.path)
        : method === 'POST' && sample.file
          ? await browser.agent.post(sample.path).set('x-csrf-token', browser.csrfToken).attach('file', sample.file.bytes, sample.file.name)
          : method === 'POST'
          ? await browser.post(sample.path, sample.body)
          : method === 'PATCH'
            ? await browser.patch(sample.path, sample.body)
            : method === 'PUT'
              ? await browser.agent.put(sample.path).set('x-csrf-token', browser.csrfToken).send(sample.body ?? {})
              : await browser.delete(sample.path);
    const expected = expectedOutcome(row.access, persona);
    if (expected === 'allowed') {
      expect(['unauthenticated', 'forbidden']).not.toContain(res.body?.code);
      expect(res.status).toBeLessThan(500);
      if (Array.isArray(row.access)) expect(res.status).toBeLessThan(300);
    } else {
      expect(res.status).toBe(expected);
      if (expected === 404) expect(res.body.message).toMatch(/organisation/);
    }
  });
});
