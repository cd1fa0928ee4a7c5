import { sizeFootingForSettlement, type FootingToSize } from '@porestack/geo-core';
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
 * neighbours, with the footing's load held as given, net or gross (geo-core's
 * sizeFootingForSettlement, bisection on B — D for a circle — with L/B kept). Nothing is saved;
 * apply the answer to make a new revision.
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
  const footings = engineFootings(revision.footings);
  const own = footings[index]!;
  // The load as given is held while the width changes: a pressure becomes the load it makes now.
  const long = row.shape === 'rectangle' ? Math.max(row.widthM, row.lengthM ?? row.widthM) : row.widthM;
  const short = row.shape === 'rectangle' ? Math.min(row.widthM, row.lengthM ?? row.widthM) : row.widthM;
  const areaM2 = row.shape === 'circle' ? (Math.PI * row.widthM * row.widthM) / 4 : row.shape === 'strip' ? row.widthM : long * short;
  const load = row.loadKind === 'load' ? row.load : row.load * areaM2;
  const toSize: FootingToSize = {
    id: own.id,
    xM: own.xM,
    yM: own.yM,
    depthM: own.depthM,
    pressureBasis: row.loadBasis,
    ...(row.shape === 'strip'
      ? { shape: 'strip' as const, loadKnPerM: load }
      : row.shape === 'rectangle'
        ? { shape: 'rectangle' as const, loadKn: load, lengthToWidthRatio: long / short }
        : { shape: row.shape, loadKn: load }),
  };
  const options = revision.options;
  const result = sizeFootingForSettlement({
    profile,
    footing: toSize,
    targetSettlementM,
    minWidthM: request.minWidthM,
    maxWidthM: request.maxWidthM,
    ...(options.includeNeighbours ? { neighbours: footings.filter((_, i) => i !== index) } : {}),
    options: {
      stressMethod: options.stressMethod,
      designLifeYears: options.designLifeYears,
      ...(options.sublayerMode === 'count' ? { sublayerCount: options.sublayerCount } : { sublayerMaxThicknessM: options.sublayerMaxThicknessM }),
    },
  });
  // Back to B along x and L along y, as the schedule keeps them (geo-core sizes the shorter side).
  const ratio = long / short;
  const alongX = row.shape === 'rectangle' && (row.lengthM ?? row.widthM) < row.widthM;
  const found = result.widthM === null ? { widthM: null, lengthM: null } : row.shape !== 'rectangle' ? { widthM: result.widthM, lengthM: null } : alongX ? { widthM: result.widthM * ratio, lengthM: result.widthM } : { widthM: result.widthM, lengthM: result.widthM * ratio };
  const size = found.widthM === null ? '' : row.shape === 'rectangle' ? `B × L = ${found.widthM.toFixed(2)} × ${(found.lengthM ?? 0).toFixed(2)} m` : `${row.shape === 'circle' ? 'D' : 'B'} = ${found.widthM.toFixed(2)} m`;
  const unit = row.shape === 'strip' ? 'kN/m' : 'kN';
  const message =
    result.status === 'found'
      ? `${row.id} needs ${size} to settle ${mm(result.settlementM ?? 0)}, meeting ${targetWords}. Its ${row.loadBasis} load (${load.toFixed(0)} ${unit}) is held as it is now.`
      : result.status === 'minimum-width-suffices'
        ? `Even the smallest width tried (${request.minWidthM} m) keeps ${row.id} within ${targetWords}: it settles ${mm(result.settlementAtMinWidthM)}. Bearing capacity, not settlement, will set its size.`
        : `No width between ${request.minWidthM} m and ${request.maxWidthM} m keeps ${row.id} within ${targetWords}: at ${request.maxWidthM} m it still settles ${mm(result.settlementAtMaxWidthM)}. Widen the range, reduce the load, or consider ground improvement or piles.`;
  return {
    footingId: row.id,
    status: result.status,
    widthM: found.widthM,
    lengthM: found.lengthM,
    settlementM: result.settlementM,
    targetSettlementM,
    settlementAtMinWidthM: result.settlementAtMinWidthM,
    settlementAtMaxWidthM: result.settlementAtMaxWidthM,
    message,
    warnings: [...result.warnings],
  };
}
