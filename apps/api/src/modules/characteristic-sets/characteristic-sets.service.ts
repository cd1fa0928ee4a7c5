import type { CharacteristicSetDetail, CharacteristicSetRevision, CharacteristicSetSummary, SetRevisionTrace, SetStatistics } from '@porestack/types';
import { type CharacteristicSetInputSchema } from '@porestack/types';
import type { EntityManager } from 'typeorm';
import type { z } from 'zod';
import { dataSource } from '../../data-source.js';
import { DomainError, NotFoundError } from '../../errors/domain-error.js';
import { audit } from '../audit/audit.service.js';
import type { Actor } from '../consolidation-tests/consolidation-tests.service.js';
import { designVersions, toRecordVersionTrace, userNames } from '../design-records/design-records.service.js';
import { CharacteristicSetRevisionEntity } from './characteristic-set-revision.entity.js';
import { CharacteristicSetEntity } from './characteristic-set.entity.js';
import { setMember, setStatistics } from './set-statistics.js';

type SetInput = z.output<typeof CharacteristicSetInputSchema>;

/** A stored set revision as the ground model reads it. */
export interface StoredSetRevision {
  id: string;
  setId: string;
  revision: number;
  name: string;
  adopted: CharacteristicSetRevision['adopted'];
  members: CharacteristicSetRevision['members'];
}

/** Members and statistics of these versions; every id must be an approved version of the project. */
export async function previewSetStatistics(orgId: string, projectId: string, versionIds: readonly string[]): Promise<SetStatistics> {
  const versions = await designVersions(orgId, projectId, versionIds);
  const missing = versionIds.filter((id) => !versions.has(id));
  if (missing.length > 0) {
    throw new DomainError('validation_failed', `${missing.length} of the versions picked ${missing.length === 1 ? 'is' : 'are'} not an approved soil record version of this project. Pick the records again from the list.`, [
      { path: 'versionIds', message: 'Not all are approved versions of this project.' },
    ]);
  }
  const members = versionIds.map((id) => setMember(versions.get(id)!)).sort((a, b) => a.depthM - b.depthM);
  return { members, statistics: setStatistics(members) };
}

async function writeRevision(manager: EntityManager, orgId: string, projectId: string, set: CharacteristicSetEntity, revision: number, input: SetInput, actor: Actor): Promise<void> {
  const { members, statistics } = await previewSetStatistics(orgId, projectId, [...new Set(input.versionIds)]);
  await manager.getRepository(CharacteristicSetRevisionEntity).insert({
    organisationId: orgId,
    setId: set.id,
    revision,
    name: input.name,
    note: input.note,
    recordVersionIds: members.map((m) => m.versionId),
    adopted: Object.fromEntries(Object.entries(input.adopted).map(([key, adopted]) => [key, { value: adopted.value, basis: adopted.basis, note: adopted.note }])),
    members: members.map((m) => ({ ...m, newerVersion: null })),
    statistics,
    createdById: actor.id,
  });
  await audit.record(
    { organisationId: orgId, actorUserId: actor.id, action: 'characteristic_set.revised', objectType: 'characteristic_set', objectId: set.id, details: { revision, versionIds: members.map((m) => m.versionId) } },
    manager,
  );
}

export async function createCharacteristicSet(orgId: string, projectId: string, input: SetInput, actor: Actor): Promise<CharacteristicSetDetail> {
  const id = await dataSource.transaction(async (manager) => {
    const repo = manager.getRepository(CharacteristicSetEntity);
    const set = await repo.save(repo.create({ organisationId: orgId, projectId, name: input.name, currentRevision: 1, createdById: actor.id }));
    await writeRevision(manager, orgId, projectId, set, 1, input, actor);
    return set.id;
  });
  return getCharacteristicSet(orgId, projectId, id);
}

export async function reviseCharacteristicSet(orgId: string, projectId: string, setId: string, input: SetInput, actor: Actor): Promise<CharacteristicSetDetail> {
  await dataSource.transaction(async (manager) => {
    const repo = manager.getRepository(CharacteristicSetEntity);
    const set = await repo.findOne({ where: { organisationId: orgId, projectId, id: setId }, lock: { mode: 'pessimistic_write' } });
    if (!set) throw new NotFoundError('characteristic set');
    const revision = set.currentRevision + 1;
    await writeRevision(manager, orgId, projectId, set, revision, input, actor);
    await repo.update({ id: set.id }, { currentRevision: revision, name: input.name });
  });
  return getCharacteristicSet(orgId, projectId, setId);
}

/** Members as stored, with newer approved versions marked as of now. */
async function withNewerVersions(orgId: string, projectId: string, rows: CharacteristicSetRevisionEntity[]): Promise<Map<string, CharacteristicSetRevision['members']>> {
  const current = await designVersions(orgId, projectId, rows.flatMap((r) => r.recordVersionIds));
  return new Map(rows.map((row) => [row.id, row.members.map((m) => ({ ...m, newerVersion: (current.get(m.versionId)?.currentVersion ?? m.version) > m.version ? (current.get(m.versionId)?.currentVersion ?? null) : null }))]));
}

