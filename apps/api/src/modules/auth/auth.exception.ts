import { DomainError } from '../../errors/domain-error.js';

/** One message for an unknown e-mail and a wrong password: neither reveals which accounts exist. */
export const invalidCredentials = () =>
  new DomainError(
    'invalid_credentials',
    'The e-mail address or password is not right. Check both and try again, or reset your password.',
  );

export const emailTaken = () =>
  new DomainError(
    'email_taken',
    'An account with this e-mail address already exists. Sign in instead, or reset the password if you forgot it.',
  );

export const resetTokenUnknown = () =>
  new DomainError(
    'token_invalid',
    'This password-reset link is not valid. Open the latest link from your e-mail, or ask for a new one.',
  );

export const resetTokenUsed = () =>
  new DomainError(
    'token_used',
    'This password-reset link has already been used. Ask for a new link if you need to change the password again.',
  );

export const resetTokenExpired = () =>
  new DomainError('token_expired', 'This password-reset link has expired. Ask for a new link: each one works for 60 minutes.');

export const signUpLinkUnknown = () =>
  new DomainError('token_invalid', 'This sign-up link is not valid. Open the latest link from your e-mail, or sign up again.');

export const signUpLinkUsed = () =>
  new DomainError('token_used', 'This sign-up link has already been used: the account exists. Sign in with your e-mail address and password.');

export const signUpLinkExpired = () =>
  new DomainError('token_expired', 'This sign-up link has expired. Sign up again: each link works for 24 hours.');
