import type { PreparedFooting } from '../stress/prepared-footing.js';
import type { StressMethod } from '../stress/footing.types.js';
import { settlementTimeCurve } from '../time-rate/settlement-time-curve.js';
import { timeForPrimaryShare } from '../time-rate/time-for-primary-share.js';
import { consolidatingLayersOf } from './consolidating-layers-of.js';
import type { SettlementModel } from './prepare-settlement-model.js';
import { settlementAtPoint } from './settlement-at-point.js';
import type { EvaluationPointLabel, FootingSettlementResult, PointSettlement, SettlementCheckOptions } from './settlement-check.types.js';

/** One footing of a prepared check. */
export interface FootingSettlementResultInput {
  readonly model: SettlementModel;
  readonly prepared: readonly PreparedFooting[];
  readonly ownIndex: number;
  readonly stressMethod: StressMethod;
  readonly includeNeighbours: boolean;
  readonly designLifeYears: number;
  readonly options: SettlementCheckOptions;
}

/**
 * Everything runSettlementCheck reports for one footing: settlements at the
 * centre (with per-sublayer rows) and, unless only the centre is asked for, at
 * the corners or their equivalents (EvaluationPointLabel); primary settlement per clay layer; the settlement–time
 * curve from Terzaghi's U(Tv) per layer on its own drainage path; the times to
 * 50 % and 90 % of primary settlement; and the total against the limit.
 *
 * @param input prepared model and footings, the footing's index, method, design life (years), options
 * @returns the footing's result, plain data
 * @throws RangeError when ownIndex names no footing
 * @example footingSettlementResult({ model, prepared, ownIndex: 0, stressMethod: 'boussinesq', includeNeighbours: true, designLifeYears: 50, options: {} }).totalM
 */
export function footingSettlementResult(input: FootingSettlementResultInput): FootingSettlementResult {
  const { model, prepared, ownIndex, stressMethod, includeNeighbours, designLifeYears, options } = input;
  const footing = prepared[ownIndex];
  if (footing === undefined) throw new RangeError('runSettlementCheck requires a consistent footing list');
  const at = (xM: number, yM: number, withSublayers: boolean) =>
    settlementAtPoint({ model, footings: prepared, ownIndex, xM, yM, method: stressMethod, includeNeighbours, designLifeYears, withSublayers });
  const centre = at(footing.xM, footing.yM, true);
  const corners = options.evaluationPoints === 'centre' ? [] : evaluationOffsets(footing);
  const points: PointSettlement[] = [
    { label: 'centre', xM: footing.xM, yM: footing.yM, immediateM: centre.immediateM, primaryM: centre.primaryM, secondaryM: centre.secondaryM, totalM: centre.totalM },
    ...corners.map(([label, dx, dy]) => {
      const point = at(footing.xM + dx, footing.yM + dy, false);
      return { label, xM: footing.xM + dx, yM: footing.yM + dy, immediateM: point.immediateM, primaryM: point.primaryM, secondaryM: point.secondaryM, totalM: point.totalM };
    }),
  ];
  const consolidating = consolidatingLayersOf(model, centre.primaryByLayer);
  const timeCurve = settlementTimeCurve(consolidating, centre.immediateM, options.timesYears).map((point) => ({ timeYears: point.timeYears, settlementM: point.settlementM }));
  const shareTime = (share: number) => (consolidating.length === 0 ? null : timeForPrimaryShare(consolidating, share).timeYears);
  return {
    id: footing.id,
    shape: footing.shape,
    xM: footing.xM,
    yM: footing.yM,
    widthM: footing.widthM,
    lengthM: footing.shape === 'rectangle' || footing.shape === 'square' ? footing.lengthM : null,
    depthM: footing.depthM,
    pressureBasis: footing.grossPressureKpa === undefined ? 'net' : 'gross',
    pressureKpa: footing.pressureKpa,
    grossPressureKpa: footing.grossPressureKpa ?? null,
    overburdenRemovedKpa: footing.overburdenRemovedKpa ?? null,
    loadKn: footing.shape === 'strip' ? null : footing.pressureKpa * planAreaM2(footing),
    loadKnPerM: footing.shape === 'strip' ? footing.pressureKpa * footing.widthM : null,
    immediateDepthFactor: footing.immediateDepthFactor ?? 1,
    immediateM: centre.immediateM,
    primaryM: centre.primaryM,
    secondaryM: centre.secondaryM,
    totalM: centre.totalM,
    points,
    sublayers: centre.sublayers,
    primaryByLayer: [...centre.primaryByLayer].map(([layerIndex, primarySettlementM]) => ({ layerIndex, primarySettlementM })),
    timeCurve,
    timeTo50PercentYears: shareTime(0.5),
    timeTo90PercentYears: shareTime(0.9),
    withinTotalLimit: options.totalSettlementLimitM === undefined ? null : centre.totalM <= options.totalSettlementLimitM,
  };
}

/** The points other than the centre, as offsets from it: see EvaluationPointLabel. */
function evaluationOffsets(footing: PreparedFooting): Array<[EvaluationPointLabel, number, number]> {
  const halfWidthM = footing.widthM / 2;
  if (footing.shape === 'strip') {
    return [
      ['edge-x-', -halfWidthM, 0],
      ['edge-x+', halfWidthM, 0],
    ];
  }
  if (footing.shape === 'circle') {
    return [
      ['edge-x-', -halfWidthM, 0],
      ['edge-x+', halfWidthM, 0],
      ['edge-y-', 0, -halfWidthM],
      ['edge-y+', 0, halfWidthM],
    ];
  }
  const halfLengthM = footing.lengthM / 2;
  return [
    ['corner-x-y-', -halfWidthM, -halfLengthM],
    ['corner-x+y-', halfWidthM, -halfLengthM],
    ['corner-x-y+', -halfWidthM, halfLengthM],
    ['corner-x+y+', halfWidthM, halfLengthM],
  ];
}

/** Plan area of a rectangle, square or circle, m². */
function planAreaM2(footing: PreparedFooting): number {
  return footing.shape === 'circle' ? (Math.PI * footing.widthM * footing.widthM) / 4 : footing.widthM * footing.lengthM;
}
