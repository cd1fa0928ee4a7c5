import type { MigrationInterface, QueryRunner } from 'typeorm';

/**
 * Row-level security on every tenant-owned table (each table with an organisation_id): a
 * row is seen, written or changed only when the connection's `porestack.org_id` setting is
 * empty (work outside any organisation: sign-in, migrations, housekeeping) or names the
 * row's organisation. db/tenant-wall.ts sets it for each request and job of one
 * organisation and switches the connection to the `porestack_tenant` role meanwhile: the
 * login role owns the tables and passes the walls (not FORCEd: the readings' bulk COPY runs
 * as it, since PostgreSQL refuses COPY FROM under row-level security), porestack_tenant is
 * bound by them. A table added later calls porestack_add_tenant_wall('<table>') in its own
 * migration; a test checks that none is missed.
 */
export class RowLevelSecurity1796324847360 implements MigrationInterface {
  name = 'RowLevelSecurity1796324847360';

  public async up(queryRunner: QueryRunner): Promise<void> {
    // Roles belong to the whole cluster: another database of it may have made this one already.
    await queryRunner.query(`DO $$
      BEGIN
        CREATE ROLE porestack_tenant NOLOGIN;
      EXCEPTION WHEN duplicate_object OR unique_violation THEN NULL;
      END
    $$`);
    await queryRunner.query('GRANT porestack_tenant TO CURRENT_USER');
    await queryRunner.query('GRANT USAGE ON SCHEMA public TO porestack_tenant');
    await queryRunner.query('GRANT SELECT, INSERT, UPDATE, DELETE ON ALL TABLES IN SCHEMA public TO porestack_tenant');
    await queryRunner.query('GRANT USAGE, SELECT ON ALL SEQUENCES IN SCHEMA public TO porestack_tenant');
    // Tables made later by this role (later migrations; pg-boss's schema and its per-queue tables,
    // which a request writes to when it queues a job in its own transaction) are open to it too.
    await queryRunner.query('ALTER DEFAULT PRIVILEGES GRANT SELECT, INSERT, UPDATE, DELETE ON TABLES TO porestack_tenant');
    await queryRunner.query('ALTER DEFAULT PRIVILEGES GRANT USAGE, SELECT ON SEQUENCES TO porestack_tenant');
    await queryRunner.query('ALTER DEFAULT PRIVILEGES GRANT USAGE ON SCHEMAS TO porestack_tenant');
    await queryRunner.query(`DO $$
      BEGIN
        IF EXISTS (SELECT 1 FROM pg_namespace WHERE nspname = 'pgboss') THEN
          GRANT USAGE ON SCHEMA pgboss TO porestack_tenant;
          GRANT SELECT, INSERT, UPDATE, DELETE ON ALL TABLES IN SCHEMA pgboss TO porestack_tenant;
          GRANT USAGE, SELECT ON ALL SEQUENCES IN SCHEMA pgboss TO porestack_tenant;
        END IF;
      END
    $$`);
    await queryRunner.query(`CREATE FUNCTION porestack_sees(organisation uuid) RETURNS boolean LANGUAGE sql STABLE AS $$
      SELECT coalesce(current_setting('porestack.org_id', true), '') = ''
          OR organisation = nullif(current_setting('porestack.org_id', true), '')::uuid
    $$`);
    await queryRunner.query(`CREATE FUNCTION porestack_add_tenant_wall(target regclass) RETURNS void LANGUAGE plpgsql AS $$
      BEGIN
        EXECUTE format('ALTER TABLE %s ENABLE ROW LEVEL SECURITY', target);
        EXECUTE format('CREATE POLICY tenant_wall ON %s USING (porestack_sees(organisation_id)) WITH CHECK (porestack_sees(organisation_id))', target);
      END
    $$`);
    await queryRunner.query(`DO $$
      DECLARE owned record;
      BEGIN
        FOR owned IN SELECT c.table_name FROM information_schema.columns c
                       JOIN information_schema.tables t ON t.table_schema = c.table_schema AND t.table_name = c.table_name
                      WHERE c.table_schema = 'public' AND c.column_name = 'organisation_id' AND t.table_type = 'BASE TABLE' LOOP
          PERFORM porestack_add_tenant_wall(format('public.%I', owned.table_name)::regclass);
        END LOOP;
      END
    $$`);
  }

  public async down(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`DO $$
      DECLARE walled record;
      BEGIN
        FOR walled IN SELECT tablename FROM pg_policies WHERE schemaname = 'public' AND policyname = 'tenant_wall' LOOP
          EXECUTE format('DROP POLICY tenant_wall ON public.%I', walled.tablename);
          EXECUTE format('ALTER TABLE public.%I DISABLE ROW LEVEL SECURITY', walled.tablename);
        END LOOP;
      END
    $$`);
    await queryRunner.query('ALTER DEFAULT PRIVILEGES REVOKE SELECT, INSERT, UPDATE, DELETE ON TABLES FROM porestack_tenant');
    await queryRunner.query('ALTER DEFAULT PRIVILEGES REVOKE USAGE, SELECT ON SEQUENCES FROM porestack_tenant');
    await queryRunner.query('ALTER DEFAULT PRIVILEGES REVOKE USAGE ON SCHEMAS FROM porestack_tenant');
    await queryRunner.query('REVOKE ALL ON ALL TABLES IN SCHEMA public FROM porestack_tenant');
    await queryRunner.query('REVOKE ALL ON ALL SEQUENCES IN SCHEMA public FROM porestack_tenant');
    await queryRunner.query('DROP FUNCTION porestack_add_tenant_wall(regclass)');
    await queryRunner.query('DROP FUNCTION porestack_sees(uuid)');
  }
}
