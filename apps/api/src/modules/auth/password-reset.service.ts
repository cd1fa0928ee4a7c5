import type { PasswordResetConfirm, PasswordResetRequest } from '@porestack/types';
import { IsNull } from 'typeorm';
import { dataSource } from '../../data-source.js';
import { env } from '../../config/env.js';
import { countHit, minutesBlocked, minutesWord, rateLimited, type Limit } from '../../http/rate-limits.js';
import { enqueueAuthMail } from '../../jobs/auth-mail-queue.js';
import { publicLink, sendMail } from '../../mail/mailer.js';
import { passwordResetMail } from '../../mail/templates/password-reset.mail.js';
import { audit } from '../audit/audit.service.js';
import { endSessionsOf } from '../sessions/sessions.service.js';
import { hashPassword } from '../users/passwords.js';
import { UserEntity } from '../users/user.entity.js';
import { resetTokenExpired, resetTokenUnknown, resetTokenUsed } from './auth.exception.js';
import { createOneTimeToken, hashToken } from './one-time-token.js';
import { PasswordResetTokenEntity } from './password-reset-token.entity.js';

export const RESET_TOKEN_MINUTES = 60;

/** Reset requests per e-mail address and per client, per hour (RESET_RATE_LIMIT, RESET_CLIENT_RATE_LIMIT). */
function resetLimits(): { byAddress: Limit; byClient: Limit } {
  const config = env();
  return {
    byAddress: { name: 'reset-address', points: config.RESET_RATE_LIMIT, windowMinutes: 60 },
    byClient: { name: 'reset-client', points: config.RESET_CLIENT_RATE_LIMIT, windowMinutes: 60 },
  };
}

/**
 * Queues the reset mail and answers at once, the same way and in the same time whether or
 * not an account uses the address (the worker finds out, and mails only a real account).
 * Limited per address and per client.
 */
export async function requestPasswordReset(input: PasswordResetRequest, client: string): Promise<void> {
  const { byAddress, byClient } = resetLimits();
  const blocked = Math.max(await minutesBlocked(byAddress, input.email), await minutesBlocked(byClient, client));
  if (blocked > 0) throw rateLimited(`Too many password-reset requests. Check your inbox (and spam folder) for the last link, or try again in ${minutesWord(blocked)}.`);
  await Promise.all([countHit(byAddress, input.email), countHit(byClient, client)]);
  await enqueueAuthMail({ kind: 'password-reset', email: input.email });
}

/** In the worker: mails a one-time link when the account exists. A refused mail is thrown, to be tried again. */
export async function sendPasswordResetMail(email: string): Promise<void> {
  const user = await dataSource.getRepository(UserEntity).findOneBy({ email });
  if (!user) return;
  const { token, tokenHash } = createOneTimeToken();
  await dataSource.getRepository(PasswordResetTokenEntity).insert({
    userId: user.id,
    tokenHash,
    expiresAt: new Date(Date.now() + RESET_TOKEN_MINUTES * 60_000),
  });
  await audit.record({
    organisationId: null,
    actorUserId: user.id,
    action: 'auth.password_reset_requested',
    objectType: 'user',
    objectId: user.id,
  });
  const url = publicLink(`/reset-password?token=${encodeURIComponent(token)}`);
  await sendMail(user.email, passwordResetMail({ name: user.name, url, validMinutes: RESET_TOKEN_MINUTES }));
}

/** Sets the new password, spends the token and ends every existing session of the account. */
export async function confirmPasswordReset(input: PasswordResetConfirm): Promise<void> {
  const passwordHash = await hashPassword(input.password);
  await dataSource.transaction(async (manager) => {
    const tokens = manager.getRepository(PasswordResetTokenEntity);
    const row = await tokens.findOne({
      where: { tokenHash: hashToken(input.token) },
      lock: { mode: 'pessimistic_write' },
    });
    if (!row) throw resetTokenUnknown();
    if (row.usedAt) throw resetTokenUsed();
    if (row.expiresAt.getTime() <= Date.now()) throw resetTokenExpired();
    await tokens.update({ id: row.id }, { usedAt: new Date() });
    // Other links sent earlier stop working too: only the newest request matters.
    await tokens.update({ userId: row.userId, usedAt: IsNull() }, { usedAt: new Date() });
    await manager
      .getRepository(UserEntity)
      .update({ id: row.userId }, { passwordHash, sessionVersion: () => 'session_version + 1' });
    await endSessionsOf(row.userId, manager);
    await audit.record(
      { organisationId: null, actorUserId: row.userId, action: 'auth.password_reset', objectType: 'user', objectId: row.userId },
      manager,
    );
  });
}
