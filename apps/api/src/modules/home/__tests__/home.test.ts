import type { AuditEntry, HomeOverview } from '@porestack/types';
import { describe, expect, it } from 'vitest';
import { createApp } from '../../../app.js';
import { createMember, signedInBrowser, signUpAdmin, uniqueEmail } from '../../../testing/browser.js';
import { analysedTest, approvedTest, draftTest, placeOnProject, submittedTest, uploadKnownReadings } from '../../../testing/lab-fixtures.js';
import { jobRuns } from '../../job-runs/job-runs.service.js';
import { requestChanges } from '../../reviews/reviews.service.js';

const app = createApp();

describe('home pages', () => {
  it('when each role opens the home page, then it holds that role’s section only, from what that role may read', async () => {
    const admin = await signUpAdmin(app, 'home-admin');
    const orgId = admin.orgId;
    const tech = await createMember(orgId, 'technician', 'home-tech');
    const otherTech = await createMember(orgId, 'technician', 'home-other-tech');
    const manager = await createMember(orgId, 'lab_manager', 'home-manager');
    const designer = await createMember(orgId, 'designer', 'home-designer');
    const client = await createMember(orgId, 'client', 'home-client');

    const approved = await approvedTest(orgId, tech.userId, manager.userId, { designerIds: [designer.userId] });
    const draft = await draftTest(orgId, tech.userId, { onSampleOf: approved });
    const analysed = await analysedTest(orgId, tech.userId, { onSampleOf: approved });
    const submitted = await submittedTest(orgId, tech.userId, { onSampleOf: approved });
    const returned = await submittedTest(orgId, tech.userId, { onSampleOf: approved });
    await requestChanges(orgId, returned.testId, { id: manager.userId, name: 'Home manager' }, 'Recheck the final water content.');
    const failing = await draftTest(orgId, tech.userId, { onSampleOf: approved });
    const { analysisJobId } = await uploadKnownReadings(orgId, failing.testId, tech.userId);
    await jobRuns.update(analysisJobId, { state: 'failed', message: 'The specimen has no dry mass.' });
    const notTheirs = await draftTest(orgId, otherTech.userId);
    const elsewhere = await approvedTest(orgId, otherTech.userId, manager.userId);
    await placeOnProject(orgId, approved.projectId, client.userId, 'client');
    await admin.browser.post(`/api/orgs/${orgId}/invitations`, { email: uniqueEmail('home-pending'), roles: ['technician'] }).expect(201);
    const both = await createMember(orgId, ['technician', 'designer'], 'home-both');
    await placeOnProject(orgId, elsewhere.projectId, both.userId, 'designer');
    await admin.browser.patch(`/api/orgs/${orgId}/projects/${approved.projectId}`, { siteName: 'North yard' }).expect(200);

    const homeOf = async (email: string) => (await (await signedInBrowser(app, email)).get(`/api/orgs/${orgId}/home`).expect(200)).body as HomeOverview;

    const technician = await homeOf(tech.email);
    expect([technician.labManager, technician.designer, technician.client, technician.admin]).toEqual([null, null, null, null]);
    // One test in each status: the failing one has its readings in (readings_uploaded) and its analysis failed.
    expect(technician.technician?.countsByStatus).toEqual({ draft: 1, readings_uploaded: 1, analysed: 1, submitted: 1, approved: 1, changes_requested: 1 });
    expect(technician.technician?.waiting.map((w) => [w.testId, w.reason, w.detail])).toEqual([
      [failing.testId, 'analysis_failed', 'The specimen has no dry mass.'],
      [returned.testId, 'changes_requested', 'Recheck the final water content.'],
      [analysed.testId, 'ready_to_submit', null],
      [draft.testId, 'needs_readings', null],
    ]);
    expect(JSON.stringify(technician)).not.toContain(notTheirs.testId);

    const labManager = await homeOf(manager.email);
    expect(labManager.labManager?.reviewQueue.map((q) => q.testId)).toEqual([submitted.testId]);
    expect(labManager.labManager?.recentApprovals.map((a) => a.testId)).toEqual([elsewhere.testId, approved.testId]);
    expect(labManager.labManager?.stuckTests.map((s) => [s.testId, s.message])).toEqual([[failing.testId, 'The specimen has no dry mass.']]);

    const designerHome = await homeOf(designer.email);
    expect(designerHome.designer?.projects.map((p) => p.id)).toEqual([approved.projectId]);

    const clientHome = await homeOf(client.email);
    expect(clientHome.client?.projects.map((p) => p.id)).toEqual([approved.projectId]);
    expect(clientHome.client?.recentResults.map((r) => [r.testId, r.version])).toEqual([[approved.testId, 1]]);
    expect(JSON.stringify(clientHome)).not.toContain(elsewhere.testId);

    const adminHome = await homeOf(admin.email);
    // Seven members; the one holding technician and designer counts under both roles.
    expect(adminHome.admin?.memberTotal).toBe(7);
    expect(adminHome.admin?.memberCounts).toEqual({ admin: 1, technician: 3, lab_manager: 1, designer: 2, client: 1 });
    expect(adminHome.admin?.pendingInvitations.map((i) => i.roles)).toEqual([['technician']]);

    // A member holding two roles gets both sections: their own tests (none) and the project they design.
    const bothHome = await homeOf(both.email);
    expect(bothHome.technician?.waiting).toEqual([]);
    expect(bothHome.designer?.projects.map((p) => p.id)).toEqual([elsewhere.projectId]);
    expect([bothHome.labManager, bothHome.client, bothHome.admin]).toEqual([null, null, null]);
    const edit = adminHome.admin?.recentActivity.find((e) => e.action === 'project.updated') as AuditEntry;
    expect(edit.objectLabel).toMatch(/^FX-.* Fixture project/);
    expect(edit.details['changes']).toEqual([{ field: 'siteName', from: '', to: 'North yard' }]);
  });

  it('when a lab worker edits a test, then the activity log names the test and each field old → new, and the technician by name', async () => {
    const admin = await signUpAdmin(app, 'home-audit');
    const tech = await createMember(admin.orgId, 'technician', 'home-audit-tech');
    const manager = await createMember(admin.orgId, 'lab_manager', 'home-audit-manager');
    const colleague = await createMember(admin.orgId, 'technician', 'home-audit-colleague');
    const fixture = await draftTest(admin.orgId, tech.userId);
    const browser = await signedInBrowser(app, manager.email);
    await browser.patch(`/api/orgs/${admin.orgId}/tests/${fixture.testId}`, { apparatusName: 'Frame 3', technicianId: colleague.userId }).expect(200);
    const log = (await admin.browser.get(`/api/orgs/${admin.orgId}/audit`).expect(200)).body as AuditEntry[];
    const edit = log.find((e) => e.action === 'test.updated');
    expect(edit?.objectLabel).toMatch(/^T-/);
    expect(edit?.details['changes']).toEqual([
      { field: 'technician', from: 'Test home-audit-tech', to: 'Test home-audit-colleague' },
      { field: 'apparatusName', from: 'Frame 2', to: 'Frame 3' },
    ]);
  });

  it('when a member of another organisation asks for this home page, then 404', async () => {
    const a = await signUpAdmin(app, 'home-a');
    const b = await signUpAdmin(app, 'home-b');
    await b.browser.get(`/api/orgs/${a.orgId}/home`).expect(404);
  });
});
