import type { Role } from '@porestack/types';

/** Who reads a project's design work: its designers, and the lab's managers and administrators. */
export const DESIGN_READERS: readonly Role[] = ['admin', 'lab_manager', 'designer'];
/** Who builds ground models, characteristic sets and checks, and runs them: the project's designers. */
export const DESIGN_WRITERS: readonly Role[] = ['designer'];
