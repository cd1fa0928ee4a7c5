import type { MigrationInterface, QueryRunner } from "typeorm";

export class Design1796323725979 implements MigrationInterface {
    name = 'Design1796323725979'

    public async up(queryRunner: QueryRunner): Promise<void> {
        await queryRunner.query(`CREATE TABLE "characteristic_sets" ("id" uuid NOT NULL DEFAULT gen_random_uuid(), "organisation_id" uuid NOT NULL, "project_id" uuid NOT NULL, "name" text NOT NULL, "current_revision" integer NOT NULL, "created_by_id" uuid NOT NULL, "created_at" TIMESTAMP WITH TIME ZONE NOT NULL DEFAULT now(), "updated_at" TIMESTAMP WITH TIME ZONE NOT NULL DEFAULT now(), CONSTRAINT "PK_f5e2cd4f899c73f14859f805673" PRIMARY KEY ("id"))`);
        await queryRunner.query(`CREATE INDEX "characteristic_sets_project_id_idx" ON "characteristic_sets"  ("project_id") `);
        await queryRunner.query(`CREATE INDEX "characteristic_sets_organisation_id_idx" ON "characteristic_sets"  ("organisation_id") `);
        await queryRunner.query(`CREATE TABLE "characteristic_set_revisions" ("id" uuid NOT NULL DEFAULT gen_random_uuid(), "organisation_id" uuid NOT NULL, "set_id" uuid NOT NULL, "revision" integer NOT NULL, "name" text NOT NULL, "note" text NOT NULL DEFAULT '', "record_version_ids" uuid array NOT NULL, "adopted" jsonb NOT NULL, "members" jsonb NOT NULL, "statistics" jsonb NOT NULL, "created_by_id" uuid NOT NULL, "created_at" TIMESTAMP WITH TIME ZONE NOT NULL DEFAULT now(), CONSTRAINT "PK_65858b0e30c26943d56488e98f7" PRIMARY KEY ("id"))`);
        await queryRunner.query(`CREATE UNIQUE INDEX "characteristic_set_revisions_set_revision_key" ON "characteristic_set_revisions"  ("set_id", "revision") `);
        await queryRunner.query(`CREATE INDEX "characteristic_set_revisions_organisation_id_idx" ON "characteristic_set_revisions"  ("organisation_id") `);
        await queryRunner.query(`CREATE TABLE "ground_models" ("id" uuid NOT NULL DEFAULT gen_random_uuid(), "organisation_id" uuid NOT NULL, "project_id" uuid NOT NULL, "name" text NOT NULL, "current_revision" integer NOT NULL, "created_by_id" uuid NOT NULL, "created_at" TIMESTAMP WITH TIME ZONE NOT NULL DEFAULT now(), "updated_at" TIMESTAMP WITH TIME ZONE NOT NULL DEFAULT now(), CONSTRAINT "PK_db7546818474bcce43db6795bcf" PRIMARY KEY ("id"))`);
        await queryRunner.query(`CREATE INDEX "ground_models_project_id_idx" ON "ground_models"  ("project_id") `);
        await queryRunner.query(`CREATE INDEX "ground_models_organisation_id_idx" ON "ground_models"  ("organisation_id") `);
        await queryRunner.query(`CREATE TABLE "ground_model_revisions" ("id" uuid NOT NULL DEFAULT gen_random_uuid(), "organisation_id" uuid NOT NULL, "ground_model_id" uuid NOT NULL, "revision" integer NOT NULL, "name" text NOT NULL, "note" text NOT NULL DEFAULT '', "content" jsonb NOT NULL, "record_version_ids" uuid array NOT NULL DEFAULT '{}', "set_revision_ids" uuid array NOT NULL DEFAULT '{}', "created_by_id" uuid NOT NULL, "created_at" TIMESTAMP WITH TIME ZONE NOT NULL DEFAULT now(), CONSTRAINT "PK_8aba7a77823ee7942ac81ca82e5" PRIMARY KEY ("id"))`);
        await queryRunner.query(`CREATE UNIQUE INDEX "ground_model_revisions_model_revision_key" ON "ground_model_revisions"  ("ground_model_id", "revision") `);
        await queryRunner.query(`CREATE INDEX "ground_model_revisions_organisation_id_idx" ON "ground_model_revisions"  ("organisation_id") `);
        await queryRunner.query(`CREATE TABLE "settlement_checks" ("id" uuid NOT NULL DEFAULT gen_random_uuid(), "organisation_id" uuid NOT NULL, "project_id" uuid NOT NULL, "name" text NOT NULL, "ground_model_id" uuid NOT NULL, "footings" jsonb NOT NULL DEFAULT '[]', "options" jsonb NOT NULL, "current_revision" integer, "pending_job_id" uuid, "created_by_id" uuid NOT NULL, "created_at" TIMESTAMP WITH TIME ZONE NOT NULL DEFAULT now(), "updated_at" TIMESTAMP WITH TIME ZONE NOT NULL DEFAULT now(), CONSTRAINT "PK_a8d03fe993d5d3787a78bd6c3b7" PRIMARY KEY ("id"))`);
        await queryRunner.query(`CREATE INDEX "settlement_checks_project_id_idx" ON "settlement_checks"  ("project_id") `);
        await queryRunner.query(`CREATE INDEX "settlement_checks_organisation_id_idx" ON "settlement_checks"  ("organisation_id") `);
        await queryRunner.query(`CREATE TABLE "settlement_check_revisions" ("id" uuid NOT NULL DEFAULT gen_random_uuid(), "organisation_id" uuid NOT NULL, "check_id" uuid NOT NULL, "revision" integer NOT NULL, "reason" text NOT NULL, "ground_model_revision_id" uuid NOT NULL, "footings" jsonb NOT NULL, "options" jsonb NOT NULL, "footings_as_run" jsonb NOT NULL, "result" json NOT NULL, "warnings" jsonb NOT NULL DEFAULT '[]', "geo_core_version" text NOT NULL, "duration_ms" double precision NOT NULL, "max_total_m" double precision NOT NULL, "pairs_over_limit" integer NOT NULL, "footings_over_limit" integer NOT NULL, "created_by_id" uuid NOT NULL, "created_at" TIMESTAMP WITH TIME ZONE NOT NULL DEFAULT now(), CONSTRAINT "PK_85bd2e8d2f800b3fc9185dced19" PRIMARY KEY ("id"))`);
        await queryRunner.query(`CREATE UNIQUE INDEX "settlement_check_revisions_check_revision_key" ON "settlement_check_revisions"  ("check_id", "revision") `);
        await queryRunner.query(`CREATE INDEX "settlement_check_revisions_organisation_id_idx" ON "settlement_check_revisions"  ("organisation_id") `);
        await queryRunner.query(`CREATE TABLE "settlement_check_footing_results" ("revision_id" uuid NOT NULL, "footing_index" integer NOT NULL, "organisation_id" uuid NOT NULL, "footing_id" text NOT NULL, "detail" json NOT NULL, CONSTRAINT "PK_54d1e39658a584c65aca0ae0c0c" PRIMARY KEY ("revision_id", "footing_index"))`);
        await queryRunner.query(`CREATE UNIQUE INDEX "settlement_check_footing_results_revision_footing_key" ON "settlement_check_footing_results"  ("revision_id", "footing_id") `);
        await queryRunner.query(`CREATE INDEX "settlement_check_footing_results_organisation_id_idx" ON "settlement_check_footing_results"  ("organisation_id") `);
        await queryRunner.query(`ALTER TABLE "characteristic_sets" ADD CONSTRAINT "characteristic_sets_project_id_fkey" FOREIGN KEY ("project_id") REFERENCES "projects"("id") ON DELETE RESTRICT ON UPDATE NO ACTION`);
        await queryRunner.query(`ALTER TABLE "characteristic_set_revisions" ADD CONSTRAINT "characteristic_set_revisions_set_id_fkey" FOREIGN KEY ("set_id") REFERENCES "characteristic_sets"("id") ON DELETE RESTRICT ON UPDATE NO ACTION`);
        await queryRunner.query(`ALTER TABLE "ground_models" ADD CONSTRAINT "ground_models_project_id_fkey" FOREIGN KEY ("project_id") REFERENCES "projects"("id") ON DELETE RESTRICT ON UPDATE NO ACTION`);
        await queryRunner.query(`ALTER TABLE "ground_model_revisions" ADD CONSTRAINT "ground_model_revisions_ground_model_id_fkey" FOREIGN KEY ("ground_model_id") REFERENCES "ground_models"("id") ON DELETE RESTRICT ON UPDATE NO ACTION`);
        await queryRunner.query(`ALTER TABLE "settlement_checks" ADD CONSTRAINT "settlement_checks_project_id_fkey" FOREIGN KEY ("project_id") REFERENCES "projects"("id") ON DELETE RESTRICT ON UPDATE NO ACTION`);
        await queryRunner.query(`ALTER TABLE "settlement_checks" ADD CONSTRAINT "settlement_checks_ground_model_id_fkey" FOREIGN KEY ("ground_model_id") REFERENCES "ground_models"("id") ON DELETE RESTRICT ON UPDATE NO ACTION`);
        await queryRunner.query(`ALTER TABLE "settlement_check_revisions" ADD CONSTRAINT "settlement_check_revisions_check_id_fkey" FOREIGN KEY ("check_id") REFERENCES "settlement_checks"("id") ON DELETE RESTRICT ON UPDATE NO ACTION`);
        await queryRunner.query(`ALTER TABLE "settlement_check_revisions" ADD CONSTRAINT "settlement_check_revisions_ground_model_revision_id_fkey" FOREIGN KEY ("ground_model_revision_id") REFERENCES "ground_model_revisions"("id") ON DELETE RESTRICT ON UPDATE NO ACTION`);
        await queryRunner.query(`ALTER TABLE "settlement_check_footing_results" ADD CONSTRAINT "settlement_check_footing_results_revision_id_fkey" FOREIGN KEY ("revision_id") REFERENCES "settlement_check_revisions"("id") ON DELETE RESTRICT ON UPDATE NO ACTION`);
        // Revisions are what checks pin and reports print: no code path may change or remove one.
        await queryRunner.query(`CREATE FUNCTION "refuse_change_to_design_revision"() RETURNS trigger LANGUAGE plpgsql AS $$
BEGIN
  RAISE EXCEPTION 'rows of % are immutable: a saved revision cannot be changed or removed; save a new revision instead', TG_TABLE_NAME
    USING ERRCODE = 'integrity_constraint_violation';
END
$$`);
        await queryRunner.query(`CREATE TRIGGER "ground_model_revisions_immutable" BEFORE UPDATE OR DELETE ON "ground_model_revisions" FOR EACH ROW EXECUTE FUNCTION "refuse_change_to_design_revision"()`);
        await queryRunner.query(`CREATE TRIGGER "ground_model_revisions_no_truncate" BEFORE TRUNCATE ON "ground_model_revisions" FOR EACH STATEMENT EXECUTE FUNCTION "refuse_change_to_design_revision"()`);
        await queryRunner.query(`CREATE TRIGGER "characteristic_set_revisions_immutable" BEFORE UPDATE OR DELETE ON "characteristic_set_revisions" FOR EACH ROW EXECUTE FUNCTION "refuse_change_to_design_revision"()`);
        await queryRunner.query(`CREATE TRIGGER "characteristic_set_revisions_no_truncate" BEFORE TRUNCATE ON "characteristic_set_revisions" FOR EACH STATEMENT EXECUTE FUNCTION "refuse_change_to_design_revision"()`);
        await queryRunner.query(`CREATE TRIGGER "settlement_check_revisions_immutable" BEFORE UPDATE OR DELETE ON "settlement_check_revisions" FOR EACH ROW EXECUTE FUNCTION "refuse_change_to_design_revision"()`);
        await queryRunner.query(`CREATE TRIGGER "settlement_check_revisions_no_truncate" BEFORE TRUNCATE ON "settlement_check_revisions" FOR EACH STATEMENT EXECUTE FUNCTION "refuse_change_to_design_revision"()`);
        await queryRunner.query(`CREATE TRIGGER "settlement_check_footing_results_immutable" BEFORE UPDATE OR DELETE ON "settlement_check_footing_results" FOR EACH ROW EXECUTE FUNCTION "refuse_change_to_design_revision"()`);
        await queryRunner.query(`CREATE TRIGGER "settlement_check_footing_results_no_truncate" BEFORE TRUNCATE ON "settlement_check_footing_results" FOR EACH STATEMENT EXECUTE FUNCTION "refuse_change_to_design_revision"()`);
    }

