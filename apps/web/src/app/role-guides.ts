import type { Role } from '@porestack/types';

export type RoleTask = {
  text: string;
  /** Whether this version of Porestack already offers it. */
  available: boolean;
};

/** What each role is for, said plainly, including what this version cannot do yet. */
export const ROLE_GUIDES: Record<Role, { summary: string; tasks: readonly RoleTask[] }> = {
  admin: {
    summary: 'Administrators decide who works in this organisation and with which role.',
    tasks: [
      { text: 'Invite colleagues by e-mail and choose their role.', available: true },
      { text: 'Change a member’s role, or remove someone who has left.', available: true },
      { text: 'Read the activity log: invitations, role changes and other changes, with who made them and when.', available: true },
      { text: 'Set up projects and boreholes for the laboratory’s work.', available: false },
    ],
  },
  technician: {
    summary: 'Technicians bring the laboratory’s measurements into Porestack.',
    tasks: [
      { text: 'Upload oedometer readings (load stages with time and settlement) for a test.', available: false },
      { text: 'Check the fitted curves before sending a test for review.', available: false },
    ],
  },
  lab_manager: {
    summary: 'Lab managers check fitted consolidation parameters and approve or return them.',
    tasks: [
      { text: 'Work through the review queue of submitted tests.', available: false },
      { text: 'Approve parameters so designers can use them, or send a test back with a note.', available: false },
    ],
  },
  designer: {
    summary: 'Designers use approved parameters to check the settlement of footings.',
    tasks: [
      { text: 'Pick approved soil parameters for a project: ground models and characteristic sets.', available: true },
      { text: 'Run settlement checks for footings and keep the results with the project.', available: true },
    ],
  },
  client: {
    summary: 'Clients read the summaries the laboratory and designers share with them.',
    tasks: [{ text: 'Read reports shared with your organisation.', available: false }],
  },
};
