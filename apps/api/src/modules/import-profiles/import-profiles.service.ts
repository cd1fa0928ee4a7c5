import { ImportMappingSchema, type ImportProfile, type ImportProfileCreate } from '@porestack/types';
import type { EntityManager } from 'typeorm';
import { dataSource } from '../../data-source.js';
import { NotFoundError } from '../../errors/domain-error.js';
import { profileNameTaken } from '../uploads/upload.exception.js';
import { ImportProfileEntity } from './import-profile.entity.js';

function toProfile(row: ImportProfileEntity): ImportProfile {
  // Profiles saved before a setting existed take its default (the mapping schema fills it in).
  return { id: row.id, name: row.name, mapping: ImportMappingSchema.parse(row.mapping), createdAt: row.createdAt.toISOString() };
}

/** Saved mappings of an organisation, by name. */
export const importProfiles = {
  async list(orgId: string): Promise<ImportProfile[]> {
    const rows = await dataSource.getRepository(ImportProfileEntity).find({ where: { organisationId: orgId }, order: { name: 'ASC' } });
    return rows.map(toProfile);
  },

  async find(orgId: string, id: string, manager: EntityManager = dataSource.manager): Promise<ImportProfile> {
    const row = await manager.getRepository(ImportProfileEntity).findOneBy({ organisationId: orgId, id });
    if (!row) throw new NotFoundError('import profile');
    return toProfile(row);
  },

  /** @throws profile_name_taken when the organisation has a profile of that name (any case). */
  async create(orgId: string, actorId: string, input: ImportProfileCreate, manager: EntityManager = dataSource.manager): Promise<ImportProfile> {
    const repo = manager.getRepository(ImportProfileEntity);
    const clash = await repo
      .createQueryBuilder('profile')
      .where('profile.organisation_id = :orgId AND lower(profile.name) = lower(:name)', { orgId, name: input.name })
      .getExists();
    if (clash) throw profileNameTaken(input.name);
    return toProfile(await repo.save(repo.create({ organisationId: orgId, name: input.name, mapping: input.mapping, createdById: actorId })));
  },
};
