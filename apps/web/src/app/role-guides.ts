import type { Role } from '@porestack/types';

/** What each role is for, said plainly: the line under the home page's title. */
export const ROLE_SUMMARIES: Record<Role, string> = {
  admin: 'Administrators decide who works in this organisation and with which role, and can read everything that happens in it.',
  technician: 'Technicians run the tests: they set up each specimen, bring in the logger’s readings, check the fitted curves and send the test for review.',
  lab_manager: 'Lab managers check each submitted test and approve its parameters, or send it back with a note; they also keep the projects and share them with clients.',
  designer: 'Designers use the approved parameters of the projects they are on for the settlement checks of footings.',
  client: 'Clients read the approved test results and the reports of the projects the laboratory shares with them.',
};
