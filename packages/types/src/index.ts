export { ROLES, RoleSchema, ROLE_LABELS } from './roles.js';
export type { Role } from './roles.js';
export { ApiErrorSchema, API_ERROR_CODES } from './errors.js';
export type { ApiError, ApiErrorCode } from './errors.js';
export {
  SignUpSchema,
  SignInSchema,
  PasswordResetRequestSchema,
  PasswordResetConfirmSchema,
  UserSchema,
  MembershipSchema,
  SessionSchema,
  CsrfTokenSchema,
} from './auth.js';
export type { SignUp, SignIn, PasswordResetRequest, PasswordResetConfirm, User, Membership, Session, CsrfToken } from './auth.js';
export {
  MemberSchema,
  InvitationCreateSchema,
  InvitationSchema,
  InvitationPreviewSchema,
  InvitationAcceptSchema,
  MemberRoleUpdateSchema,
  AuditEntrySchema,
} from './organisations.js';
export type {
  Member,
  InvitationCreate,
  Invitation,
  InvitationPreview,
  InvitationAccept,
  MemberRoleUpdate,
  AuditEntry,
} from './organisations.js';
