import { LAB_STAFF_ROLES, ROLES, type Role } from './roles.js';

/**
 * Who may do what, by role: the API's route policies (`access` in defineRoutes) and the web's
 * buttons, navigation and role gates both read these lists, so the screen never offers what the
 * server refuses. A member holding any role of a list may do it. The route-policy test writes
 * its own expected lists out rather than reading these.
 */
export const ROLE_ACCESS = {
  /** Members, invitations and the activity log. */
  admins: ['admin'],
  /** The laboratory's records (projects, tests, readings, analyses): the lab, and the designers who use them. */
  labReaders: [...LAB_STAFF_ROLES, 'designer'],
  /** Who keeps projects (client, reference, designers). */
  projectEditors: ['admin', 'lab_manager'],
  /** Who records boreholes, samples and tests, and runs the analysis. */
  labWorkers: ['technician', 'lab_manager'],
  /** Who approves a test or sends it back. */
  reviewers: ['lab_manager'],
  /** Who reads approved soil records: everyone in the organisation, each within their project scope. */
  recordReaders: ROLES,
  /** Who reads projects, their boreholes and samples: everyone, each within their project scope (designers and clients: the projects they are on). */
  projectReaders: ROLES,
  /**
   * Who sends readings files and runs imports: the technician who runs the test. Lab managers
   * review what was imported rather than import it, which keeps the review independent.
   */
  importers: ['technician'],
  /**
   * Who sees raw uploads (list, preview, download) and saved import profiles: the lab, and
   * admins for support. Designers and clients get the approved record with the file's SHA-256
   * for traceability, not the lab's raw working files.
   */
  uploadReaders: ['technician', 'lab_manager', 'admin'],
  /** Who reads a project's design work (ground models, characteristic sets, checks): its designers, and the lab's managers and administrators. */
  designReaders: ['admin', 'lab_manager', 'designer'],
  /** Who builds ground models, characteristic sets and checks and runs them: the project's designers. */
  designWriters: ['designer'],
  /** Who reads issued settlement checks and downloads their PDF summaries: the design readers, and the clients the project is shared with. */
  issuedCheckReaders: ['admin', 'lab_manager', 'designer', 'client'],
  /** Who keeps the organisation's import profiles. */
  profileEditors: ['technician', 'lab_manager'],
} as const satisfies Record<string, readonly Role[]>;
