import type { MigrationInterface, QueryRunner } from "typeorm";

export class IssuedReports1796313882857 implements MigrationInterface {
    name = 'IssuedReports1796313882857'

    public async up(queryRunner: QueryRunner): Promise<void> {
        await queryRunner.query(`CREATE TABLE "issued_reports" ("id" uuid NOT NULL DEFAULT gen_random_uuid(), "organisation_id" uuid NOT NULL, "kind" text NOT NULL, "subject_id" uuid NOT NULL, "test_id" uuid, "state" text NOT NULL DEFAULT 'queued', "message" text, "job_run_id" uuid, "object_key" text, "file_name" text, "sha256" text, "byte_size" integer, "generated_at" TIMESTAMP WITH TIME ZONE, "created_at" TIMESTAMP WITH TIME ZONE NOT NULL DEFAULT now(), CONSTRAINT "PK_7f5085e13b7612397daab8b7897" PRIMARY KEY ("id"))`);
        await queryRunner.query(`CREATE INDEX "issued_reports_test_id_idx" ON "issued_reports"  ("test_id") `);
        await queryRunner.query(`CREATE UNIQUE INDEX "issued_reports_kind_subject_id_key" ON "issued_reports"  ("kind", "subject_id") `);
        await queryRunner.query(`CREATE INDEX "issued_reports_organisation_id_idx" ON "issued_reports"  ("organisation_id") `);
        await queryRunner.query(`ALTER TABLE "organisations" ADD "report_address" text NOT NULL DEFAULT ''`);
        await queryRunner.query(`ALTER TABLE "organisations" ADD "test_method_statement" text`);
        // An issued file never changes: once a report has its hash, the file, the hash and the
        // row stay as they are (a failed or pending report may still be updated and retried).
        await queryRunner.query(`CREATE FUNCTION "refuse_change_to_issued_report"() RETURNS trigger LANGUAGE plpgsql AS $$
BEGIN
  IF OLD.sha256 IS NOT NULL THEN
    RAISE EXCEPTION 'issued report % is final: its stored file and hash cannot be changed or removed', OLD.id
      USING ERRCODE = 'integrity_constraint_violation';
  END IF;
  IF TG_OP = 'DELETE' THEN RETURN OLD; END IF;
  RETURN NEW;
END
$$`);
        await queryRunner.query(`CREATE TRIGGER "issued_reports_final" BEFORE UPDATE OR DELETE ON "issued_reports" FOR EACH ROW EXECUTE FUNCTION "refuse_change_to_issued_report"()`);
        await queryRunner.query(`CREATE TRIGGER "issued_reports_no_truncate" BEFORE TRUNCATE ON "issued_reports" FOR EACH STATEMENT EXECUTE FUNCTION "refuse_change_to_approved_record"()`);
    }

    public async down(queryRunner: QueryRunner): Promise<void> {
        await queryRunner.query(`DROP TRIGGER "issued_reports_no_truncate" ON "issued_reports"`);
        await queryRunner.query(`DROP TRIGGER "issued_reports_final" ON "issued_reports"`);
        await queryRunner.query(`DROP FUNCTION "refuse_change_to_issued_report"()`);
        await queryRunner.query(`ALTER TABLE "organisations" DROP COLUMN "test_method_statement"`);
        await queryRunner.query(`ALTER TABLE "organisations" DROP COLUMN "report_address"`);
        await queryRunner.query(`DROP INDEX "public"."issued_reports_organisation_id_idx"`);
        await queryRunner.query(`DROP INDEX "public"."issued_reports_kind_subject_id_key"`);
        await queryRunner.query(`DROP INDEX "public"."issued_reports_test_id_idx"`);
        await queryRunner.query(`DROP TABLE "issued_reports"`);
    }

}
