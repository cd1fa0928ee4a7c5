import { roleList, type Role } from '@porestack/types';
import { renderMail, type MailContent } from './layout.js';

export function invitationMail(input: {
  organisationName: string;
  invitedBy: string;
  roles: readonly Role[];
  url: string;
  validDays: number;
  /** Projects shared with the invitee (a client invitation made by sharing). */
  projectNames?: readonly string[];
}): MailContent {
  const projects = input.projectNames ?? [];
  return renderMail({
    subject: `${input.invitedBy} invited you to ${input.organisationName} on Porestack`,
    paragraphs: [
      'Hello,',
      `${input.invitedBy} invited you to join ${input.organisationName} on Porestack as ${roleList(input.roles)}.`,
      ...(projects.length > 0
        ? [`${projects.length === 1 ? 'The project' : 'The projects'} ${projects.join(', ')} ${projects.length === 1 ? 'is' : 'are'} shared with you: once you accept, you can read the approved test results and issued reports there.`]
        : []),
      `Open the link below to accept. It works once, for ${input.validDays} days.`,
    ],
    action: { label: 'Accept the invitation', url: input.url },
    footer: 'If you were not expecting this, ignore this e-mail: nothing happens until the link is opened and accepted.',
  });
}
