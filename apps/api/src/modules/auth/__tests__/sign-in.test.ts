import { randomUUID } from 'node:crypto';
import jwt from 'jsonwebtoken';
import request from 'supertest';
import { describe, expect, it } from 'vitest';
import { env } from '../../../config/env.js';
import { createApp } from '../../../app.js';
import { dataSource } from '../../../data-source.js';
import { openBrowser, signUpAdmin, TEST_PASSWORD, uniqueEmail, type Browser } from '../../../testing/browser.js';
import { UserEntity } from '../../users/user.entity.js';

const app = createApp();

describe('sign-up, sign-in, session, sign-out', () => {
  it('when an account is made, then its person is admin of a new organisation and can sign in', async () => {
    const { browser, session, email } = await signUpAdmin(app, 'founder');
    expect(session.user.email).toBe(email);
    expect(session.memberships).toEqual([{ organisationId: expect.any(String), organisationName: 'Org of founder', roles: ['admin'] }]);
    const res = await browser.get('/api/auth/session').expect(200);
    expect(res.body).toEqual(session);
    const stored = await dataSource.getRepository(UserEntity).findOneByOrFail({ email });
    expect(stored.passwordHash).toMatch(/^\$2[ab]\$10\$/);
  });

  it('when the session cookie is set at sign-in, then it is httpOnly and SameSite=Lax', async () => {
    const { email } = await signUpAdmin(app, 'cookie');
    const res = await (await openBrowser(app)).post('/api/auth/sign-in', { email, password: TEST_PASSWORD }).expect(200);
    const cookie = ([] as string[]).concat(res.headers['set-cookie'] ?? []).find((c) => c.startsWith('porestack_session='));
    expect(cookie).toMatch(/HttpOnly/);
    expect(cookie).toMatch(/SameSite=Lax/);
  });

  it('when a member signs in with the right password, then the session lists their memberships', async () => {
    const { email, session } = await signUpAdmin(app, 'returning');
    const browser = await openBrowser(app);
    const res = await browser.post('/api/auth/sign-in', { email, password: TEST_PASSWORD }).expect(200);
    expect(res.body).toEqual(session);
    await browser.get('/api/auth/session').expect(200);
  });

  it('when the password is wrong or the e-mail unknown, then 401 with the same message', async () => {
    const { email } = await signUpAdmin(app, 'wrongpw');
    const browser = await openBrowser(app);
    const wrong = await browser.post('/api/auth/sign-in', { email, password: 'not-the-password' }).expect(401);
    const unknown = await browser.post('/api/auth/sign-in', { email: uniqueEmail('nobody'), password: 'whatever-123' }).expect(401);
    expect(wrong.body.code).toBe('invalid_credentials');
    expect(unknown.body).toEqual(wrong.body);
  });

  it('when a signed-in user signs out, then the session route answers 401', async () => {
    const { browser } = await signUpAdmin(app, 'leaver');
    await browser.post('/api/auth/sign-out').expect(204);
    const res = await browser.get('/api/auth/session').expect(401);
    expect(res.body.code).toBe('unauthenticated');
  });

  it('when nobody is signed in, then the session route answers 401 with a message to sign in', async () => {
    const browser = await openBrowser(app);
    const res = await browser.get('/api/auth/session').expect(401);
    expect(res.body.message).toMatch(/Sign in/);
  });

  it('when a session cookie copied before sign-out is sent again afterwards, then 401: sign-out ended the session on the server', async () => {
    const { browser } = await signUpAdmin(app, 'copied');
    const copied = sessionCookieOf(browser);
    await browser.post('/api/auth/sign-out').expect(204);
    const res = await request(app).get('/api/auth/session').set('Cookie', `porestack_session=${copied}`).expect(401);
    expect(res.body.code).toBe('unauthenticated');
  });

  it('when a cookie is signed with the secret but has no expiry, a subject that is not a uuid, or an unknown session, then 401 (never 500)', async () => {
    const { browser, session } = await signUpAdmin(app, 'forged');
    const sid = (jwt.decode(sessionCookieOf(browser)) as { sid: string }).sid;
    const secret = env().JWT_SECRET;
    const forged = [
      jwt.sign({ sub: session.user.id, sid, ver: 0 }, secret, { algorithm: 'HS256' }),
      jwt.sign({ sub: 'admin', sid, ver: 0 }, secret, { algorithm: 'HS256', expiresIn: '1h' }),
      jwt.sign({ sub: "1' OR '1'='1", sid: 'x', ver: 0 }, secret, { algorithm: 'HS256', expiresIn: '1h' }),
      jwt.sign({ sub: session.user.id, sid: randomUUID(), ver: 0 }, secret, { algorithm: 'HS256', expiresIn: '1h' }),
      jwt.sign({ sub: session.user.id, ver: 0 }, secret, { algorithm: 'HS256', expiresIn: '1h' }),
    ];
    for (const token of forged) {
      const res = await request(app).get('/api/auth/session').set('Cookie', `porestack_session=${token}`);
      expect(res.status).toBe(401);
      expect(res.body.code).toBe('unauthenticated');
    }
  });

  it('when a cookie that was accepted before passes its expiry, then 401: its expiry is checked on every request', async () => {
    const { browser, session } = await signUpAdmin(app, 'expiring');
    const sid = (jwt.decode(sessionCookieOf(browser)) as { sid: string }).sid;
    const token = jwt.sign({ sub: session.user.id, sid, ver: 0 }, env().JWT_SECRET, { algorithm: 'HS256', expiresIn: 2 });
    await request(app).get('/api/auth/session').set('Cookie', `porestack_session=${token}`).expect(200);
    await new Promise((resolve) => setTimeout(resolve, 2_100));
    const res = await request(app).get('/api/auth/session').set('Cookie', `porestack_session=${token}`).expect(401);
    expect(res.body.code).toBe('unauthenticated');
  });
});

function sessionCookieOf(browser: Browser): string {
  const cookie = browser.agent.jar.getCookie('porestack_session', { domain: '127.0.0.1', path: '/', secure: false, script: false });
  if (!cookie) throw new Error('no session cookie in the browser');
  return cookie.value;
}
