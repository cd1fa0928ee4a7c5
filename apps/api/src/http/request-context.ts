import type { Role } from '@porestack/types';
import type { Request } from 'express';
import type { UserEntity } from '../modules/users/user.entity.js';

/** The organisation a request acts in, resolved from `:orgId` and the caller's membership. */
export interface TenantContext {
  orgId: string;
  organisationName: string;
  /** Every role the caller holds here (one or more, in ROLES' order); the guard let them in on any of them. */
  roles: readonly Role[];
}

declare global {
  // eslint-disable-next-line @typescript-eslint/no-namespace -- Express types are extended this way
  namespace Express {
    interface Request {
      /** Set by the route guard for every route whose access is not 'public'. */
      user?: UserEntity;
      /** Set by the route guard for every route whose access lists roles. */
      tenant?: TenantContext;
    }
  }
}

/** The signed-in user; only valid inside a route declared 'signed-in' or with roles. */
export function currentUser(req: Request): UserEntity {
  if (!req.user) throw new Error('currentUser() called in a route without a signed-in policy');
  return req.user;
}

/** The tenant of this request; only valid inside a route declared with roles. */
export function currentTenant(req: Request): TenantContext {
  if (!req.tenant) throw new Error('currentTenant() called in a route without a role policy');
  return req.tenant;
}
