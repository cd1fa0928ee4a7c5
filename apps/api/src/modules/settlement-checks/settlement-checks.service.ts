import type { GroundModelContent, RunCheckAnswer, SettlementCheckCreateSchema, SettlementCheckDetail, SettlementCheckSummary, SettlementCheckUpdateSchema, SizingApplySchema } from '@porestack/types';
import type { z } from 'zod';
import { dataSource } from '../../data-source.js';
import { DomainError, NotFoundError } from '../../errors/domain-error.js';
import { refuseUnlessClean } from '../../errors/input-issues.js';
import { audit } from '../audit/audit.service.js';
import type { Actor } from '../consolidation-tests/consolidation-tests.service.js';
import { userNames } from '../design-records/design-records.service.js';
import { currentGroundModelRevision } from '../ground-models/ground-models.service.js';
import type { ProjectScope } from '../projects/project-scope.js';
import { checkInputIssues } from './check-input-issues.js';
import { runCheck } from './check-runs.service.js';
import { CheckRevisionEntity } from './check-revision.entity.js';
import { freshnessOf } from './freshness.js';
import { SettlementCheckEntity } from './settlement-check.entity.js';

type CheckCreate = z.output<typeof SettlementCheckCreateSchema>;
type CheckUpdate = z.output<typeof SettlementCheckUpdateSchema>;

async function groundModelOf(orgId: string, projectId: string, groundModelId: string) {
  try {
    return await currentGroundModelRevision(orgId, projectId, groundModelId);
  } catch (error) {
    if (error instanceof NotFoundError) {
      throw new DomainError('validation_failed', 'That ground model is not one of this project. Choose a ground model from the list.', [{ path: 'groundModelId', message: 'Not a ground model of this project.' }]);
    }
    throw error;
  }
}

export async function createCheck(orgId: string, projectId: string, input: CheckCreate, actor: Actor): Promise<SettlementCheckDetail> {
  const { revision } = await groundModelOf(orgId, projectId, input.groundModelId);
  const issues = checkInputIssues(revision.content, input.footings, input.options, 'save');
  refuseUnlessClean(issues.errors, issues.warnings, input.acceptWarnings, 'check');
  const id = await dataSource.transaction(async (manager) => {
    const repo = manager.getRepository(SettlementCheckEntity);
    const check = await repo.save(
      repo.create({ organisationId: orgId, projectId, name: input.name, groundModelId: input.groundModelId, footings: input.footings, options: input.options, currentRevision: null, pendingJobId: null, createdById: actor.id }),
    );
    await audit.record({ organisationId: orgId, actorUserId: actor.id, action: 'settlement_check.created', objectType: 'settlement_check', objectId: check.id, details: { footings: input.footings.length } }, manager);
    return check.id;
  });
  return getCheck(orgId, projectId, id);
}

/** Saves the draft: the schedule, options, ground model or name. Revisions already run are not touched. */
export async function updateCheck(orgId: string, projectId: string, checkId: string, input: CheckUpdate, actor: Actor): Promise<SettlementCheckDetail> {
  await dataSource.transaction(async (manager) => {
    const repo = manager.getRepository(SettlementCheckEntity);
    const check = await repo.findOne({ where: { organisationId: orgId, projectId, id: checkId }, lock: { mode: 'pessimistic_write' } });
    if (!check) throw new NotFoundError('settlement check');
    const next = {
      name: input.name ?? check.name,
      groundModelId: input.groundModelId ?? check.groundModelId,
      footings: input.footings ?? check.footings,
      options: input.options ?? check.options,
    };
    const { revision } = await groundModelOf(orgId, projectId, next.groundModelId);
    const issues = checkInputIssues(revision.content, next.footings, next.options, 'save');
    refuseUnlessClean(issues.errors, issues.warnings, input.acceptWarnings, 'check');
    await repo.update({ id: check.id }, next);
    await audit.record(
      { organisationId: orgId, actorUserId: actor.id, action: 'settlement_check.updated', objectType: 'settlement_check', objectId: check.id, details: { fields: Object.keys(input).filter((k) => k !== 'acceptWarnings') } },
      manager,
    );
  });
  return getCheck(orgId, projectId, checkId);
}

interface SummaryRow {
  id: string;
  project_id: string;
  project_name: string;
  name: string;
  ground_model_id: string;
  ground_model_name: string;
  footing_count: number;
  current_revision: number | null;
  latest_run_at: Date | null;
  updated_at: Date;
  pending_job_id: string | null;
  pinned_content: GroundModelContent | null;
}

