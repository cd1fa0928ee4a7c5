import { ROLES, type Role } from '@porestack/types';
import { beforeAll, describe, expect, it } from 'vitest';
import { createApp } from '../../app.js';
import { dataSource } from '../../data-source.js';
import { InvitationEntity } from '../../modules/invitations/invitation.entity.js';
import { openBrowser, signedInBrowser, signUpAdmin, createMember, uniqueEmail, type Browser } from '../../testing/browser.js';
import { listRoutes, type Access } from '../routes.js';

const app = createApp();

/**
 * The access every route must have: the specification, written independently of the
 * routers. A new route without a row here fails the first test below.
 */
interface Sample {
  path: string;
  body?: object;
}
interface Context {
  orgId: string;
  adminId: string;
  newMemberId: () => Promise<string>;
  newInvitationId: () => Promise<string>;
}
const ADMIN: readonly Role[] = ['admin'];
const SPEC: Record<string, { access: Access; sample: (ctx: Context) => Promise<Sample> | Sample; signsOut?: true }> = {
  'GET /api/health': { access: 'public', sample: () => ({ path: '/api/health' }) },
  'GET /api/auth/csrf': { access: 'public', sample: () => ({ path: '/api/auth/csrf' }) },
  'POST /api/auth/sign-up': { access: 'public', sample: () => ({ path: '/api/auth/sign-up', body: {} }) },
  'POST /api/auth/sign-in': { access: 'public', sample: () => ({ path: '/api/auth/sign-in', body: { email: uniqueEmail('x'), password: 'x' } }) },
  'POST /api/auth/sign-out': { access: 'public', sample: () => ({ path: '/api/auth/sign-out' }), signsOut: true },
  'GET /api/auth/session': { access: 'signed-in', sample: () => ({ path: '/api/auth/session' }) },
  'POST /api/auth/password-reset/request': {
    access: 'public',
    sample: () => ({ path: '/api/auth/password-reset/request', body: { email: uniqueEmail('nobody') } }),
  },
  'POST /api/auth/password-reset/confirm': {
    access: 'public',
    sample: () => ({ path: '/api/auth/password-reset/confirm', body: { token: 'not-a-real-token', password: 'long-enough-password' } }),
  },
  'GET /api/invitations/:token': { access: 'public', sample: () => ({ path: '/api/invitations/not-a-real-token' }) },
  'POST /api/invitations/:token/accept': {
    access: 'public',
    sample: () => ({ path: '/api/invitations/not-a-real-token/accept', body: { password: 'x' } }),
  },
  'GET /api/orgs/:orgId/invitations': { access: ADMIN, sample: (c) => ({ path: `/api/orgs/${c.orgId}/invitations` }) },
  'POST /api/orgs/:orgId/invitations': {
    access: ADMIN,
    sample: (c) => ({ path: `/api/orgs/${c.orgId}/invitations`, body: { email: uniqueEmail('invitee'), role: 'client' } }),
  },
  'DELETE /api/orgs/:orgId/invitations/:invitationId': {
    access: ADMIN,
    sample: async (c) => ({ path: `/api/orgs/${c.orgId}/invitations/${await c.newInvitationId()}` }),
  },
  'GET /api/orgs/:orgId/members': { access: ADMIN, sample: (c) => ({ path: `/api/orgs/${c.orgId}/members` }) },
  'PATCH /api/orgs/:orgId/members/:userId': {
    access: ADMIN,
    sample: async (c) => ({ path: `/api/orgs/${c.orgId}/members/${await c.newMemberId()}`, body: { role: 'designer' } }),
  },
  'DELETE /api/orgs/:orgId/members/:userId': {
    access: ADMIN,
    sample: async (c) => ({ path: `/api/orgs/${c.orgId}/members/${await c.newMemberId()}` }),
  },
  'GET /api/orgs/:orgId/audit': { access: ADMIN, sample: (c) => ({ path: `/api/orgs/${c.orgId}/audit` }) },
};