export async function listCharacteristicSets(orgId: string, projectId: string): Promise<CharacteristicSetSummary[]> {
  const sets = await dataSource.getRepository(CharacteristicSetEntity).find({ where: { organisationId: orgId, projectId }, order: { name: 'ASC' } });
  if (sets.length === 0) return [];
  const currents = await dataSource
    .getRepository(CharacteristicSetRevisionEntity)
    .createQueryBuilder('r')
    .innerJoin(CharacteristicSetEntity, 's', 's.id = r.set_id AND s.current_revision = r.revision')
    .where('r.organisation_id = :orgId AND s.project_id = :projectId', { orgId, projectId })
    .getMany();
  const members = await withNewerVersions(orgId, projectId, currents);
  return sets.map((set) => {
    const current = currents.find((r) => r.setId === set.id)!;
    const list = members.get(current.id) ?? [];
    return {
      id: set.id,
      projectId,
      name: set.name,
      currentRevision: set.currentRevision,
      currentRevisionId: current.id,
      memberCount: list.length,
      membersWithNewerVersions: list.filter((m) => m.newerVersion !== null).length,
      updatedAt: set.updatedAt.toISOString(),
    };
  });
}

export async function getCharacteristicSet(orgId: string, projectId: string, setId: string, revision?: number): Promise<CharacteristicSetDetail> {
  const summary = (await listCharacteristicSets(orgId, projectId)).find((s) => s.id === setId);
  if (!summary) throw new NotFoundError('characteristic set');
  const rows = await dataSource.getRepository(CharacteristicSetRevisionEntity).find({ where: { organisationId: orgId, setId }, order: { revision: 'DESC' } });
  const chosen = rows.find((r) => r.revision === (revision ?? summary.currentRevision));
  if (!chosen) throw new NotFoundError('characteristic set revision');
  const names = await userNames(rows.map((r) => r.createdById));
  const members = (await withNewerVersions(orgId, projectId, [chosen])).get(chosen.id) ?? [];
  const actor = (id: string) => ({ id, name: names.get(id) ?? '' });
  return {
    ...summary,
    current: {
      id: chosen.id,
      setId,
      revision: chosen.revision,
      name: chosen.name,
      note: chosen.note,
      adopted: chosen.adopted,
      members,
      statistics: chosen.statistics,
      createdBy: actor(chosen.createdById),
      createdAt: chosen.createdAt.toISOString(),
    },
    revisions: rows.map((r) => ({ id: r.id, revision: r.revision, note: r.note, createdBy: actor(r.createdById), createdAt: r.createdAt.toISOString() })),
  };
}

/** Set revisions of the project by id (for ground model layers). */
export async function setRevisionsByIds(orgId: string, projectId: string, ids: readonly string[], manager: EntityManager = dataSource.manager): Promise<Map<string, StoredSetRevision>> {
  if (ids.length === 0) return new Map();
  const rows = await manager
    .getRepository(CharacteristicSetRevisionEntity)
    .createQueryBuilder('r')
    .innerJoin(CharacteristicSetEntity, 's', 's.id = r.set_id')
    .where('r.organisation_id = :orgId AND s.project_id = :projectId AND r.id IN (:...ids)', { orgId, projectId, ids: [...new Set(ids)] })
    .getMany();
  return new Map(rows.map((r) => [r.id, { id: r.id, setId: r.setId, revision: r.revision, name: r.name, adopted: r.adopted, members: r.members }]));
}

/** The newest revision number of each set (for "newer parameters approved"). */
export async function currentSetRevisions(orgId: string, setIds: readonly string[]): Promise<Map<string, { revision: number; id: string }>> {
  if (setIds.length === 0) return new Map();
  const rows = (await dataSource.query(
    'SELECT s.id AS set_id, r.id, r.revision FROM characteristic_sets s JOIN characteristic_set_revisions r ON r.set_id = s.id AND r.revision = s.current_revision WHERE s.organisation_id = $1 AND s.id = ANY($2::uuid[])',
    [orgId, [...new Set(setIds)]],
  )) as Array<{ set_id: string; id: string; revision: number }>;
  return new Map(rows.map((row) => [row.set_id, { revision: row.revision, id: row.id }]));
}

/** A set revision's adopted values and the record versions behind them. */
export async function traceSetRevision(orgId: string, projectId: string, setRevisionId: string): Promise<SetRevisionTrace> {
  const row = await dataSource
    .getRepository(CharacteristicSetRevisionEntity)
    .createQueryBuilder('r')
    .innerJoin(CharacteristicSetEntity, 's', 's.id = r.set_id')
    .addSelect('s.current_revision', 'current_revision')
    .where('r.organisation_id = :orgId AND s.project_id = :projectId AND r.id = :id', { orgId, projectId, id: setRevisionId })
    .getRawAndEntities();
  const entity = row.entities[0];
  if (!entity) throw new NotFoundError('characteristic set revision');
  const versions = await designVersions(orgId, projectId, entity.recordVersionIds);
  const names = await userNames([entity.createdById]);
  return {
    kind: 'set',
    setId: entity.setId,
    setRevisionId: entity.id,
    name: entity.name,
    revision: entity.revision,
    currentRevision: Number((row.raw[0] as { current_revision: number }).current_revision),
    createdByName: names.get(entity.createdById) ?? '',
    createdAt: entity.createdAt.toISOString(),
    adopted: entity.adopted,
    members: entity.recordVersionIds.flatMap((id) => {
      const v = versions.get(id);
      return v ? [toRecordVersionTrace(v)] : [];
    }),
  };
}
