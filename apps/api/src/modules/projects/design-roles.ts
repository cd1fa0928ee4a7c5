import { ROLE_ACCESS } from '@porestack/types';

// The design routes' access, by name; the lists live in @porestack/types (ROLE_ACCESS), which the web reads too.
export const DESIGN_READERS = ROLE_ACCESS.designReaders;
export const DESIGN_WRITERS = ROLE_ACCESS.designWriters;
export const ISSUED_CHECK_READERS = ROLE_ACCESS.issuedCheckReaders;
