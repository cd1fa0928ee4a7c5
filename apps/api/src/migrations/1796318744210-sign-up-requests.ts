import type { MigrationInterface, QueryRunner } from 'typeorm';

/** Sign-ups wait for their e-mailed link (the same answer whether or not the address has an account). */
export class SignUpRequests1796318744210 implements MigrationInterface {
  name = 'SignUpRequests1796318744210';

  public async up(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(
      `CREATE TABLE "sign_up_requests" ("id" uuid NOT NULL DEFAULT gen_random_uuid(), "email" text NOT NULL, "name" text NOT NULL, "organisation_name" text NOT NULL, "password_hash" text NOT NULL, "token_hash" text, "expires_at" TIMESTAMP WITH TIME ZONE NOT NULL, "used_at" TIMESTAMP WITH TIME ZONE, "created_at" TIMESTAMP WITH TIME ZONE NOT NULL DEFAULT now(), CONSTRAINT "PK_sign_up_requests" PRIMARY KEY ("id"))`,
    );
    await queryRunner.query(`CREATE UNIQUE INDEX "sign_up_requests_token_hash_key" ON "sign_up_requests" ("token_hash") `);
  }

  public async down(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`DROP INDEX "public"."sign_up_requests_token_hash_key"`);
    await queryRunner.query(`DROP TABLE "sign_up_requests"`);
  }
}
