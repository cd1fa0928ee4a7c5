import { renderMail, type MailContent } from './layout.js';

export function passwordResetMail(input: { name: string; url: string; validMinutes: number }): MailContent {
  return renderMail({
    subject: 'Reset your Porestack password',
    paragraphs: [
      `Hello ${input.name},`,
      `Someone asked to reset the password of your Porestack account. Open the link below to choose a new one. It works once, for ${input.validMinutes} minutes.`,
    ],
    action: { label: 'Choose a new password', url: input.url },
    footer: 'If you did not ask for this, ignore this e-mail: your password stays as it is.',
  });
}
