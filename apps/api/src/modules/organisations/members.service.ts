import type { Member, Role } from '@porestack/types';
import type { EntityManager } from 'typeorm';
import { dataSource } from '../../data-source.js';
import { NotFoundError } from '../../errors/domain-error.js';
import { audit } from '../audit/audit.service.js';
import type { UserEntity } from '../users/user.entity.js';
import { lastAdmin } from './member.exception.js';
import { MembershipEntity } from './membership.entity.js';

export async function listMembers(orgId: string): Promise<Member[]> {
  const rows = await dataSource.getRepository(MembershipEntity).find({
    where: { organisationId: orgId },
    relations: { user: true },
    order: { createdAt: 'ASC' },
  });
  return rows.map((m) => ({ userId: m.userId, name: m.user.name, email: m.user.email, role: m.role, joinedAt: m.createdAt.toISOString() }));
}

/**
 * The membership to change, with every admin row of the organisation locked, so two
 * admins demoting each other at once cannot leave the organisation without one.
 */
async function lockForChange(manager: EntityManager, orgId: string, userId: string): Promise<{ target: MembershipEntity; adminCount: number }> {
  const memberships = manager.getRepository(MembershipEntity);
  const admins = await memberships.find({ where: { organisationId: orgId, role: 'admin' }, lock: { mode: 'pessimistic_write' } });
  const target = await memberships.findOne({ where: { organisationId: orgId, userId }, lock: { mode: 'pessimistic_write' } });
  if (!target) throw new NotFoundError('member');
  return { target, adminCount: admins.length };
}

export async function changeMemberRole(orgId: string, userId: string, role: Role, actor: UserEntity): Promise<Member> {
  await dataSource.transaction(async (manager) => {
    const { target, adminCount } = await lockForChange(manager, orgId, userId);
    if (target.role === role) return;
    if (target.role === 'admin' && adminCount <= 1) throw lastAdmin('demote');
    await manager.getRepository(MembershipEntity).update({ organisationId: orgId, id: target.id }, { role });
    await audit.record(
      {
        organisationId: orgId,
        actorUserId: actor.id,
        action: 'member.role_changed',
        objectType: 'user',
        objectId: userId,
        details: { from: target.role, to: role },
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
    if (target.role === 'admin' && adminCount <= 1) throw lastAdmin('remove');
    await manager.getRepository(MembershipEntity).delete({ organisationId: orgId, id: target.id });
    // Their places on projects go with the membership, so an invitation later starts from nothing.
    await manager.query('DELETE FROM project_members WHERE organisation_id = $1 AND user_id = $2', [orgId, userId]);
    await audit.record(
      { organisationId: orgId, actorUserId: actor.id, action: 'member.removed', objectType: 'user', objectId: userId, details: { role: target.role } },
      manager,
    );
  });
}
