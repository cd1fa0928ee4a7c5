import type { Role } from '@porestack/types';

/** Who sees the laboratory's records: everyone in the lab, and the designers who use them. */
export const LAB_READERS: readonly Role[] = ['admin', 'technician', 'lab_manager', 'designer'];
/** Who keeps projects (client, reference, designers). */
export const PROJECT_EDITORS: readonly Role[] = ['admin', 'lab_manager'];
/** Who records boreholes, samples and tests, and runs the analysis. */
export const LAB_WORKERS: readonly Role[] = ['technician', 'lab_manager'];
/** Who reviews. */
export const REVIEWERS: readonly Role[] = ['lab_manager'];
/** Who reads approved soil records: designers and clients too. */
export const RECORD_READERS: readonly Role[] = ['admin', 'technician', 'lab_manager', 'designer', 'client'];
/** Who reads projects, their boreholes and samples: everyone, each within their project scope (project-scope.ts). */
export const PROJECT_READERS: readonly Role[] = ['admin', 'technician', 'lab_manager', 'designer', 'client'];
