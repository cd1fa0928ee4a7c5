import { describe, expect, it } from 'vitest';
import { dataSource } from '../../data-source.js';
import { MembershipRoles1796313749156 } from '../1796313749156-membership-roles.js';

/** Rolled back whatever happens: DDL is transactional in PostgreSQL, so nothing outlives the test. */
async function inRolledBackTransaction(work: (query: (sql: string, parameters?: unknown[]) => Promise<unknown>) => Promise<void>): Promise<void> {
  const runner = dataSource.createQueryRunner();
  await runner.connect();
  await runner.startTransaction();
  try {
    await work((sql, parameters) => runner.query(sql, parameters));
  } finally {
    await runner.rollbackTransaction();
    await runner.release();
  }
}

describe('migration MembershipRoles1796313749156', () => {
  it('when memberships and invitations held one role each, then after the migration each holds that role as a set of one', async () => {
    const migration = new MembershipRoles1796313749156();
    await inRolledBackTransaction(async (query) => {
      const runner = { query } as Parameters<typeof migration.up>[0];
      await migration.down(runner);
      const [org] = (await query(`INSERT INTO organisations (name) VALUES ('Migrated lab') RETURNING id`)) as Array<{ id: string }>;
      const [user] = (await query(`INSERT INTO users (email, name, password_hash) VALUES ('migrated@example.test', 'Migrated', 'x') RETURNING id`)) as Array<{ id: string }>;
      await query(`INSERT INTO memberships (organisation_id, user_id, role) VALUES ($1, $2, 'lab_manager')`, [org?.id, user?.id]);
      await query(
        `INSERT INTO invitations (organisation_id, email, role, token_hash, invited_by_id, expires_at) VALUES ($1, 'next@example.test', 'designer', 'h', $2, now())`,
        [org?.id, user?.id],
      );

      await migration.up(runner);

      expect(await query('SELECT roles FROM memberships WHERE organisation_id = $1', [org?.id])).toEqual([{ roles: ['lab_manager'] }]);
      expect(await query('SELECT roles FROM invitations WHERE organisation_id = $1', [org?.id])).toEqual([{ roles: ['designer'] }]);
      await expect(query(`UPDATE memberships SET roles = '{}' WHERE organisation_id = $1`, [org?.id])).rejects.toThrow(/memberships_roles_not_empty/);
    });
  });
});
