import { renderMail, type MailContent } from './layout.js';

export function finishSignUpMail(input: { name: string; organisationName: string; url: string; validHours: number }): MailContent {
  return renderMail({
    subject: 'Finish creating your Porestack account',
    paragraphs: [
      `Hello ${input.name},`,
      `Open the link below to create your Porestack account and the organisation “${input.organisationName}”, with you as its administrator. It works once, for ${input.validHours} hours.`,
    ],
    action: { label: 'Create my account', url: input.url },
    footer: 'If you did not sign up, ignore this e-mail: no account is made without the link.',
  });
}

export function accountExistsMail(input: { name: string; signInUrl: string; resetUrl: string }): MailContent {
  return renderMail({
    subject: 'You already have a Porestack account',
    paragraphs: [
      `Hello ${input.name},`,
      'Someone asked to create a Porestack account with this e-mail address, which already has one, so no new account was made. Sign in with your password, or choose a new one if you forgot it.',
      `Reset the password: ${input.resetUrl}`,
    ],
    action: { label: 'Sign in', url: input.signInUrl },
    footer: 'If this was not you, nothing changed: your account and password stay as they are.',
  });
}
