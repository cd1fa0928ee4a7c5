import { holdsAnyRole, LAB_STAFF_ROLES, ROLE_ACCESS, type Role } from '@porestack/types';

/**
 * What a member may do in the laboratory pages, from every role they hold, mirroring the API's
 * route policies so the UI never offers a button the server will refuse. The server still decides.
 */
export const labPermissions = (roles: readonly Role[]) => ({
  /** Create and edit projects. */
  editProjects: holdsAnyRole(roles, ROLE_ACCESS.projectEditors),
  /** Record boreholes, samples and tests; edit the set-up; override picks; re-run; submit. */
  benchWork: holdsAnyRole(roles, ROLE_ACCESS.labWorkers),
  /** Send readings files and run imports: the technician who runs the test. */
  importReadings: holdsAnyRole(roles, ROLE_ACCESS.importers),
  /** Approve or ask for changes (never a test one ran or submitted oneself: the server refuses that). */
  review: holdsAnyRole(roles, ROLE_ACCESS.reviewers),
  /** Follow tests through the lab's own pages in any status (designers and clients read approved versions). */
  readsLabWork: holdsAnyRole(roles, LAB_STAFF_ROLES),
  /** Ask again for an issued report whose printing failed. */
  retryReports: holdsAnyRole(roles, ROLE_ACCESS.reviewers),
});

/** Who may open a test page: the lab, and designers following a soil record back to its test. */
export const TEST_PAGE_ROLES: readonly Role[] = ROLE_ACCESS.labReaders;
