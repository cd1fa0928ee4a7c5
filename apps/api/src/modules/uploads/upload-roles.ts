import { ROLE_ACCESS } from '@porestack/types';

// The upload routes' access, by name; the lists and the reasons for them live in
// @porestack/types (ROLE_ACCESS), which the web reads too.
export const IMPORTERS = ROLE_ACCESS.importers;
export const UPLOAD_READERS = ROLE_ACCESS.uploadReaders;
export const PROFILE_EDITORS = ROLE_ACCESS.profileEditors;
