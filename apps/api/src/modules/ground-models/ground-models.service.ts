import { type GroundModelCreateSchema, type GroundModelContentInputSchema, type GroundModelDetail, type GroundModelRevision, type GroundModelSummary, type SetMember, type StressProfile } from '@porestack/types';
import type { EntityManager } from 'typeorm';
import type { z } from 'zod';
import { dataSource } from '../../data-source.js';
import { NotFoundError } from '../../errors/domain-error.js';
import { refuseUnlessClean } from '../../errors/input-issues.js';
import { audit } from '../audit/audit.service.js';
import { setRevisionsByIds } from '../characteristic-sets/characteristic-sets.service.js';
import type { Actor } from '../consolidation-tests/consolidation-tests.service.js';
import { userNames } from '../design-records/design-records.service.js';
import { GroundModelRevisionEntity } from './ground-model-revision.entity.js';
import { GroundModelEntity } from './ground-model.entity.js';
import { resolveGroundModel } from './resolve-ground-model.js';
import { stressProfile } from './stress-profile.js';

type GroundModelInput = z.output<typeof GroundModelCreateSchema>;
type ContentInput = z.output<typeof GroundModelContentInputSchema>;

async function profileOf(orgId: string, projectId: string, revision: Pick<GroundModelRevisionEntity, 'content' | 'setRevisionIds'>): Promise<StressProfile> {
  const sets = await setRevisionsByIds(orgId, projectId, revision.setRevisionIds);
  const members = new Map<string, readonly SetMember[]>([...sets].map(([id, set]) => [id, set.members]));
  return stressProfile(revision.content, members);
}

/**
 * The profile drawing for a ground model being edited, without saving it: resolved values,
 * stresses, and every error and warning, so the editor shows them as the designer types.
 */
export async function previewGroundModel(orgId: string, projectId: string, input: ContentInput) {
  const resolved = await resolveGroundModel(orgId, projectId, input);
  const profile = resolved.errors.length === 0 ? await profileOf(orgId, projectId, resolved) : null;
  return { content: resolved.content, profile, errors: resolved.errors, warnings: resolved.warnings };
}

async function writeRevision(manager: EntityManager, orgId: string, projectId: string, model: GroundModelEntity, revision: number, input: GroundModelInput, actor: Actor): Promise<GroundModelRevisionEntity> {
  const resolved = await resolveGroundModel(orgId, projectId, input);
  refuseUnlessClean(resolved.errors, resolved.warnings, input.acceptWarnings, 'ground model');
  const repo = manager.getRepository(GroundModelRevisionEntity);
  const saved = await repo.save(
    repo.create({
      organisationId: orgId,
      groundModelId: model.id,
      revision,
      name: input.name,
      note: input.note,
      content: resolved.content,
      recordVersionIds: resolved.recordVersionIds,
      setRevisionIds: resolved.setRevisionIds,
      createdById: actor.id,
    }),
  );
  await audit.record(
    { organisationId: orgId, actorUserId: actor.id, action: 'ground_model.revised', objectType: 'ground_model', objectId: model.id, details: { revision, recordVersionIds: resolved.recordVersionIds, setRevisionIds: resolved.setRevisionIds } },
    manager,
  );
  return saved;
}

export async function createGroundModel(orgId: string, projectId: string, input: GroundModelInput, actor: Actor): Promise<GroundModelDetail> {
  const id = await dataSource.transaction(async (manager) => {
    const repo = manager.getRepository(GroundModelEntity);
    const model = await repo.save(repo.create({ organisationId: orgId, projectId, name: input.name, currentRevision: 1, createdById: actor.id }));
    await writeRevision(manager, orgId, projectId, model, 1, input, actor);
    return model.id;
  });
  return getGroundModel(orgId, projectId, id);
}

/** Saves the next revision; earlier ones stay as they were, for the checks that pinned them. */
export async function reviseGroundModel(orgId: string, projectId: string, modelId: string, input: GroundModelInput, actor: Actor, manager?: EntityManager): Promise<GroundModelRevisionEntity> {
  const work = async (m: EntityManager) => {
    const repo = m.getRepository(GroundModelEntity);
    const model = await repo.findOne({ where: { organisationId: orgId, projectId, id: modelId }, lock: { mode: 'pessimistic_write' } });
    if (!model) throw new NotFoundError('ground model');
    const revision = model.currentRevision + 1;
    const saved = await writeRevision(m, orgId, projectId, model, revision, input, actor);
    await repo.update({ id: model.id }, { currentRevision: revision, name: input.name });
    return saved;
  };
  return manager ? work(manager) : dataSource.transaction(work);
}

export async function listGroundModels(orgId: string, projectId: string): Promise<GroundModelSummary[]> {
  const rows = (await dataSource.query(
    `SELECT m.id, m.name, m.current_revision, m.updated_at, jsonb_array_length(r.content->'layers') AS layer_count
       FROM ground_models m JOIN ground_model_revisions r ON r.ground_model_id = m.id AND r.revision = m.current_revision
      WHERE m.organisation_id = $1 AND m.project_id = $2 ORDER BY m.name`,
    [orgId, projectId],
  )) as Array<{ id: string; name: string; current_revision: number; updated_at: Date; layer_count: number }>;
  return rows.map((row) => ({ id: row.id, projectId, name: row.name, currentRevision: row.current_revision, layerCount: Number(row.layer_count), updatedAt: row.updated_at.toISOString() }));
}

export async function getGroundModel(orgId: string, projectId: string, modelId: string, revision?: number): Promise<GroundModelDetail> {
  const model = await dataSource.getRepository(GroundModelEntity).findOneBy({ organisationId: orgId, projectId, id: modelId });
  if (!model) throw new NotFoundError('ground model');
  const rows = await dataSource.getRepository(GroundModelRevisionEntity).find({ where: { organisationId: orgId, groundModelId: modelId }, order: { revision: 'DESC' } });
  const chosen = rows.find((r) => r.revision === (revision ?? model.currentRevision));
  if (!chosen) throw new NotFoundError('ground model revision');
  const names = await userNames(rows.map((r) => r.createdById));
  const actor = (id: string) => ({ id, name: names.get(id) ?? '' });
  const current: GroundModelRevision = {
    id: chosen.id,
    groundModelId: model.id,
    revision: chosen.revision,
    note: chosen.note,
    content: chosen.content,
    profile: await profileOf(orgId, projectId, chosen),
    createdBy: actor(chosen.createdById),
    createdAt: chosen.createdAt.toISOString(),
  };
  return {
    id: model.id,
    projectId,
    name: model.name,
    currentRevision: model.currentRevision,
    layerCount: chosen.content.layers.length,
    updatedAt: model.updatedAt.toISOString(),
    current,
    revisions: rows.map((r) => ({ revision: r.revision, note: r.note, createdBy: actor(r.createdById), createdAt: r.createdAt.toISOString() })),
  };
}

/** The newest revision of a ground model of the project (what a run pins). */
export async function currentGroundModelRevision(orgId: string, projectId: string, modelId: string, manager: EntityManager = dataSource.manager): Promise<{ model: GroundModelEntity; revision: GroundModelRevisionEntity }> {
  const model = await manager.getRepository(GroundModelEntity).findOneBy({ organisationId: orgId, projectId, id: modelId });
  if (!model) throw new NotFoundError('ground model');
  const revision = await manager.getRepository(GroundModelRevisionEntity).findOneByOrFail({ groundModelId: model.id, revision: model.currentRevision });
  return { model, revision };
}
