import { GEO_CORE_VERSION } from '@porestack/geo-core';
import type { CheckOptions, CheckRevision, CheckRunResult, FootingRow, FootingSettlementResult, RunCheckAnswer } from '@porestack/types';
import type { EntityManager } from 'typeorm';
import { dataSource } from '../../data-source.js';
import { DomainError, NotFoundError } from '../../errors/domain-error.js';
import { refuseUnlessClean } from '../../errors/input-issues.js';
import { enqueueCheckRun } from '../../jobs/run-check-queue.js';
import { audit } from '../audit/audit.service.js';
import { userNames } from '../design-records/design-records.service.js';
import { GroundModelRevisionEntity } from '../ground-models/ground-model-revision.entity.js';
import { currentGroundModelRevision } from '../ground-models/ground-models.service.js';
import { checkInputIssues } from './check-input-issues.js';
import { CheckRevisionEntity } from './check-revision.entity.js';
import { FootingResultEntity } from './footing-result.entity.js';
import { runEngineOffThread } from './engine-pool.js';
import { runCheckEngine } from './run-check-engine.js';
import { SettlementCheckEntity } from './settlement-check.entity.js';

/** Up to this many footings a run answers at once (about a second, measured in bench/design-check-bench.ts); more go to the worker. */
export const INLINE_FOOTING_LIMIT = 200;

/** What a run is made of, fixed when it is asked for (a queued run does not see later edits). */
export interface RunSnapshot {
  checkId: string;
  groundModelRevisionId: string;
  footings: FootingRow[];
  options: CheckOptions;
  reason: string;
}

async function lockCheck(manager: EntityManager, orgId: string, projectId: string, checkId: string): Promise<SettlementCheckEntity> {
  const check = await manager.getRepository(SettlementCheckEntity).findOne({ where: { organisationId: orgId, projectId, id: checkId }, lock: { mode: 'pessimistic_write' } });
  if (!check) throw new NotFoundError('settlement check');
  return check;
}

/**
 * Runs the check's saved draft on its ground model's newest revision. Errors in the input stop
 * it with a message naming the row or field and nothing is saved; a small check answers with the
 * new revision, a large one is queued for the worker and answers with the job to follow.
 */
export async function runCheck(orgId: string, projectId: string, checkId: string, reason: string | undefined, actorId: string): Promise<RunCheckAnswer> {
  const check = await dataSource.getRepository(SettlementCheckEntity).findOneBy({ organisationId: orgId, projectId, id: checkId });
  if (!check) throw new NotFoundError('settlement check');
  if (check.pendingJobId) throw new DomainError('invalid_transition', 'A run of this check is already in progress. Wait for it to finish, then run again.');
  const { revision } = await currentGroundModelRevision(orgId, projectId, check.groundModelId);
  const snapshot: RunSnapshot = { checkId, groundModelRevisionId: revision.id, footings: check.footings, options: check.options, reason: reason?.trim() || 'Run' };
  return runSnapshot(orgId, projectId, snapshot, revision, actorId);
}

/** Runs a fixed snapshot now, or queues it when it is large. */
export async function runSnapshot(orgId: string, projectId: string, snapshot: RunSnapshot, groundModel: GroundModelRevisionEntity, actorId: string): Promise<RunCheckAnswer> {
  const issues = checkInputIssues(groundModel.content, snapshot.footings, snapshot.options, 'run');
  refuseUnlessClean(issues.errors, [], true, 'check run');
  if (snapshot.options.loading === 'footings' && snapshot.footings.length > INLINE_FOOTING_LIMIT) {
    const jobId = await dataSource.transaction(async (manager) => {
      const check = await lockCheck(manager, orgId, projectId, snapshot.checkId);
      if (check.pendingJobId) throw new DomainError('invalid_transition', 'A run of this check is already in progress. Wait for it to finish, then run again.');
      const id = await enqueueCheckRun({ orgId, projectId, actorId, snapshot }, manager);
      await manager.getRepository(SettlementCheckEntity).update({ id: check.id }, { pendingJobId: id });
      return id;
    });
    return { kind: 'queued', jobId };
  }
  const stored = await executeSnapshot(orgId, projectId, snapshot, groundModel, actorId);
  return { kind: 'done', revision: stored.revision, revisionId: stored.id };
}

const withoutDetail = (footing: FootingSettlementResult): FootingSettlementResult => ({ ...footing, sublayers: [], timeCurve: [] });

