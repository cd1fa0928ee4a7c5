import type { Request } from 'express';
import pg from 'pg';
import { afterEach, beforeAll, describe, expect, it, vi } from 'vitest';
import { createApp } from '../../app.js';
import { createMember, openBrowser, signedInBrowser, signUpAdmin, type Browser } from '../../testing/browser.js';
import { authenticate, authenticateInOrg } from '../authenticate.js';
import { SESSION_COOKIE } from '../session-cookie.js';

/**
 * Session checks that arrive together are read from PostgreSQL together (one query per
 * organisation asked for), and each request still gets its own answer: its own user, its own
 * membership, 401 for an ended session, 404 outside its organisations, 403 without the role.
 */
const app = createApp();
let orgA: string;
let orgB: string;
let adminA: Browser;
let adminB: Browser;
let technicianA: Browser;
let clientA: Browser;
let leaver: Browser;
let emails: Record<'adminA' | 'adminB' | 'technicianA', string>;

/** The session cookie a browser holds, as a request object carrying only it. */
function requestOf(browser: Browser): Request {
  const cookie = browser.agent.jar.getCookie(SESSION_COOKIE, { domain: '127.0.0.1', path: '/', secure: false, script: false });
  return { cookies: { [SESSION_COOKIE]: cookie?.value } } as unknown as Request;
}

beforeAll(async () => {
  const a = await signUpAdmin(app, 'batch-admin-a');
  const b = await signUpAdmin(app, 'batch-admin-b');
  orgA = a.orgId;
  orgB = b.orgId;
  adminA = a.browser;
  adminB = b.browser;
  const technician = await createMember(orgA, 'technician', 'batch-tech');
  const client = await createMember(orgA, 'client', 'batch-client');
  const leaving = await createMember(orgA, 'technician', 'batch-leaver');
  technicianA = await signedInBrowser(app, technician.email);
  clientA = await signedInBrowser(app, client.email);
  leaver = await signedInBrowser(app, leaving.email);
  emails = { adminA: a.email, adminB: b.email, technicianA: technician.email };
});

afterEach(() => {
  vi.restoreAllMocks();
});

describe('session checks read together', () => {
  it('when twelve checks for two organisations and none are asked in one turn, then three queries answer each its own', async () => {
    // Every query the pg driver sends in this process, by text: the batched session read selects from unnest(…).
    const sent = vi.spyOn(pg.Client.prototype, 'query');
    const signedOut = await openBrowser(app);
    const ended = requestOf(leaver);
    await leaver.post('/api/auth/sign-out').expect(204);

    const checks = [
      authenticateInOrg(requestOf(technicianA), orgA, ['technician']),
      authenticateInOrg(requestOf(adminB), orgB, ['admin']),
      authenticateInOrg(requestOf(adminA), orgA, ['admin']),
      authenticateInOrg(requestOf(adminB), orgA, ['admin']),
      authenticateInOrg(requestOf(clientA), orgA, ['technician', 'lab_manager']),
      authenticateInOrg(ended, orgA, ['technician']),
      authenticateInOrg(requestOf(technicianA), orgB, ['technician']),
      authenticate(requestOf(adminA)),
      authenticate(requestOf(technicianA)),
      authenticate(ended),
      authenticateInOrg(requestOf(adminA), orgB, ['admin']),
      authenticateInOrg(requestOf(signedOut), orgA, ['admin']),
    ].map((check) => check.then((value) => ({ value }), (error: { code?: string }) => ({ error: error.code })));
    const answers = await Promise.all(checks);

    const sessionQueries = sent.mock.calls.filter(([config]) => typeof config === 'object' && config !== null && String((config as { text?: string }).text).includes('unnest'));
    expect(sessionQueries).toHaveLength(3);

    const userOf = (k: number) => (answers[k] as unknown as { value: { user: { email: string }; tenant?: { orgId: string; roles: string[] } } }).value;
    expect(userOf(0).user.email).toBe(emails.technicianA);
    expect(userOf(0).tenant).toMatchObject({ orgId: orgA, roles: ['technician'] });
    expect(userOf(1).user.email).toBe(emails.adminB);
    expect(userOf(1).tenant).toMatchObject({ orgId: orgB, roles: ['admin'] });
    expect(userOf(2).user.email).toBe(emails.adminA);
    expect(userOf(2).tenant).toMatchObject({ orgId: orgA, roles: ['admin'] });
    expect(answers[3]).toEqual({ error: 'not_found' });
    expect(answers[4]).toEqual({ error: 'forbidden' });
    expect(answers[5]).toEqual({ error: 'unauthenticated' });
    expect(answers[6]).toEqual({ error: 'not_found' });
    expect((answers[7] as unknown as { value: { email: string } }).value.email).toBe(emails.adminA);
    expect((answers[8] as unknown as { value: { email: string } }).value.email).toBe(emails.technicianA);
    expect(answers[9]).toEqual({ error: 'unauthenticated' });
    expect(answers[10]).toEqual({ error: 'not_found' });
    expect(answers[11]).toEqual({ error: 'unauthenticated' });
  });

  it('when forty requests of different people and organisations arrive at once, then each answers as it would alone', async () => {
    const asked = [
      { browser: technicianA, url: `/api/orgs/${orgA}/tests`, status: 200 },
      { browser: adminB, url: `/api/orgs/${orgB}/tests`, status: 200 },
      { browser: adminB, url: `/api/orgs/${orgA}/tests`, status: 404 },
      { browser: clientA, url: `/api/orgs/${orgA}/tests`, status: 403 },
      { browser: adminA, url: '/api/auth/session', status: 200 },
    ];
    const rounds = Array.from({ length: 8 }, () => asked).flat();
    const answers = await Promise.all(rounds.map(({ browser, url }) => browser.get(url)));
    expect(answers.map((res) => res.status)).toEqual(rounds.map(({ status }) => status));
    const sessions = answers.filter((_res, k) => rounds[k]?.url === '/api/auth/session');
    for (const res of sessions) expect((res.body as { user: { email: string } }).user.email).toBe(emails.adminA);
  });
});
