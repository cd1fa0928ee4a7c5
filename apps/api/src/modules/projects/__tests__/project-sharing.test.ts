import type { AuditEntry, Invitation, InvitationPreview, ProjectClients, ProjectShareOutcome, ProjectSummary, Session } from '@porestack/types';
import { describe, expect, it } from 'vitest';
import { createApp } from '../../../app.js';
import { env } from '../../../config/env.js';
import { dataSource } from '../../../data-source.js';
import { createMember, openBrowser, signedInBrowser, signUpAdmin, TEST_PASSWORD, uniqueEmail } from '../../../testing/browser.js';
import { linkIn, mailsTo, waitForMail } from '../../../testing/mail-inbox.js';
import { withRefusingMailServer } from '../../../testing/refusing-smtp.js';
import { approvedTest, draftTest, placeOnProject } from '../../../testing/lab-fixtures.js';

const app = createApp();
const publicUrl = () => env().PUBLIC_URL.replace(/\/$/, '');

/** A laboratory with an approved test on a project, a lab manager who shares it and a technician. */
async function lab(label: string) {
  const admin = await signUpAdmin(app, label);
  const technician = await createMember(admin.orgId, 'technician', `${label}-tech`);
  const manager = await createMember(admin.orgId, 'lab_manager', `${label}-manager`);
  const project = await approvedTest(admin.orgId, technician.userId, manager.userId);
  const managerBrowser = await signedInBrowser(app, manager.email);
  const clientsPath = `/api/orgs/${admin.orgId}/projects/${project.projectId}/clients`;
  return { admin, technician, manager, project, managerBrowser, clientsPath };
}

async function projectIdsSeenBy(email: string, orgId: string): Promise<string[]> {
  const browser = await signedInBrowser(app, email);
  return ((await browser.get(`/api/orgs/${orgId}/projects`).expect(200)).body as ProjectSummary[]).map((p) => p.id);
}

async function auditActions(admin: Awaited<ReturnType<typeof signUpAdmin>>): Promise<AuditEntry[]> {
  return (await admin.browser.get(`/api/orgs/${admin.orgId}/audit`).expect(200)).body as AuditEntry[];
}

