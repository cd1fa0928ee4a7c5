import type { Role } from '@porestack/types';

/**
 * Who sends readings files and runs imports: the technician who runs the test. Lab managers
 * review what was imported rather than import it, which keeps the review independent.
 */
export const IMPORTERS: readonly Role[] = ['technician'];

/**
 * Who sees raw uploads (list, preview, download) and saved import profiles: the lab, and
 * admins for support. Designers and clients get the approved record with the file's
 * SHA-256 for traceability, not the lab's raw working files.
 */
export const UPLOAD_READERS: readonly Role[] = ['technician', 'lab_manager', 'admin'];

/** Who keeps the organisation's import profiles. */
export const PROFILE_EDITORS: readonly Role[] = ['technician', 'lab_manager'];
