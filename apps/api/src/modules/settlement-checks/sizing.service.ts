import { sizeFootingForSettlement } from '@porestack/geo-core';
import type { SizingAnswer, SizingRequestSchema } from '@porestack/types';
import type { z } from 'zod';
import { dataSource } from '../../data-source.js';
import { DomainError, NotFoundError } from '../../errors/domain-error.js';
import { GroundModelRevisionEntity } from '../ground-models/ground-model-revision.entity.js';
import { soilProfileFromContent } from '../ground-models/soil-profile-from-content.js';
import { CheckRevisionEntity } from './check-revision.entity.js';
import { engineFootings } from './run-check-engine.js';
import { SettlementCheckEntity } from './settlement-check.entity.js';

type SizingRequest = z.output<typeof SizingRequestSchema>;

const mm = (m: number) => `${(m * 1000).toFixed(1)} mm`;

/**
 * The width of one footing that meets a target total settlement, or that matches another
 * footing's settlement in the latest revision — on that revision's ground model, options and
 * neighbours, with the footing's net load held (geo-core's sizeFootingForSettlement, bisection
 * on B with L/B kept). Nothing is saved; apply the answer to make a new revision.
 */
export async function sizeFooting(orgId: string, projectId: string, checkId: string, request: SizingRequest): Promise<SizingAnswer> {
  const check = await dataSource.getRepository(SettlementCheckEntity).findOneBy({ organisationId: orgId, projectId, id: checkId });
  if (!check) throw new NotFoundError('settlement check');
  if (check.currentRevision === null) throw new DomainError('invalid_transition', 'Run the check first: sizing works on the latest revision’s ground model and neighbours.');
  const revision = await dataSource.getRepository(CheckRevisionEntity).findOneByOrFail({ checkId, revision: check.currentRevision });
  if (revision.result.kind !== 'footings') throw new DomainError('invalid_transition', 'A uniform-load check has no footings to size.');
  const index = revision.footings.findIndex((f) => f.id === request.footingId);
  const row = revision.footings[index];
  if (!row) throw new DomainError('validation_failed', `There is no footing ${request.footingId} in revision ${revision.revision}.`, [{ path: 'footingId', message: 'Choose a footing of the latest revision.' }]);
  if (row.shape !== 'rectangle' && row.shape !== 'square') {
    throw new DomainError('validation_failed', `Footing ${row.id} is a ${row.shape}; sizing handles rectangles and squares.`, [{ path: 'footingId', message: 'Choose a rectangle or square.' }]);
  }
  let targetSettlementM = (request.targetTotalMm ?? 0) / 1000;
  let targetWords = `the target of ${mm(targetSettlementM)}`;
  if (request.target === 'match') {
    const other = revision.result.check.footings.find((f) => f.id === request.matchFootingId);
    if (!other) throw new DomainError('validation_failed', `There is no footing ${request.matchFootingId ?? ''} in revision ${revision.revision}.`, [{ path: 'matchFootingId', message: 'Choose another footing of the latest revision.' }]);
    targetSettlementM = other.totalM;
    targetWords = `the settlement of ${other.id} in revision ${revision.revision} (${mm(other.totalM)})`;
  }
  const groundModel = await dataSource.getRepository(GroundModelRevisionEntity).findOneByOrFail({ id: revision.groundModelRevisionId });
  const { profile } = soilProfileFromContent(groundModel.content, { immediate: revision.options.immediate, secondary: revision.options.secondary });
  const prepared = engineFootings(revision.footings, profile);
  const own = prepared.footings[index]!;
  const shortM = Math.min(own.widthM, own.lengthM);
  const ratio = Math.max(own.widthM, own.lengthM) / shortM;
  const options = revision.options;
  const result = sizeFootingForSettlement({
    profile,
    footing: { id: own.id, xM: own.xM, yM: own.yM, depthM: own.depthM, loadKn: (own.pressureKpa ?? 0) * own.widthM * own.lengthM, lengthToWidthRatio: ratio },
    targetSettlementM,
    minWidthM: request.minWidthM,
    maxWidthM: request.maxWidthM,
    ...(options.includeNeighbours ? { neighbours: prepared.footings.filter((_, i) => i !== index) } : {}),
    options: {
      stressMethod: options.stressMethod,
      designLifeYears: options.designLifeYears,
      ...(options.sublayerMode === 'count' ? { sublayerCount: options.sublayerCount } : { sublayerMaxThicknessM: options.sublayerMaxThicknessM }),
    },
  });
  // Back to B along x and L along y, as the schedule keeps them.
  const sides = (short: number | null) => (short === null ? { widthM: null, lengthM: null } : own.widthM <= own.lengthM ? { widthM: short, lengthM: short * ratio } : { widthM: short * ratio, lengthM: short });
  const found = sides(result.widthM);
  const size = found.widthM === null ? '' : row.shape === 'square' ? `B = ${found.widthM.toFixed(2)} m` : `B × L = ${found.widthM.toFixed(2)} × ${(found.lengthM ?? 0).toFixed(2)} m`;
  const message =
    result.status === 'found'
      ? `${row.id} needs ${size} to settle ${mm(result.settlementM ?? 0)}, meeting ${targetWords}. Its net load (${((own.pressureKpa ?? 0) * own.widthM * own.lengthM).toFixed(0)} kN) is held as it is now.`
      : result.status === 'minimum-width-suffices'
        ? `Even the smallest width tried (${request.minWidthM} m) keeps ${row.id} within ${targetWords}: it settles ${mm(result.settlementAtMinWidthM)}. Bearing capacity, not settlement, will set its size.`
        : `No width between ${request.minWidthM} m and ${request.maxWidthM} m keeps ${row.id} within ${targetWords}: at ${request.maxWidthM} m it still settles ${mm(result.settlementAtMaxWidthM)}. Widen the range, reduce the load, or consider ground improvement or piles.`;
  return {
    footingId: row.id,
    status: result.status,
    widthM: found.widthM,
    lengthM: row.shape === 'square' ? found.widthM : found.lengthM,
    settlementM: result.settlementM,
    targetSettlementM,
    settlementAtMinWidthM: result.settlementAtMinWidthM,
    settlementAtMaxWidthM: result.settlementAtMaxWidthM,
    message,
    warnings: [...result.warnings],
  };
}
