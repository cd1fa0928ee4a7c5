import type { MigrationInterface, QueryRunner } from "typeorm";

export class LabRecords1796180920952 implements MigrationInterface {
    name = 'LabRecords1796180920952'

    public async up(queryRunner: QueryRunner): Promise<void> {
        await queryRunner.query(`CREATE TABLE "projects" ("id" uuid NOT NULL DEFAULT gen_random_uuid(), "organisation_id" uuid NOT NULL, "name" text NOT NULL, "reference" text NOT NULL, "client_name" text NOT NULL, "site_name" text NOT NULL DEFAULT '', "created_by_id" uuid NOT NULL, "created_at" TIMESTAMP WITH TIME ZONE NOT NULL DEFAULT now(), "updated_at" TIMESTAMP WITH TIME ZONE NOT NULL DEFAULT now(), CONSTRAINT "PK_6271df0a7aed1d6c0691ce6ac50" PRIMARY KEY ("id"))`);
        await queryRunner.query(`CREATE UNIQUE INDEX "projects_organisation_reference_key" ON "projects"  ("organisation_id", "reference") `);
        await queryRunner.query(`CREATE INDEX "projects_organisation_id_idx" ON "projects"  ("organisation_id") `);
        await queryRunner.query(`CREATE TABLE "boreholes" ("id" uuid NOT NULL DEFAULT gen_random_uuid(), "organisation_id" uuid NOT NULL, "project_id" uuid NOT NULL, "name" text NOT NULL, "ground_level_m_od" double precision, "water_table_depth_m" double precision, "created_at" TIMESTAMP WITH TIME ZONE NOT NULL DEFAULT now(), CONSTRAINT "PK_1b3e672d70e789edd2135bef474" PRIMARY KEY ("id"))`);
        await queryRunner.query(`CREATE UNIQUE INDEX "boreholes_project_name_key" ON "boreholes"  ("project_id", "name") `);
        await queryRunner.query(`CREATE INDEX "boreholes_organisation_id_idx" ON "boreholes"  ("organisation_id") `);
        await queryRunner.query(`CREATE TABLE "samples" ("id" uuid NOT NULL DEFAULT gen_random_uuid(), "organisation_id" uuid NOT NULL, "borehole_id" uuid NOT NULL, "reference" text NOT NULL, "top_depth_m" double precision NOT NULL, "bottom_depth_m" double precision NOT NULL, "description" text NOT NULL DEFAULT '', "bulk_unit_weight_kn_per_m3" double precision, "in_situ_stress_kpa" double precision, "created_at" TIMESTAMP WITH TIME ZONE NOT NULL DEFAULT now(), CONSTRAINT "PK_d68b5b3bd25a6851b033fb63444" PRIMARY KEY ("id"))`);
        await queryRunner.query(`CREATE UNIQUE INDEX "samples_borehole_reference_key" ON "samples"  ("borehole_id", "reference") `);
        await queryRunner.query(`CREATE INDEX "samples_organisation_id_idx" ON "samples"  ("organisation_id") `);
        await queryRunner.query(`CREATE TABLE "consolidation_tests" ("id" uuid NOT NULL DEFAULT gen_random_uuid(), "organisation_id" uuid NOT NULL, "sample_id" uuid NOT NULL, "reference" text NOT NULL, "status" text NOT NULL DEFAULT 'draft', "technician_id" uuid NOT NULL, "initial_height_mm" double precision, "diameter_mm" double precision, "specific_gravity" double precision, "dry_mass_g" double precision, "initial_water_content" double precision, "wet_mass_g" double precision, "final_water_content" double precision, "drainage" text NOT NULL DEFAULT 'double', "apparatus_name" text NOT NULL DEFAULT '', "compliance" jsonb NOT NULL DEFAULT '[]', "started_on" date, "finished_on" date, "picks" jsonb NOT NULL DEFAULT '{}', "pick_reason" text, "latest_upload_id" uuid, "latest_analysis_id" uuid, "submitted_at" TIMESTAMP WITH TIME ZONE, "submitted_by_id" uuid, "created_at" TIMESTAMP WITH TIME ZONE NOT NULL DEFAULT now(), "updated_at" TIMESTAMP WITH TIME ZONE NOT NULL DEFAULT now(), CONSTRAINT "PK_49868668c95c0de2553be218c5e" PRIMARY KEY ("id"))`);
        await queryRunner.query(`CREATE UNIQUE INDEX "consolidation_tests_organisation_reference_key" ON "consolidation_tests"  ("organisation_id", "reference") `);
        await queryRunner.query(`CREATE INDEX "consolidation_tests_sample_id_idx" ON "consolidation_tests"  ("sample_id") `);
        await queryRunner.query(`CREATE INDEX "consolidation_tests_organisation_id_status_idx" ON "consolidation_tests"  ("organisation_id", "status") `);
        await queryRunner.query(`CREATE TABLE "analyses" ("id" uuid NOT NULL DEFAULT gen_random_uuid(), "organisation_id" uuid NOT NULL, "test_id" uuid NOT NULL, "geo_core_version" text NOT NULL, "inputs_hash" text NOT NULL, "picks" jsonb NOT NULL DEFAULT '{}', "pick_reason" text, "upload_id" uuid, "result" jsonb NOT NULL, "warning_count" integer NOT NULL, "reading_count" integer NOT NULL, "requested_by_id" uuid, "created_at" TIMESTAMP WITH TIME ZONE NOT NULL DEFAULT now(), CONSTRAINT "PK_91421900ca225ed9865d016a940" PRIMARY KEY ("id"))`);
        await queryRunner.query(`CREATE INDEX "analyses_test_id_created_at_idx" ON "analyses"  ("test_id", "created_at") `);
        await queryRunner.query(`CREATE INDEX "analyses_organisation_id_idx" ON "analyses"  ("organisation_id") `);
        await queryRunner.query(`CREATE TABLE "job_runs" ("id" uuid NOT NULL DEFAULT gen_random_uuid(), "organisation_id" uuid NOT NULL, "kind" text NOT NULL, "state" text NOT NULL DEFAULT 'queued', "progress" double precision NOT NULL DEFAULT '0', "message" text, "test_id" uuid, "upload_id" uuid, "result" jsonb, "boss_job_id" text, "created_by_id" uuid, "created_at" TIMESTAMP WITH TIME ZONE NOT NULL DEFAULT now(), "updated_at" TIMESTAMP WITH TIME ZONE NOT NULL DEFAULT now(), CONSTRAINT "PK_4d0012c04fcfc287550b76be7e9" PRIMARY KEY ("id"))`);
        await queryRunner.query(`CREATE INDEX "job_runs_test_id_idx" ON "job_runs"  ("test_id") `);
        await queryRunner.query(`CREATE INDEX "job_runs_organisation_id_created_at_idx" ON "job_runs"  ("organisation_id", "created_at") `);
        await queryRunner.query(`CREATE TABLE "project_members" ("id" uuid NOT NULL DEFAULT gen_random_uuid(), "organisation_id" uuid NOT NULL, "project_id" uuid NOT NULL, "user_id" uuid NOT NULL, "role" text NOT NULL DEFAULT 'designer', "created_at" TIMESTAMP WITH TIME ZONE NOT NULL DEFAULT now(), CONSTRAINT "PK_0b2f46f804be4aea9234c78bcc9" PRIMARY KEY ("id"))`);
        await queryRunner.query(`CREATE UNIQUE INDEX "project_members_project_user_key" ON "project_members"  ("project_id", "user_id") `);
        await queryRunner.query(`CREATE INDEX "project_members_organisation_id_idx" ON "project_members"  ("organisation_id") `);
        await queryRunner.query(`CREATE TABLE "review_events" ("id" uuid NOT NULL DEFAULT gen_random_uuid(), "organisation_id" uuid NOT NULL, "test_id" uuid NOT NULL, "decision" text NOT NULL, "comment" text, "actor_id" uuid NOT NULL, "analysis_id" uuid, "at" TIMESTAMP WITH TIME ZONE NOT NULL DEFAULT now(), CONSTRAINT "PK_56256411bd89756b5d504504f59" PRIMARY KEY ("id"))`);
        await queryRunner.query(`CREATE INDEX "review_events_test_id_at_idx" ON "review_events"  ("test_id", "at") `);
        await queryRunner.query(`CREATE INDEX "review_events_organisation_id_idx" ON "review_events"  ("organisation_id") `);
        await queryRunner.query(`CREATE TABLE "soil_records" ("id" uuid NOT NULL DEFAULT gen_random_uuid(), "organisation_id" uuid NOT NULL, "test_id" uuid NOT NULL, "sample_id" uuid NOT NULL, "project_id" uuid NOT NULL, "current_version" integer NOT NULL, "created_at" TIMESTAMP WITH TIME ZONE NOT NULL DEFAULT now(), CONSTRAINT "PK_7e139c232eadebd5e4823d4170d" PRIMARY KEY ("id"))`);
        await queryRunner.query(`CREATE UNIQUE INDEX "soil_records_test_id_key" ON "soil_records"  ("test_id") `);
        await queryRunner.query(`CREATE INDEX "soil_records_organisation_id_idx" ON "soil_records"  ("organisation_id") `);
        await queryRunner.query(`CREATE TABLE "soil_record_versions" ("id" uuid NOT NULL DEFAULT gen_random_uuid(), "organisation_id" uuid NOT NULL, "record_id" uuid NOT NULL, "version" integer NOT NULL, "test_id" uuid NOT NULL, "analysis_id" uuid NOT NULL, "upload_id" uuid, "upload_sha256" text, "geo_core_version" text NOT NULL, "initial_void_ratio" double precision NOT NULL, "compression_index" double precision, "recompression_index" double precision, "swell_index" double precision, "preconsolidation_casagrande_kpa" double precision, "preconsolidation_pacheco_silva_kpa" double precision, "preconsolidation_adopted_kpa" double precision, "preconsolidation_adopted_from" text, "overconsolidation_ratio" double precision, "cv_min_m2_per_yr" double precision, "cv_max_m2_per_yr" double precision, "secondary_compression_index" double precision, "sample_quality" text, "approved_by_id" uuid NOT NULL, "approved_at" TIMESTAMP WITH TIME ZONE NOT NULL DEFAULT now(), CONSTRAINT "PK_8de59a733c6a2d1c8c25511a89d" PRIMARY KEY ("id"))`);
        await queryRunner.query(`CREATE UNIQUE INDEX "soil_record_versions_record_version_key" ON "soil_record_versions"  ("record_id", "version") `);
        await queryRunner.query(`CREATE INDEX "soil_record_versions_organisation_id_idx" ON "soil_record_versions"  ("organisation_id") `);
        await queryRunner.query(`CREATE TABLE "soil_record_supersessions" ("version_id" uuid NOT NULL, "organisation_id" uuid NOT NULL, "superseded_by_id" uuid NOT NULL, "superseded_at" TIMESTAMP WITH TIME ZONE NOT NULL DEFAULT now(), CONSTRAINT "PK_3e77b3a9937c725dee3aeb62a3b" PRIMARY KEY ("version_id"))`);
        await queryRunner.query(`CREATE INDEX "soil_record_supersessions_organisation_id_idx" ON "soil_record_supersessions"  ("organisation_id") `);
        await queryRunner.query(`ALTER TABLE "projects" ADD CONSTRAINT "projects_organisation_id_fkey" FOREIGN KEY ("organisation_id") REFERENCES "organisations"("id") ON DELETE RESTRICT ON UPDATE NO ACTION`);
        await queryRunner.query(`ALTER TABLE "boreholes" ADD CONSTRAINT "boreholes_project_id_fkey" FOREIGN KEY ("project_id") REFERENCES "projects"("id") ON DELETE RESTRICT ON UPDATE NO ACTION`);
        await queryRunner.query(`ALTER TABLE "samples" ADD CONSTRAINT "samples_borehole_id_fkey" FOREIGN KEY ("borehole_id") REFERENCES "boreholes"("id") ON DELETE RESTRICT ON UPDATE NO ACTION`);
        await queryRunner.query(`ALTER TABLE "consolidation_tests" ADD CONSTRAINT "consolidation_tests_sample_id_fkey" FOREIGN KEY ("sample_id") REFERENCES "samples"("id") ON DELETE RESTRICT ON UPDATE NO ACTION`);
        await queryRunner.query(`ALTER TABLE "consolidation_tests" ADD CONSTRAINT "consolidation_tests_technician_id_fkey" FOREIGN KEY ("technician_id") REFERENCES "users"("id") ON DELETE RESTRICT ON UPDATE NO ACTION`);
        await queryRunner.query(`ALTER TABLE "analyses" ADD CONSTRAINT "analyses_test_id_fkey" FOREIGN KEY ("test_id") REFERENCES "consolidation_tests"("id") ON DELETE RESTRICT ON UPDATE NO ACTION`);
        await queryRunner.query(`ALTER TABLE "project_members" ADD CONSTRAINT "project_members_project_id_fkey" FOREIGN KEY ("project_id") REFERENCES "projects"("id") ON DELETE CASCADE ON UPDATE NO ACTION`);
        await queryRunner.query(`ALTER TABLE "project_members" ADD CONSTRAINT "project_members_user_id_fkey" FOREIGN KEY ("user_id") REFERENCES "users"("id") ON DELETE CASCADE ON UPDATE NO ACTION`);
        await queryRunner.query(`ALTER TABLE "review_events" ADD CONSTRAINT "review_events_test_id_fkey" FOREIGN KEY ("test_id") REFERENCES "consolidation_tests"("id") ON DELETE RESTRICT ON UPDATE NO ACTION`);
        await queryRunner.query(`ALTER TABLE "soil_records" ADD CONSTRAINT "soil_records_test_id_fkey" FOREIGN KEY ("test_id") REFERENCES "consolidation_tests"("id") ON DELETE RESTRICT ON UPDATE NO ACTION`);
        await queryRunner.query(`ALTER TABLE "soil_record_versions" ADD CONSTRAINT "soil_record_versions_record_id_fkey" FOREIGN KEY ("record_id") REFERENCES "soil_records"("id") ON DELETE RESTRICT ON UPDATE NO ACTION`);
        await queryRunner.query(`ALTER TABLE "soil_record_supersessions" ADD CONSTRAINT "soil_record_supersessions_version_id_fkey" FOREIGN KEY ("version_id") REFERENCES "soil_record_versions"("id") ON DELETE RESTRICT ON UPDATE NO ACTION`);

        // Approved soil record versions are evidence: once written they never change. The
        // trigger refuses UPDATE and DELETE of a version row (and of the supersession note
        // that marks it replaced), whoever asks — the application, a migration or psql.
        // Superseding is a new row in soil_record_supersessions, never an UPDATE.
        await queryRunner.query(`CREATE FUNCTION "refuse_change_to_approved_record"() RETURNS trigger LANGUAGE plpgsql AS $$
BEGIN
  RAISE EXCEPTION 'rows of % are immutable: an approved soil record version cannot be changed or removed; approve a new version instead', TG_TABLE_NAME
    USING ERRCODE = 'integrity_constraint_violation';
END
$$`);
        await queryRunner.query(`CREATE TRIGGER "soil_record_versions_immutable" BEFORE UPDATE OR DELETE ON "soil_record_versions" FOR EACH ROW EXECUTE FUNCTION "refuse_change_to_approved_record"()`);
        await queryRunner.query(`CREATE TRIGGER "soil_record_versions_no_truncate" BEFORE TRUNCATE ON "soil_record_versions" FOR EACH STATEMENT EXECUTE FUNCTION "refuse_change_to_approved_record"()`);
        await queryRunner.query(`CREATE TRIGGER "soil_record_supersessions_immutable" BEFORE UPDATE OR DELETE ON "soil_record_supersessions" FOR EACH ROW EXECUTE FUNCTION "refuse_change_to_approved_record"()`);
        await queryRunner.query(`CREATE TRIGGER "soil_record_supersessions_no_truncate" BEFORE TRUNCATE ON "soil_record_supersessions" FOR EACH STATEMENT EXECUTE FUNCTION "refuse_change_to_approved_record"()`);
    }

