import { z } from 'zod';
import { RolesSchema } from './roles.js';

export const MemberSchema = z.object({
  userId: z.uuid(),
  name: z.string(),
  email: z.string(),
  roles: RolesSchema,
  joinedAt: z.iso.datetime({ offset: true }),
});
export type Member = z.infer<typeof MemberSchema>;

export const InvitationCreateSchema = z.object({
  email: z.email({ message: 'Enter a valid e-mail address, like name@example.org.' }).trim().toLowerCase(),
  /** The roles the invitee gets on accepting: one or more. */
  roles: RolesSchema,
});
export type InvitationCreate = z.infer<typeof InvitationCreateSchema>;

export const InvitationSchema = z.object({
  id: z.uuid(),
  email: z.string(),
  roles: RolesSchema,
  invitedBy: z.string(),
  createdAt: z.iso.datetime({ offset: true }),
  expiresAt: z.iso.datetime({ offset: true }),
  /** Projects shared with the invitee: accepting puts them on these as a client. */
  projects: z.array(z.object({ id: z.uuid(), name: z.string(), reference: z.string() })),
});
export type Invitation = z.infer<typeof InvitationSchema>;

/** What the invitee sees before accepting (GET /api/invitations/:token). */
export const InvitationPreviewSchema = z.object({
  organisationName: z.string(),
  email: z.string(),
  roles: RolesSchema,
  invitedBy: z.string(),
  accountExists: z.boolean(),
  expiresAt: z.iso.datetime({ offset: true }),
  /** Names of the projects shared with the invitee, if any. */
  projectNames: z.array(z.string()),
});
export type InvitationPreview = z.infer<typeof InvitationPreviewSchema>;

/** Accepting: a new account gives name and password; an existing one gives its password. */
export const InvitationAcceptSchema = z.object({
  name: z.string().trim().min(1).max(120).optional(),
  password: z.string().min(1, { message: 'Enter a password.' }).max(200),
});
export type InvitationAccept = z.infer<typeof InvitationAcceptSchema>;

/** The member's whole new set of roles (PATCH /api/orgs/:orgId/members/:userId). */
export const MemberRolesUpdateSchema = z.object({ roles: RolesSchema });
export type MemberRolesUpdate = z.infer<typeof MemberRolesUpdateSchema>;

export const AuditEntrySchema = z.object({
  id: z.uuid(),
  at: z.iso.datetime({ offset: true }),
  actorName: z.string().nullable(),
  action: z.string(),
  objectType: z.string(),
  objectId: z.string().nullable(),
  /** The object in words as it is now (a test's reference, a project's reference and name, a person's name); null once it is gone. */
  objectLabel: z.string().nullable(),
  details: z.record(z.string(), z.unknown()),
});
export type AuditEntry = z.infer<typeof AuditEntrySchema>;
