import { PASSWORD_MAX_BYTES, type Invitation, type InvitationAccept, type InvitationCreate, type InvitationPreview } from '@porestack/types';
import { IsNull, MoreThan, type EntityManager } from 'typeorm';
import { dataSource } from '../../data-source.js';
import { NotFoundError } from '../../errors/domain-error.js';
import { logger } from '../../http/logger.js';
import { publicLink, sendMail } from '../../mail/mailer.js';
import { invitationMail } from '../../mail/templates/invitation.mail.js';
import { audit } from '../audit/audit.service.js';
import { invalidCredentials } from '../auth/auth.exception.js';
import { createOneTimeToken, hashToken } from '../auth/one-time-token.js';
import { MembershipEntity } from '../organisations/membership.entity.js';
import { OrganisationEntity } from '../organisations/organisation.entity.js';
import { byteLength, hashPassword, MIN_PASSWORD_LENGTH, verifyPassword } from '../users/passwords.js';
import { UserEntity } from '../users/user.entity.js';
import {
  alreadyMember,
  invitationExpired,
  invitationRevoked,
  invitationUnknown,
  invitationMailFailed,
  invitationUsed,
  nameRequired,
  passwordTooLong,
  passwordTooShort,
} from './invitation.exception.js';
import { InvitationEntity } from './invitation.entity.js';
import { InvitationProjectEntity } from './invitation-project.entity.js';

export const INVITATION_DAYS = 7;

type SharedProject = { id: string; name: string; reference: string };

function toDto(row: InvitationEntity, projects: SharedProject[]): Invitation {
  return {
    id: row.id,
    email: row.email,
    roles: row.roles,
    invitedBy: row.invitedBy.name,
    createdAt: row.createdAt.toISOString(),
    expiresAt: row.expiresAt.toISOString(),
    projects,
  };
}

/** The projects shared through each invitation, by invitation id. */
async function sharedProjects(manager: EntityManager, invitationIds: string[]): Promise<Map<string, SharedProject[]>> {
  const byInvitation = new Map<string, SharedProject[]>();
  if (invitationIds.length === 0) return byInvitation;
  const rows = (await manager.query(
    `SELECT ip.invitation_id, p.id, p.name, p.reference FROM invitation_projects ip JOIN projects p ON p.id = ip.project_id
      WHERE ip.invitation_id = ANY($1::uuid[]) ORDER BY p.name`,
    [invitationIds],
  )) as Array<SharedProject & { invitation_id: string }>;
  for (const { invitation_id: invitationId, ...project } of rows) byInvitation.set(invitationId, [...(byInvitation.get(invitationId) ?? []), project]);
  return byInvitation;
}

async function isMember(manager: EntityManager, orgId: string, email: string): Promise<boolean> {
  return manager
    .getRepository(MembershipEntity)
    .createQueryBuilder('m')
    .innerJoin('m.user', 'u')
    .where('m.organisation_id = :orgId AND u.email = :email', { orgId, email })
    .getExists();
}

/**
 * Invites by e-mail; a new invitation to the same address replaces the pending one. With
 * `projectIds` (a client invitation made by sharing projects) the invitee joins those projects
 * as a client on accepting; the projects of a replaced pending client invitation are kept too.
 */
export async function createInvitation(orgId: string, actor: UserEntity, input: InvitationCreate, projectIds: readonly string[] = []): Promise<Invitation> {
  const asClient = input.roles.includes('client');
  if (projectIds.length > 0 && !asClient) throw new Error('createInvitation: projects are shared with clients only');
  const { token, tokenHash } = createOneTimeToken();
  const { row, projects } = await dataSource.transaction(async (manager) => {
    if (await isMember(manager, orgId, input.email)) throw alreadyMember(input.email);
    const invitations = manager.getRepository(InvitationEntity);
    const pending = await invitations.findBy({ organisationId: orgId, email: input.email, acceptedAt: IsNull(), revokedAt: IsNull(), expiresAt: MoreThan(new Date()) });
    const carried = asClient ? [...(await sharedProjects(manager, pending.filter((p) => p.roles.includes('client')).map((p) => p.id))).values()].flat().map((p) => p.id) : [];
    await invitations.update(
      { organisationId: orgId, email: input.email, acceptedAt: IsNull(), revokedAt: IsNull() },
      { revokedAt: new Date() },
    );
    const saved = await invitations.save(
      invitations.create({
        organisationId: orgId,
        email: input.email,
        roles: input.roles,
        tokenHash,
        invitedById: actor.id,
        expiresAt: new Date(Date.now() + INVITATION_DAYS * 24 * 3600_000),
      }),
    );
    const allProjectIds = [...new Set([...carried, ...projectIds])];
    if (allProjectIds.length > 0) {
      await manager.getRepository(InvitationProjectEntity).insert(allProjectIds.map((projectId) => ({ organisationId: orgId, invitationId: saved.id, projectId })));
    }
    const shared = (await sharedProjects(manager, [saved.id])).get(saved.id) ?? [];
    await audit.record(
      {
        organisationId: orgId,
        actorUserId: actor.id,
        action: 'invitation.created',
        objectType: 'invitation',
        objectId: saved.id,
        details: { email: input.email, roles: input.roles, ...(shared.length > 0 ? { projects: shared.map((p) => p.reference) } : {}) },
      },
      manager,
    );
    for (const project of shared.filter((p) => projectIds.includes(p.id))) {
      await audit.record(
        { organisationId: orgId, actorUserId: actor.id, action: 'project.shared', objectType: 'project', objectId: project.id, details: { email: input.email, reference: project.reference, by: 'invitation' } },
        manager,
      );
    }
    const organisation = await manager.getRepository(OrganisationEntity).findOneByOrFail({ id: orgId });
    // Sent before the commit: an invitation nobody was told about would only wait to expire,
    // so when the mail cannot go out, nothing is kept and the admin is told to try again.
    try {
      await sendMail(
        input.email,
        invitationMail({
          organisationName: organisation.name,
          invitedBy: actor.name,
          roles: input.roles,
          url: publicLink(`/invitations/${encodeURIComponent(token)}`),
          validDays: INVITATION_DAYS,
          projectNames: shared.map((p) => p.name),
        }),
      );
    } catch (error) {
      logger.warn({ err: error, invitationId: saved.id }, 'invitation e-mail could not be sent');
      throw invitationMailFailed();
    }
    return { row: Object.assign(saved, { invitedBy: actor }), projects: shared };
  });
  return toDto(row, projects);
}

