import { env } from '../../config/env.js';
import { countHit, forgetHits, minutesBlocked, minutesWord, rateLimited, type Limit } from '../../http/rate-limits.js';

/** Failed sign-ins of one account, from anywhere (SIGN_IN_RATE_LIMIT per SIGN_IN_RATE_WINDOW_MINUTES). */
function accountLimit(): Limit {
  const config = env();
  return { name: 'sign-in-account', points: config.SIGN_IN_RATE_LIMIT, windowMinutes: config.SIGN_IN_RATE_WINDOW_MINUTES };
}

/** Failed sign-ins from one client, whatever the accounts (SIGN_IN_CLIENT_RATE_LIMIT): password spraying. */
function clientLimit(): Limit {
  const config = env();
  return { name: 'sign-in-client', points: config.SIGN_IN_CLIENT_RATE_LIMIT, windowMinutes: config.SIGN_IN_RATE_WINDOW_MINUTES };
}

export interface SignInAttempt {
  readonly email: string;
  readonly client: string;
}

/** Refuses (429) before the password is checked when the account or the client has failed too often. */
export async function assertSignInAllowed(attempt: SignInAttempt): Promise<void> {
  const [byAccount, byClient] = await Promise.all([minutesBlocked(accountLimit(), attempt.email), minutesBlocked(clientLimit(), attempt.client)]);
  if (byAccount > 0) {
    throw rateLimited(`Too many failed sign-in attempts for this e-mail address. Try again in ${minutesWord(byAccount)}, or reset your password.`);
  }
  if (byClient > 0) throw rateLimited(`Too many failed sign-in attempts from your network. Try again in ${minutesWord(byClient)}.`);
}

export async function recordFailedSignIn(attempt: SignInAttempt): Promise<void> {
  await Promise.all([countHit(accountLimit(), attempt.email), countHit(clientLimit(), attempt.client)]);
}

/** A successful sign-in clears the account's failures (the client's stay: spraying finds one password). */
export async function recordSignedIn(attempt: SignInAttempt): Promise<void> {
  await forgetHits(accountLimit(), attempt.email);
}
