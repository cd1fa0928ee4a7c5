import type { MigrationInterface, QueryRunner } from "typeorm";

export class ReadingsImport1796181181337 implements MigrationInterface {
    name = 'ReadingsImport1796181181337'

    public async up(queryRunner: QueryRunner): Promise<void> {
        await queryRunner.query(`CREATE TABLE "import_profiles" ("id" uuid NOT NULL DEFAULT gen_random_uuid(), "organisation_id" uuid NOT NULL, "name" text NOT NULL, "mapping" jsonb NOT NULL, "created_by_id" uuid, "created_at" TIMESTAMP WITH TIME ZONE NOT NULL DEFAULT now(), CONSTRAINT "PK_ef179128b4ec8f73de28ab64139" PRIMARY KEY ("id"))`);
        await queryRunner.query(`CREATE UNIQUE INDEX "import_profiles_organisation_name_key" ON "import_profiles"  ("organisation_id", "name") `);
        await queryRunner.query(`CREATE TABLE "uploads" ("id" uuid NOT NULL DEFAULT gen_random_uuid(), "organisation_id" uuid NOT NULL, "test_id" uuid NOT NULL, "object_key" text NOT NULL, "original_name" text NOT NULL, "sha256" text NOT NULL, "size_bytes" integer NOT NULL, "detected_type" text NOT NULL, "status" text NOT NULL, "uploaded_by_id" uuid NOT NULL, "mapping" jsonb, "failure" jsonb, "reading_count" integer, "increment_count" integer, "specimen_values" jsonb NOT NULL DEFAULT '{}', "created_at" TIMESTAMP WITH TIME ZONE NOT NULL DEFAULT now(), "imported_at" TIMESTAMP WITH TIME ZONE, CONSTRAINT "PK_d1781d1eedd7459314f60f39bd3" PRIMARY KEY ("id"))`);
        await queryRunner.query(`CREATE INDEX "uploads_test_id_created_at_idx" ON "uploads"  ("test_id", "created_at") `);
        await queryRunner.query(`CREATE INDEX "uploads_organisation_id_idx" ON "uploads"  ("organisation_id") `);
        await queryRunner.query(`CREATE TABLE "readings" ("test_id" uuid NOT NULL, "row_number" integer NOT NULL, "organisation_id" uuid NOT NULL, "upload_id" uuid NOT NULL, "increment_index" integer NOT NULL, "stress_kpa" double precision NOT NULL, "elapsed_min" double precision NOT NULL, "deformation_mm" double precision NOT NULL, CONSTRAINT "readings_pkey" PRIMARY KEY ("test_id", "row_number"))`);
        await queryRunner.query(`CREATE INDEX "readings_organisation_id_idx" ON "readings"  ("organisation_id") `);
        await queryRunner.query(`ALTER TABLE "import_profiles" ADD CONSTRAINT "import_profiles_organisation_id_fkey" FOREIGN KEY ("organisation_id") REFERENCES "organisations"("id") ON DELETE CASCADE ON UPDATE NO ACTION`);
        await queryRunner.query(`ALTER TABLE "uploads" ADD CONSTRAINT "uploads_test_id_fkey" FOREIGN KEY ("test_id") REFERENCES "consolidation_tests"("id") ON DELETE CASCADE ON UPDATE NO ACTION`);
        await queryRunner.query(`ALTER TABLE "uploads" ADD CONSTRAINT "uploads_uploaded_by_id_fkey" FOREIGN KEY ("uploaded_by_id") REFERENCES "users"("id") ON DELETE RESTRICT ON UPDATE NO ACTION`);
        await queryRunner.query(`ALTER TABLE "readings" ADD CONSTRAINT "readings_test_id_fkey" FOREIGN KEY ("test_id") REFERENCES "consolidation_tests"("id") ON DELETE CASCADE ON UPDATE NO ACTION`);
        await queryRunner.query(`ALTER TABLE "readings" ADD CONSTRAINT "readings_upload_id_fkey" FOREIGN KEY ("upload_id") REFERENCES "uploads"("id") ON DELETE CASCADE ON UPDATE NO ACTION`);
    }

    public async down(queryRunner: QueryRunner): Promise<void> {
        await queryRunner.query(`ALTER TABLE "readings" DROP CONSTRAINT "readings_upload_id_fkey"`);
        await queryRunner.query(`ALTER TABLE "readings" DROP CONSTRAINT "readings_test_id_fkey"`);
        await queryRunner.query(`ALTER TABLE "uploads" DROP CONSTRAINT "uploads_uploaded_by_id_fkey"`);
        await queryRunner.query(`ALTER TABLE "uploads" DROP CONSTRAINT "uploads_test_id_fkey"`);
        await queryRunner.query(`ALTER TABLE "import_profiles" DROP CONSTRAINT "import_profiles_organisation_id_fkey"`);
        await queryRunner.query(`DROP INDEX "public"."readings_organisation_id_idx"`);
        await queryRunner.query(`DROP TABLE "readings"`);
        await queryRunner.query(`DROP INDEX "public"."uploads_organisation_id_idx"`);
        await queryRunner.query(`DROP INDEX "public"."uploads_test_id_created_at_idx"`);
        await queryRunner.query(`DROP TABLE "uploads"`);
        await queryRunner.query(`DROP INDEX "public"."import_profiles_organisation_name_key"`);
        await queryRunner.query(`DROP TABLE "import_profiles"`);
    }

}