    public async down(queryRunner: QueryRunner): Promise<void> {
        await queryRunner.query(`DROP TRIGGER "soil_record_supersessions_no_truncate" ON "soil_record_supersessions"`);
        await queryRunner.query(`DROP TRIGGER "soil_record_supersessions_immutable" ON "soil_record_supersessions"`);
        await queryRunner.query(`DROP TRIGGER "soil_record_versions_no_truncate" ON "soil_record_versions"`);
        await queryRunner.query(`DROP TRIGGER "soil_record_versions_immutable" ON "soil_record_versions"`);
        await queryRunner.query(`DROP FUNCTION "refuse_change_to_approved_record"()`);
        await queryRunner.query(`ALTER TABLE "soil_record_supersessions" DROP CONSTRAINT "soil_record_supersessions_version_id_fkey"`);
        await queryRunner.query(`ALTER TABLE "soil_record_versions" DROP CONSTRAINT "soil_record_versions_record_id_fkey"`);
        await queryRunner.query(`ALTER TABLE "soil_records" DROP CONSTRAINT "soil_records_test_id_fkey"`);
        await queryRunner.query(`ALTER TABLE "review_events" DROP CONSTRAINT "review_events_test_id_fkey"`);
        await queryRunner.query(`ALTER TABLE "project_members" DROP CONSTRAINT "project_members_user_id_fkey"`);
        await queryRunner.query(`ALTER TABLE "project_members" DROP CONSTRAINT "project_members_project_id_fkey"`);
        await queryRunner.query(`ALTER TABLE "analyses" DROP CONSTRAINT "analyses_test_id_fkey"`);
        await queryRunner.query(`ALTER TABLE "consolidation_tests" DROP CONSTRAINT "consolidation_tests_technician_id_fkey"`);
        await queryRunner.query(`ALTER TABLE "consolidation_tests" DROP CONSTRAINT "consolidation_tests_sample_id_fkey"`);
        await queryRunner.query(`ALTER TABLE "samples" DROP CONSTRAINT "samples_borehole_id_fkey"`);
        await queryRunner.query(`ALTER TABLE "boreholes" DROP CONSTRAINT "boreholes_project_id_fkey"`);
        await queryRunner.query(`ALTER TABLE "projects" DROP CONSTRAINT "projects_organisation_id_fkey"`);
        await queryRunner.query(`DROP INDEX "public"."soil_record_supersessions_organisation_id_idx"`);
        await queryRunner.query(`DROP TABLE "soil_record_supersessions"`);
        await queryRunner.query(`DROP INDEX "public"."soil_record_versions_organisation_id_idx"`);
        await queryRunner.query(`DROP INDEX "public"."soil_record_versions_record_version_key"`);
        await queryRunner.query(`DROP TABLE "soil_record_versions"`);
        await queryRunner.query(`DROP INDEX "public"."soil_records_organisation_id_idx"`);
        await queryRunner.query(`DROP INDEX "public"."soil_records_test_id_key"`);
        await queryRunner.query(`DROP TABLE "soil_records"`);
        await queryRunner.query(`DROP INDEX "public"."review_events_organisation_id_idx"`);
        await queryRunner.query(`DROP INDEX "public"."review_events_test_id_at_idx"`);
        await queryRunner.query(`DROP TABLE "review_events"`);
        await queryRunner.query(`DROP INDEX "public"."project_members_organisation_id_idx"`);
        await queryRunner.query(`DROP INDEX "public"."project_members_project_user_key"`);
        await queryRunner.query(`DROP TABLE "project_members"`);
        await queryRunner.query(`DROP INDEX "public"."job_runs_organisation_id_created_at_idx"`);
        await queryRunner.query(`DROP INDEX "public"."job_runs_test_id_idx"`);
        await queryRunner.query(`DROP TABLE "job_runs"`);
        await queryRunner.query(`DROP INDEX "public"."analyses_organisation_id_idx"`);
        await queryRunner.query(`DROP INDEX "public"."analyses_test_id_created_at_idx"`);
        await queryRunner.query(`DROP TABLE "analyses"`);
        await queryRunner.query(`DROP INDEX "public"."consolidation_tests_organisation_id_status_idx"`);
        await queryRunner.query(`DROP INDEX "public"."consolidation_tests_sample_id_idx"`);
        await queryRunner.query(`DROP INDEX "public"."consolidation_tests_organisation_reference_key"`);
        await queryRunner.query(`DROP TABLE "consolidation_tests"`);
        await queryRunner.query(`DROP INDEX "public"."samples_organisation_id_idx"`);
        await queryRunner.query(`DROP INDEX "public"."samples_borehole_reference_key"`);
        await queryRunner.query(`DROP TABLE "samples"`);
        await queryRunner.query(`DROP INDEX "public"."boreholes_organisation_id_idx"`);
        await queryRunner.query(`DROP INDEX "public"."boreholes_project_name_key"`);
        await queryRunner.query(`DROP TABLE "boreholes"`);
        await queryRunner.query(`DROP INDEX "public"."projects_organisation_id_idx"`);
        await queryRunner.query(`DROP INDEX "public"."projects_organisation_reference_key"`);
        await queryRunner.query(`DROP TABLE "projects"`);
    }

}
