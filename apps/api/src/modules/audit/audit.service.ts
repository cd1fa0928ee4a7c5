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

/** The object of an entry in words, looked up in the entry's own organisation; null once the object is gone. */
const OBJECT_LABEL_SQL = `CASE entry.object_type
  WHEN 'project' THEN (SELECT p.reference || ' ' || p.name FROM projects p WHERE p.id::text = entry.object_id AND p.organisation_id = entry.organisation_id)
  WHEN 'consolidation_test' THEN (SELECT t.reference FROM consolidation_tests t WHERE t.id::text = entry.object_id AND t.organisation_id = entry.organisation_id)
  WHEN 'soil_record' THEN (SELECT t.reference FROM soil_records r JOIN consolidation_tests t ON t.id = r.test_id WHERE r.id::text = entry.object_id AND r.organisation_id = entry.organisation_id)
  WHEN 'sample' THEN (SELECT b.name || ' / ' || s.reference FROM samples s JOIN boreholes b ON b.id = s.borehole_id WHERE s.id::text = entry.object_id AND s.organisation_id = entry.organisation_id)
  WHEN 'borehole' THEN (SELECT b.name FROM boreholes b WHERE b.id::text = entry.object_id AND b.organisation_id = entry.organisation_id)
  WHEN 'invitation' THEN (SELECT i.email FROM invitations i WHERE i.id::text = entry.object_id AND i.organisation_id = entry.organisation_id)
  WHEN 'issued_report' THEN (SELECT t.reference || ' v' || v.version FROM issued_reports ir JOIN soil_record_versions v ON v.id = ir.subject_id
    JOIN consolidation_tests t ON t.id = v.test_id WHERE ir.id::text = entry.object_id AND ir.organisation_id = entry.organisation_id)
  WHEN 'upload' THEN (SELECT u.original_name FROM uploads u WHERE u.id::text = entry.object_id AND u.organisation_id = entry.organisation_id)
  WHEN 'user' THEN (SELECT u.name FROM users u WHERE u.id::text = entry.object_id)
  WHEN 'organisation' THEN (SELECT o.name FROM organisations o WHERE o.id::text = entry.object_id)
END`;

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

  /**
   * The organisation's entries, newest first, each with the object it is about named in words
   * (a test by its reference, a project by reference and name, a person by name) as it is now,
   * so the activity page need not show ids.
   */
  async list(orgId: string, limit = 200): Promise<AuditEntry[]> {
    const rows = await dataSource
      .getRepository(AuditEntryEntity)
      .createQueryBuilder('entry')
      .leftJoin(UserEntity, 'actor', 'actor.id = entry.actor_user_id')
      .select(['entry.id', 'entry.at', 'entry.action', 'entry.objectType', 'entry.objectId', 'entry.details'])
      .addSelect('actor.name', 'actor_name')
      .addSelect(OBJECT_LABEL_SQL, 'object_label')
      .where('entry.organisation_id = :orgId', { orgId })
      .orderBy('entry.at', 'DESC')
      .addOrderBy('entry.id', 'DESC')
      .limit(limit)
      .getRawAndEntities();
    return rows.entities.map((entity, index) => ({
      id: entity.id,
      at: entity.at.toISOString(),
      actorName: (rows.raw[index] as { actor_name: string | null } | undefined)?.actor_name ?? null,
      objectLabel: (rows.raw[index] as { object_label: string | null } | undefined)?.object_label ?? null,
      action: entity.action,
      objectType: entity.objectType,
      objectId: entity.objectId,
      details: entity.details,
    }));
  },
};
