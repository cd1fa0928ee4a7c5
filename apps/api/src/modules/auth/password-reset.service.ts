import type { PasswordResetConfirm, PasswordResetRequest } from '@porestack/types';
import { IsNull } from 'typeorm';
import { dataSource } from '../../data-source.js';
import { logger } from '../../http/logger.js';
import { publicLink, sendMail } from '../../mail/mailer.js';
import { passwordResetMail } from '../../mail/templates/password-reset.mail.js';
import { audit } from '../audit/audit.service.js';
import { hashPassword } from '../users/passwords.js';
import { UserEntity } from '../users/user.entity.js';
import { resetTokenExpired, resetTokenUnknown, resetTokenUsed } from './auth.exception.js';
import { createOneTimeToken, hashToken } from './one-time-token.js';
import { PasswordResetTokenEntity } from './password-reset-token.entity.js';

export const RESET_TOKEN_MINUTES = 60;

/** Mails a one-time link when the account exists; says nothing either way (no account enumeration). */
export async function requestPasswordReset(input: PasswordResetRequest): Promise<void> {
  const user = await dataSource.getRepository(UserEntity).findOneBy({ email: input.email });
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
  try {
    await sendMail(user.email, passwordResetMail({ name: user.name, url, validMinutes: RESET_TOKEN_MINUTES }));
  } catch (error) {
    // Answering differently here would tell a stranger the account exists; the person asks again.
    logger.error({ err: error, userId: user.id }, 'password-reset e-mail could not be sent');
  }
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
    await audit.record(
      { organisationId: null, actorUserId: row.userId, action: 'auth.password_reset', objectType: 'user', objectId: row.userId },
      manager,
    );
  });
}
