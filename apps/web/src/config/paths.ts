/**
 * Every URL the web app links to or routes on, in one place. `pattern` is what the
 * router matches; `to(...)` builds a concrete link.
 */
export const paths = {
  root: { pattern: '/', to: () => '/' },
  signIn: { pattern: '/sign-in', to: () => '/sign-in' },
  signUp: { pattern: '/sign-up', to: () => '/sign-up' },
  forgotPassword: { pattern: '/forgot-password', to: () => '/forgot-password' },
  /** The link in the password-reset e-mail: `/reset-password?token=…`. */
  resetPassword: { pattern: '/reset-password', to: () => '/reset-password' },
  /** The link in the invitation e-mail: `/invitations/<token>`. */
  invitation: { pattern: '/invitations/:token', to: (token: string) => `/invitations/${encodeURIComponent(token)}` },
  org: {
    home: { pattern: '/orgs/:orgId', to: (orgId: string) => `/orgs/${orgId}` },
    members: { pattern: 'members', to: (orgId: string) => `/orgs/${orgId}/members` },
    activity: { pattern: 'activity', to: (orgId: string) => `/orgs/${orgId}/activity` },
  },
} as const;

/** API endpoints, relative: the API serves this app from the same origin. */
export const apiPaths = {
  csrf: '/api/auth/csrf',
  session: '/api/auth/session',
  signIn: '/api/auth/sign-in',
  signUp: '/api/auth/sign-up',
  signOut: '/api/auth/sign-out',
  passwordResetRequest: '/api/auth/password-reset/request',
  passwordResetConfirm: '/api/auth/password-reset/confirm',
  invitation: (token: string) => `/api/invitations/${encodeURIComponent(token)}`,
  invitationAccept: (token: string) => `/api/invitations/${encodeURIComponent(token)}/accept`,
  members: (orgId: string) => `/api/orgs/${orgId}/members`,
  member: (orgId: string, userId: string) => `/api/orgs/${orgId}/members/${userId}`,
  invitations: (orgId: string) => `/api/orgs/${orgId}/invitations`,
  orgInvitation: (orgId: string, invitationId: string) => `/api/orgs/${orgId}/invitations/${invitationId}`,
  audit: (orgId: string) => `/api/orgs/${orgId}/audit`,
} as const;