async function summaries(orgId: string, filter: { projectIds: readonly string[] | null; checkId?: string }): Promise<Array<SettlementCheckSummary & { pendingJobId: string | null }>> {
  const rows = (await dataSource.query(
    `SELECT c.id, c.project_id, p.name AS project_name, c.name, c.ground_model_id, g.name AS ground_model_name,
            jsonb_array_length(c.footings) AS footing_count, c.current_revision, r.created_at AS latest_run_at, c.updated_at, c.pending_job_id,
            gr.content AS pinned_content
       FROM settlement_checks c
       JOIN projects p ON p.id = c.project_id
       JOIN ground_models g ON g.id = c.ground_model_id
       LEFT JOIN settlement_check_revisions r ON r.check_id = c.id AND r.revision = c.current_revision
       LEFT JOIN ground_model_revisions gr ON gr.id = r.ground_model_revision_id
      WHERE c.organisation_id = $1 AND ($2::uuid[] IS NULL OR c.project_id = ANY($2::uuid[])) AND ($3::uuid IS NULL OR c.id = $3)
      ORDER BY p.name, c.name`,
    [orgId, filter.projectIds, filter.checkId ?? null],
  )) as SummaryRow[];
  const freshness = await freshnessOf(
    orgId,
    rows.flatMap((row) => (row.pinned_content ? [{ key: row.id, projectId: row.project_id, content: row.pinned_content }] : [])),
  );
  return rows.map((row) => ({
    id: row.id,
    projectId: row.project_id,
    projectName: row.project_name,
    name: row.name,
    groundModelId: row.ground_model_id,
    groundModelName: row.ground_model_name,
    footingCount: Number(row.footing_count),
    latestRevision: row.current_revision,
    latestRunAt: row.latest_run_at ? row.latest_run_at.toISOString() : null,
    newerParametersApproved: freshness.get(row.id)?.newerParametersApproved ?? false,
    updatedAt: row.updated_at.toISOString(),
    pendingJobId: row.pending_job_id,
  }));
}

/** The checks of one project. */
export async function listProjectChecks(orgId: string, projectId: string): Promise<SettlementCheckSummary[]> {
  return (await summaries(orgId, { projectIds: [projectId] })).map(({ pendingJobId: _pending, ...summary }) => summary);
}

/**
 * Every check the caller may see across the organisation (a designer: the projects they are on),
 * optionally only those whose pinned parameters have newer approved versions — the designer's
 * home lists these.
 */
export async function listScopedChecks(orgId: string, scope: ProjectScope, onlyNewer: boolean): Promise<SettlementCheckSummary[]> {
  if (scope.kind === 'projects' && scope.projectIds.length === 0) return [];
  const all = await summaries(orgId, { projectIds: scope.kind === 'projects' ? scope.projectIds : null });
  return all.filter((c) => !onlyNewer || c.newerParametersApproved).map(({ pendingJobId: _pending, ...summary }) => summary);
}

export async function getCheck(orgId: string, projectId: string, checkId: string): Promise<SettlementCheckDetail> {
  const [summary] = await summaries(orgId, { projectIds: [projectId], checkId });
  if (!summary) throw new NotFoundError('settlement check');
  const check = await dataSource.getRepository(SettlementCheckEntity).findOneByOrFail({ id: checkId });
  const revisions = await dataSource.getRepository(CheckRevisionEntity).find({
    where: { organisationId: orgId, checkId },
    select: { id: true, revision: true, reason: true, createdById: true, createdAt: true, maxTotalM: true, pairsOverLimit: true, footingsOverLimit: true, footingsAsRun: true, groundModelRevisionId: true },
    order: { revision: 'DESC' },
  });
  const names = await userNames(revisions.map((r) => r.createdById));
  const latest = revisions[0];
  const pinned = latest ? ((await dataSource.query('SELECT content FROM ground_model_revisions WHERE id = $1', [latest.groundModelRevisionId])) as Array<{ content: GroundModelContent }>)[0] : undefined;
  const freshness = pinned ? ((await freshnessOf(orgId, [{ key: checkId, projectId, content: pinned.content }])).get(checkId) ?? { newerParametersApproved: false, changes: [] }) : { newerParametersApproved: false, changes: [] };
  return {
    ...summary,
    footings: check.footings,
    options: check.options,
    revisions: revisions.map((r) => ({
      id: r.id,
      revision: r.revision,
      reason: r.reason,
      createdBy: { id: r.createdById, name: names.get(r.createdById) ?? '' },
      createdAt: r.createdAt.toISOString(),
      footingCount: r.footingsAsRun.length,
      maxTotalM: r.maxTotalM,
      pairsOverLimit: r.pairsOverLimit,
      footingsOverLimit: r.footingsOverLimit,
    })),
    freshness,
  };
}

/**
 * Puts a sized width back into the schedule (the draft is saved, its warnings asked for as on
 * any save) and runs the check, so the sized footing is a new revision with the reason given.
 */
export async function applySizing(orgId: string, projectId: string, checkId: string, input: z.output<typeof SizingApplySchema>, actor: Actor): Promise<RunCheckAnswer> {
  const check = await dataSource.getRepository(SettlementCheckEntity).findOneBy({ organisationId: orgId, projectId, id: checkId });
  if (!check) throw new NotFoundError('settlement check');
  const row = check.footings.find((f) => f.id === input.footingId);
  if (!row) throw new DomainError('validation_failed', `There is no footing ${input.footingId} in the schedule.`, [{ path: 'footingId', message: 'Choose a footing of the schedule.' }]);
  const before = row.shape === 'rectangle' ? `${row.widthM.toFixed(2)} × ${(row.lengthM ?? row.widthM).toFixed(2)} m` : `${row.widthM.toFixed(2)} m`;
  const sized = { ...row, widthM: input.widthM, lengthM: row.shape === 'rectangle' ? (input.lengthM ?? row.lengthM) : row.lengthM };
  const after = sized.shape === 'rectangle' ? `${sized.widthM.toFixed(2)} × ${(sized.lengthM ?? sized.widthM).toFixed(2)} m` : `${sized.widthM.toFixed(2)} m`;
  await updateCheck(orgId, projectId, checkId, { footings: check.footings.map((f) => (f.id === row.id ? sized : f)), acceptWarnings: input.acceptWarnings }, actor);
  return runCheck(orgId, projectId, checkId, input.reason || `${row.id} sized by the tool: ${before} → ${after}`, actor.id);
}
