import type { AuditEntry, Member } from '@porestack/types';
import { describe, expect, it } from 'vitest';
import { createApp } from '../../../app.js';
import { createMember, signedInBrowser, signUpAdmin, uniqueEmail } from '../../../testing/browser.js';

const app = createApp();

describe('members', () => {
  it('when an admin changes a technician to lab manager, then the member list and the audit log show it', async () => {
    const admin = await signUpAdmin(app, 'role-changer');
    const tech = await createMember(admin.orgId, 'technician');
    const res = await admin.browser.patch(`/api/orgs/${admin.orgId}/members/${tech.userId}`, { roles: ['lab_manager'] }).expect(200);
    expect((res.body as Member).roles).toEqual(['lab_manager']);
    const audit = (await admin.browser.get(`/api/orgs/${admin.orgId}/audit`).expect(200)).body as AuditEntry[];
    expect(audit[0]).toMatchObject({
      action: 'member.role_changed',
      actorName: 'Test role-changer',
      objectId: tech.userId,
      details: { from: ['technician'], to: ['lab_manager'] },
    });
  });

  it('when an admin gives a technician the lab manager role as well, then the member holds both and is let in where either is', async () => {
    const admin = await signUpAdmin(app, 'adds-role');
    const tech = await createMember(admin.orgId, 'technician');
    const res = await admin.browser.patch(`/api/orgs/${admin.orgId}/members/${tech.userId}`, { roles: ['lab_manager', 'technician', 'lab_manager'] }).expect(200);
    expect((res.body as Member).roles).toEqual(['technician', 'lab_manager']);
    const browser = await signedInBrowser(app, tech.email);
    const session = await browser.get('/api/auth/session').expect(200);
    expect(session.body.memberships).toEqual([{ organisationId: admin.orgId, organisationName: 'Org of adds-role', roles: ['technician', 'lab_manager'] }]);
    await browser.get(`/api/orgs/${admin.orgId}/review-queue`).expect(200);
    await browser.get(`/api/orgs/${admin.orgId}/templates/readings.csv`).expect(200);
    await browser.get(`/api/orgs/${admin.orgId}/members`).expect(403);
  });

  it('when a member holding none of a route’s roles calls it, then 403 names every role they hold', async () => {
    const admin = await signUpAdmin(app, 'names-roles');
    const member = await createMember(admin.orgId, ['designer', 'client']);
    const browser = await signedInBrowser(app, member.email);
    const res = await browser.get(`/api/orgs/${admin.orgId}/members`).expect(403);
    expect(res.body.message).toBe(
      'Your roles in Org of names-roles (Designer and Client) cannot do this; it needs one of: Administrator. Ask an administrator of the organisation if you need it.',
    );
  });

  it('when an admin sends no roles or an unknown one, then 400 names the field and nothing changes', async () => {
    const admin = await signUpAdmin(app, 'bad-roles');
    const tech = await createMember(admin.orgId, 'technician');
    const path = `/api/orgs/${admin.orgId}/members/${tech.userId}`;
    const empty = await admin.browser.patch(path, { roles: [] }).expect(400);
    expect(empty.body.issues).toEqual([{ path: 'roles', message: 'Choose at least one role.' }]);
    const unknown = await admin.browser.patch(path, { roles: ['owner'] }).expect(400);
    expect(unknown.body.issues[0].path).toBe('roles.0');
    const members = (await admin.browser.get(`/api/orgs/${admin.orgId}/members`).expect(200)).body as Member[];
    expect(members.find((m) => m.userId === tech.userId)?.roles).toEqual(['technician']);
  });

  it('when the only admin takes the lab manager role for herself, then she holds both and may open the review queue', async () => {
    const admin = await signUpAdmin(app, 'one-person-lab');
    const path = `/api/orgs/${admin.orgId}/members/${admin.session.user.id}`;
    await admin.browser.get(`/api/orgs/${admin.orgId}/review-queue`).expect(403);
    const res = await admin.browser.patch(path, { roles: ['admin', 'lab_manager'] }).expect(200);
    expect((res.body as Member).roles).toEqual(['admin', 'lab_manager']);
    await admin.browser.get(`/api/orgs/${admin.orgId}/review-queue`).expect(200);
    await admin.browser.get(`/api/orgs/${admin.orgId}/members`).expect(200);
  });

  it('when the only admin is demoted or removed, then 409 last_admin says to appoint another admin first', async () => {
    const admin = await signUpAdmin(app, 'sole-admin');
    const path = `/api/orgs/${admin.orgId}/members/${admin.session.user.id}`;
    const demote = await admin.browser.patch(path, { roles: ['client'] }).expect(409);
    expect(demote.body.code).toBe('last_admin');
    expect(demote.body.message).toMatch(/Make another member an administrator first/);
    await admin.browser.patch(path, { roles: ['lab_manager'] }).expect(409);
    await admin.browser.delete(path).expect(409);
  });

  it('when there is a second admin, then the first may step down', async () => {
    const admin = await signUpAdmin(app, 'stepping-down');
    await createMember(admin.orgId, 'admin', 'successor');
    await admin.browser.patch(`/api/orgs/${admin.orgId}/members/${admin.session.user.id}`, { roles: ['designer'] }).expect(200);
    await admin.browser.get(`/api/orgs/${admin.orgId}/members`).expect(403);
  });

  it('when there is another admin, then an admin may not add a role to herself (403 says whom to ask), but the other admin may', async () => {
    const admin = await signUpAdmin(app, 'self-grant');
    const other = await createMember(admin.orgId, 'admin', 'colleague');
    const path = `/api/orgs/${admin.orgId}/members/${admin.session.user.id}`;
    const res = await admin.browser.patch(path, { roles: ['admin', 'lab_manager'] }).expect(403);
    expect(res.body).toMatchObject({ code: 'forbidden', message: expect.stringContaining('Ask one of them to add it') });
    const colleague = await signedInBrowser(app, other.email);
    const granted = await colleague.patch(path, { roles: ['admin', 'lab_manager'] }).expect(200);
    expect((granted.body as Member).roles).toEqual(['admin', 'lab_manager']);
  });

  it('when an admin removes a client, then the client loses access to the organisation', async () => {
    const admin = await signUpAdmin(app, 'remover');
    const client = await createMember(admin.orgId, 'client');
    const clientBrowser = await signedInBrowser(app, client.email);
    await admin.browser.delete(`/api/orgs/${admin.orgId}/members/${client.userId}`).expect(204);
    const session = await clientBrowser.get('/api/auth/session').expect(200);
    expect(session.body.memberships).toEqual([]);
    const members = (await admin.browser.get(`/api/orgs/${admin.orgId}/members`).expect(200)).body as Member[];
    expect(members.map((m) => m.userId)).not.toContain(client.userId);
  });

  it('when an admin names a user who is not a member, then 404 not_found', async () => {
    const admin = await signUpAdmin(app, 'typo');
    const stranger = await signUpAdmin(app, 'stranger');
    await admin.browser.patch(`/api/orgs/${admin.orgId}/members/${stranger.session.user.id}`, { roles: ['client'] }).expect(404);
    await admin.browser.delete(`/api/orgs/${admin.orgId}/members/not-a-uuid`).expect(404);
  });
});

