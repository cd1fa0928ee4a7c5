import { z } from 'zod';

const isoDateTime = z.iso.datetime({ offset: true });

/** Sharing a project with a client: their e-mail address (a member with the client role, or anyone to invite). */
export const ProjectShareCreateSchema = z.object({
  email: z.email({ message: 'Enter a valid e-mail address, like name@example.org.' }).trim().toLowerCase(),
});
export type ProjectShareCreate = z.infer<typeof ProjectShareCreateSchema>;

/** A client member the project is shared with. */
export const ProjectClientSchema = z.object({
  userId: z.uuid(),
  name: z.string(),
  email: z.string(),
  sharedAt: isoDateTime,
  /** Who shared it; null when not recorded (or that person's account is gone). */
  sharedByName: z.string().nullable(),
});
export type ProjectClient = z.infer<typeof ProjectClientSchema>;

/** Someone invited as a client with this project, who has not accepted yet. */
export const ProjectClientInvitationSchema = z.object({
  invitationId: z.uuid(),
  email: z.string(),
  invitedAt: isoDateTime,
  expiresAt: isoDateTime,
  invitedByName: z.string(),
});
export type ProjectClientInvitation = z.infer<typeof ProjectClientInvitationSchema>;

/** GET /projects/:projectId/clients — who the project is shared with. */
export const ProjectClientsSchema = z.object({
  clients: z.array(ProjectClientSchema),
  invitations: z.array(ProjectClientInvitationSchema),
});
export type ProjectClients = z.infer<typeof ProjectClientsSchema>;

/** What sharing did: put a client member on the project, or invited the address (with the project). */
export const ProjectShareOutcomeSchema = z.discriminatedUnion('outcome', [
  z.object({ outcome: z.literal('shared'), client: ProjectClientSchema }),
  z.object({ outcome: z.literal('invited'), invitation: ProjectClientInvitationSchema }),
]);
export type ProjectShareOutcome = z.infer<typeof ProjectShareOutcomeSchema>;