describe('route policies', () => {
  it('when the app is built, then every registered route declares its access', () => {
    const routes = listRoutes(app);
    expect(routes.length).toBeGreaterThan(10);
    const undeclared = routes.filter((route) => route.access === undefined).map((r) => `${r.method} ${r.path}`);
    expect(undeclared).toEqual([]);
  });

  it('when the app is built, then every API route is in the role table with the access the table specifies', () => {
    const declared = Object.fromEntries(
      listRoutes(app)
        .filter((route) => route.path.startsWith('/api/'))
        .map((route) => [`${route.method} ${route.path}`, route.access]),
    );
    const specified = Object.fromEntries(Object.entries(SPEC).map(([key, row]) => [key, row.access]));
    expect(declared).toEqual(specified);
  });
});

type Persona = Role | 'outsider' | 'anonymous';
const PERSONAS: Persona[] = [...ROLES, 'outsider', 'anonymous'];

/** What the guard must answer for this persona under this access, or 'allowed'. */
function expectedOutcome(access: Access, persona: Persona): 'allowed' | 401 | 403 | 404 {
  if (access === 'public') return 'allowed';
  if (persona === 'anonymous') return 401;
  if (access === 'signed-in') return 'allowed';
  if (persona === 'outsider') return 404;
  return access.includes(persona) ? 'allowed' : 403;
}

describe('every role on every route', () => {
  const emails = {} as Record<Persona, string>;
  const browsers = {} as Record<Persona, Browser>;
  let ctx: Context;

  beforeAll(async () => {
    const admin = await signUpAdmin(app, 'policy-admin');
    const outsider = await signUpAdmin(app, 'policy-outsider');
    browsers.admin = admin.browser;
    emails.admin = admin.email;
    browsers.outsider = outsider.browser;
    emails.outsider = outsider.email;
    browsers.anonymous = await openBrowser(app);
    for (const role of ROLES.filter((r) => r !== 'admin')) {
      emails[role] = (await createMember(admin.orgId, role)).email;
      browsers[role] = await signedInBrowser(app, emails[role]);
    }
    ctx = {
      orgId: admin.orgId,
      adminId: admin.session.user.id,
      newMemberId: async () => (await createMember(admin.orgId, 'client', 'target')).userId,
      newInvitationId: async () => {
        const row = await dataSource.getRepository(InvitationEntity).save({
          organisationId: admin.orgId,
          email: uniqueEmail('pending'),
          role: 'client',
          tokenHash: `hash-${Math.random()}`,
          invitedById: admin.session.user.id,
          expiresAt: new Date(Date.now() + 3600_000),
        });
        return row.id;
      },
    };
  });

  const cases = Object.entries(SPEC).flatMap(([key, row]) => PERSONAS.map((persona) => ({ key, row, persona })));

  it.each(cases)('when $persona calls $key, then the guard answers as the policy says', async ({ key, row, persona }) => {
    const [method, ...rest] = key.split(' ');
    expect(rest.length).toBe(1);
    const browser = row.signsOut
      ? persona === 'anonymous' || persona === 'outsider' || persona === 'admin'
        ? await openBrowser(app)
        : await signedInBrowser(app, emails[persona])
      : browsers[persona];
    const sample = await row.sample(ctx);
    const res =
      method === 'GET'
        ? await browser.get(sample.path)
        : method === 'POST'
          ? await browser.post(sample.path, sample.body)
          : method === 'PATCH'
            ? await browser.patch(sample.path, sample.body)
            : await browser.delete(sample.path);
    const expected = expectedOutcome(row.access, persona);
    if (expected === 'allowed') {
      expect(['unauthenticated', 'forbidden']).not.toContain(res.body?.code);
      expect(res.status).toBeLessThan(500);
      if (Array.isArray(row.access)) expect(res.status).toBeLessThan(300);
    } else {
      expect(res.status).toBe(expected);
      if (expected === 404) expect(res.body.message).toMatch(/organisation/);
    }
  });
});
