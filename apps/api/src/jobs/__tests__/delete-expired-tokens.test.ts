import { randomUUID } from 'node:crypto';
import { describe, expect, it } from 'vitest';
import { dataSource } from '../../data-source.js';
import { PasswordResetTokenEntity } from '../../modules/auth/password-reset-token.entity.js';
import { createMember } from '../../testing/browser.js';
import { createBoss } from '../boss.js';
import { deleteExpiredTokens, deleteExpiredTokensJob } from '../delete-expired-tokens.job.js';
import { registerJobs } from '../register-jobs.js';
import { OrganisationEntity } from '../../modules/organisations/organisation.entity.js';

const DAY = 24 * 3600_000;

async function tokenFor(userId: string, expiresInMs: number, usedAgoMs: number | null): Promise<string> {
  const row = await dataSource.getRepository(PasswordResetTokenEntity).save({
    userId,
    tokenHash: randomUUID(),
    expiresAt: new Date(Date.now() + expiresInMs),
    usedAt: usedAgoMs === null ? null : new Date(Date.now() - usedAgoMs),
  });
  return row.id;
}

async function someUser(): Promise<string> {
  const org = await dataSource.getRepository(OrganisationEntity).save({ name: 'Housekeeping Org' });
  return (await createMember(org.id, 'technician', 'housekeeping')).userId;
}

describe('deleteExpiredTokens()', () => {
  it('when tokens expired or were used more than a day ago, then they are deleted and recent ones stay', async () => {
    const userId = await someUser();
    const oldExpired = await tokenFor(userId, -2 * DAY, null);
    const oldUsed = await tokenFor(userId, 2 * DAY, 2 * DAY);
    const fresh = await tokenFor(userId, 3600_000, null);
    const recentlyUsed = await tokenFor(userId, 3600_000, 60_000);
    await deleteExpiredTokens();
    const left = (await dataSource.getRepository(PasswordResetTokenEntity).findBy({ userId })).map((t) => t.id).sort();
    expect(left).toEqual([fresh, recentlyUsed].sort());
    expect(left).not.toContain(oldExpired);
    expect(left).not.toContain(oldUsed);
  });

  it('when the worker’s queue gets the housekeeping job, then pg-boss runs the handler to completion', async () => {
    const userId = await someUser();
    const oldExpired = await tokenFor(userId, -2 * DAY, null);
    const boss = createBoss();
    await boss.start();
    try {
      // Without the cron schedule: the test sends the job itself.
      await registerJobs(boss, [{ name: deleteExpiredTokensJob.name, handler: deleteExpiredTokensJob.handler }]);
      const jobId = await boss.send(deleteExpiredTokensJob.name, {});
      expect(jobId).toBeTruthy();
      const deadline = Date.now() + 15_000;
      let state: string | undefined;
      while (Date.now() < deadline) {
        state = (await boss.getJobById(deleteExpiredTokensJob.name, jobId ?? ''))?.state;
        if (state === 'completed' || state === 'failed') break;
        await new Promise((resolve) => setTimeout(resolve, 200));
      }
      expect(state).toBe('completed');
      expect(await dataSource.getRepository(PasswordResetTokenEntity).existsBy({ id: oldExpired })).toBe(false);
    } finally {
      await boss.stop({ graceful: false, wait: true });
    }
  });
});
