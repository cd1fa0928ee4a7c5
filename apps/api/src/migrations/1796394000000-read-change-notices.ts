import type { MigrationInterface, QueryRunner } from 'typeorm';

/** The tables whose rows the kept reads (db/read-cache.ts) are made of, each with an organisation_id. */
const TENANT_TABLES = ['projects', 'boreholes', 'samples', 'consolidation_tests', 'job_runs', 'review_events'];

/**
 * A notice on the `porestack_reads` channel, at commit, naming the organisation whose rows changed
 * ('*' for a TRUNCATE, which fires no row triggers), so every API process drops what it kept of
 * that organisation. From the database itself: no write path of the application (a request, a
 * job in the worker, a migration, a person in psql) can change these rows without it. PostgreSQL
 * sends one notice per organisation and transaction however many rows changed.
 *
 * A user's name shows in the tests of every organisation they belong to; the function runs as its
 * owner (the login role, which the tenant walls do not bind) to find them all from one tenant's work.
 */
export class ReadChangeNotices1796394000000 implements MigrationInterface {
  name = 'ReadChangeNotices1796394000000';

  public async up(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`CREATE FUNCTION porestack_reads_changed() RETURNS trigger LANGUAGE plpgsql SECURITY DEFINER SET search_path = public AS $$
      BEGIN
        IF TG_OP = 'TRUNCATE' THEN
          PERFORM pg_notify('porestack_reads', '*');
        ELSIF TG_TABLE_NAME = 'users' THEN
          PERFORM pg_notify('porestack_reads', m.organisation_id::text) FROM memberships m WHERE m.user_id = OLD.id;
        ELSIF TG_OP = 'DELETE' THEN
          PERFORM pg_notify('porestack_reads', OLD.organisation_id::text);
        ELSE
          PERFORM pg_notify('porestack_reads', NEW.organisation_id::text);
        END IF;
        RETURN NULL;
      END
    $$`);
    for (const table of TENANT_TABLES) {
      await queryRunner.query(`CREATE TRIGGER porestack_reads_changed AFTER INSERT OR UPDATE OR DELETE ON ${table} FOR EACH ROW EXECUTE FUNCTION porestack_reads_changed()`);
      await queryRunner.query(`CREATE TRIGGER porestack_reads_truncated AFTER TRUNCATE ON ${table} FOR EACH STATEMENT EXECUTE FUNCTION porestack_reads_changed()`);
    }
    await queryRunner.query('CREATE TRIGGER porestack_reads_changed AFTER UPDATE OF name OR DELETE ON users FOR EACH ROW EXECUTE FUNCTION porestack_reads_changed()');
    await queryRunner.query('CREATE TRIGGER porestack_reads_truncated AFTER TRUNCATE ON users FOR EACH STATEMENT EXECUTE FUNCTION porestack_reads_changed()');
  }

  public async down(queryRunner: QueryRunner): Promise<void> {
    for (const table of [...TENANT_TABLES, 'users']) {
      await queryRunner.query(`DROP TRIGGER porestack_reads_changed ON ${table}`);
      await queryRunner.query(`DROP TRIGGER porestack_reads_truncated ON ${table}`);
    }
    await queryRunner.query('DROP FUNCTION porestack_reads_changed()');
  }
}
