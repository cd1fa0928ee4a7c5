import { holdsAnyRole, ROLE_LABELS, roleList, type Role } from '@porestack/types';
import type { Request } from 'express';
import { dataSource } from '../data-source.js';
import { DomainError, NotFoundError } from '../errors/domain-error.js';
import { MembershipEntity } from '../modules/organisations/membership.entity.js';
import { userOfSession } from '../modules/sessions/sessions.service.js';
import type { UserEntity } from '../modules/users/user.entity.js';
import { UUID_PATTERN } from './params.js';
import type { TenantContext } from './request-context.js';
import { readSessionClaims } from './session-cookie.js';

/**
 * The user of a valid session cookie whose server-side session is live: signed out, expired
 * or issued before a password change (newer session_version) is refused.
 */
export async function authenticate(req: Request): Promise<UserEntity> {
  const claims = readSessionClaims(req);
  const user = claims ? await userOfSession(claims.sid, claims.sub, claims.ver) : null;
  if (!claims || !user) {
    throw new DomainError('unauthenticated', 'You are not signed in, or your session has ended. Sign in and try again.');
  }
  return user;
}

/**
 * The caller's membership in `:orgId`, let in when any role it holds is among `roles`.
 * Not a member answers exactly as a missing organisation (404), so ids of other tenants
 * reveal nothing.
 */
export async function resolveTenant(userId: string, orgId: string | undefined, roles: readonly Role[]): Promise<TenantContext> {
  if (!orgId || !UUID_PATTERN.test(orgId)) throw new NotFoundError('organisation');
  const membership = await dataSource.getRepository(MembershipEntity).findOne({
    where: { organisationId: orgId, userId },
    relations: { organisation: true },
  });
  if (!membership) throw new NotFoundError('organisation');
  if (!holdsAnyRole(membership.roles, roles)) {
    const held = membership.roles.length === 1 ? 'role' : 'roles';
    const allowed = roles.map((role) => ROLE_LABELS[role]).join(', ');
    throw new DomainError(
      'forbidden',
      `Your ${held} in ${membership.organisation.name} (${roleList(membership.roles)}) cannot do this; it needs one of: ${allowed}. Ask an administrator of the organisation if you need it.`,
    );
  }
  return { orgId, organisationName: membership.organisation.name, roles: membership.roles };
}
