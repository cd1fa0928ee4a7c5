import { describe, expect, it } from 'vitest';
import { createApp } from '../../../app.js';
import { dataSource } from '../../../data-source.js';
import { clientAddress, openBrowser, signUpAdmin, TEST_PASSWORD, uniqueEmail } from '../../../testing/browser.js';
import { AuditEntryEntity } from '../../audit/audit-entry.entity.js';

// vitest.config.ts sets SIGN_IN_RATE_LIMIT=5 (per account) and SIGN_IN_CLIENT_RATE_LIMIT=8 (per client).
const ACCOUNT_LIMIT = 5;
const CLIENT_LIMIT = 8;

describe('sign-in rate limits', () => {
  it('when the password is wrong more often than the limit, then 429 says when to try again, even with the right password', async () => {
    const app = createApp();
    const { email } = await signUpAdmin(app, 'hammered');
    const browser = await openBrowser(app);
    for (let i = 0; i < ACCOUNT_LIMIT; i += 1) {
      await browser.post('/api/auth/sign-in', { email, password: `wrong-${i}` }).expect(401);
    }
    const blocked = await browser.post('/api/auth/sign-in', { email, password: TEST_PASSWORD }).expect(429);
    expect(blocked.body).toEqual({
      code: 'rate_limited',
      message: 'Too many failed sign-in attempts for this e-mail address. Try again in 15 minutes, or reset your password.',
    });
    const failures = await dataSource
      .getRepository(AuditEntryEntity)
      .createQueryBuilder('e')
      .where("e.action = 'auth.sign_in_failed' AND e.details->>'email' = :email", { email })
      .getCount();
    expect(failures).toBe(ACCOUNT_LIMIT);
  });

  it('when one account is locked out, then another account from the same client can still sign in', async () => {
    const app = createApp();
    const locked = await signUpAdmin(app, 'locked');
    const other = await signUpAdmin(app, 'unaffected');
    const browser = await openBrowser(app);
    for (let i = 0; i <= ACCOUNT_LIMIT; i += 1) await browser.post('/api/auth/sign-in', { email: locked.email, password: 'wrong-password' });
    await browser.post('/api/auth/sign-in', { email: other.email, password: TEST_PASSWORD }).expect(200);
  });

  it('when sign-ins succeed many times, then they do not count towards the limit', async () => {
    const app = createApp();
    const { email } = await signUpAdmin(app, 'regular');
    const browser = await openBrowser(app);
    for (let i = 0; i < ACCOUNT_LIMIT + 2; i += 1) await browser.post('/api/auth/sign-in', { email, password: TEST_PASSWORD }).expect(200);
  });

  it('when one client tries one password on many addresses (spraying), then it is stopped after the client limit, also for a real account', async () => {
    const app = createApp();
    const { email } = await signUpAdmin(app, 'sprayed');
    const sprayer = await openBrowser(app);
    for (let i = 0; i < CLIENT_LIMIT; i += 1) {
      await sprayer.post('/api/auth/sign-in', { email: uniqueEmail(`spray-${i}`), password: 'Summer2026!!' }).expect(401);
    }
    const blocked = await sprayer.post('/api/auth/sign-in', { email, password: TEST_PASSWORD }).expect(429);
    expect(blocked.body.message).toBe('Too many failed sign-in attempts from your network. Try again in 15 minutes.');
    // Another client is not affected.
    await (await openBrowser(app)).post('/api/auth/sign-in', { email, password: TEST_PASSWORD }).expect(200);
  });

  it('when two API processes serve one client, then they share the counts (kept in PostgreSQL, not in each process)', async () => {
    const first = createApp();
    const second = createApp();
    const { email } = await signUpAdmin(first, 'two-processes');
    const address = clientAddress();
    const onFirst = await openBrowser(first, address);
    const onSecond = await openBrowser(second, address);
    for (let i = 0; i < ACCOUNT_LIMIT; i += 1) {
      await (i % 2 === 0 ? onFirst : onSecond).post('/api/auth/sign-in', { email, password: `wrong-${i}` }).expect(401);
    }
    await onSecond.post('/api/auth/sign-in', { email, password: TEST_PASSWORD }).expect(429);
    await onFirst.post('/api/auth/sign-in', { email, password: TEST_PASSWORD }).expect(429);
  });

  it('when no proxy is configured, then a client rotating X-Forwarded-For is still one client and is stopped', async () => {
    const app = createApp({ trustProxy: false });
    const { email } = await signUpAdmin(app, 'rotating');
    for (let i = 0; i < CLIENT_LIMIT; i += 1) {
      const pretending = await openBrowser(app, clientAddress());
      await pretending.post('/api/auth/sign-in', { email: uniqueEmail(`rotate-${i}`), password: 'Summer2026!!' }).expect(401);
    }
    const res = await (await openBrowser(app, clientAddress())).post('/api/auth/sign-in', { email, password: TEST_PASSWORD });
    expect(res.status).toBe(429);
    expect(res.body.message).toBe('Too many failed sign-in attempts from your network. Try again in 15 minutes.');
  });
});

describe('passwords longer than bcrypt reads', () => {
  it('when a sign-up password is over 72 bytes, then 400 names the field; one that shares its first 72 bytes with the real password never signs in', async () => {
    const app = createApp();
    const browser = await openBrowser(app);
    const tooLong = await browser.post('/api/auth/sign-up', { name: 'Long', email: uniqueEmail('long'), password: 'é'.repeat(40), organisationName: 'Long Org' }).expect(400);
    expect(tooLong.body.issues).toEqual([{ path: 'password', message: expect.stringMatching(/^Use a password of at most 72 bytes/) }]);

    const password = 'x'.repeat(72);
    const { email } = await signUpAdmin(app, 'seventy-two', password);
    await browser.post('/api/auth/sign-in', { email, password: `${password}anything-after` }).expect(401);
    await browser.post('/api/auth/sign-in', { email, password }).expect(200);
  });
});
