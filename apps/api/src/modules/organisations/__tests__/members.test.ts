import type { AuditEntry, Member } from '@porestack/types';
import { describe, expect, it } from 'vitest';
import { createApp } from '../../../app.js';
import { createMember, signedInBrowser, signUpAdmin, uniqueEmail } from '../../../testing/browser.js';

const app = createApp();

describe('members', () => {
  it('when an admin changes a technician to lab manager, then the member list and the audit log show it', async () => {
    const admin = await signUpAdmin(app, 'role-changer');
    const tech = await createMember(admin.orgId, 'technician');
    const res = await admin.browser.patch(`/api/orgs/${admin.orgId}/members/${tech.userId}`, { role: 'lab_manager' }).expect(200);
    expect((res.body as Member).role).toBe('lab_manager');
    const audit = (await admin.browser.get(`/api/orgs/${admin.orgId}/audit`).expect(200)).body as AuditEntry[];
    expect(audit[0]).toMatchObject({
      action: 'member.role_changed',
      actorName: 'Test role-changer',
      objectId: tech.userId,
      details: { from: 'technician', to: 'lab_manager' },
    });
  });

  it('when the only admin is demoted or removed, then 409 last_admin says to appoint another admin first', async () => {
    const admin = await signUpAdmin(app, 'sole-admin');
    const path = `/api/orgs/${admin.orgId}/members/${admin.session.user.id}`;
    const demote = await admin.browser.patch(path, { role: 'client' }).expect(409);
    expect(demote.body.code).toBe('last_admin');
    expect(demote.body.message).toMatch(/Make another member an administrator first/);
    await admin.browser.delete(path).expect(409);
  });

  it('when there is a second admin, then the first may step down', async () => {
    const admin = await signUpAdmin(app, 'stepping-down');
    await createMember(admin.orgId, 'admin', 'successor');
    await admin.browser.patch(`/api/orgs/${admin.orgId}/members/${admin.session.user.id}`, { role: 'designer' }).expect(200);
    await admin.browser.get(`/api/orgs/${admin.orgId}/members`).expect(403);
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
    await admin.browser.patch(`/api/orgs/${admin.orgId}/members/${stranger.session.user.id}`, { role: 'client' }).expect(404);
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
    await other.browser.patch(`/api/orgs/${owner.orgId}/members/${tech.userId}`, { role: 'admin' }).expect(404);
    await other.browser.delete(`/api/orgs/${owner.orgId}/members/${tech.userId}`).expect(404);
    await other.browser.post(`/api/orgs/${owner.orgId}/invitations`, { email: uniqueEmail('x'), role: 'admin' }).expect(404);
    const members = (await owner.browser.get(`/api/orgs/${owner.orgId}/members`).expect(200)).body as Member[];
    expect(members.find((m) => m.userId === tech.userId)?.role).toBe('technician');
    expect((await owner.browser.get(`/api/orgs/${owner.orgId}/invitations`).expect(200)).body).toEqual([]);
  });

  it('when an admin withdraws an invitation of another organisation through their own org, then 404 and it stays pending', async () => {
    const owner = await signUpAdmin(app, 'inv-owner');
    const created = await owner.browser.post(`/api/orgs/${owner.orgId}/invitations`, { email: uniqueEmail('p'), role: 'client' }).expect(201);
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
    await other.browser.post(`/api/orgs/${other.orgId}/invitations`, { email: uniqueEmail('elsewhere'), role: 'client' }).expect(201);
    const invited = await admin.browser.post(`/api/orgs/${admin.orgId}/invitations`, { email: uniqueEmail('aud'), role: 'client' }).expect(201);
    await admin.browser.delete(`/api/orgs/${admin.orgId}/invitations/${invited.body.id}`).expect(204);
    const entries = (await admin.browser.get(`/api/orgs/${admin.orgId}/audit`).expect(200)).body as AuditEntry[];
    expect(entries.map((e) => e.action)).toEqual(['invitation.revoked', 'invitation.created', 'organisation.created']);
    expect(entries.every((e) => e.actorName === 'Test audited')).toBe(true);
  });
});
