import type { MigrationInterface, QueryRunner } from "typeorm";

export class ClientSharing1796322759129 implements MigrationInterface {
    name = 'ClientSharing1796322759129'

    public async up(queryRunner: QueryRunner): Promise<void> {
        await queryRunner.query(`CREATE TABLE "invitation_projects" ("id" uuid NOT NULL DEFAULT gen_random_uuid(), "organisation_id" uuid NOT NULL, "invitation_id" uuid NOT NULL, "project_id" uuid NOT NULL, "created_at" TIMESTAMP WITH TIME ZONE NOT NULL DEFAULT now(), CONSTRAINT "PK_8eefbbdffd76934d19eb751b6c3" PRIMARY KEY ("id"))`);
        await queryRunner.query(`CREATE UNIQUE INDEX "invitation_projects_invitation_project_key" ON "invitation_projects"  ("invitation_id", "project_id") `);
        await queryRunner.query(`CREATE INDEX "invitation_projects_project_id_idx" ON "invitation_projects"  ("project_id") `);
        await queryRunner.query(`CREATE INDEX "invitation_projects_organisation_id_idx" ON "invitation_projects"  ("organisation_id") `);
        await queryRunner.query(`ALTER TABLE "project_members" ADD "added_by_id" uuid`);
        await queryRunner.query(`ALTER TABLE "invitation_projects" ADD CONSTRAINT "invitation_projects_invitation_id_fkey" FOREIGN KEY ("invitation_id") REFERENCES "invitations"("id") ON DELETE CASCADE ON UPDATE NO ACTION`);
        await queryRunner.query(`ALTER TABLE "invitation_projects" ADD CONSTRAINT "invitation_projects_project_id_fkey" FOREIGN KEY ("project_id") REFERENCES "projects"("id") ON DELETE CASCADE ON UPDATE NO ACTION`);
        await queryRunner.query(`ALTER TABLE "project_members" ADD CONSTRAINT "project_members_added_by_id_fkey" FOREIGN KEY ("added_by_id") REFERENCES "users"("id") ON DELETE SET NULL ON UPDATE NO ACTION`);
    }

    public async down(queryRunner: QueryRunner): Promise<void> {
        await queryRunner.query(`ALTER TABLE "project_members" DROP CONSTRAINT "project_members_added_by_id_fkey"`);
        await queryRunner.query(`ALTER TABLE "invitation_projects" DROP CONSTRAINT "invitation_projects_project_id_fkey"`);
        await queryRunner.query(`ALTER TABLE "invitation_projects" DROP CONSTRAINT "invitation_projects_invitation_id_fkey"`);
        await queryRunner.query(`ALTER TABLE "project_members" DROP COLUMN "added_by_id"`);
        await queryRunner.query(`DROP INDEX "public"."invitation_projects_organisation_id_idx"`);
        await queryRunner.query(`DROP INDEX "public"."invitation_projects_project_id_idx"`);
        await queryRunner.query(`DROP INDEX "public"."invitation_projects_invitation_project_key"`);
        await queryRunner.query(`DROP TABLE "invitation_projects"`);
    }

}
