import type { SignUp, SignUpConfirm } from '@porestack/types';
import { env } from '../../config/env.js';
import { dataSource } from '../../data-source.js';
import { countHit, minutesBlocked, minutesWord, rateLimited, type Limit } from '../../http/rate-limits.js';
import { enqueueAuthMail } from '../../jobs/auth-mail-queue.js';
import { publicLink, sendMail } from '../../mail/mailer.js';
import { accountExistsMail, finishSignUpMail } from '../../mail/templates/sign-up.mail.js';
import { hashPassword } from '../users/passwords.js';
import { UserEntity } from '../users/user.entity.js';
import { createAccount, type SignedIn } from './auth.service.js';
import { signUpLinkExpired, signUpLinkUnknown, signUpLinkUsed } from './auth.exception.js';
import { createOneTimeToken, hashToken } from './one-time-token.js';
import { SignUpRequestEntity } from './sign-up-request.entity.js';

export const SIGN_UP_LINK_HOURS = 24;

/** Sign-ups per client per hour (SIGN_UP_CLIENT_RATE_LIMIT). */
function signUpLimit(): Limit {
  return { name: 'sign-up-client', points: env().SIGN_UP_CLIENT_RATE_LIMIT, windowMinutes: 60 };
}

/**
 * Keeps the sign-up and queues its mail, answering the same way and in the same time whether
 * or not the address already has an account: the password is hashed and the request stored
 * either way, and the worker decides which mail to send.
 */
export async function requestSignUp(input: SignUp, client: string): Promise<void> {
  const blocked = await minutesBlocked(signUpLimit(), client);
  if (blocked > 0) throw rateLimited(`Too many sign-ups from your network. Try again in ${minutesWord(blocked)}.`);
  await countHit(signUpLimit(), client);
  const passwordHash = await hashPassword(input.password);
  const repo = dataSource.getRepository(SignUpRequestEntity);
  const request = await repo.save(
    repo.create({
      email: input.email,
      name: input.name,
      organisationName: input.organisationName,
      passwordHash,
      tokenHash: null,
      expiresAt: new Date(Date.now() + SIGN_UP_LINK_HOURS * 3600_000),
      usedAt: null,
    }),
  );
  await enqueueAuthMail({ kind: 'sign-up', requestId: request.id });
}

/**
 * In the worker: mails the link that finishes the sign-up, or — when the address already
 * has an account — a mail saying so, with links to sign in and to reset the password.
 */
export async function sendSignUpMail(requestId: string): Promise<void> {
  const repo = dataSource.getRepository(SignUpRequestEntity);
  const request = await repo.findOneBy({ id: requestId });
  if (!request || request.usedAt) return;
  if (await dataSource.getRepository(UserEntity).existsBy({ email: request.email })) {
    await sendMail(request.email, accountExistsMail({ name: request.name, signInUrl: publicLink('/sign-in'), resetUrl: publicLink('/forgot-password') }));
    return;
  }
  const { token, tokenHash } = createOneTimeToken();
  await repo.update({ id: request.id }, { tokenHash });
  const url = publicLink(`/finish-sign-up?token=${encodeURIComponent(token)}`);
  await sendMail(request.email, finishSignUpMail({ name: request.name, organisationName: request.organisationName, url, validHours: SIGN_UP_LINK_HOURS }));
}

/** Creates the account and its organisation from an e-mailed link, once. */
export async function confirmSignUp(input: SignUpConfirm): Promise<SignedIn> {
  return dataSource.transaction(async (manager) => {
    const repo = manager.getRepository(SignUpRequestEntity);
    const request = await repo.findOne({ where: { tokenHash: hashToken(input.token) }, lock: { mode: 'pessimistic_write' } });
    if (!request) throw signUpLinkUnknown();
    if (request.usedAt) throw signUpLinkUsed();
    if (request.expiresAt.getTime() <= Date.now()) throw signUpLinkExpired();
    await repo.update({ id: request.id }, { usedAt: new Date() });
    return createAccount({ name: request.name, email: request.email, organisationName: request.organisationName }, request.passwordHash, manager);
  });
}
