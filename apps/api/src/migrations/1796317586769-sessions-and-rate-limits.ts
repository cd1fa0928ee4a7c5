import type { MigrationInterface, QueryRunner } from 'typeorm';

/**
 * Server-side sessions (sign-out ends one for good) and the table of the sign-in and
 * password-reset rate limiters, shared by every API process (rate-limiter-flexible's
 * PostgreSQL store, with the columns it expects).
 */
export class SessionsAndRateLimits1796317586769 implements MigrationInterface {
  name = 'SessionsAndRateLimits1796317586769';

  public async up(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(
      `CREATE TABLE "sessions" ("id" uuid NOT NULL DEFAULT gen_random_uuid(), "user_id" uuid NOT NULL, "expires_at" TIMESTAMP WITH TIME ZONE NOT NULL, "ended_at" TIMESTAMP WITH TIME ZONE, "created_at" TIMESTAMP WITH TIME ZONE NOT NULL DEFAULT now(), CONSTRAINT "PK_3238ef96f18b355b671619111bc" PRIMARY KEY ("id"))`,
    );
    await queryRunner.query(`CREATE INDEX "sessions_user_id_idx" ON "sessions" ("user_id") `);
    await queryRunner.query(
      `ALTER TABLE "sessions" ADD CONSTRAINT "sessions_user_id_fkey" FOREIGN KEY ("user_id") REFERENCES "users"("id") ON DELETE CASCADE ON UPDATE NO ACTION`,
    );
    await queryRunner.query(`CREATE TABLE "rate_limits" ("key" varchar(255) PRIMARY KEY, "points" integer NOT NULL DEFAULT 0, "expire" bigint)`);
  }

  public async down(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`DROP TABLE "rate_limits"`);
    await queryRunner.query(`ALTER TABLE "sessions" DROP CONSTRAINT "sessions_user_id_fkey"`);
    await queryRunner.query(`DROP INDEX "public"."sessions_user_id_idx"`);
    await queryRunner.query(`DROP TABLE "sessions"`);
  }
}
