export { ROLES, RoleSchema, RolesSchema, ROLE_LABELS, LAB_STAFF_ROLES, canonicalRoles, holdsAnyRole, roleList } from './roles.js';
export type { Role } from './roles.js';
export { ROLE_ACCESS } from './role-access.js';
export type { Assert, DeepWritable, MatchesSource, SameShape, ShapeDifference } from './type-contract.js';
export {
  ConsolidationTestResultSchema,
  ConsolidationIncrementResultSchema,
  TaylorIncrementResultSchema,
  CasagrandeIncrementResultSchema,
  CompressionIndexFitSchema,
  RecompressionIndexFitSchema,
  CasagrandePreconsolidationConstructionSchema,
  PachecoSilvaPreconsolidationConstructionSchema,
  AppliedPickSchema,
  ConsolidationWarningSchema,
  ExcludedIncrementSchema,
  CONSOLIDATION_WARNING_CODES,
  StressVoidRatioPointSchema,
  StressVoidRatioLineSchema,
  TimeCurvePointSchema,
  TimeCurveLineSchema,
} from './lab/consolidation-result.js';
export type {
  ConsolidationTestResult,
  ConsolidationIncrementResult,
  TaylorIncrementResult,
  CasagrandeIncrementResult,
  CompressionIndexFit,
  RecompressionIndexFit,
  CasagrandePreconsolidationConstruction,
  PachecoSilvaPreconsolidationConstruction,
  AppliedPick,
  ConsolidationWarning,
  ExcludedIncrement,
  StressVoidRatioPoint,
  StressVoidRatioLine,
  TimeCurvePoint,
  TimeCurveLine,
} from './lab/consolidation-result.js';
export {
  TEST_STATUSES,
  TestStatusSchema,
  TEST_STATUS_LABELS,
  TEST_STATUS_HINTS,
  FROZEN_TEST_STATUSES,
  isFrozenTestStatus,
  REVIEW_DECISIONS,
  JOB_STATES,
  JobStateSchema,
} from './lab/states.js';
export type { TestStatus, ReviewDecision, ReviewOutcome, JobState } from './lab/states.js';
export { ApiErrorSchema, API_ERROR_CODES } from './errors.js';
export type { ApiError, ApiErrorCode } from './errors.js';
export {
  SignUpSchema,
  SignUpConfirmSchema,
  SignUpSentSchema,
  SignInSchema,
  PasswordResetRequestSchema,
  PasswordResetConfirmSchema,
  PASSWORD_MAX_BYTES,
  UserSchema,
  MembershipSchema,
  SessionSchema,
  CsrfTokenSchema,
} from './auth.js';
export type { SignUp, SignUpConfirm, SignUpSent, SignIn, PasswordResetRequest, PasswordResetConfirm, User, Membership, Session, CsrfToken } from './auth.js';
export {
  MemberSchema,
  InvitationCreateSchema,
  InvitationSchema,
  InvitationPreviewSchema,
  InvitationAcceptSchema,
  MemberRolesUpdateSchema,
  AuditEntrySchema,
} from './organisations.js';
export type {
  Member,
  InvitationCreate,
  Invitation,
  InvitationPreview,
  InvitationAccept,
  MemberRolesUpdate,
  AuditEntry,
} from './organisations.js';
export {
  ProjectSummarySchema,
  ProjectDesignerSchema,
  ProjectDetailSchema,
  ProjectCreateSchema,
  ProjectUpdateSchema,
  BoreholeSchema,
  BoreholeCreateSchema,
  SampleSchema,
  SampleCreateSchema,
  DrainageSchema,
  CompliancePointSchema,
  SpecimenSchema,
  TestCreateSchema,
  TestUpdateSchema,
  KeyParametersSchema,
  AnalysisSummarySchema,
  TestSummarySchema,
  TestDetailSchema,
  TestListQuerySchema,
} from './lab/records.js';
export type {
  ProjectSummary,
  ProjectDesigner,
  ProjectDetail,
  ProjectCreate,
  ProjectUpdate,
  Borehole,
  BoreholeCreate,
  Sample,
  SampleCreate,
  CompliancePoint,
  Specimen,
  TestCreate,
  TestUpdate,
  KeyParameters,
  AnalysisSummary,
  TestSummary,
  TestDetail,
  TestListQuery,
} from './lab/records.js';
export { IncrementPicksSchema, PicksSchema, PicksUpdateSchema, AnalysisSchema, JobRunSchema } from './lab/analysis.js';
export type { IncrementPicksInput, Picks, PicksUpdate, Analysis, JobRun } from './lab/analysis.js';
export {
  ReviewQueueItemSchema,
  ChangeRequestSchema,
  ApprovalSchema,
  ReviewEventSchema,
  SoilRecordVersionSchema,
  SoilRecordSummarySchema,
  SoilRecordDetailSchema,
  SoilRecordListQuerySchema,
} from './lab/review.js';
export type { ReviewQueueItem, ChangeRequest, Approval, ReviewEvent, SoilRecordVersion, SoilRecordSummary, SoilRecordDetail } from './lab/review.js';
export {
  IMPORT_FIELDS,
  StressUnitSchema,
  TimeUnitSchema,
  LengthUnitSchema,
  CsvDelimiterSchema,
  TimeFormatSchema,
  TimeOriginSchema,
  DateOrderSchema,
  TimeReadingSchema,
  DeformationReadingSchema,
  SheetLayoutSchema,
  StressSourceSchema,
  ImportMappingSchema,
  ImportRequestSchema,
  ImportProfileCreateSchema,
  ImportProfileSchema,
} from './lab/import-mapping.js';
export type {
  ImportField,
  StressUnit,
  TimeUnit,
  LengthUnit,
  CsvDelimiter,
  TimeFormat,
  TimeOrigin,
  DateOrder,
  TimeReading,
  DeformationReading,
  SheetLayout,
  StressSource,
  ImportMapping,
  ImportMappingInput,
  ImportRequest,
  ImportProfileCreate,
  ImportProfile,
} from './lab/import-mapping.js';
export { MAPPING_SETTINGS, MappingSettingSchema, MappingGuessSchema, MappingSuggestionSchema, guessFromMapping } from './lab/import-guess.js';
export type { MappingSetting, MappingGuess, MappingSuggestion } from './lab/import-guess.js';
export {
  ImportIssueSchema,
  ImportNoteSchema,
  SameFileSchema,
  UploadStatusSchema,
  DetectedFileTypeSchema,
  UploadSchema,
  LayoutSchema,
  PreviewRowSchema,
  UploadPreviewSchema,
  ImportTrialRequestSchema,
  TrialReadingSchema,
  ImportTrialSchema,
  ReadingRowSchema,
  ReadingsPageSchema,
  ReadingsPageQuerySchema,
} from './lab/import.js';
export type {
  ImportIssue,
  ImportNote,
  SameFile,
  UploadStatus,
  DetectedFileType,
  Upload,
  Layout,
  PreviewRow,
  UploadPreview,
  ImportTrialRequest,
  TrialReading,
  ImportTrial,
  ReadingRow,
  ReadingsPage,
  ReadingsPageQuery,
} from './lab/import.js';
export {
  ProjectShareCreateSchema,
  ProjectClientSchema,
  ProjectClientInvitationSchema,
  ProjectClientsSchema,
  ProjectShareOutcomeSchema,
} from './sharing.js';
export type { ProjectShareCreate, ProjectClient, ProjectClientInvitation, ProjectClients, ProjectShareOutcome } from './sharing.js';
export {
  ResultsProjectSchema,
  IssuedResultSchema,
  ResultsSampleSchema,
  ResultsBoreholeSchema,
  ProjectResultsSchema,
  IssuedSpecimenSchema,
  IssuedTestSummarySchema,
} from './lab/results.js';
export type { ResultsProject, IssuedResult, ResultsBorehole, ProjectResults, IssuedSpecimen, IssuedTestSummary } from './lab/results.js';
export {
  WAITING_REASONS,
  WaitingReasonSchema,
  HomeTestSchema,
  WaitingTestSchema,
  HomeApprovalSchema,
  StuckTestSchema,
  HomeOverviewSchema,
} from './home.js';
export type { WaitingReason, HomeTest, WaitingTest, HomeApproval, StuckTest, HomeOverview } from './home.js';
export { REPORT_KINDS, ReportKindSchema, REPORT_STATES, ReportStateSchema, IssuedReportSchema, ReportSettingsSchema, ReportSettingsViewSchema } from './lab/reports.js';
export type { ReportKind, ReportState, IssuedReport, ReportSettings, ReportSettingsView } from './lab/reports.js';
