import { describe, expect, it } from 'vitest';
import { createApp } from '../../../app.js';
import { dataSource } from '../../../data-source.js';
import { openBrowser, signUpAdmin, TEST_PASSWORD, uniqueEmail } from '../../../testing/browser.js';
import { linkIn, mailsTo, waitForMail } from '../../../testing/mail-inbox.js';
import { withRefusingMailServer } from '../../../testing/refusing-smtp.js';
import { hashToken } from '../one-time-token.js';
import { PasswordResetTokenEntity } from '../password-reset-token.entity.js';

const app = createApp();
const PUBLIC_URL = process.env['PUBLIC_URL'] ?? '';
const NEW_PASSWORD = 'a-brand-new-password';

async function requestResetLink(email: string, count = 1): Promise<string> {
  const browser = await openBrowser(app);
  await browser.post('/api/auth/password-reset/request', { email }).expect(202);
  const mail = await waitForMail(email, count);
  expect(mail.subject).toBe('Reset your Porestack password');
  expect(mail.html).toContain('Choose a new password');
  const link = linkIn(mail, `${PUBLIC_URL}/reset-password?token=`);
  return new URL(link).searchParams.get('token') ?? '';
}

describe('password reset', () => {
  it('when a member asks for a reset, then the e-mailed link sets a new password that signs in, and the old one stops working', async () => {
    const { email, browser: oldSession } = await signUpAdmin(app, 'forgetful');
    const token = await requestResetLink(email);
    const browser = await openBrowser(app);
    await browser.post('/api/auth/password-reset/confirm', { token, password: NEW_PASSWORD }).expect(204);
    await browser.post('/api/auth/sign-in', { email, password: TEST_PASSWORD }).expect(401);
    await browser.post('/api/auth/sign-in', { email, password: NEW_PASSWORD }).expect(200);
    // Sessions signed in before the reset end with it.
    await oldSession.get('/api/auth/session').expect(401);
  });

  it('when the same reset link is used twice, then the second answers 410 token_used', async () => {
    const { email } = await signUpAdmin(app, 'twice');
    const token = await requestResetLink(email);
    const browser = await openBrowser(app);
    await browser.post('/api/auth/password-reset/confirm', { token, password: NEW_PASSWORD }).expect(204);
    const res = await browser.post('/api/auth/password-reset/confirm', { token, password: 'yet-another-password' }).expect(410);
    expect(res.body.code).toBe('token_used');
    expect(res.body.message).toMatch(/already been used/);
  });

  it('when a reset link is older than 60 minutes, then 410 token_expired and the password is unchanged', async () => {
    const { email } = await signUpAdmin(app, 'late');
    const token = await requestResetLink(email);
    await dataSource
      .getRepository(PasswordResetTokenEntity)
      .update({ tokenHash: hashToken(token) }, { expiresAt: new Date(Date.now() - 1000) });
    const browser = await openBrowser(app);
    const res = await browser.post('/api/auth/password-reset/confirm', { token, password: NEW_PASSWORD }).expect(410);
    expect(res.body.code).toBe('token_expired');
    expect(res.body.message).toMatch(/expired.*new link/);
    await browser.post('/api/auth/sign-in', { email, password: TEST_PASSWORD }).expect(200);
  });

  it('when a newer link was used, then an older link of the same account no longer works', async () => {
    const { email } = await signUpAdmin(app, 'two-links');
    const older = await requestResetLink(email, 1);
    const newer = await requestResetLink(email, 2);
    const browser = await openBrowser(app);
    await browser.post('/api/auth/password-reset/confirm', { token: newer, password: NEW_PASSWORD }).expect(204);
    await browser.post('/api/auth/password-reset/confirm', { token: older, password: 'yet-another-password' }).expect(410);
  });

  it('when the token is made up, then 400 token_invalid', async () => {
    const browser = await openBrowser(app);
    const res = await browser.post('/api/auth/password-reset/confirm', { token: 'made-up-token-value', password: NEW_PASSWORD }).expect(400);
    expect(res.body.code).toBe('token_invalid');
  });

  it('when the e-mail has no account, then 202 all the same and no mail is sent', async () => {
    const email = uniqueEmail('stranger');
    const browser = await openBrowser(app);
    const res = await browser.post('/api/auth/password-reset/request', { email }).expect(202);
    expect(res.body.message).toMatch(/If an account uses this e-mail address/);
    await new Promise((resolve) => setTimeout(resolve, 300));
    expect(await mailsTo(email)).toEqual([]);
  });

  it('when the mail server refuses the reset e-mail of a real account, then 202 exactly as for an unknown address', async () => {
    const admin = await signUpAdmin(app, 'reset-mail-down');
    const stranger = await withRefusingMailServer(async () => {
      const browser = await openBrowser(app);
      const known = await browser.post('/api/auth/password-reset/request', { email: admin.email }).expect(202);
      const unknown = await browser.post('/api/auth/password-reset/request', { email: uniqueEmail('nobody') }).expect(202);
      expect(known.body).toEqual(unknown.body);
      return unknown.body;
    });
    expect(stranger.message).toMatch(/If an account uses this e-mail address/);
  });
});
