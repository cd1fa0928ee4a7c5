import { ROLE_ACCESS } from '@porestack/types';

// The lab routes' access, by name; the lists themselves live in @porestack/types (ROLE_ACCESS),
// which the web reads too.
export const LAB_READERS = ROLE_ACCESS.labReaders;
export const PROJECT_EDITORS = ROLE_ACCESS.projectEditors;
export const LAB_WORKERS = ROLE_ACCESS.labWorkers;
export const REVIEWERS = ROLE_ACCESS.reviewers;
export const RECORD_READERS = ROLE_ACCESS.recordReaders;
export const PROJECT_READERS = ROLE_ACCESS.projectReaders;
