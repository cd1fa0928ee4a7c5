import 'reflect-metadata';
import { DataSource } from 'typeorm';
import { installTenantWall } from './db/tenant-wall.js';
import { databaseUrl } from './config/env.js';
import { AuditEntryEntity } from './modules/audit/audit-entry.entity.js';
import { PasswordResetTokenEntity } from './modules/auth/password-reset-token.entity.js';
import { InvitationEntity } from './modules/invitations/invitation.entity.js';
import { InvitationProjectEntity } from './modules/invitations/invitation-project.entity.js';
import { MembershipEntity } from './modules/organisations/membership.entity.js';
import { OrganisationEntity } from './modules/organisations/organisation.entity.js';
import { UserEntity } from './modules/users/user.entity.js';
import { AnalysisEntity } from './modules/analyses/analysis.entity.js';
import { BoreholeEntity } from './modules/boreholes/borehole.entity.js';
import { ConsolidationTestEntity } from './modules/consolidation-tests/consolidation-test.entity.js';
import { JobRunEntity } from './modules/job-runs/job-run.entity.js';
import { ProjectMemberEntity } from './modules/projects/project-member.entity.js';
import { ProjectEntity } from './modules/projects/project.entity.js';
import { ReviewEventEntity } from './modules/reviews/review-event.entity.js';
import { SampleEntity } from './modules/samples/sample.entity.js';
import { SoilRecordSupersessionEntity } from './modules/soil-records/soil-record-supersession.entity.js';
import { SoilRecordVersionEntity } from './modules/soil-records/soil-record-version.entity.js';
import { SoilRecordEntity } from './modules/soil-records/soil-record.entity.js';
import { ImportProfileEntity } from './modules/import-profiles/import-profile.entity.js';
import { ReadingEntity } from './modules/readings/reading.entity.js';
import { UploadEntity } from './modules/uploads/upload.entity.js';
import { IssuedReportEntity } from './modules/reports/issued-report.entity.js';
import { SessionEntity } from './modules/sessions/session.entity.js';
import { SignUpRequestEntity } from './modules/auth/sign-up-request.entity.js';
import { TestContributionEntity } from './modules/consolidation-tests/test-contribution.entity.js';
import { CharacteristicSetRevisionEntity } from './modules/characteristic-sets/characteristic-set-revision.entity.js';
import { CharacteristicSetEntity } from './modules/characteristic-sets/characteristic-set.entity.js';
import { GroundModelRevisionEntity } from './modules/ground-models/ground-model-revision.entity.js';
import { GroundModelEntity } from './modules/ground-models/ground-model.entity.js';
import { CheckRevisionEntity } from './modules/settlement-checks/check-revision.entity.js';
import { FootingResultEntity } from './modules/settlement-checks/footing-result.entity.js';
import { SettlementCheckEntity } from './modules/settlement-checks/settlement-check.entity.js';
import { Init1796179339734 } from './migrations/1796179339734-init.js';
import { LabRecords1796180920952 } from './migrations/1796180920952-lab-records.js';
import { ReadingsImport1796181181337 } from './migrations/1796181181337-readings-import.js';
import { ReadingsOneForeignKey1796181664432 } from './migrations/1796181664432-readings-one-foreign-key.js';
import { MembershipRoles1796313749156 } from './migrations/1796313749156-membership-roles.js';
import { IssuedReports1796313882857 } from './migrations/1796313882857-issued-reports.js';
import { SessionsAndRateLimits1796317586769 } from './migrations/1796317586769-sessions-and-rate-limits.js';
import { SignUpRequests1796318744210 } from './migrations/1796318744210-sign-up-requests.js';
import { TestContributions1796320068018 } from './migrations/1796320068018-test-contributions.js';
import { ClientSharing1796322759129 } from './migrations/1796322759129-client-sharing.js';
import { Design1796323725979 } from './migrations/1796323725979-design.js';
import { ImportNotesAndSheets1796323849735 } from './migrations/1796323849735-import-notes-and-sheets.js';
import { RowLevelSecurity1796324847360 } from './migrations/1796324847360-row-level-security.js';
import { ReadChangeNotices1796394000000 } from './migrations/1796394000000-read-change-notices.js';

/**
 * The one DataSource (the TypeORM CLI requires exactly one export here). Entities and
 * migrations are listed as classes: globs cannot be imported under vitest.
 * `synchronize` is off: the schema changes only through migrations.
 */
installTenantWall();

export const dataSource = new DataSource({
  type: 'postgres',
  url: databaseUrl(),
  entities: [UserEntity, OrganisationEntity, MembershipEntity, InvitationEntity, PasswordResetTokenEntity, AuditEntryEntity,
    ProjectEntity, ProjectMemberEntity, BoreholeEntity, SampleEntity, ConsolidationTestEntity, AnalysisEntity, ReviewEventEntity,
    SoilRecordEntity, SoilRecordVersionEntity, SoilRecordSupersessionEntity, JobRunEntity,
    UploadEntity, ReadingEntity, ImportProfileEntity, IssuedReportEntity, SessionEntity, SignUpRequestEntity, TestContributionEntity, InvitationProjectEntity,
    GroundModelEntity, GroundModelRevisionEntity, CharacteristicSetEntity, CharacteristicSetRevisionEntity,
    SettlementCheckEntity, CheckRevisionEntity, FootingResultEntity],
  migrations: [Init1796179339734, LabRecords1796180920952, ReadingsImport1796181181337, ReadingsOneForeignKey1796181664432, MembershipRoles1796313749156,
    IssuedReports1796313882857, SessionsAndRateLimits1796317586769, SignUpRequests1796318744210, TestContributions1796320068018,
    ClientSharing1796322759129, Design1796323725979, ImportNotesAndSheets1796323849735, RowLevelSecurity1796324847360,
    ReadChangeNotices1796394000000],
  // gen_random_uuid() is built into PostgreSQL 13+, so no extension is needed on a managed server.
  uuidExtension: 'pgcrypto',
  synchronize: false,
  migrationsRun: false,
  logging: ['error'],
});
