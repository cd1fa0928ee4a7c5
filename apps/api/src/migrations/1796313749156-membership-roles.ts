import type { MigrationInterface, QueryRunner } from 'typeorm';

/**
 * A membership (and an invitation) holds a set of roles instead of one: `role text` becomes
 * `roles text[]`, each existing role kept as a set of one. Down keeps the first role of each set
 * (in ROLES' order, as stored), which loses the others: a set cannot fit in one column.
 */
export class MembershipRoles1796313749156 implements MigrationInterface {
  name = 'MembershipRoles1796313749156';

  public async up(queryRunner: QueryRunner): Promise<void> {
    for (const table of ['memberships', 'invitations']) {
      await queryRunner.query(`ALTER TABLE "${table}" ADD "roles" text array`);
      await queryRunner.query(`UPDATE "${table}" SET "roles" = ARRAY["role"]`);
      await queryRunner.query(`ALTER TABLE "${table}" ALTER COLUMN "roles" SET NOT NULL`);
      await queryRunner.query(`ALTER TABLE "${table}" ADD CONSTRAINT "${table}_roles_not_empty" CHECK (cardinality("roles") > 0)`);
      await queryRunner.query(`ALTER TABLE "${table}" DROP COLUMN "role"`);
    }
  }

  public async down(queryRunner: QueryRunner): Promise<void> {
    for (const table of ['memberships', 'invitations']) {
      await queryRunner.query(`ALTER TABLE "${table}" ADD "role" text`);
      await queryRunner.query(`UPDATE "${table}" SET "role" = "roles"[1]`);
      await queryRunner.query(`ALTER TABLE "${table}" ALTER COLUMN "role" SET NOT NULL`);
      await queryRunner.query(`ALTER TABLE "${table}" DROP CONSTRAINT "${table}_roles_not_empty"`);
      await queryRunner.query(`ALTER TABLE "${table}" DROP COLUMN "roles"`);
    }
  }
}
