import type { MigrationInterface, QueryRunner } from "typeorm";

export class Init1796179339734 implements MigrationInterface {
    name = 'Init1796179339734'

    public async up(queryRunner: QueryRunner): Promise<void> {
        await queryRunner.query(`CREATE TABLE "audit_entries" ("id" uuid NOT NULL DEFAULT gen_random_uuid(), "organisation_id" uuid, "actor_user_id" uuid, "action" text NOT NULL, "object_type" text NOT NULL, "object_id" text, "details" jsonb NOT NULL DEFAULT '{}', "at" TIMESTAMP WITH TIME ZONE NOT NULL DEFAULT now(), CONSTRAINT "PK_6b1623bcad4d04530b76548d619" PRIMARY KEY ("id"))`);
        await queryRunner.query(`CREATE INDEX "audit_entries_organisation_id_at_idx" ON "audit_entries"  ("organisation_id", "at") `);
        await queryRunner.query(`CREATE TABLE "users" ("id" uuid NOT NULL DEFAULT gen_random_uuid(), "email" text NOT NULL, "name" text NOT NULL, "password_hash" text NOT NULL, "session_version" integer NOT NULL DEFAULT '0', "created_at" TIMESTAMP WITH TIME ZONE NOT NULL DEFAULT now(), CONSTRAINT "PK_a3ffb1c0c8416b9fc6f907b7433" PRIMARY KEY ("id"))`);
        await queryRunner.query(`CREATE UNIQUE INDEX "users_email_key" ON "users"  ("email") `);
        await queryRunner.query(`CREATE TABLE "password_reset_tokens" ("id" uuid NOT NULL DEFAULT gen_random_uuid(), "user_id" uuid NOT NULL, "token_hash" text NOT NULL, "created_at" TIMESTAMP WITH TIME ZONE NOT NULL DEFAULT now(), "expires_at" TIMESTAMP WITH TIME ZONE NOT NULL, "used_at" TIMESTAMP WITH TIME ZONE, CONSTRAINT "PK_d16bebd73e844c48bca50ff8d3d" PRIMARY KEY ("id"))`);
        await queryRunner.query(`CREATE UNIQUE INDEX "password_reset_tokens_token_hash_key" ON "password_reset_tokens"  ("token_hash") `);
        await queryRunner.query(`CREATE INDEX "password_reset_tokens_user_id_idx" ON "password_reset_tokens"  ("user_id") `);
        await queryRunner.query(`CREATE TABLE "organisations" ("id" uuid NOT NULL DEFAULT gen_random_uuid(), "name" text NOT NULL, "created_at" TIMESTAMP WITH TIME ZONE NOT NULL DEFAULT now(), CONSTRAINT "PK_7bf54cba378d5b2f1d4c10ef4df" PRIMARY KEY ("id"))`);
        await queryRunner.query(`CREATE TABLE "invitations" ("id" uuid NOT NULL DEFAULT gen_random_uuid(), "organisation_id" uuid NOT NULL, "email" text NOT NULL, "role" text NOT NULL, "token_hash" text NOT NULL, "invited_by_id" uuid NOT NULL, "created_at" TIMESTAMP WITH TIME ZONE NOT NULL DEFAULT now(), "expires_at" TIMESTAMP WITH TIME ZONE NOT NULL, "accepted_at" TIMESTAMP WITH TIME ZONE, "revoked_at" TIMESTAMP WITH TIME ZONE, CONSTRAINT "PK_5dec98cfdfd562e4ad3648bbb07" PRIMARY KEY ("id"))`);
        await queryRunner.query(`CREATE UNIQUE INDEX "invitations_token_hash_key" ON "invitations"  ("token_hash") `);
        await queryRunner.query(`CREATE INDEX "invitations_organisation_id_idx" ON "invitations"  ("organisation_id") `);
        await queryRunner.query(`CREATE TABLE "memberships" ("id" uuid NOT NULL DEFAULT gen_random_uuid(), "organisation_id" uuid NOT NULL, "user_id" uuid NOT NULL, "role" text NOT NULL, "created_at" TIMESTAMP WITH TIME ZONE NOT NULL DEFAULT now(), CONSTRAINT "PK_25d28bd932097a9e90495ede7b4" PRIMARY KEY ("id"))`);
        await queryRunner.query(`CREATE UNIQUE INDEX "memberships_organisation_user_key" ON "memberships"  ("organisation_id", "user_id") `);
        await queryRunner.query(`CREATE INDEX "memberships_user_id_idx" ON "memberships"  ("user_id") `);
        await queryRunner.query(`CREATE INDEX "memberships_organisation_id_idx" ON "memberships"  ("organisation_id") `);
        await queryRunner.query(`ALTER TABLE "password_reset_tokens" ADD CONSTRAINT "password_reset_tokens_user_id_fkey" FOREIGN KEY ("user_id") REFERENCES "users"("id") ON DELETE CASCADE ON UPDATE NO ACTION`);
        await queryRunner.query(`ALTER TABLE "invitations" ADD CONSTRAINT "invitations_organisation_id_fkey" FOREIGN KEY ("organisation_id") REFERENCES "organisations"("id") ON DELETE CASCADE ON UPDATE NO ACTION`);
        await queryRunner.query(`ALTER TABLE "invitations" ADD CONSTRAINT "invitations_invited_by_id_fkey" FOREIGN KEY ("invited_by_id") REFERENCES "users"("id") ON DELETE CASCADE ON UPDATE NO ACTION`);
        await queryRunner.query(`ALTER TABLE "memberships" ADD CONSTRAINT "memberships_organisation_id_fkey" FOREIGN KEY ("organisation_id") REFERENCES "organisations"("id") ON DELETE CASCADE ON UPDATE NO ACTION`);
        await queryRunner.query(`ALTER TABLE "memberships" ADD CONSTRAINT "memberships_user_id_fkey" FOREIGN KEY ("user_id") REFERENCES "users"("id") ON DELETE CASCADE ON UPDATE NO ACTION`);
    }

