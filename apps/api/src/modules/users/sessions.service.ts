import type { Session } from '@porestack/types';
import type { EntityManager } from 'typeorm';
import { dataSource } from '../../data-source.js';
import { MembershipEntity } from '../organisations/membership.entity.js';
import type { UserEntity } from './user.entity.js';

/** The Session body every sign-in route answers with: the user and all their memberships. */
export async function sessionFor(user: UserEntity, manager: EntityManager = dataSource.manager): Promise<Session> {
  const memberships = await manager.getRepository(MembershipEntity).find({
    where: { userId: user.id },
    relations: { organisation: true },
    order: { createdAt: 'ASC' },
  });
  return {
    user: { id: user.id, email: user.email, name: user.name },
    memberships: memberships.map((m) => ({
      organisationId: m.organisationId,
      organisationName: m.organisation.name,
      roles: m.roles,
    })),
  };
}
