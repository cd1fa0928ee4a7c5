import { LessThan } from 'typeorm';
import { dataSource } from '../data-source.js';
import { PasswordResetTokenEntity } from '../modules/auth/password-reset-token.entity.js';
import type { JobDefinition } from './job-definition.js';

/**
 * Used or expired reset tokens are kept a day (for support questions), then deleted; so are
 * ended or expired sessions, and rate-limit counts whose window has closed.
 */
const KEEP_MS = 24 * 3600_000;

export async function deleteExpiredTokens(now = new Date()): Promise<number> {
  const cutoff = new Date(now.getTime() - KEEP_MS);
  const tokens = dataSource.getRepository(PasswordResetTokenEntity);
  const expired = await tokens.delete({ expiresAt: LessThan(cutoff) });
  const used = await tokens.delete({ usedAt: LessThan(cutoff) });
  await dataSource.query('DELETE FROM sessions WHERE ended_at < $1 OR expires_at < $1', [cutoff]);
  await dataSource.query('DELETE FROM rate_limits WHERE expire < $1', [now.getTime()]);
  return (expired.affected ?? 0) + (used.affected ?? 0);
}

export const deleteExpiredTokensJob: JobDefinition = {
  name: 'housekeeping.delete-expired-tokens',
  schedule: '17 3 * * *',
  handler: async () => {
    await deleteExpiredTokens();
  },
};