    public async down(queryRunner: QueryRunner): Promise<void> {
        await queryRunner.query(`ALTER TABLE "memberships" DROP CONSTRAINT "memberships_user_id_fkey"`);
        await queryRunner.query(`ALTER TABLE "memberships" DROP CONSTRAINT "memberships_organisation_id_fkey"`);
        await queryRunner.query(`ALTER TABLE "invitations" DROP CONSTRAINT "invitations_invited_by_id_fkey"`);
        await queryRunner.query(`ALTER TABLE "invitations" DROP CONSTRAINT "invitations_organisation_id_fkey"`);
        await queryRunner.query(`ALTER TABLE "password_reset_tokens" DROP CONSTRAINT "password_reset_tokens_user_id_fkey"`);
        await queryRunner.query(`DROP INDEX "public"."memberships_organisation_id_idx"`);
        await queryRunner.query(`DROP INDEX "public"."memberships_user_id_idx"`);
        await queryRunner.query(`DROP INDEX "public"."memberships_organisation_user_key"`);
        await queryRunner.query(`DROP TABLE "memberships"`);
        await queryRunner.query(`DROP INDEX "public"."invitations_organisation_id_idx"`);
        await queryRunner.query(`DROP INDEX "public"."invitations_token_hash_key"`);
        await queryRunner.query(`DROP TABLE "invitations"`);
        await queryRunner.query(`DROP TABLE "organisations"`);
        await queryRunner.query(`DROP INDEX "public"."password_reset_tokens_user_id_idx"`);
        await queryRunner.query(`DROP INDEX "public"."password_reset_tokens_token_hash_key"`);
        await queryRunner.query(`DROP TABLE "password_reset_tokens"`);
        await queryRunner.query(`DROP INDEX "public"."users_email_key"`);
        await queryRunner.query(`DROP TABLE "users"`);
        await queryRunner.query(`DROP INDEX "public"."audit_entries_organisation_id_at_idx"`);
        await queryRunner.query(`DROP TABLE "audit_entries"`);
    }

}
