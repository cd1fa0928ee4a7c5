import type { MigrationInterface, QueryRunner } from 'typeorm';

/**
 * Imports that keep what they dropped or replaced (uploads.notes, note_count), readings
 * from a workbook of one sheet per increment (readings.sheet_index in the key: row numbers
 * repeat from sheet to sheet), and the lookup of the same file in another test by its hash.
 * Down fails while a test holds readings from more than one sheet (their row numbers repeat
 * under the old key): delete those readings first.
 */
export class ImportNotesAndSheets1796323849735 implements MigrationInterface {
  name = 'ImportNotesAndSheets1796323849735';

  public async up(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`ALTER TABLE "uploads" ADD "notes" jsonb NOT NULL DEFAULT '[]'`);
    await queryRunner.query(`ALTER TABLE "uploads" ADD "note_count" integer NOT NULL DEFAULT '0'`);
    await queryRunner.query(`ALTER TABLE "readings" ADD "sheet_index" smallint NOT NULL DEFAULT '0'`);
    await queryRunner.query(`ALTER TABLE "readings" DROP CONSTRAINT "readings_pkey"`);
    await queryRunner.query(`ALTER TABLE "readings" ADD CONSTRAINT "readings_pkey" PRIMARY KEY ("test_id", "sheet_index", "row_number")`);
    await queryRunner.query(`CREATE INDEX "uploads_organisation_id_sha256_idx" ON "uploads" ("organisation_id", "sha256")`);
  }

  public async down(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`DROP INDEX "public"."uploads_organisation_id_sha256_idx"`);
    await queryRunner.query(`ALTER TABLE "readings" DROP CONSTRAINT "readings_pkey"`);
    await queryRunner.query(`ALTER TABLE "readings" ADD CONSTRAINT "readings_pkey" PRIMARY KEY ("test_id", "row_number")`);
    await queryRunner.query(`ALTER TABLE "readings" DROP COLUMN "sheet_index"`);
    await queryRunner.query(`ALTER TABLE "uploads" DROP COLUMN "note_count"`);
    await queryRunner.query(`ALTER TABLE "uploads" DROP COLUMN "notes"`);
  }
}
