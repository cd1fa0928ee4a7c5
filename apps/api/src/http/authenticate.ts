import { holdsAnyRole, ROLE_LABELS, roleList, type Role } from '@porestack/types';
import DataLoader from 'dataloader';
import type { Request } from 'express';
import { preparedQuery } from '../db/prepared.js';
import { outsideTenant, runInTenant } from '../db/tenant-wall.js';
import { DomainError, NotFoundError } from '../errors/domain-error.js';
import { UserEntity } from '../modules/users/user.entity.js';
import { UUID_PATTERN } from './params.js';
import type { TenantContext } from './request-context.js';
import { readSessionClaims, type SessionClaims } from './session-cookie.js';

const NOT_SIGNED_IN = 'You are not signed in, or your session has ended. Sign in and try again.';

/**
 * Live sessions' users and their memberships in one organisation ($4; null for none asked), for
 * many session cookies in one round trip: the i-th row answers the i-th (session, user,
 * session_version) triple. Signed out, expired or issued before a password change (newer
 * session_version) is no row.
 */
const USERS_AND_MEMBERSHIPS_SQL = `
  SELECT q.i, u.id, u.email, u.name, u.password_hash, u.session_version, u.created_at, m.roles, o.name AS organisation_name
    FROM unnest($1::uuid[], $2::uuid[], $3::int[]) WITH ORDINALITY AS q(sid, uid, ver, i)
    JOIN sessions s ON s.id = q.sid AND s.ended_at IS NULL AND s.expires_at > now()
    JOIN users u ON u.id = s.user_id AND u.id = q.uid AND u.session_version = q.ver
    LEFT JOIN memberships m ON m.user_id = u.id AND m.organisation_id = $4
    LEFT JOIN organisations o ON o.id = m.organisation_id`;

interface UserAndMembershipRow {
  i: string;
  id: string;
  email: string;
  name: string;
  password_hash: string;
  session_version: number;
  created_at: Date;
  roles: Role[] | null;
  organisation_name: string | null;
}

interface SessionLookup {
  claims: SessionClaims;
  orgId: string | null;
}

/** The rows for one organisation's lookups (or none's), in their order; null where no live session. */
async function lookUpSessions(orgId: string | null, lookups: readonly SessionLookup[]): Promise<(UserAndMembershipRow | null)[]> {
  const values = [lookups.map((l) => l.claims.sid), lookups.map((l) => l.claims.sub), lookups.map((l) => l.claims.ver), orgId];
  // The membership rows are behind the tenant wall: read within the organisation asked for (or
  // outside any), not within that of whichever request happened to start the batch.
  const read = () => preparedQuery<UserAndMembershipRow>(USERS_AND_MEMBERSHIPS_SQL, values);
  const rows = orgId === null ? await outsideTenant(read) : await runInTenant(orgId, read);
  const answers: (UserAndMembershipRow | null)[] = lookups.map(() => null);
  for (const row of rows) answers[Number(row.i) - 1] = row;
  return answers;
}

/**
 * Session checks asked for while the same batch of network input is handled (one turn of the
 * event loop; under load, tens of requests) go to PostgreSQL as one query per organisation.
 * Each is still read after its request arrived — a session ended before it is ended for it, on
 * every API process — but the database is woken once per batch instead of once per request.
 */
const sessionLoader = new DataLoader<SessionLookup, UserAndMembershipRow | null>(
  async (lookups) => {
    const byOrg = new Map<string | null, number[]>();
    lookups.forEach((lookup, index) => {
      const group = byOrg.get(lookup.orgId);
      if (group) group.push(index);
      else byOrg.set(lookup.orgId, [index]);
    });
    const answers: (UserAndMembershipRow | null | Error)[] = lookups.map(() => null);
    await Promise.all(
      [...byOrg].map(async ([orgId, indices]) => {
        try {
          const rows = await lookUpSessions(
            orgId,
            indices.map((index) => lookups[index] as SessionLookup),
          );
          indices.forEach((index, k) => (answers[index] = rows[k] ?? null));
        } catch (error) {
          for (const index of indices) answers[index] = error as Error;
        }
      }),
    );
    return answers;
  },
  { cache: false, maxBatchSize: 500, batchScheduleFn: (callback) => setImmediate(callback) },
);

/** The session cookie's user (401 without a live session) and the row holding their membership in `orgId`. */
async function sessionUser(req: Request, orgId: string | null): Promise<{ user: UserEntity; row: UserAndMembershipRow }> {
  const claims = readSessionClaims(req);
  if (!claims) throw new DomainError('unauthenticated', NOT_SIGNED_IN);
  const row = await sessionLoader.load({ claims, orgId });
  if (!row) throw new DomainError('unauthenticated', NOT_SIGNED_IN);
  const user = Object.assign(new UserEntity(), {
    id: row.id,
    email: row.email,
    name: row.name,
    passwordHash: row.password_hash,
    sessionVersion: row.session_version,
    createdAt: row.created_at,
  });
  return { user, row };
}

/** The user of a valid session cookie whose server-side session is live (see sessionUser). */
export async function authenticate(req: Request): Promise<UserEntity> {
  return (await sessionUser(req, null)).user;
}

/**
 * authenticate() and the caller's membership in `:orgId`, let in when any role it holds is
 * among `roles`. Not signed in answers 401 first; not a member answers exactly as a missing
 * organisation (404), so ids of other tenants reveal nothing.
 */
export async function authenticateInOrg(req: Request, orgId: string | undefined, roles: readonly Role[]): Promise<{ user: UserEntity; tenant: TenantContext }> {
  const knownOrg = orgId !== undefined && UUID_PATTERN.test(orgId) ? orgId : null;
  const { user, row } = await sessionUser(req, knownOrg);
  if (knownOrg === null || row.roles === null || row.organisation_name === null) throw new NotFoundError('organisation');
  if (!holdsAnyRole(row.roles, roles)) {
    const held = row.roles.length === 1 ? 'role' : 'roles';
    const allowed = roles.map((role) => ROLE_LABELS[role]).join(', ');
    throw new DomainError(
      'forbidden',
      `Your ${held} in ${row.organisation_name} (${roleList(row.roles)}) cannot do this; it needs one of: ${allowed}. Ask an administrator of the organisation if you need it.`,
    );
  }
  return { user, tenant: { orgId: knownOrg, organisationName: row.organisation_name, roles: row.roles } };
}
