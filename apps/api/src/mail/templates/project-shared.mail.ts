import { renderMail, type MailContent } from './layout.js';

/** To a client member when a further project is shared with them. */
export function projectSharedMail(input: { organisationName: string; sharedBy: string; projectName: string; url: string }): MailContent {
  return renderMail({
    subject: `${input.organisationName} shared ${input.projectName} with you on Porestack`,
    paragraphs: [
      'Hello,',
      `${input.sharedBy} of ${input.organisationName} shared the project ${input.projectName} with you.`,
      'You can read its approved test results and, once the laboratory issues them, the reports.',
    ],
    action: { label: 'Open the project', url: input.url },
    footer: 'You receive this because you are a client of the laboratory on Porestack. The laboratory can withdraw the sharing at any time.',
  });
}
