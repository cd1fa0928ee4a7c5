import type { Invitation, InvitationPreview, Role, Session } from '@porestack/types';
import { describe, expect, it } from 'vitest';
import { createApp } from '../../../app.js';
import { dataSource } from '../../../data-source.js';
import { openBrowser, signUpAdmin, TEST_PASSWORD, uniqueEmail, type SignedUpAdmin } from '../../../testing/browser.js';
import { linkIn, waitForMail } from '../../../testing/mail-inbox.js';
import { withRefusingMailServer } from '../../../testing/refusing-smtp.js';
import { UserEntity } from '../../users/user.entity.js';
import { InvitationEntity } from '../invitation.entity.js';

const app = createApp();
const PUBLIC_URL = process.env['PUBLIC_URL'] ?? '';

/** Invites through the API and returns the token from the link in the mail that arrived. */
async function inviteAndReadMail(admin: SignedUpAdmin, email: string, roles: Role[] = ['technician']): Promise<{ token: string; invitation: Invitation }> {
  const res = await admin.browser.post(`/api/orgs/${admin.orgId}/invitations`, { email, roles }).expect(201);
  const mail = await waitForMail(email);
  expect(mail.subject).toMatch(/invited you to Org of/);
  expect(mail.text).toMatch(/as (Technician|Designer|Client|Lab manager|Administrator)/);
  const link = linkIn(mail, `${PUBLIC_URL}/invitations/`);
  return { token: decodeURIComponent(link.slice(`${PUBLIC_URL}/invitations/`.length)), invitation: res.body as Invitation };
}

