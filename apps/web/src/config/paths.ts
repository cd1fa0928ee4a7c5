/**
 * Every URL the web app links to or routes on, in one place. `pattern` is what the
 * router matches; `to(...)` builds a concrete link.
 */
export const paths = {
  root: { pattern: '/', to: () => '/' },
  signIn: { pattern: '/sign-in', to: () => '/sign-in' },
  signUp: { pattern: '/sign-up', to: () => '/sign-up' },
  /** The link in the sign-up e-mail: `/finish-sign-up?token=…`. */
  finishSignUp: { pattern: '/finish-sign-up', to: () => '/finish-sign-up' },
  forgotPassword: { pattern: '/forgot-password', to: () => '/forgot-password' },
  /** The link in the password-reset e-mail: `/reset-password?token=…`. */
  resetPassword: { pattern: '/reset-password', to: () => '/reset-password' },
  /** The link in the invitation e-mail: `/invitations/<token>`. */
  invitation: { pattern: '/invitations/:token', to: (token: string) => `/invitations/${encodeURIComponent(token)}` },
  org: {
    home: { pattern: '/orgs/:orgId', to: (orgId: string) => `/orgs/${orgId}` },
    members: { pattern: 'members', to: (orgId: string) => `/orgs/${orgId}/members` },
    activity: { pattern: 'activity', to: (orgId: string) => `/orgs/${orgId}/activity` },
    projects: { pattern: 'projects', to: (orgId: string) => `/orgs/${orgId}/projects` },
    project: { pattern: 'projects/:projectId', to: (orgId: string, projectId: string) => `/orgs/${orgId}/projects/${projectId}` },
    tests: { pattern: 'tests', to: (orgId: string) => `/orgs/${orgId}/tests` },
    /** `?section=` picks the part of the test page to open (see the test page's sections). */
    test: { pattern: 'tests/:testId', to: (orgId: string, testId: string) => `/orgs/${orgId}/tests/${testId}` },
    reviewQueue: { pattern: 'review-queue', to: (orgId: string) => `/orgs/${orgId}/review-queue` },
    soilRecords: { pattern: 'soil-records', to: (orgId: string) => `/orgs/${orgId}/soil-records` },
    /** `?version=n` opens one version; without it, the current one. */
    soilRecord: { pattern: 'soil-records/:recordId', to: (orgId: string, recordId: string) => `/orgs/${orgId}/soil-records/${recordId}` },
  },
} as const;

/** API endpoints, relative: the API serves this app from the same origin. */
export const apiPaths = {
  csrf: '/api/auth/csrf',
  session: '/api/auth/session',
  signIn: '/api/auth/sign-in',
  signUp: '/api/auth/sign-up',
  signUpConfirm: '/api/auth/sign-up/confirm',
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
  projects: (orgId: string) => `/api/orgs/${orgId}/projects`,
  project: (orgId: string, projectId: string) => `/api/orgs/${orgId}/projects/${projectId}`,
  boreholes: (orgId: string, projectId: string) => `/api/orgs/${orgId}/projects/${projectId}/boreholes`,
  samples: (orgId: string, boreholeId: string) => `/api/orgs/${orgId}/boreholes/${boreholeId}/samples`,
  sampleTests: (orgId: string, sampleId: string) => `/api/orgs/${orgId}/samples/${sampleId}/tests`,
  tests: (orgId: string) => `/api/orgs/${orgId}/tests`,
  test: (orgId: string, testId: string) => `/api/orgs/${orgId}/tests/${testId}`,
  testAnalysis: (orgId: string, testId: string) => `/api/orgs/${orgId}/tests/${testId}/analysis`,
  testPicks: (orgId: string, testId: string) => `/api/orgs/${orgId}/tests/${testId}/picks`,
  testSubmit: (orgId: string, testId: string) => `/api/orgs/${orgId}/tests/${testId}/submit`,
  testApprove: (orgId: string, testId: string) => `/api/orgs/${orgId}/tests/${testId}/approve`,
  testRequestChanges: (orgId: string, testId: string) => `/api/orgs/${orgId}/tests/${testId}/request-changes`,
  testReviews: (orgId: string, testId: string) => `/api/orgs/${orgId}/tests/${testId}/reviews`,
  testUploads: (orgId: string, testId: string) => `/api/orgs/${orgId}/tests/${testId}/uploads`,
  testReadings: (orgId: string, testId: string) => `/api/orgs/${orgId}/tests/${testId}/readings`,
  designers: (orgId: string) => `/api/orgs/${orgId}/designers`,
  uploadDownload: (orgId: string, uploadId: string) => `/api/orgs/${orgId}/uploads/${uploadId}/download`,
  uploadPreview: (orgId: string, uploadId: string) => `/api/orgs/${orgId}/uploads/${uploadId}/preview`,
  uploadImport: (orgId: string, uploadId: string) => `/api/orgs/${orgId}/uploads/${uploadId}/import`,
  uploadTrial: (orgId: string, uploadId: string) => `/api/orgs/${orgId}/uploads/${uploadId}/trial`,
  importProfiles: (orgId: string) => `/api/orgs/${orgId}/import-profiles`,
  readingsTemplateCsv: (orgId: string) => `/api/orgs/${orgId}/templates/readings.csv`,
  readingsTemplateXlsx: (orgId: string) => `/api/orgs/${orgId}/templates/readings.xlsx`,
  job: (orgId: string, jobId: string) => `/api/orgs/${orgId}/jobs/${jobId}`,
  reviewQueue: (orgId: string) => `/api/orgs/${orgId}/review-queue`,
  soilRecords: (orgId: string) => `/api/orgs/${orgId}/soil-records`,
  soilRecord: (orgId: string, recordId: string) => `/api/orgs/${orgId}/soil-records/${recordId}`,
  soilRecordVersion: (orgId: string, recordId: string, version: number) => `/api/orgs/${orgId}/soil-records/${recordId}/versions/${version}`,
} as const;
