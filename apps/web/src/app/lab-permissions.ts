import type { Role } from '@porestack/types';

/**
 * What each role may do in the laboratory pages, mirroring the API's route policies so the UI
 * never offers a button the server will refuse. The server still decides.
 */
export const labPermissions = (role: Role) => ({
  /** Create and edit projects. */
  editProjects: role === 'admin' || role === 'lab_manager',
  /** Record boreholes, samples and tests; edit the set-up; override picks; re-run; submit. */
  benchWork: role === 'technician' || role === 'lab_manager',
  /** Send readings files and run imports: the technician who runs the test. */
  importReadings: role === 'technician',
  /** Approve or ask for changes. */
  review: role === 'lab_manager',
  /** Ask again for an issued report whose printing failed. */
  retryReports: role === 'lab_manager',
});

/** Who may open a test page: the lab, and designers following a soil record back to its test. */
export const TEST_PAGE_ROLES: readonly Role[] = ['admin', 'technician', 'lab_manager', 'designer'];
