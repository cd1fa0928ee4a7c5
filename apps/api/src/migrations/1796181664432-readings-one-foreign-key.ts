import type { MigrationInterface, QueryRunner } from "typeorm";

export class ReadingsOneForeignKey1796181664432 implements MigrationInterface {
    name = 'ReadingsOneForeignKey1796181664432'

    public async up(queryRunner: QueryRunner): Promise<void> {
        await queryRunner.query(`ALTER TABLE "readings" DROP CONSTRAINT "readings_test_id_fkey"`);
        await queryRunner.query(`ALTER TABLE "readings" DROP CONSTRAINT "readings_upload_id_fkey"`);
        await queryRunner.query(`CREATE UNIQUE INDEX "uploads_test_id_id_key" ON "uploads"  ("test_id", "id") `);
        await queryRunner.query(`ALTER TABLE "readings" ADD CONSTRAINT "readings_upload_fkey" FOREIGN KEY ("upload_id", "test_id") REFERENCES "uploads"("id","test_id") ON DELETE CASCADE ON UPDATE NO ACTION`);
    }

    public async down(queryRunner: QueryRunner): Promise<void> {
        await queryRunner.query(`ALTER TABLE "readings" DROP CONSTRAINT "readings_upload_fkey"`);
        await queryRunner.query(`DROP INDEX "public"."uploads_test_id_id_key"`);
        await queryRunner.query(`ALTER TABLE "readings" ADD CONSTRAINT "readings_upload_id_fkey" FOREIGN KEY ("upload_id") REFERENCES "uploads"("id") ON DELETE CASCADE ON UPDATE NO ACTION`);
        await queryRunner.query(`ALTER TABLE "readings" ADD CONSTRAINT "readings_test_id_fkey" FOREIGN KEY ("test_id") REFERENCES "consolidation_tests"("id") ON DELETE CASCADE ON UPDATE NO ACTION`);
    }

}
