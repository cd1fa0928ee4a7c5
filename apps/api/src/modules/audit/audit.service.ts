import type { AuditEntry } from '@porestack/types';
import type { EntityManager } from 'typeorm';
import { dataSource } from '../../data-source.js';
import { UserEntity } from '../users/user.entity.js';
import { AuditEntryEntity } from './audit-entry.entity.js';

export interface AuditRecord {
  /** null for events outside any tenant (sign-in, password reset). */
  organisationId: string | null;
  actorUserId: string | null;
  /** dotted verb, e.g. 'invitation.created', 'test.approved' */
  action: string;
  objectType: string;
  objectId: string | null;
  details?: Record<string, unknown>;
}

/**
 * Writes and reads the audit log. Pass the transaction's manager to `record` so the entry
 * commits (or rolls back) with the change it describes.
 */
export const audit = {
  async record(entry: AuditRecord, manager: EntityManager = dataSource.manager): Promise<void> {
    const entries = manager.getRepository(AuditEntryEntity);
    await entries.save(
      entries.create({
        organisationId: entry.organisationId,
        actorUserId: entry.actorUserId,
        action: entry.action,
        objectType: entry.objectType,
        objectId: entry.objectId,
        details: entry.details ?? {},
      }),
    );
  },

  /** The organisation's entries, newest first. */
  async list(orgId: string, limit = 200): Promise<AuditEntry[]> {
    const rows = await dataSource
      .getRepository(AuditEntryEntity)
      .createQueryBuilder('entry')
      .leftJoin(UserEntity, 'actor', 'actor.id = entry.actor_user_id')
      .select(['entry.id', 'entry.at', 'entry.action', 'entry.objectType', 'entry.objectId', 'entry.details'])
      .addSelect('actor.name', 'actor_name')
      .where('entry.organisation_id = :orgId', { orgId })
      .orderBy('entry.at', 'DESC')
      .addOrderBy('entry.id', 'DESC')
      .limit(limit)
      .getRawAndEntities();
    return rows.entities.map((entity, index) => ({
      id: entity.id,
      at: entity.at.toISOString(),
      actorName: (rows.raw[index] as { actor_name: string | null } | undefined)?.actor_name ?? null,
      action: entity.action,
      objectType: entity.objectType,
      objectId: entity.objectId,
      details: entity.details,
    }));
  },
};
