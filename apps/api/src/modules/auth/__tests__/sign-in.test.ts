import { describe, expect, it } from 'vitest';
import { createApp } from '../../../app.js';
import { dataSource } from '../../../data-source.js';
import { openBrowser, signUpAdmin, TEST_PASSWORD, uniqueEmail } from '../../../testing/browser.js';
import { UserEntity } from '../../users/user.entity.js';

const app = createApp();

describe('sign-up, sign-in, session, sign-out', () => {
  it('when a person signs up, then they are admin of a new organisation and signed in', async () => {
    const { browser, session, email } = await signUpAdmin(app, 'founder');
    expect(session.user.email).toBe(email);
    expect(session.memberships).toEqual([{ organisationId: expect.any(String), organisationName: 'Org of founder', roles: ['admin'] }]);
    const res = await browser.get('/api/auth/session').expect(200);
    expect(res.body).toEqual(session);
    const stored = await dataSource.getRepository(UserEntity).findOneByOrFail({ email });
    expect(stored.passwordHash).toMatch(/^\$2[ab]\$10\$/);
  });

  it('when the session cookie is set, then it is httpOnly and SameSite=Lax', async () => {
    const browser = await openBrowser(app);
    const res = await browser
      .post('/api/auth/sign-up', { name: 'Cookie Check', email: uniqueEmail('cookie'), password: TEST_PASSWORD, organisationName: 'Cookie Org' })
      .expect(201);
    const cookie = ([] as string[]).concat(res.headers['set-cookie'] ?? []).find((c) => c.startsWith('porestack_session='));
    expect(cookie).toMatch(/HttpOnly/);
    expect(cookie).toMatch(/SameSite=Lax/);
  });

  it('when someone signs up with an e-mail that has an account, then 409 email_taken and no second user', async () => {
    const { email } = await signUpAdmin(app, 'taken');
    const browser = await openBrowser(app);
    const res = await browser
      .post('/api/auth/sign-up', { name: 'Second', email: email.toUpperCase(), password: TEST_PASSWORD, organisationName: 'Another Org' })
      .expect(409);
    expect(res.body.code).toBe('email_taken');
    expect(res.body.message).toMatch(/already exists/);
    expect(await dataSource.getRepository(UserEntity).countBy({ email })).toBe(1);
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
});