/** Invitations neither accepted, withdrawn nor expired, newest first. */
export async function listPendingInvitations(orgId: string): Promise<Invitation[]> {
  const rows = await dataSource.getRepository(InvitationEntity).find({
    where: { organisationId: orgId, acceptedAt: IsNull(), revokedAt: IsNull(), expiresAt: MoreThan(new Date()) },
    relations: { invitedBy: true },
    order: { createdAt: 'DESC' },
  });
  const projects = await sharedProjects(dataSource.manager, rows.map((row) => row.id));
  return rows.map((row) => toDto(row, projects.get(row.id) ?? []));
}

export async function revokeInvitation(orgId: string, invitationId: string, actor: UserEntity): Promise<void> {
  await dataSource.transaction(async (manager) => {
    const invitations = manager.getRepository(InvitationEntity);
    const row = await invitations.findOneBy({ organisationId: orgId, id: invitationId, acceptedAt: IsNull(), revokedAt: IsNull() });
    if (!row) throw new NotFoundError('invitation');
    await invitations.update({ organisationId: orgId, id: row.id }, { revokedAt: new Date() });
    await audit.record(
      {
        organisationId: orgId,
        actorUserId: actor.id,
        action: 'invitation.revoked',
        objectType: 'invitation',
        objectId: row.id,
        details: { email: row.email, roles: row.roles },
      },
      manager,
    );
  });
}

/** The invitation a link stands for, if it can still be accepted. */
async function usableInvitation(manager: EntityManager, token: string, lock: boolean): Promise<InvitationEntity> {
  const invitations = manager.getRepository(InvitationEntity);
  const found = await invitations.findOne({
    where: { tokenHash: hashToken(token) },
    ...(lock ? { lock: { mode: 'pessimistic_write' as const } } : {}),
  });
  if (!found) throw invitationUnknown();
  if (found.acceptedAt) throw invitationUsed();
  if (found.revokedAt) throw invitationRevoked();
  if (found.expiresAt.getTime() <= Date.now()) throw invitationExpired();
  const row = await invitations.findOneOrFail({ where: { id: found.id }, relations: { organisation: true, invitedBy: true } });
  return row;
}

export async function previewInvitation(token: string): Promise<InvitationPreview> {
  const row = await usableInvitation(dataSource.manager, token, false);
  const accountExists = await dataSource.getRepository(UserEntity).existsBy({ email: row.email });
  return {
    organisationName: row.organisation.name,
    email: row.email,
    roles: row.roles,
    invitedBy: row.invitedBy.name,
    accountExists,
    expiresAt: row.expiresAt.toISOString(),
    projectNames: ((await sharedProjects(dataSource.manager, [row.id])).get(row.id) ?? []).map((p) => p.name),
  };
}

/**
 * Accepts: creates the account (name + new password) or, when the e-mail already has one,
 * checks its password; then adds the membership and spends the invitation.
 */
export async function acceptInvitation(token: string, input: InvitationAccept): Promise<UserEntity> {
  return dataSource.transaction(async (manager) => {
    const row = await usableInvitation(manager, token, true);
    const users = manager.getRepository(UserEntity);
    let user = await users.findOneBy({ email: row.email });
    if (user) {
      if (!(await verifyPassword(input.password, user.passwordHash))) throw invalidCredentials();
      if (await isMember(manager, row.organisationId, row.email)) throw alreadyMember(row.email);
    } else {
      if (!input.name) throw nameRequired();
      if (input.password.length < MIN_PASSWORD_LENGTH) throw passwordTooShort(MIN_PASSWORD_LENGTH);
      if (byteLength(input.password) > PASSWORD_MAX_BYTES) throw passwordTooLong(PASSWORD_MAX_BYTES);
      user = await users.save(users.create({ email: row.email, name: input.name, passwordHash: await hashPassword(input.password) }));
      await audit.record(
        { organisationId: null, actorUserId: user.id, action: 'user.signed_up', objectType: 'user', objectId: user.id, details: { via: 'invitation' } },
        manager,
      );
    }
    await manager.getRepository(MembershipEntity).insert({ organisationId: row.organisationId, userId: user.id, roles: row.roles });
    if (row.roles.includes('client')) {
      // The projects shared through the invitation: the new client's places.
      await manager.query(
        `INSERT INTO project_members (organisation_id, project_id, user_id, role, added_by_id)
         SELECT ip.organisation_id, ip.project_id, $2, 'client', $3 FROM invitation_projects ip WHERE ip.invitation_id = $1
         ON CONFLICT (project_id, user_id) DO NOTHING`,
        [row.id, user.id, row.invitedById],
      );
    }
    await manager.getRepository(InvitationEntity).update({ organisationId: row.organisationId, id: row.id }, { acceptedAt: new Date() });
    await audit.record(
      {
        organisationId: row.organisationId,
        actorUserId: user.id,
        action: 'invitation.accepted',
        objectType: 'invitation',
        objectId: row.id,
        details: { email: row.email, roles: row.roles },
      },
      manager,
    );
    return user;
  });
}
