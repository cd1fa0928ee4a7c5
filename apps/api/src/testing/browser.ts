import { randomBytes, randomUUID } from 'node:crypto';
import { canonicalRoles, type Role, type Session } from '@porestack/types';
import type { Express } from 'express';
import request from 'supertest';
import { dataSource } from '../data-source.js';
import { MembershipEntity } from '../modules/organisations/membership.entity.js';
import { createAccount } from '../modules/auth/auth.service.js';
import { hashPassword } from '../modules/users/passwords.js';
import { UserEntity } from '../modules/users/user.entity.js';

export const TEST_PASSWORD = 'correct-horse-battery';

/** An e-mail address no other test uses, at a domain that can never receive mail. */
export function uniqueEmail(label: string): string {
  return `${label}-${randomUUID().slice(0, 8)}@example.test`;
}

/**
 * A browser tab against the app: keeps cookies like a browser, fetched the CSRF token
 * once, and sends it on every state-changing request as the web app does.
 */
export interface Browser {
  agent: ReturnType<typeof request.agent>;
  csrfToken: string;
  get(url: string): request.Test;
  post(url: string, body?: object | string): request.Test;
  patch(url: string, body?: object): request.Test;
  delete(url: string): request.Test;
}

/**
 * Each browser is its own client, as if behind the portal's reverse proxy (TRUST_PROXY is
 * loopback in tests): per-client rate limits then count one test's requests, not the suite's.
 */
export function clientAddress(): string {
  const octets = randomBytes(3);
  return `10.${octets[0]}.${octets[1]}.${octets[2]}`;
}

/** `app` is the app in this process, or the base URL of a portal running in another. */
export async function openBrowser(app: Express | string, address = clientAddress()): Promise<Browser> {
  const agent = request.agent(app).set('X-Forwarded-For', address);
  const res = await agent.get('/api/auth/csrf').expect(200);
  const csrfToken = (res.body as { csrfToken: string }).csrfToken;
  return {
    agent,
    csrfToken,
    get: (url) => agent.get(url),
    post: (url, body) => {
      const req = agent.post(url).set('x-csrf-token', csrfToken);
      return typeof body === 'string' ? req.set('content-type', 'application/json').send(body) : req.send(body ?? {});
    },
    patch: (url, body) => agent.patch(url).set('x-csrf-token', csrfToken).send(body ?? {}),
    delete: (url) => agent.delete(url).set('x-csrf-token', csrfToken),
  };
}

export interface SignedUpAdmin {
  browser: Browser;
  session: Session;
  orgId: string;
  email: string;
}

/**
 * A new user who is admin of a new organisation, signed in through the API. The account is
 * made as a confirmed sign-up makes it (createAccount); the e-mailed sign-up itself has its
 * own tests (sign-up.test.ts), which need the mail worker.
 */
export async function signUpAdmin(app: Express, label = 'admin', password = TEST_PASSWORD): Promise<SignedUpAdmin> {
  const email = uniqueEmail(label);
  const passwordHash = password === TEST_PASSWORD ? await (testPasswordHash ??= hashPassword(TEST_PASSWORD)) : await hashPassword(password);
  await createAccount({ name: `Test ${label}`, email, organisationName: `Org of ${label}` }, passwordHash);
  const browser = await openBrowser(app);
  const res = await browser.post('/api/auth/sign-in', { email, password }).expect(200);
  const session = res.body as Session;
  const orgId = session.memberships[0]?.organisationId;
  if (!orgId) throw new Error('sign-in answered without a membership');
  return { browser, session, orgId, email };
}

/** One bcrypt hash of TEST_PASSWORD for every user the tests insert directly. */
let testPasswordHash: Promise<string> | undefined;

/** A user added straight to the database with a role, or several, in `orgId` (faster than an invitation). */
export async function createMember(orgId: string, role: Role | readonly Role[], label: string = [role].flat().join('-')): Promise<{ userId: string; email: string }> {
  const email = uniqueEmail(label);
  const user = await dataSource
    .getRepository(UserEntity)
    .save({ email, name: `Test ${label}`, passwordHash: await (testPasswordHash ??= hashPassword(TEST_PASSWORD)) });
  await dataSource.getRepository(MembershipEntity).insert({ organisationId: orgId, userId: user.id, roles: canonicalRoles([role].flat()) });
  return { userId: user.id, email };
}

/** A browser signed in as `email` (password TEST_PASSWORD). */
export async function signedInBrowser(app: Express | string, email: string): Promise<Browser> {
  const browser = await openBrowser(app);
  await browser.post('/api/auth/sign-in', { email, password: TEST_PASSWORD }).expect(200);
  return browser;
}