    public async down(queryRunner: QueryRunner): Promise<void> {
        await queryRunner.query(`DROP TRIGGER "settlement_check_footing_results_no_truncate" ON "settlement_check_footing_results"`);
        await queryRunner.query(`DROP TRIGGER "settlement_check_footing_results_immutable" ON "settlement_check_footing_results"`);
        await queryRunner.query(`DROP TRIGGER "settlement_check_revisions_no_truncate" ON "settlement_check_revisions"`);
        await queryRunner.query(`DROP TRIGGER "settlement_check_revisions_immutable" ON "settlement_check_revisions"`);
        await queryRunner.query(`DROP TRIGGER "characteristic_set_revisions_no_truncate" ON "characteristic_set_revisions"`);
        await queryRunner.query(`DROP TRIGGER "characteristic_set_revisions_immutable" ON "characteristic_set_revisions"`);
        await queryRunner.query(`DROP TRIGGER "ground_model_revisions_no_truncate" ON "ground_model_revisions"`);
        await queryRunner.query(`DROP TRIGGER "ground_model_revisions_immutable" ON "ground_model_revisions"`);
        await queryRunner.query(`DROP FUNCTION "refuse_change_to_design_revision"()`);
        await queryRunner.query(`ALTER TABLE "settlement_check_footing_results" DROP CONSTRAINT "settlement_check_footing_results_revision_id_fkey"`);
        await queryRunner.query(`ALTER TABLE "settlement_check_revisions" DROP CONSTRAINT "settlement_check_revisions_ground_model_revision_id_fkey"`);
        await queryRunner.query(`ALTER TABLE "settlement_check_revisions" DROP CONSTRAINT "settlement_check_revisions_check_id_fkey"`);
        await queryRunner.query(`ALTER TABLE "settlement_checks" DROP CONSTRAINT "settlement_checks_ground_model_id_fkey"`);
        await queryRunner.query(`ALTER TABLE "settlement_checks" DROP CONSTRAINT "settlement_checks_project_id_fkey"`);
        await queryRunner.query(`ALTER TABLE "ground_model_revisions" DROP CONSTRAINT "ground_model_revisions_ground_model_id_fkey"`);
        await queryRunner.query(`ALTER TABLE "ground_models" DROP CONSTRAINT "ground_models_project_id_fkey"`);
        await queryRunner.query(`ALTER TABLE "characteristic_set_revisions" DROP CONSTRAINT "characteristic_set_revisions_set_id_fkey"`);
        await queryRunner.query(`ALTER TABLE "characteristic_sets" DROP CONSTRAINT "characteristic_sets_project_id_fkey"`);
        await queryRunner.query(`DROP INDEX "public"."settlement_check_footing_results_organisation_id_idx"`);
        await queryRunner.query(`DROP INDEX "public"."settlement_check_footing_results_revision_footing_key"`);
        await queryRunner.query(`DROP TABLE "settlement_check_footing_results"`);
        await queryRunner.query(`DROP INDEX "public"."settlement_check_revisions_organisation_id_idx"`);
        await queryRunner.query(`DROP INDEX "public"."settlement_check_revisions_check_revision_key"`);
        await queryRunner.query(`DROP TABLE "settlement_check_revisions"`);
        await queryRunner.query(`DROP INDEX "public"."settlement_checks_organisation_id_idx"`);
        await queryRunner.query(`DROP INDEX "public"."settlement_checks_project_id_idx"`);
        await queryRunner.query(`DROP TABLE "settlement_checks"`);
        await queryRunner.query(`DROP INDEX "public"."ground_model_revisions_organisation_id_idx"`);
        await queryRunner.query(`DROP INDEX "public"."ground_model_revisions_model_revision_key"`);
        await queryRunner.query(`DROP TABLE "ground_model_revisions"`);
        await queryRunner.query(`DROP INDEX "public"."ground_models_organisation_id_idx"`);
        await queryRunner.query(`DROP INDEX "public"."ground_models_project_id_idx"`);
        await queryRunner.query(`DROP TABLE "ground_models"`);
        await queryRunner.query(`DROP INDEX "public"."characteristic_set_revisions_organisation_id_idx"`);
        await queryRunner.query(`DROP INDEX "public"."characteristic_set_revisions_set_revision_key"`);
        await queryRunner.query(`DROP TABLE "characteristic_set_revisions"`);
        await queryRunner.query(`DROP INDEX "public"."characteristic_sets_organisation_id_idx"`);
        await queryRunner.query(`DROP INDEX "public"."characteristic_sets_project_id_idx"`);
        await queryRunner.query(`DROP TABLE "characteristic_sets"`);
    }

}