describe('sharing a project with a client', () => {
  it('when a lab manager shares with a client member, then the client is placed at once, told by e-mail with a link to the project, and it is in the activity log', async () => {
    const { admin, project, managerBrowser, clientsPath } = await lab('share-member');
    const client = await createMember(admin.orgId, 'client', 'share-member-client');
    expect(await projectIdsSeenBy(client.email, admin.orgId)).toEqual([]);

    const outcome = (await managerBrowser.post(clientsPath, { email: client.email.toUpperCase() }).expect(201)).body as ProjectShareOutcome;
    expect(outcome).toMatchObject({ outcome: 'shared', client: { userId: client.userId, email: client.email, sharedByName: 'Test share-member-manager' } });
    const mail = await waitForMail(client.email);
    expect(mail.subject).toMatch(/shared .* with you/);
    expect(linkIn(mail, `${publicUrl()}/orgs/${admin.orgId}/projects/${project.projectId}`)).toBeTruthy();
    expect(await projectIdsSeenBy(client.email, admin.orgId)).toEqual([project.projectId]);

    const listed = (await managerBrowser.get(clientsPath).expect(200)).body as ProjectClients;
    expect(listed.clients.map((c) => c.email)).toEqual([client.email]);
    expect(listed.invitations).toEqual([]);

    const again = await managerBrowser.post(clientsPath, { email: client.email }).expect(400);
    expect(again.body.issues).toEqual([{ path: 'email', message: expect.stringMatching(/already shared/) }]);

    await managerBrowser.delete(`${clientsPath}/${client.userId}`).expect(204);
    expect(await projectIdsSeenBy(client.email, admin.orgId)).toEqual([]);
    const clientBrowser = await signedInBrowser(app, client.email);
    await clientBrowser.get(`/api/orgs/${admin.orgId}/soil-records/${project.recordId}`).expect(404);
    await managerBrowser.delete(`${clientsPath}/${client.userId}`).expect(404);

    const log = await auditActions(admin);
    const shared = log.find((e) => e.action === 'project.shared');
    const withdrawn = log.find((e) => e.action === 'project.share_withdrawn');
    expect(shared).toMatchObject({ actorName: 'Test share-member-manager', objectId: project.projectId, details: { email: client.email } });
    expect(withdrawn).toMatchObject({ actorName: 'Test share-member-manager', objectId: project.projectId, details: { email: client.email } });
  });

  it('when a lab manager shares with a new address, then an invitation mail names the project, and accepting it makes a client who sees that project only', async () => {
    const { admin, project, managerBrowser, clientsPath, technician } = await lab('share-new');
    const other = await draftTest(admin.orgId, technician.userId);
    const email = uniqueEmail('new-client');
    const outcome = (await managerBrowser.post(clientsPath, { email }).expect(201)).body as ProjectShareOutcome;
    expect(outcome).toMatchObject({ outcome: 'invited', invitation: { email, invitedByName: 'Test share-new-manager' } });

    const mail = await waitForMail(email);
    expect(mail.text).toMatch(/as Client/);
    expect(mail.text).toContain('is shared with you');
    const link = linkIn(mail, `${publicUrl()}/invitations/`);
    const token = decodeURIComponent(link.slice(`${publicUrl()}/invitations/`.length));
    const invitee = await openBrowser(app);
    const preview = (await invitee.get(`/api/invitations/${token}`).expect(200)).body as InvitationPreview;
    expect(preview).toMatchObject({ roles: ['client'], accountExists: false, projectNames: [expect.stringMatching(/^Fixture project/)] });
    const listed = (await managerBrowser.get(clientsPath).expect(200)).body as ProjectClients;
    expect(listed.invitations.map((i) => i.email)).toEqual([email]);
    const pending = (await admin.browser.get(`/api/orgs/${admin.orgId}/invitations`).expect(200)).body as Invitation[];
    expect(pending.map((i) => [i.email, i.roles, i.projects.map((p) => p.id)])).toEqual([[email, ['client'], [project.projectId]]]);

    const session = (await invitee.post(`/api/invitations/${token}/accept`, { name: 'Nia Client', password: TEST_PASSWORD }).expect(200)).body as Session;
    expect(session.memberships.map((m) => m.roles)).toEqual([['client']]);
    const seen = ((await invitee.get(`/api/orgs/${admin.orgId}/projects`).expect(200)).body as ProjectSummary[]).map((p) => p.id);
    expect(seen).toEqual([project.projectId]);
    await invitee.get(`/api/orgs/${admin.orgId}/projects/${other.projectId}`).expect(404);
    const afterAccept = (await managerBrowser.get(clientsPath).expect(200)).body as ProjectClients;
    expect(afterAccept.clients.map((c) => [c.email, c.sharedByName])).toEqual([[email, 'Test share-new-manager']]);
    expect(afterAccept.invitations).toEqual([]);
  });

  it('when a second project is shared with someone already invited, then one invitation carries both projects', async () => {
    const { admin, project, managerBrowser, clientsPath, technician } = await lab('share-two');
    const second = await draftTest(admin.orgId, technician.userId);
    const email = uniqueEmail('two-projects');
    await managerBrowser.post(clientsPath, { email }).expect(201);
    await managerBrowser.post(`/api/orgs/${admin.orgId}/projects/${second.projectId}/clients`, { email }).expect(201);
    const pending = (await admin.browser.get(`/api/orgs/${admin.orgId}/invitations`).expect(200)).body as Invitation[];
    expect(pending).toHaveLength(1);
    expect(pending[0]?.projects.map((p) => p.id).sort()).toEqual([project.projectId, second.projectId].sort());
  });

  it('when the share is withdrawn before the invitation is accepted, then the invitation is withdrawn with it and the link no longer works', async () => {
    const { admin, project, managerBrowser, clientsPath } = await lab('share-withdraw');
    const email = uniqueEmail('withdrawn');
    const outcome = (await managerBrowser.post(clientsPath, { email }).expect(201)).body as ProjectShareOutcome;
    if (outcome.outcome !== 'invited') throw new Error('expected an invitation');
    const link = linkIn(await waitForMail(email), `${publicUrl()}/invitations/`);
    const token = decodeURIComponent(link.slice(`${publicUrl()}/invitations/`.length));
    await managerBrowser.delete(`${clientsPath.replace(/clients$/, 'client-invitations')}/${outcome.invitation.invitationId}`).expect(204);
    await managerBrowser.delete(`/api/orgs/${admin.orgId}/projects/${project.projectId}/client-invitations/${outcome.invitation.invitationId}`).expect(404);
    const res = await (await openBrowser(app)).post(`/api/invitations/${token}/accept`, { name: 'Too Late', password: TEST_PASSWORD }).expect(400);
    expect(res.body.code).toBe('token_invalid');
    expect(((await managerBrowser.get(clientsPath).expect(200)).body as ProjectClients).invitations).toEqual([]);
    expect((await auditActions(admin)).map((e) => e.action)).toEqual(expect.arrayContaining(['project.shared', 'project.share_withdrawn', 'invitation.revoked']));
  });

  it('when the address belongs to a designer or lab staff, then 400 naming why, and nothing is shared', async () => {
    const { admin, managerBrowser, clientsPath } = await lab('share-roles');
    const designer = await createMember(admin.orgId, 'designer', 'share-roles-designer');
    const tech = await createMember(admin.orgId, 'technician', 'share-roles-technician');
    const asDesigner = await managerBrowser.post(clientsPath, { email: designer.email }).expect(400);
    expect(asDesigner.body.issues[0].message).toMatch(/as Designer/);
    const asTech = await managerBrowser.post(clientsPath, { email: tech.email }).expect(400);
    expect(asTech.body.issues[0].message).toMatch(/already sees every project/);
    const bad = await managerBrowser.post(clientsPath, { email: 'not-an-address' }).expect(400);
    expect(bad.body.issues[0].path).toBe('email');
    expect(((await managerBrowser.get(clientsPath).expect(200)).body as ProjectClients).clients).toEqual([]);
  });

  it('when the mail server refuses the share e-mail, then 503 and the client is not placed', async () => {
    const { admin, managerBrowser, clientsPath } = await lab('share-refused');
    const client = await createMember(admin.orgId, 'client', 'share-refused-client');
    await withRefusingMailServer(async () => {
      const res = await managerBrowser.post(clientsPath, { email: client.email }).expect(503);
      expect(res.body.code).toBe('service_unavailable');
    });
    expect(((await managerBrowser.get(clientsPath).expect(200)).body as ProjectClients).clients).toEqual([]);
    expect(await mailsTo(client.email)).toEqual([]);
  });

  it('when a technician, a designer, a client or another organisation tries to share, then 403 or 404', async () => {
    const { admin, technician, project, clientsPath } = await lab('share-denied');
    const designer = await createMember(admin.orgId, 'designer');
    const client = await createMember(admin.orgId, 'client');
    for (const email of [technician.email, designer.email, client.email]) {
      const browser = await signedInBrowser(app, email);
      await browser.post(clientsPath, { email: uniqueEmail('x') }).expect(403);
      await browser.get(clientsPath).expect(403);
    }
    const outsider = await signUpAdmin(app, 'share-outsider');
    await outsider.browser.post(clientsPath, { email: uniqueEmail('x') }).expect(404);
    // Another organisation's project id under one's own organisation: 404 too.
    await outsider.browser.post(`/api/orgs/${outsider.orgId}/projects/${project.projectId}/clients`, { email: uniqueEmail('x') }).expect(404);
  });

  it('when the designers list of a shared project is edited, then the clients keep their place; when a client is removed from the organisation, their places go', async () => {
    const { admin, project } = await lab('share-keeps');
    const client = await createMember(admin.orgId, 'client', 'share-keeps-client');
    await placeOnProject(admin.orgId, project.projectId, client.userId, 'client');
    const designer = await createMember(admin.orgId, 'designer', 'share-keeps-designer');
    await admin.browser.patch(`/api/orgs/${admin.orgId}/projects/${project.projectId}`, { designerIds: [designer.userId] }).expect(200);
    expect(await projectIdsSeenBy(client.email, admin.orgId)).toEqual([project.projectId]);
    await admin.browser.delete(`/api/orgs/${admin.orgId}/members/${client.userId}`).expect(204);
    const [left] = (await dataSource.query('SELECT count(*)::int AS n FROM project_members WHERE user_id = $1', [client.userId])) as Array<{ n: number }>;
    expect(left?.n).toBe(0);
  });
});
