import type { MigrationInterface, QueryRunner } from 'typeorm';

/**
 * Who changed a test's set-up, picks or readings, and when: an approver must not be among
 * them (since the test's last approval). Earlier work is taken from what the tests record:
 * the creator is not known, the technician ran the set-up and the readings.
 */
export class TestContributions1796320068018 implements MigrationInterface {
  name = 'TestContributions1796320068018';

  public async up(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(
      `CREATE TABLE "test_contributions" ("id" uuid NOT NULL DEFAULT gen_random_uuid(), "organisation_id" uuid NOT NULL, "test_id" uuid NOT NULL, "user_id" uuid NOT NULL, "kind" text NOT NULL, "at" TIMESTAMP WITH TIME ZONE NOT NULL DEFAULT now(), CONSTRAINT "PK_test_contributions" PRIMARY KEY ("id"))`,
    );
    await queryRunner.query(`CREATE INDEX "test_contributions_test_id_at_idx" ON "test_contributions" ("test_id", "at") `);
    await queryRunner.query(`CREATE INDEX "test_contributions_organisation_id_idx" ON "test_contributions" ("organisation_id") `);
    await queryRunner.query(
      `ALTER TABLE "test_contributions" ADD CONSTRAINT "test_contributions_kind_check" CHECK ("kind" IN ('set-up', 'picks', 'readings'))`,
    );
    await queryRunner.query(
      `ALTER TABLE "test_contributions" ADD CONSTRAINT "test_contributions_test_id_fkey" FOREIGN KEY ("test_id") REFERENCES "consolidation_tests"("id") ON DELETE CASCADE`,
    );
    await queryRunner.query(
      `INSERT INTO "test_contributions" ("organisation_id", "test_id", "user_id", "kind", "at")
       SELECT t.organisation_id, t.id, t.technician_id, k.kind, t.created_at FROM "consolidation_tests" t CROSS JOIN (VALUES ('set-up'), ('readings')) AS k(kind)`,
    );
    // Insert-only, like the soil record versions: the history an approval is checked against cannot be rewritten.
    await queryRunner.query(`CREATE OR REPLACE FUNCTION test_contributions_insert_only() RETURNS trigger LANGUAGE plpgsql AS $$
      BEGIN RAISE EXCEPTION 'test_contributions is insert-only'; END $$`);
    await queryRunner.query(
      `CREATE TRIGGER test_contributions_insert_only BEFORE UPDATE OR DELETE ON "test_contributions" FOR EACH ROW EXECUTE FUNCTION test_contributions_insert_only()`,
    );
  }

  public async down(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`DROP TRIGGER test_contributions_insert_only ON "test_contributions"`);
    await queryRunner.query(`DROP FUNCTION test_contributions_insert_only()`);
    await queryRunner.query(`DROP TABLE "test_contributions"`);
  }
}
