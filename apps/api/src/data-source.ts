import 'reflect-metadata';
import { DataSource } from 'typeorm';
import { databaseUrl } from './config/env.js';
import { AuditEntryEntity } from './modules/audit/audit-entry.entity.js';
import { PasswordResetTokenEntity } from './modules/auth/password-reset-token.entity.js';
import { InvitationEntity } from './modules/invitations/invitation.entity.js';
import { MembershipEntity } from './modules/organisations/membership.entity.js';
import { OrganisationEntity } from './modules/organisations/organisation.entity.js';
import { UserEntity } from './modules/users/user.entity.js';
import { Init1796179339734 } from './migrations/1796179339734-init.js';

/**
 * The one DataSource (the TypeORM CLI requires exactly one export here). Entities and
 * migrations are listed as classes: globs cannot be imported under vitest.
 * `synchronize` is off: the schema changes only through migrations.
 */
export const dataSource = new DataSource({
  type: 'postgres',
  url: databaseUrl(),
  entities: [UserEntity, OrganisationEntity, MembershipEntity, InvitationEntity, PasswordResetTokenEntity, AuditEntryEntity],
  migrations: [Init1796179339734],
  // gen_random_uuid() is built into PostgreSQL 13+, so no extension is needed on a managed server.
  uuidExtension: 'pgcrypto',
  synchronize: false,
  migrationsRun: false,
  logging: ['error'],
});
