import { describe, expect, it } from 'vitest';
import { createApp } from '../../../app.js';
import { dataSource } from '../../../data-source.js';
import { openBrowser, signUpAdmin, TEST_PASSWORD } from '../../../testing/browser.js';
import { AuditEntryEntity } from '../../audit/audit-entry.entity.js';

// vitest.config.ts sets SIGN_IN_RATE_LIMIT=5.
const LIMIT = 5;

describe('sign-in rate limit', () => {
  it('when the password is wrong more often than the limit, then 429 says when to try again, even with the right password', async () => {
    const app = createApp();
    const { email } = await signUpAdmin(app, 'hammered');
    const browser = await openBrowser(app);
    for (let i = 0; i < LIMIT; i += 1) {
      await browser.post('/api/auth/sign-in', { email, password: `wrong-${i}` }).expect(401);
    }
    const blocked = await browser.post('/api/auth/sign-in', { email, password: TEST_PASSWORD }).expect(429);
    expect(blocked.body.code).toBe('rate_limited');
    expect(blocked.body.message).toMatch(/Try again in 15 minutes/);
    const failures = await dataSource
      .getRepository(AuditEntryEntity)
      .createQueryBuilder('e')
      .where("e.action = 'auth.sign_in_failed' AND e.details->>'email' = :email", { email })
      .getCount();
    expect(failures).toBe(LIMIT);
  });

  it('when one e-mail is locked out, then another account from the same address can still sign in', async () => {
    const app = createApp();
    const locked = await signUpAdmin(app, 'locked');
    const other = await signUpAdmin(app, 'unaffected');
    const browser = await openBrowser(app);
    for (let i = 0; i <= LIMIT; i += 1) await browser.post('/api/auth/sign-in', { email: locked.email, password: 'wrong-password' });
    await browser.post('/api/auth/sign-in', { email: other.email, password: TEST_PASSWORD }).expect(200);
  });

  it('when sign-ins succeed many times, then they do not count towards the limit', async () => {
    const app = createApp();
    const { email } = await signUpAdmin(app, 'regular');
    const browser = await openBrowser(app);
    for (let i = 0; i < LIMIT + 2; i += 1) await browser.post('/api/auth/sign-in', { email, password: TEST_PASSWORD }).expect(200);
  });
});
