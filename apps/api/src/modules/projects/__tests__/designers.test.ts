import type { ProjectDesigner, ProjectDetail } from '@porestack/types';
import { describe, expect, it } from 'vitest';
import { createApp } from '../../../app.js';
import { createMember, signedInBrowser, signUpAdmin } from '../../../testing/browser.js';

const app = createApp();

describe('designers of a project', () => {
  it('when a lab manager lists designers, then only members with the designer role come back, and they can be set on a project', async () => {
    const admin = await signUpAdmin(app, 'designers-admin');
    const manager = await createMember(admin.orgId, 'lab_manager', 'designers-manager');
    const designer = await createMember(admin.orgId, 'designer', 'designers-designer');
    await createMember(admin.orgId, 'technician', 'designers-tech');
    const browser = await signedInBrowser(app, manager.email);

    const listed = (await browser.get(`/api/orgs/${admin.orgId}/designers`).expect(200)).body as ProjectDesigner[];
    expect(listed.map((d) => d.userId)).toEqual([designer.userId]);

    const created = (await browser.post(`/api/orgs/${admin.orgId}/projects`, { name: 'Designer project', reference: `DP-${Date.now()}`, clientName: 'Client' }).expect(201)).body as ProjectDetail;
    const patched = (await browser.patch(`/api/orgs/${admin.orgId}/projects/${created.id}`, { designerIds: [designer.userId] }).expect(200)).body as ProjectDetail;
    expect(patched.designers).toEqual([{ userId: designer.userId, name: listed[0]!.name, email: designer.email }]);
  });

  it('when the designer list is asked for from another organisation, then 404 and nothing leaks', async () => {
    const a = await signUpAdmin(app, 'designers-a');
    await createMember(a.orgId, 'designer', 'designers-a-designer');
    const b = await signUpAdmin(app, 'designers-b');
    const res = await b.browser.get(`/api/orgs/${a.orgId}/designers`);
    expect(res.status).toBe(404);
    expect(JSON.stringify(res.body)).not.toMatch(/designers-a-designer/);
  });

  it('when a designer lists projects, then only the projects they are assigned to come back; another project of the organisation answers 404', async () => {
    const admin = await signUpAdmin(app, 'scope-admin');
    const designer = await createMember(admin.orgId, 'designer', 'scope-designer');
    const theirs = (await admin.browser.post(`/api/orgs/${admin.orgId}/projects`, { name: 'Assigned', reference: `SC-A-${Date.now()}`, clientName: 'Client', designerIds: [designer.userId] }).expect(201))
      .body as ProjectDetail;
    const other = (await admin.browser.post(`/api/orgs/${admin.orgId}/projects`, { name: 'Not assigned', reference: `SC-B-${Date.now()}`, clientName: 'Client' }).expect(201)).body as ProjectDetail;
    const browser = await signedInBrowser(app, designer.email);

    const listed = (await browser.get(`/api/orgs/${admin.orgId}/projects`).expect(200)).body as ProjectDetail[];
    expect(listed.map((p) => p.id)).toEqual([theirs.id]);
    await browser.get(`/api/orgs/${admin.orgId}/projects/${theirs.id}`).expect(200);
    await browser.get(`/api/orgs/${admin.orgId}/projects/${theirs.id}/boreholes`).expect(200);
    await browser.get(`/api/orgs/${admin.orgId}/projects/${other.id}`).expect(404);
    await browser.get(`/api/orgs/${admin.orgId}/projects/${other.id}/boreholes`).expect(404);

    // Lab staff keep the whole organisation.
    const all = (await admin.browser.get(`/api/orgs/${admin.orgId}/projects`).expect(200)).body as ProjectDetail[];
    expect(all.map((p) => p.id).sort()).toEqual([theirs.id, other.id].sort());
  });
});
