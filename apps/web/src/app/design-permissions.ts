import { holdsAnyRole, ROLE_ACCESS, type Role } from '@porestack/types';

/** Mirrors the API's design route policies, so the pages never offer what the server refuses. */
export const DESIGN_READERS: readonly Role[] = ROLE_ACCESS.designReaders;

export const designPermissions = (roles: readonly Role[]) => ({
  /** See a project's ground models, sets and checks. */
  read: holdsAnyRole(roles, ROLE_ACCESS.designReaders),
  /** Build and run them: the project's designers. */
  edit: holdsAnyRole(roles, ROLE_ACCESS.designWriters),
});
