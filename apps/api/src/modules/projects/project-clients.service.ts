import { holdsAnyRole, roleList, type ProjectClient, type ProjectClientInvitation, type ProjectClients, type ProjectShareOutcome } from '@porestack/types';
import type { EntityManager } from 'typeorm';
import { dataSource } from '../../data-source.js';
import { DomainError, NotFoundError } from '../../errors/domain-error.js';
import { logger } from '../../http/logger.js';
import { publicLink, sendMail } from '../../mail/mailer.js';
import { projectSharedMail } from '../../mail/templates/project-shared.mail.js';
import { audit } from '../audit/audit.service.js';
import { invitationMailFailed } from '../invitations/invitation.exception.js';
import { createInvitation } from '../invitations/invitations.service.js';
import { MembershipEntity } from '../organisations/membership.entity.js';
import { OrganisationEntity } from '../organisations/organisation.entity.js';
import type { UserEntity } from '../users/user.entity.js';
import { ORGANISATION_WIDE_ROLES } from './project-scope.js';
import { ProjectMemberEntity } from './project-member.entity.js';
import { ProjectEntity } from './project.entity.js';

const emailIssue = (message: string) => new DomainError('validation_failed', message, [{ path: 'email', message }]);

async function projectOrThrow(manager: EntityManager, orgId: string, projectId: string): Promise<ProjectEntity> {
  const project = await manager.getRepository(ProjectEntity).findOneBy({ organisationId: orgId, id: projectId });
  if (!project) throw new NotFoundError('project');
  return project;
}

async function clients(manager: EntityManager, orgId: string, projectId: string, userId?: string): Promise<ProjectClient[]> {
  const rows = (await manager.query(
    `SELECT u.id, u.name, u.email, pm.created_at, adder.name AS added_by_name
       FROM project_members pm JOIN users u ON u.id = pm.user_id LEFT JOIN users adder ON adder.id = pm.added_by_id
      WHERE pm.organisation_id = $1 AND pm.project_id = $2 AND pm.role = 'client' AND ($3::uuid IS NULL OR pm.user_id = $3)
      ORDER BY u.name`,
    [orgId, projectId, userId ?? null],
  )) as Array<{ id: string; name: string; email: string; created_at: Date; added_by_name: string | null }>;
  return rows.map((r) => ({ userId: r.id, name: r.name, email: r.email, sharedAt: r.created_at.toISOString(), sharedByName: r.added_by_name }));
}

async function pendingInvitations(manager: EntityManager, orgId: string, projectId: string): Promise<ProjectClientInvitation[]> {
  const rows = (await manager.query(
    `SELECT i.id, i.email, i.created_at, i.expires_at, u.name AS invited_by_name
       FROM invitation_projects ip JOIN invitations i ON i.id = ip.invitation_id JOIN users u ON u.id = i.invited_by_id
      WHERE ip.organisation_id = $1 AND ip.project_id = $2 AND i.accepted_at IS NULL AND i.revoked_at IS NULL AND i.expires_at > now()
      ORDER BY i.created_at DESC`,
    [orgId, projectId],
  )) as Array<{ id: string; email: string; created_at: Date; expires_at: Date; invited_by_name: string }>;
  return rows.map((r) => ({ invitationId: r.id, email: r.email, invitedAt: r.created_at.toISOString(), expiresAt: r.expires_at.toISOString(), invitedByName: r.invited_by_name }));
}

/** Who the project is shared with: client members, and pending invitations that carry it. */
export async function listProjectClients(orgId: string, projectId: string): Promise<ProjectClients> {
  await projectOrThrow(dataSource.manager, orgId, projectId);
  return { clients: await clients(dataSource.manager, orgId, projectId), invitations: await pendingInvitations(dataSource.manager, orgId, projectId) };
}

/**
 * Why a member is not given a client's place: lab staff already see every project; a member
 * without the client role gets it from an administrator first (lab managers share, they do not
 * hand out roles).
 */
function notAClient(email: string, roles: MembershipEntity['roles']): DomainError | null {
  if (holdsAnyRole(roles, ORGANISATION_WIDE_ROLES)) {
    return emailIssue(`${email} is a member here as ${roleList(roles)} and already sees every project; there is nothing to share.`);
  }
  if (!roles.includes('client')) {
    return emailIssue(
      `${email} is a member here as ${roleList(roles)}, not as a client. Designers are put on a project through its designers list; for a client's view, an administrator adds the client role to them first.`,
    );
  }
  return null;
}

/**
 * Shares the project with a client by e-mail. A member with the client role is put on the project
 * at once and told by e-mail; any other address (a new person, or an account of another
 * organisation) is invited as a client with this project, through the invitations module. Both
 * are in the activity log. The mail goes out before the commit: when it cannot, nothing is kept.
 */
