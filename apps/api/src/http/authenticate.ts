import { holdsAnyRole, ROLE_LABELS, roleList, type Role } from '@porestack/types';
import type { Request } from 'express';
import { preparedQuery } from '../db/prepared.js';
import { DomainError, NotFoundError } from '../errors/domain-error.js';
import { UserEntity } from '../modules/users/user.entity.js';
import { UUID_PATTERN } from './params.js';
import type { TenantContext } from './request-context.js';
import { readSessionClaims } from './session-cookie.js';

const NOT_SIGNED_IN = 'You are not signed in, or your session has ended. Sign in and try again.';

/**
 * A live session's user and their membership in `orgId` (null for none asked or not a member),
 * in one round trip: signed out, expired or issued before a password change (newer
 * session_version) is no session.
 */
const USER_AND_MEMBERSHIP_SQL = `
  SELECT u.id, u.email, u.name, u.password_hash, u.session_version, u.created_at, m.roles, o.name AS organisation_name
    FROM sessions s
    JOIN users u ON u.id = s.user_id
    LEFT JOIN memberships m ON m.user_id = u.id AND m.organisation_id = $4
    LEFT JOIN organisations o ON o.id = m.organisation_id
   WHERE s.id = $1 AND u.id = $2 AND u.session_version = $3 AND s.ended_at IS NULL AND s.expires_at > now()`;

interface UserAndMembershipRow {
  id: string;
  email: string;
  name: string;
  password_hash: string;
  session_version: number;
  created_at: Date;
  roles: Role[] | null;
  organisation_name: string | null;
}

/** The session cookie's user (401 without a live session) and the row holding their membership in `orgId`. */
async function sessionUser(req: Request, orgId: string | null): Promise<{ user: UserEntity; row: UserAndMembershipRow }> {
  const claims = readSessionClaims(req);
  if (!claims) throw new DomainError('unauthenticated', NOT_SIGNED_IN);
  const [row] = await preparedQuery<UserAndMembershipRow>(USER_AND_MEMBERSHIP_SQL, [claims.sid, claims.sub, claims.ver, orgId]);
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
