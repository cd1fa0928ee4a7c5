import { describe, expect, it } from 'vitest';
import { dataSource } from '../../data-source.js';

describe('migrations and entities', () => {
  it('when every migration has run, then the entities need no further schema change (what migration:generate --check asks)', async () => {
    const pending = await dataSource.showMigrations();
    expect(pending).toBe(false);
    const sql = await dataSource.driver.createSchemaBuilder().log();
    expect(sql.upQueries.map((q) => q.query)).toEqual([]);
  });
});
