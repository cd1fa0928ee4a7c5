import type { Session } from '@porestack/types';
import type PgBoss from 'pg-boss';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createApp } from '../../../app.js';
import { dataSource } from '../../../data-source.js';
import { authMailJob } from '../../../jobs/auth-mail.job.js';
import { stopJobQueue } from '../../../jobs/boss.js';
import { openBrowser, signUpAdmin, TEST_PASSWORD, uniqueEmail } from '../../../testing/browser.js';
import { startWorker } from '../../../testing/import-harness.js';
import { linkIn, waitForMail } from '../../../testing/mail-inbox.js';
import { UserEntity } from '../../users/user.entity.js';

const app = createApp();
const PUBLIC_URL = process.env['PUBLIC_URL'] ?? '';
let worker: PgBoss;

beforeAll(async () => {
  worker = await startWorker([authMailJob]);
});

afterAll(async () => {
  await worker.stop({ graceful: true, wait: true });
  await stopJobQueue();
});

const form = (email: string, organisationName = 'Harbour Clay Lab') => ({ name: 'New Founder', email, password: TEST_PASSWORD, organisationName });

describe('signing up through the e-mailed link', () => {
  it('when a person signs up, then 202 says a link was sent; the link creates the account and organisation, signs in, and works once', async () => {
    const email = uniqueEmail('founder');
    const browser = await openBrowser(app);
    const sent = await browser.post('/api/auth/sign-up', form(email)).expect(202);
    expect(sent.body.message).toBe(`We sent a link to ${email}. Open it within 24 hours to finish creating your account (check the spam folder if it does not arrive).`);
    expect(await dataSource.getRepository(UserEntity).countBy({ email })).toBe(0);

    const mail = await waitForMail(email);
    expect(mail.subject).toBe('Finish creating your Porestack account');
    const token = new URL(linkIn(mail, `${PUBLIC_URL}/finish-sign-up?token=`)).searchParams.get('token') ?? '';
    const confirmed = await browser.post('/api/auth/sign-up/confirm', { token }).expect(201);
    const session = confirmed.body as Session;
    expect(session.user.email).toBe(email);
    expect(session.memberships).toEqual([{ organisationId: expect.any(String), organisationName: 'Harbour Clay Lab', roles: ['admin'] }]);
    expect((await browser.get('/api/auth/session').expect(200)).body).toEqual(session);
    const cookie = ([] as string[]).concat(confirmed.headers['set-cookie'] ?? []).find((c) => c.startsWith('porestack_session='));
    expect(cookie).toMatch(/HttpOnly/);
    expect(cookie).toMatch(/SameSite=Lax/);

    const again = await (await openBrowser(app)).post('/api/auth/sign-up/confirm', { token }).expect(410);
    expect(again.body.code).toBe('token_used');
    await (await openBrowser(app)).post('/api/auth/sign-in', { email, password: TEST_PASSWORD }).expect(200);
  });

  it('when someone signs up with an address that has an account, then the answer is the same as for a new one, no second user is made, and the owner is told by mail', async () => {
    const { email } = await signUpAdmin(app, 'taken');
    const browser = await openBrowser(app);
    const taken = await browser.post('/api/auth/sign-up', form(email.toUpperCase(), 'Another Org')).expect(202);
    const fresh = uniqueEmail('fresh');
    const newcomer = await browser.post('/api/auth/sign-up', form(fresh, 'Another Org')).expect(202);
    expect(taken.body.message).toBe(newcomer.body.message.replace(fresh, email));
    expect(Object.keys(taken.body)).toEqual(Object.keys(newcomer.body));

    const mail = await waitForMail(email);
    expect(mail.subject).toBe('You already have a Porestack account');
    expect(mail.text).toContain(`${PUBLIC_URL}/forgot-password`);
    expect(await dataSource.getRepository(UserEntity).countBy({ email })).toBe(1);
  });

  it('when the link is made up or expired, then it says so and nothing is created', async () => {
    const browser = await openBrowser(app);
    expect((await browser.post('/api/auth/sign-up/confirm', { token: 'made-up-token-value' }).expect(400)).body.code).toBe('token_invalid');

    const email = uniqueEmail('late');
    await browser.post('/api/auth/sign-up', form(email)).expect(202);
    const token = new URL(linkIn(await waitForMail(email), `${PUBLIC_URL}/finish-sign-up?token=`)).searchParams.get('token') ?? '';
    await dataSource.query(`UPDATE sign_up_requests SET expires_at = now() - interval '1 second' WHERE email = $1`, [email]);
    const late = await browser.post('/api/auth/sign-up/confirm', { token }).expect(410);
    expect(late.body).toEqual({ code: 'token_expired', message: 'This sign-up link has expired. Sign up again: each link works for 24 hours.' });
    expect(await dataSource.getRepository(UserEntity).countBy({ email })).toBe(0);
  });
});
