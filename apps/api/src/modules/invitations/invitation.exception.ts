import { DomainError } from '../../errors/domain-error.js';

export const invitationUnknown = () =>
  new DomainError('token_invalid', 'This invitation link is not valid. Open the link from the latest invitation e-mail, or ask the administrator to invite you again.');

export const invitationRevoked = () =>
  new DomainError('token_invalid', 'This invitation was withdrawn by the organisation. Ask its administrator to invite you again if you still need access.');

export const invitationUsed = () =>
  new DomainError('token_used', 'This invitation has already been accepted. Sign in with the account it was accepted with.');

export const invitationExpired = () =>
  new DomainError('token_expired', 'This invitation has expired. Ask the administrator of the organisation to send a new one.');

export const alreadyMember = (email: string) =>
  new DomainError('already_member', `${email} is already a member of this organisation. Change their role on the members page instead.`);

export const nameRequired = () =>
  new DomainError('validation_failed', 'The request was not accepted. name: Enter your name to create your account.', [
    { path: 'name', message: 'Enter your name to create your account.' },
  ]);

export const passwordTooShort = (min: number) =>
  new DomainError('validation_failed', `The request was not accepted. password: Use a password of at least ${min} characters.`, [
    { path: 'password', message: `Use a password of at least ${min} characters.` },
  ]);

export const passwordTooLong = (maxBytes: number) =>
  new DomainError('validation_failed', `The request was not accepted. password: Use a password of at most ${maxBytes} bytes.`, [
    { path: 'password', message: `Use a password of at most ${maxBytes} bytes (72 plain letters or digits; accented letters and symbols count two to four).` },
  ]);

export const invitationMailFailed = () =>
  new DomainError(
    'service_unavailable',
    'The invitation e-mail could not be sent, so no invitation was made. Try again in a few minutes; if it keeps failing, ask whoever runs Porestack to check its mail settings.',
  );