describe('invitations', () => {
  it('when an admin invites a technician, then the mail link opens a preview and accepting creates the account and the membership', async () => {
    const admin = await signUpAdmin(app, 'inviter');
    const email = uniqueEmail('new-tech');
    const { token, invitation } = await inviteAndReadMail(admin, email);
    expect(invitation).toMatchObject({ email, roles: ['technician'], invitedBy: 'Test inviter' });

    const invitee = await openBrowser(app);
    const preview = (await invitee.get(`/api/invitations/${token}`).expect(200)).body as InvitationPreview;
    expect(preview).toMatchObject({ organisationName: 'Org of inviter', email, roles: ['technician'], accountExists: false });

    const accepted = await invitee.post(`/api/invitations/${token}/accept`, { name: 'Nell Tech', password: TEST_PASSWORD }).expect(200);
    const session = accepted.body as Session;
    expect(session.user).toMatchObject({ email, name: 'Nell Tech' });
    expect(session.memberships).toEqual([{ organisationId: admin.orgId, organisationName: 'Org of inviter', roles: ['technician'] }]);
    await invitee.get('/api/auth/session').expect(200);

    const members = await admin.browser.get(`/api/orgs/${admin.orgId}/members`).expect(200);
    expect(members.body.map((m: { email: string; roles: string[] }) => [m.email, m.roles])).toEqual([
      [admin.email, ['admin']],
      [email, ['technician']],
    ]);
    expect((await admin.browser.get(`/api/orgs/${admin.orgId}/invitations`).expect(200)).body).toEqual([]);
  });

  it('when a person with an account accepts with their password, then the membership is added to their account', async () => {
    const admin = await signUpAdmin(app, 'second-org');
    const existing = await signUpAdmin(app, 'has-account');
    const { token } = await inviteAndReadMail(admin, existing.email, ['designer']);
    const invitee = await openBrowser(app);
    const preview = await invitee.get(`/api/invitations/${token}`).expect(200);
    expect(preview.body.accountExists).toBe(true);

    const wrong = await invitee.post(`/api/invitations/${token}/accept`, { password: 'not-my-password' }).expect(401);
    expect(wrong.body.code).toBe('invalid_credentials');

    const res = await invitee.post(`/api/invitations/${token}/accept`, { password: TEST_PASSWORD }).expect(200);
    expect((res.body as Session).memberships.map((m) => m.roles)).toEqual([['admin'], ['designer']]);
    expect(await dataSource.getRepository(UserEntity).countBy({ email: existing.email })).toBe(1);
  });

  it('when an admin invites with two roles, then the mail names both and the new member holds both, in the usual order', async () => {
    const admin = await signUpAdmin(app, 'two-roles');
    const email = uniqueEmail('manager-and-tech');
    const { token, invitation } = await inviteAndReadMail(admin, email, ['lab_manager', 'technician']);
    expect(invitation.roles).toEqual(['technician', 'lab_manager']);
    const mail = await waitForMail(email);
    expect(mail.text).toContain('as Technician and Lab manager.');
    const invitee = await openBrowser(app);
    const accepted = await invitee.post(`/api/invitations/${token}/accept`, { name: 'Two Hats', password: TEST_PASSWORD }).expect(200);
    expect((accepted.body as Session).memberships).toEqual([{ organisationId: admin.orgId, organisationName: 'Org of two-roles', roles: ['technician', 'lab_manager'] }]);
  });

  it('when an admin invites with no role, then 400 names the roles field', async () => {
    const admin = await signUpAdmin(app, 'no-roles');
    const res = await admin.browser.post(`/api/orgs/${admin.orgId}/invitations`, { email: uniqueEmail('roleless'), roles: [] }).expect(400);
    expect(res.body.issues).toEqual([{ path: 'roles', message: 'Choose at least one role.' }]);
  });

  it('when an accepted invitation link is used again, then 410 token_used', async () => {
    const admin = await signUpAdmin(app, 'reuse');
    const { token } = await inviteAndReadMail(admin, uniqueEmail('once'));
    const invitee = await openBrowser(app);
    await invitee.post(`/api/invitations/${token}/accept`, { name: 'Once Only', password: TEST_PASSWORD }).expect(200);
    const res = await (await openBrowser(app)).post(`/api/invitations/${token}/accept`, { name: 'Twice', password: TEST_PASSWORD }).expect(410);
    expect(res.body.code).toBe('token_used');
  });

  it('when an invitation is older than 7 days, then preview and accept answer 410 token_expired and no account is made', async () => {
    const admin = await signUpAdmin(app, 'stale');
    const email = uniqueEmail('too-late');
    const { token, invitation } = await inviteAndReadMail(admin, email);
    await dataSource.getRepository(InvitationEntity).update({ id: invitation.id }, { expiresAt: new Date(Date.now() - 1000) });
    const invitee = await openBrowser(app);
    const preview = await invitee.get(`/api/invitations/${token}`).expect(410);
    expect(preview.body.code).toBe('token_expired');
    expect(preview.body.message).toMatch(/send a new one/);
    await invitee.post(`/api/invitations/${token}/accept`, { name: 'Late', password: TEST_PASSWORD }).expect(410);
    expect(await dataSource.getRepository(UserEntity).countBy({ email })).toBe(0);
  });

  it('when an admin withdraws an invitation, then it leaves the pending list and its link stops working', async () => {
    const admin = await signUpAdmin(app, 'withdrawer');
    const { token, invitation } = await inviteAndReadMail(admin, uniqueEmail('withdrawn'));
    const pending = await admin.browser.get(`/api/orgs/${admin.orgId}/invitations`).expect(200);
    expect(pending.body.map((i: Invitation) => i.id)).toEqual([invitation.id]);
    await admin.browser.delete(`/api/orgs/${admin.orgId}/invitations/${invitation.id}`).expect(204);
    expect((await admin.browser.get(`/api/orgs/${admin.orgId}/invitations`).expect(200)).body).toEqual([]);
    const res = await (await openBrowser(app)).get(`/api/invitations/${token}`).expect(400);
    expect(res.body.message).toMatch(/withdrawn/);
  });

  it('when a new account accepts without a name or with a short password, then 400 names the field and nothing is created', async () => {
    const admin = await signUpAdmin(app, 'fields');
    const email = uniqueEmail('nameless');
    const { token } = await inviteAndReadMail(admin, email);
    const invitee = await openBrowser(app);
    const noName = await invitee.post(`/api/invitations/${token}/accept`, { password: TEST_PASSWORD }).expect(400);
    expect(noName.body.issues).toEqual([{ path: 'name', message: 'Enter your name to create your account.' }]);
    const short = await invitee.post(`/api/invitations/${token}/accept`, { name: 'Short', password: 'short' }).expect(400);
    expect(short.body.issues[0].path).toBe('password');
    expect(await dataSource.getRepository(UserEntity).countBy({ email })).toBe(0);
  });

  it('when an admin invites someone who is already a member, then 409 already_member', async () => {
    const admin = await signUpAdmin(app, 'dup-invite');
    const res = await admin.browser.post(`/api/orgs/${admin.orgId}/invitations`, { email: admin.email, roles: ['client'] }).expect(409);
    expect(res.body.code).toBe('already_member');
  });

  it('when the mail server refuses the invitation e-mail, then 503 says so and no invitation is kept', async () => {
    const admin = await signUpAdmin(app, 'mail-down');
    const res = await withRefusingMailServer(() =>
      admin.browser.post(`/api/orgs/${admin.orgId}/invitations`, { email: uniqueEmail('unreached'), roles: ['technician'] }).expect(503),
    );
    expect(res.body).toMatchObject({ code: 'service_unavailable', message: expect.stringContaining('could not be sent, so no invitation was made') });
    expect(await dataSource.getRepository(InvitationEntity).countBy({ organisationId: admin.orgId })).toBe(0);
    expect((await admin.browser.get(`/api/orgs/${admin.orgId}/invitations`).expect(200)).body).toEqual([]);
  });

  it('when a link token is made up, then 400 token_invalid', async () => {
    const res = await (await openBrowser(app)).get('/api/invitations/made-up-token').expect(400);
    expect(res.body.code).toBe('token_invalid');
  });
});