describe('tenant isolation', () => {
  it('when an admin of another organisation asks for this org’s members, invitations or audit, then 404 exactly as for a missing org', async () => {
    const owner = await signUpAdmin(app, 'owner');
    const other = await signUpAdmin(app, 'other-admin');
    const missing = await other.browser.get('/api/orgs/00000000-0000-4000-8000-000000000000/members').expect(404);
    for (const path of ['members', 'invitations', 'audit']) {
      const res = await other.browser.get(`/api/orgs/${owner.orgId}/${path}`).expect(404);
      expect(res.body).toEqual(missing.body);
    }
  });

  it('when an admin of another organisation changes, removes or invites in this org, then 404 and nothing changes', async () => {
    const owner = await signUpAdmin(app, 'target-org');
    const tech = await createMember(owner.orgId, 'technician');
    const other = await signUpAdmin(app, 'intruder');
    await other.browser.patch(`/api/orgs/${owner.orgId}/members/${tech.userId}`, { roles: ['admin'] }).expect(404);
    await other.browser.delete(`/api/orgs/${owner.orgId}/members/${tech.userId}`).expect(404);
    await other.browser.post(`/api/orgs/${owner.orgId}/invitations`, { email: uniqueEmail('x'), roles: ['admin'] }).expect(404);
    const members = (await owner.browser.get(`/api/orgs/${owner.orgId}/members`).expect(200)).body as Member[];
    expect(members.find((m) => m.userId === tech.userId)?.roles).toEqual(['technician']);
    expect((await owner.browser.get(`/api/orgs/${owner.orgId}/invitations`).expect(200)).body).toEqual([]);
  });

  it('when an admin withdraws an invitation of another organisation through their own org, then 404 and it stays pending', async () => {
    const owner = await signUpAdmin(app, 'inv-owner');
    const created = await owner.browser.post(`/api/orgs/${owner.orgId}/invitations`, { email: uniqueEmail('p'), roles: ['client'] }).expect(201);
    const other = await signUpAdmin(app, 'inv-intruder');
    await other.browser.delete(`/api/orgs/${other.orgId}/invitations/${created.body.id}`).expect(404);
    const pending = await owner.browser.get(`/api/orgs/${owner.orgId}/invitations`).expect(200);
    expect(pending.body.map((i: { id: string }) => i.id)).toEqual([created.body.id]);
  });

  it('when a technician of another organisation asks for this org’s members, then 404', async () => {
    const owner = await signUpAdmin(app, 'tech-owner');
    const otherOrg = await signUpAdmin(app, 'tech-other');
    const tech = await createMember(otherOrg.orgId, 'technician');
    const browser = await signedInBrowser(app, tech.email);
    await browser.get(`/api/orgs/${owner.orgId}/members`).expect(404);
  });
});

describe('audit log', () => {
  it('when an admin signs up, invites, and a role changes, then the audit lists those events newest first, only of this org', async () => {
    const admin = await signUpAdmin(app, 'audited');
    const other = await signUpAdmin(app, 'unrelated');
    await other.browser.post(`/api/orgs/${other.orgId}/invitations`, { email: uniqueEmail('elsewhere'), roles: ['client'] }).expect(201);
    const invited = await admin.browser.post(`/api/orgs/${admin.orgId}/invitations`, { email: uniqueEmail('aud'), roles: ['client'] }).expect(201);
    await admin.browser.delete(`/api/orgs/${admin.orgId}/invitations/${invited.body.id}`).expect(204);
    const entries = (await admin.browser.get(`/api/orgs/${admin.orgId}/audit`).expect(200)).body as AuditEntry[];
    expect(entries.map((e) => e.action)).toEqual(['invitation.revoked', 'invitation.created', 'organisation.created']);
    expect(entries.every((e) => e.actorName === 'Test audited')).toBe(true);
  });
});