export async function shareProject(orgId: string, projectId: string, email: string, actor: UserEntity): Promise<ProjectShareOutcome> {
  const member = await dataSource.transaction(async (manager) => {
    const project = await projectOrThrow(manager, orgId, projectId);
    const membership = await manager
      .getRepository(MembershipEntity)
      .createQueryBuilder('m')
      .innerJoinAndSelect('m.user', 'u')
      .where('m.organisation_id = :orgId AND u.email = :email', { orgId, email })
      .getOne();
    if (!membership) return null;
    const refusal = notAClient(email, membership.roles);
    if (refusal) throw refusal;
    const places = manager.getRepository(ProjectMemberEntity);
    const place = await places.findOneBy({ organisationId: orgId, projectId, userId: membership.userId });
    if (place?.role === 'designer') throw emailIssue(`${email} is already on ${project.name} as one of its designers, who read all that a client reads and more.`);
    if (place) throw emailIssue(`${project.name} is already shared with ${email}.`);
    await places.insert({ organisationId: orgId, projectId, userId: membership.userId, role: 'client', addedById: actor.id });
    await audit.record(
      { organisationId: orgId, actorUserId: actor.id, action: 'project.shared', objectType: 'project', objectId: projectId, details: { email, reference: project.reference, by: 'existing account' } },
      manager,
    );
    const organisation = await manager.getRepository(OrganisationEntity).findOneByOrFail({ id: orgId });
    try {
      await sendMail(
        email,
        projectSharedMail({ organisationName: organisation.name, sharedBy: actor.name, projectName: project.name, url: publicLink(`/orgs/${orgId}/projects/${projectId}`) }),
      );
    } catch (error) {
      logger.warn({ err: error, projectId }, 'project-shared e-mail could not be sent');
      throw invitationMailFailed();
    }
    const [client] = await clients(manager, orgId, projectId, membership.userId);
    if (!client) throw new Error('shareProject: the place just made is missing');
    return client;
  });
  if (member) return { outcome: 'shared', client: member };
  const invitation = await createInvitation(orgId, actor, { email, roles: ['client'] }, [projectId]);
  return {
    outcome: 'invited',
    invitation: { invitationId: invitation.id, email: invitation.email, invitedAt: invitation.createdAt, expiresAt: invitation.expiresAt, invitedByName: invitation.invitedBy },
  };
}

/** Withdraws the project from a client member; they keep their membership and other projects. */
export async function withdrawClient(orgId: string, projectId: string, userId: string, actor: UserEntity): Promise<void> {
  await dataSource.transaction(async (manager) => {
    const project = await projectOrThrow(manager, orgId, projectId);
    const [client] = await clients(manager, orgId, projectId, userId);
    if (!client) throw new NotFoundError('client of this project');
    await manager.getRepository(ProjectMemberEntity).delete({ organisationId: orgId, projectId, userId, role: 'client' });
    await audit.record(
      { organisationId: orgId, actorUserId: actor.id, action: 'project.share_withdrawn', objectType: 'project', objectId: projectId, details: { email: client.email, reference: project.reference } },
      manager,
    );
  });
}

/**
 * Takes the project out of a pending client invitation; an invitation left with no project to
 * share is withdrawn altogether (it was made for the sharing).
 */
export async function withdrawClientInvitation(orgId: string, projectId: string, invitationId: string, actor: UserEntity): Promise<void> {
  await dataSource.transaction(async (manager) => {
    const project = await projectOrThrow(manager, orgId, projectId);
    const pending = (await pendingInvitations(manager, orgId, projectId)).find((i) => i.invitationId === invitationId);
    if (!pending) throw new NotFoundError('invitation for this project');
    await manager.query('DELETE FROM invitation_projects WHERE organisation_id = $1 AND invitation_id = $2 AND project_id = $3', [orgId, invitationId, projectId]);
    await audit.record(
      { organisationId: orgId, actorUserId: actor.id, action: 'project.share_withdrawn', objectType: 'project', objectId: projectId, details: { email: pending.email, reference: project.reference, by: 'pending invitation' } },
      manager,
    );
    const [left] = (await manager.query('SELECT count(*)::int AS n FROM invitation_projects WHERE invitation_id = $1', [invitationId])) as Array<{ n: number }>;
    if ((left?.n ?? 0) === 0) {
      await manager.query('UPDATE invitations SET revoked_at = now() WHERE organisation_id = $1 AND id = $2', [orgId, invitationId]);
      await audit.record(
        { organisationId: orgId, actorUserId: actor.id, action: 'invitation.revoked', objectType: 'invitation', objectId: invitationId, details: { email: pending.email, roles: ['client'] } },
        manager,
      );
    }
  });
}
