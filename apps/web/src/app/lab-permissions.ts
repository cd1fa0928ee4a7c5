import { holdsAnyRole, type Role } from '@porestack/types';

/**
 * What a member may do in the laboratory pages, from every role they hold, mirroring the API's
 * route policies so the UI never offers a button the server will refuse. The server still decides.
 */
export const labPermissions = (roles: readonly Role[]) => ({
  /** Create and edit projects. */
  editProjects: holdsAnyRole(roles, ['admin', 'lab_manager']),
  /** Record boreholes, samples and tests; edit the set-up; override picks; re-run; submit. */
  benchWork: holdsAnyRole(roles, ['technician', 'lab_manager']),
  /** Send readings files and run imports: the technician who runs the test. */
  importReadings: holdsAnyRole(roles, ['technician']),
  /** Approve or ask for changes (never a test one ran or submitted oneself: the server refuses that). */
  review: holdsAnyRole(roles, ['lab_manager']),
});

/** Who may open a test page: the lab, and designers following a soil record back to its test. */
export const TEST_PAGE_ROLES: readonly Role[] = ['admin', 'technician', 'lab_manager', 'designer'];
