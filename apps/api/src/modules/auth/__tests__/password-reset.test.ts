import type PgBoss from 'pg-boss';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createApp } from '../../../app.js';
import { dataSource } from '../../../data-source.js';
import { authMailJob } from '../../../jobs/auth-mail.job.js';
import { stopJobQueue } from '../../../jobs/boss.js';
import { openBrowser, signUpAdmin, TEST_PASSWORD, uniqueEmail } from '../../../testing/browser.js';
import { startWorker } from '../../../testing/import-harness.js';
import { linkIn, mailsTo, waitForMail } from '../../../testing/mail-inbox.js';
import { withRefusingMailServer } from '../../../testing/refusing-smtp.js';
import { hashToken } from '../one-time-token.js';
import { PasswordResetTokenEntity } from '../password-reset-token.entity.js';

const app = createApp();
const PUBLIC_URL = process.env['PUBLIC_URL'] ?? '';
const NEW_PASSWORD = 'a-brand-new-password';
// The reset mail is sent by the worker (so the request answers alike for every address).
let worker: PgBoss;

beforeAll(async () => {
  worker = await startWorker([authMailJob]);
});

afterAll(async () => {
  await worker.stop({ graceful: true, wait: true });
  await stopJobQueue();
});

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

  it('when the mail server refuses the reset e-mail of a real account, then 202 exactly as for an unknown address, and the mail job waits to be tried again', async () => {
    const admin = await signUpAdmin(app, 'reset-mail-down');
    await withRefusingMailServer(async () => {
      const browser = await openBrowser(app);
      const known = await browser.post('/api/auth/password-reset/request', { email: admin.email }).expect(202);
      const unknown = await browser.post('/api/auth/password-reset/request', { email: uniqueEmail('nobody') }).expect(202);
      expect(known.body).toEqual(unknown.body);
      expect(known.body.message).toMatch(/If an account uses this e-mail address/);
      // The worker's attempt is refused by the mail server: the job is kept for another try.
      for (let polls = 0; ; polls += 1) {
        const [job] = (await dataSource.query(`SELECT state FROM pgboss.job WHERE name = 'auth-mail' AND data->>'email' = $1`, [admin.email])) as Array<{ state: string }>;
        if (job?.state === 'retry') break;
        expect(job?.state).not.toBe('completed');
        expect(polls).toBeLessThan(200);
        await new Promise((resolve) => setTimeout(resolve, 50));
      }
    });
    expect(await mailsTo(admin.email)).toEqual([]);
  });

  it('when one address asks for more resets than the limit, then 429, while another address from elsewhere still may', async () => {
    const { email } = await signUpAdmin(app, 'reset-limit');
    for (let i = 0; i < 3; i += 1) await (await openBrowser(app)).post('/api/auth/password-reset/request', { email }).expect(202);
    const blocked = await (await openBrowser(app)).post('/api/auth/password-reset/request', { email }).expect(429);
    expect(blocked.body.message).toBe('Too many password-reset requests. Check your inbox (and spam folder) for the last link, or try again in 60 minutes.');
    await (await openBrowser(app)).post('/api/auth/password-reset/request', { email: uniqueEmail('other') }).expect(202);
  });
});
