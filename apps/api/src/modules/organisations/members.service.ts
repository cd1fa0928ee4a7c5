import { canonicalRoles, type Member, type Role } from '@porestack/types';
import { ArrayContains, type EntityManager } from 'typeorm';
import { dataSource } from '../../data-source.js';
import { NotFoundError } from '../../errors/domain-error.js';
import { audit } from '../audit/audit.service.js';
import type { UserEntity } from '../users/user.entity.js';
import { lastAdmin, ownRolesNeedAnotherAdmin } from './member.exception.js';
import { MembershipEntity } from './membership.entity.js';

export async function listMembers(orgId: string): Promise<Member[]> {
  const rows = await dataSource.getRepository(MembershipEntity).find({
    where: { organisationId: orgId },
    relations: { user: true },
    order: { createdAt: 'ASC' },
  });
  return rows.map((m) => ({ userId: m.userId, name: m.user.name, email: m.user.email, roles: m.roles, joinedAt: m.createdAt.toISOString() }));
}

/**
 * The membership to change, with every admin row of the organisation locked, so two
 * admins demoting each other at once cannot leave the organisation without one.
 */
async function lockForChange(manager: EntityManager, orgId: string, userId: string): Promise<{ target: MembershipEntity; adminCount: number }> {
  const memberships = manager.getRepository(MembershipEntity);
  const admins = await memberships.find({ where: { organisationId: orgId, roles: ArrayContains(['admin']) }, lock: { mode: 'pessimistic_write' } });
  const target = await memberships.findOne({ where: { organisationId: orgId, userId }, lock: { mode: 'pessimistic_write' } });
  if (!target) throw new NotFoundError('member');
  return { target, adminCount: admins.length };
}

/**
 * Replaces a member's roles with `roles`. Another admin may set any roles. An admin changing
 * her own may give roles up or step down (the last-admin rule aside), but adds a role to herself
 * while staying administrator only when she is the organisation's only one: a one-person lab has
 * nobody else to ask, and in a larger one a colleague grants the extra role.
 */
export async function changeMemberRoles(orgId: string, userId: string, roles: readonly Role[], actor: UserEntity): Promise<Member> {
  const next = canonicalRoles(roles);
  await dataSource.transaction(async (manager) => {
    const { target, adminCount } = await lockForChange(manager, orgId, userId);
    const previous = canonicalRoles(target.roles);
    if (previous.join() === next.join()) return;
    const isAdmin = previous.includes('admin');
    if (isAdmin && !next.includes('admin') && adminCount <= 1) throw lastAdmin('demote');
    const added = next.filter((role) => !previous.includes(role));
    if (userId === actor.id && next.includes('admin') && added.length > 0 && adminCount > 1) throw ownRolesNeedAnotherAdmin();
    await manager.getRepository(MembershipEntity).update({ organisationId: orgId, id: target.id }, { roles: next });
    await audit.record(
      {
        organisationId: orgId,
        actorUserId: actor.id,
        action: 'member.role_changed',
        objectType: 'user',
        objectId: userId,
        details: { from: previous, to: next },
      },
      manager,
    );
  });
  const member = (await listMembers(orgId)).find((m) => m.userId === userId);
  if (!member) throw new NotFoundError('member');
  return member;
}

export async function removeMember(orgId: string, userId: string, actor: UserEntity): Promise<void> {
  await dataSource.transaction(async (manager) => {
    const { target, adminCount } = await lockForChange(manager, orgId, userId);
    if (target.roles.includes('admin') && adminCount <= 1) throw lastAdmin('remove');
    await manager.getRepository(MembershipEntity).delete({ organisationId: orgId, id: target.id });
    // Their places on projects go with the membership, so an invitation later starts from nothing.
    await manager.query('DELETE FROM project_members WHERE organisation_id = $1 AND user_id = $2', [orgId, userId]);
    await audit.record(
      { organisationId: orgId, actorUserId: actor.id, action: 'member.removed', objectType: 'user', objectId: userId, details: { roles: target.roles } },
      manager,
    );
  });
}
