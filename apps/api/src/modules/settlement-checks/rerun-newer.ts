import { groundModelInputFromContent, GroundModelCreateSchema, type RunCheckAnswer } from '@porestack/types';
import { dataSource } from '../../data-source.js';
import { DomainError, NotFoundError } from '../../errors/domain-error.js';
import { currentSetRevisions } from '../characteristic-sets/characteristic-sets.service.js';
import type { Actor } from '../consolidation-tests/consolidation-tests.service.js';
import { currentDesignVersions } from '../design-records/design-records.service.js';
import { GroundModelRevisionEntity } from '../ground-models/ground-model-revision.entity.js';
import { reviseGroundModel } from '../ground-models/ground-models.service.js';
import { runSnapshot } from './check-runs.service.js';
import { CheckRevisionEntity } from './check-revision.entity.js';
import { freshnessOf } from './freshness.js';
import { SettlementCheckEntity } from './settlement-check.entity.js';

/**
 * The re-run a "newer parameters approved" flag offers: the ground model the latest revision
 * used is saved again with each superseded source moved to its newest approved version (values
 * typed by hand kept), and the same schedule and options run on it as a new revision. The old
 * revisions stay as they were.
 */
export async function rerunWithNewerParameters(orgId: string, projectId: string, checkId: string, actor: Actor): Promise<RunCheckAnswer> {
  const check = await dataSource.getRepository(SettlementCheckEntity).findOneBy({ organisationId: orgId, projectId, id: checkId });
  if (!check) throw new NotFoundError('settlement check');
  if (check.currentRevision === null) throw new DomainError('invalid_transition', 'The check has not been run yet, so nothing pins older parameters. Run it first.');
  const latest = await dataSource.getRepository(CheckRevisionEntity).findOneByOrFail({ checkId, revision: check.currentRevision });
  const pinned = await dataSource.getRepository(GroundModelRevisionEntity).findOneByOrFail({ id: latest.groundModelRevisionId });
  const freshness = (await freshnessOf(orgId, [{ key: checkId, projectId, content: pinned.content }])).get(checkId);
  if (!freshness?.newerParametersApproved) {
    throw new DomainError('invalid_transition', `No newer parameters have been approved since revision ${latest.revision} was run; there is nothing to re-run with.`);
  }
  const recordIds = pinned.content.layers.flatMap((l) => (l.source?.kind === 'record' ? [l.source.recordId] : []));
  const setIds = pinned.content.layers.flatMap((l) => (l.source?.kind === 'set' ? [l.source.setId] : []));
  const currentRecords = await currentDesignVersions(orgId, projectId, recordIds);
  const currentSets = await currentSetRevisions(orgId, setIds);
  const input = groundModelInputFromContent(pinned.content);
  input.layers = input.layers.map((layer, index) => {
    const stored = pinned.content.layers[index]?.source;
    if (stored?.kind === 'record') {
      const newest = currentRecords.get(stored.recordId);
      return newest ? { ...layer, source: { kind: 'record', recordId: stored.recordId, versionId: newest.versionId } } : layer;
    }
    if (stored?.kind === 'set') {
      const newest = currentSets.get(stored.setId);
      return newest ? { ...layer, source: { kind: 'set', setId: stored.setId, setRevisionId: newest.id } } : layer;
    }
    return layer;
  });
  const moved = freshness.changes.map((c) => `${c.label} ${c.kind === 'record' ? 'v' : 'rev. '}${c.pinned} → ${c.current}`).join('; ');
  const groundModel = await reviseGroundModel(
    orgId,
    projectId,
    pinned.groundModelId,
    GroundModelCreateSchema.parse({ ...input, name: pinned.name, note: `Newer approved parameters: ${moved}.`, acceptWarnings: true }),
    actor,
  );
  return runSnapshot(
    orgId,
    projectId,
    { checkId, groundModelRevisionId: groundModel.id, footings: latest.footings, options: latest.options, reason: `Re-run with newer approved parameters (${moved})` },
    groundModel,
    actor.id,
  );
}