/** Runs geo-core on the snapshot (here, or on an engine thread for a job) and stores the revision with every footing's detail, in one transaction. */
export async function executeSnapshot(
  orgId: string,
  projectId: string,
  snapshot: RunSnapshot,
  groundModel: GroundModelRevisionEntity,
  actorId: string,
  progress?: (fraction: number, message: string) => Promise<void>,
  where: 'here' | 'thread' = 'here',
): Promise<CheckRevisionEntity> {
  const run =
    where === 'thread'
      ? await runEngineOffThread({ content: groundModel.content, footings: snapshot.footings, options: snapshot.options })
      : runCheckEngine(groundModel.content, snapshot.footings, snapshot.options);
  await progress?.(0.8, 'Storing the results.');
  const footings = run.result.kind === 'footings' ? run.result.check.footings : [];
  const summary: CheckRunResult = run.result.kind === 'footings' ? { kind: 'footings', check: { ...run.result.check, footings: footings.map(withoutDetail) } } : run.result;
  const totals = run.result.kind === 'footings' ? footings.map((f) => f.totalM) : [run.result.check.totalM];
  return dataSource.transaction(async (manager) => {
    const check = await lockCheck(manager, orgId, projectId, snapshot.checkId);
    const revision = (check.currentRevision ?? 0) + 1;
    const repo = manager.getRepository(CheckRevisionEntity);
    // insert, not save: save would read the row back, several MB of result for a large check.
    const saved = repo.create({
      organisationId: orgId,
      checkId: check.id,
      revision,
      reason: snapshot.reason,
      groundModelRevisionId: groundModel.id,
      footings: snapshot.footings,
      options: snapshot.options,
      footingsAsRun: run.footingsAsRun,
      result: summary,
      warnings: run.warnings,
      geoCoreVersion: GEO_CORE_VERSION,
      durationMs: run.durationMs,
      maxTotalM: Math.max(0, ...totals),
      pairsOverLimit: run.result.kind === 'footings' ? run.result.check.pairs.filter((p) => !p.withinDesignLimit).length : 0,
      footingsOverLimit: run.result.kind === 'footings' ? footings.filter((f) => f.withinTotalLimit === false).length : 0,
      createdById: actorId,
    });
    const inserted = await repo.insert(saved);
    saved.id = (inserted.identifiers[0] as { id: string }).id;
    // Chunks keep each INSERT's parameters well under PostgreSQL's limit and its size modest.
    for (let start = 0; start < footings.length; start += 200) {
      await manager.getRepository(FootingResultEntity).insert(
        footings.slice(start, start + 200).map((detail, offset) => ({ revisionId: saved.id, footingIndex: start + offset, organisationId: orgId, footingId: detail.id, detail })),
      );
    }
    await manager.getRepository(SettlementCheckEntity).update({ id: check.id }, { currentRevision: revision, pendingJobId: null });
    await audit.record(
      { organisationId: orgId, actorUserId: actorId, action: 'settlement_check.run', objectType: 'settlement_check', objectId: check.id, details: { revision, reason: snapshot.reason, groundModelRevisionId: groundModel.id } },
      manager,
    );
    return saved;
  });
}

async function revisionRow(orgId: string, projectId: string, checkId: string, revision: number): Promise<{ row: CheckRevisionEntity; check: SettlementCheckEntity }> {
  const check = await dataSource.getRepository(SettlementCheckEntity).findOneBy({ organisationId: orgId, projectId, id: checkId });
  if (!check) throw new NotFoundError('settlement check');
  const row = await dataSource.getRepository(CheckRevisionEntity).findOneBy({ organisationId: orgId, checkId, revision });
  if (!row) throw new NotFoundError('revision of this check');
  return { row, check };
}

/**
 * A stored run. 'summary': each footing without its sublayer rows and time curve (a page of
 * 1,000 footings); 'full': everything geo-core returned, as a report prints it.
 */
export async function getRevision(orgId: string, projectId: string, checkId: string, revision: number, detail: 'summary' | 'full'): Promise<CheckRevision> {
  const { row, check } = await revisionRow(orgId, projectId, checkId, revision);
  const groundModel = await dataSource.getRepository(GroundModelRevisionEntity).findOneByOrFail({ id: row.groundModelRevisionId });
  const names = await userNames([row.createdById]);
  let result = row.result;
  if (detail === 'full' && result.kind === 'footings') {
    const details = await dataSource.getRepository(FootingResultEntity).find({ where: { revisionId: row.id }, order: { footingIndex: 'ASC' } });
    result = { kind: 'footings', check: { ...result.check, footings: details.map((d) => d.detail) } };
  }
  return {
    id: row.id,
    checkId,
    projectId,
    checkName: check.name,
    revision: row.revision,
    reason: row.reason,
    createdBy: { id: row.createdById, name: names.get(row.createdById) ?? '' },
    createdAt: row.createdAt.toISOString(),
    geoCoreVersion: row.geoCoreVersion,
    durationMs: row.durationMs,
    groundModel: { id: groundModel.groundModelId, name: groundModel.name, revisionId: groundModel.id, revision: groundModel.revision, content: groundModel.content },
    footings: row.footings,
    options: row.options,
    footingsAsRun: row.footingsAsRun,
    detail,
    result,
    warnings: row.warnings,
    caution: result.check.caution,
  };
}

/** One footing's full result in a revision: sublayer rows, points and time curve. */
export async function getFootingResult(orgId: string, projectId: string, checkId: string, revision: number, footingId: string): Promise<FootingSettlementResult> {
  const { row } = await revisionRow(orgId, projectId, checkId, revision);
  const found = await dataSource.getRepository(FootingResultEntity).findOneBy({ revisionId: row.id, footingId });
  if (!found) throw new NotFoundError('footing in this revision');
  return found.detail;
}
