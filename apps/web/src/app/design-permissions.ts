import type { Role } from '@porestack/types';

/** Mirrors the API's design route policies, so the pages never offer what the server refuses. */
export const DESIGN_READERS: readonly Role[] = ['admin', 'lab_manager', 'designer'];

export const designPermissions = (role: Role) => ({
  /** See a project's ground models, sets and checks. */
  read: DESIGN_READERS.includes(role),
  /** Build and run them: the project's designers. */
  edit: role === 'designer',
});
