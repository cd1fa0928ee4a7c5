import { footingPressureKpa } from '../stress/footing-pressure.js';
import type { PreparedFooting } from '../stress/footing-stress-contribution.js';
import type { Footing } from '../stress/footing.types.js';
import type { ConsolidatingLayer } from '../time-rate/consolidating-layer.types.js';
import { settlementTimeCurve } from '../time-rate/settlement-time-curve.js';
import { timeForPrimaryShare } from '../time-rate/time-for-primary-share.js';
import { footingPairResults } from './footing-pair-results.js';
import { prepareSettlementModel, type SettlementModel } from './prepare-settlement-model.js';
import { settlementAtPoint } from './settlement-at-point.js';
import type { FootingSettlementResult, PointSettlement, SettlementCheckInput, SettlementCheckResult } from './settlement-check.types.js';

const DEFAULT_SUBLAYER_MAX_THICKNESS_M = 0.5;
const DEFAULT_DESIGN_LIFE_YEARS = 50;
const DEFAULT_END_OF_PRIMARY_SHARE = 0.95;
const DEFAULT_DESIGN_ANGULAR_DISTORTION = 1 / 500;

const CAUTION =
  'These are engineering calculations for review by a qualified geotechnical engineer. They depend on sample quality, test procedure and the ground model, and do not replace site-specific judgement, local codes or licensed sign-off.';

/**
 * The settlement check of a group of shallow footings on a layered profile:
 * for each footing, immediate settlement (layered Steinbrenner), primary
 * consolidation per sublayer (Terzaghi's e–log σ′, all three cases) under the
 * stress of the footing and — unless switched off — its neighbours (Boussinesq
 * superposition or 2V:1H), secondary compression over the design life from Cα,
 * the settlement–time curve from Terzaghi's U(Tv) per clay layer, and for each
 * pair of footings the differential settlement and angular distortion judged
 * against Bjerrum (1963) and Skempton & MacDonald (1956).
 *
 * Headline numbers are at each footing's centre; the corners are evaluated too
 * unless evaluationPoints is 'centre'. The result is plain data: it records the
 * method, every layer parameter used, per-sublayer rows and every warning.
 *
 * @param input profile, footings (m, kN or kPa) and options (see SettlementCheckOptions)
 * @returns the check result, serialisable as JSON
 * @throws RangeError('runSettlementCheck requires …') for an invalid profile, footing or option
 * @example runSettlementCheck({ profile, footings: [{ id: 'F1', xM: 0, yM: 0, widthM: 2, lengthM: 2, depthM: 1, loadKn: 800 }] }).footings[0].totalM
 */
export function runSettlementCheck(input: SettlementCheckInput): SettlementCheckResult {
  const caller = 'runSettlementCheck';
  const options = input.options ?? {};
  if (options.sublayerCount !== undefined && options.sublayerMaxThicknessM !== undefined) {
    throw new RangeError(`${caller} requires either sublayerCount or sublayerMaxThicknessM, not both`);
  }
  const spacing =
    options.sublayerCount !== undefined ? { count: options.sublayerCount } : { maxThicknessM: options.sublayerMaxThicknessM ?? DEFAULT_SUBLAYER_MAX_THICKNESS_M };
  const designLifeYears = options.designLifeYears ?? DEFAULT_DESIGN_LIFE_YEARS;
  const endOfPrimaryShare = options.endOfPrimaryShare ?? DEFAULT_END_OF_PRIMARY_SHARE;
  const designAngularDistortion = options.designAngularDistortion ?? DEFAULT_DESIGN_ANGULAR_DISTORTION;
  const includeNeighbours = options.includeNeighbours ?? true;
  const stressMethod = options.stressMethod ?? 'boussinesq';
  if (!(designLifeYears > 0) || !Number.isFinite(designLifeYears)) throw new RangeError(`${caller} requires a finite designLifeYears > 0`);
  if (!(endOfPrimaryShare > 0 && endOfPrimaryShare < 1)) throw new RangeError(`${caller} requires endOfPrimaryShare strictly between 0 and 1`);
  if (!(designAngularDistortion > 0)) throw new RangeError(`${caller} requires designAngularDistortion > 0`);
  if (options.totalSettlementLimitM !== undefined && !(options.totalSettlementLimitM > 0)) throw new RangeError(`${caller} requires totalSettlementLimitM > 0`);
  if (options.timesYears !== undefined && !options.timesYears.every((t) => t >= 0 && Number.isFinite(t))) throw new RangeError(`${caller} requires every time in timesYears to be finite and >= 0`);
  if (stressMethod !== 'boussinesq' && stressMethod !== '2to1') throw new RangeError(`${caller} requires stressMethod 'boussinesq' or '2to1'`);

  const model = prepareSettlementModel(input.profile, spacing, endOfPrimaryShare, caller);
  const prepared = prepareFootings(input.footings, model, caller);
  const notes = methodNotes(stressMethod, includeNeighbours);
  const footings = prepared.map((footing, ownIndex) =>
    footingResult({ model, prepared, ownIndex, source: input.footings[ownIndex], stressMethod, includeNeighbours, designLifeYears, options }),
  );
  const pairs = footingPairResults(footings, designAngularDistortion, options.pairMaxDistanceM);
  return {
    method: { stressMethod, includeNeighbours, sublayerSpacing: spacing, designLifeYears, endOfPrimaryShare, designAngularDistortion, notes },
    layers: model.layers,
    footings,
    pairs,
    warnings: [...model.warnings],
    caution: CAUTION,
  };
}

function prepareFootings(footings: readonly Footing[], model: SettlementModel, caller: string): PreparedFooting[] {
  if (footings.length === 0) throw new RangeError(`${caller} requires at least one footing`);
  const ids = new Set<string>();
  return footings.map((footing) => {
    if (ids.has(footing.id)) throw new RangeError(`${caller} requires unique footing ids (${footing.id} repeats)`);
    ids.add(footing.id);
    if (!Number.isFinite(footing.xM) || !Number.isFinite(footing.yM)) throw new RangeError(`${caller} requires finite xM and yM (footing ${footing.id})`);
    if (!(footing.depthM >= 0) || !(footing.depthM < model.profileBottomM)) {
      throw new RangeError(`${caller} requires depthM >= 0 and above the bottom of the profile (footing ${footing.id})`);
    }
    const pressureKpa = footingPressureKpa(footing);
    if (!(pressureKpa >= 0)) throw new RangeError(`${caller} requires a load or pressure >= 0 (footing ${footing.id}); uplift is outside this check`);
    return { id: footing.id, xM: footing.xM, yM: footing.yM, widthM: footing.widthM, lengthM: footing.lengthM, depthM: footing.depthM, pressureKpa };
  });
}

interface FootingResultInput {
  readonly model: SettlementModel;
  readonly prepared: readonly PreparedFooting[];
  readonly ownIndex: number;
  readonly source: Footing | undefined;
  readonly stressMethod: 'boussinesq' | '2to1';
  readonly includeNeighbours: boolean;
  readonly designLifeYears: number;
  readonly options: NonNullable<SettlementCheckInput['options']>;
}

function footingResult(input: FootingResultInput): FootingSettlementResult {
  const { model, prepared, ownIndex, stressMethod, includeNeighbours, designLifeYears, options } = input;
  const footing = prepared[ownIndex];
  if (footing === undefined) throw new RangeError('runSettlementCheck requires a consistent footing list');
  const at = (xM: number, yM: number, withSublayers: boolean) =>
    settlementAtPoint({ model, footings: prepared, ownIndex, xM, yM, method: stressMethod, includeNeighbours, designLifeYears, withSublayers });
  const centre = at(footing.xM, footing.yM, true);
  const halfWidthM = footing.widthM / 2;
  const halfLengthM = footing.lengthM / 2;
  const corners: Array<[PointSettlement['label'], number, number]> =
    options.evaluationPoints === 'centre'
      ? []
      : [
          ['corner-x-y-', -halfWidthM, -halfLengthM],
          ['corner-x+y-', halfWidthM, -halfLengthM],
          ['corner-x-y+', -halfWidthM, halfLengthM],
          ['corner-x+y+', halfWidthM, halfLengthM],
        ];
  const points: PointSettlement[] = [
    { label: 'centre', xM: footing.xM, yM: footing.yM, immediateM: centre.immediateM, primaryM: centre.primaryM, secondaryM: centre.secondaryM, totalM: centre.totalM },
    ...corners.map(([label, dx, dy]) => {
      const point = at(footing.xM + dx, footing.yM + dy, false);
      return { label, xM: footing.xM + dx, yM: footing.yM + dy, immediateM: point.immediateM, primaryM: point.primaryM, secondaryM: point.secondaryM, totalM: point.totalM };
    }),
  ];
  const consolidating: ConsolidatingLayer[] = [];
  for (const [layerIndex, primarySettlementM] of centre.primaryByLayer) {
    const layer = model.layers[layerIndex];
    if (layer === undefined || layer.cvM2PerYr === null || layer.drainageTop === null || layer.drainageBottom === null || !(primarySettlementM > 0)) continue;
    consolidating.push({
      primarySettlementM,
      thicknessM: layer.bottomDepthM - layer.topDepthM,
      cvM2PerYr: layer.cvM2PerYr,
      drainageTop: layer.drainageTop,
      drainageBottom: layer.drainageBottom,
    });
  }
  const timeCurve = settlementTimeCurve(consolidating, centre.immediateM, options.timesYears).map((point) => ({ timeYears: point.timeYears, settlementM: point.settlementM }));
  const shareTime = (share: number) => (consolidating.length === 0 ? null : timeForPrimaryShare(consolidating, share).timeYears);
  return {
    id: footing.id,
    xM: footing.xM,
    yM: footing.yM,
    widthM: footing.widthM,
    lengthM: footing.lengthM,
    depthM: footing.depthM,
    pressureKpa: footing.pressureKpa,
    loadKn: footing.pressureKpa * footing.widthM * footing.lengthM,
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

function methodNotes(stressMethod: 'boussinesq' | '2to1', includeNeighbours: boolean): string[] {
  const notes = [
    'Stresses below each footing base; footings are flexible and loaded by the given net pressure.',
    'Primary settlement per sublayer from Cc, Cs, e0 and σ′p at mid-depth (Terzaghi, e–log σ′).',
    'Immediate settlement from Steinbrenner’s factors over the layers with E and ν, without a depth (Fox) reduction.',
    'Secondary compression from Cα over the design life, starting at the end of primary consolidation; Cα·Cs/Cc where a sublayer stays overconsolidated (Mesri & Godlewski 1977).',
  ];
  if (stressMethod === '2to1') notes.push('The 2V:1H method spreads the load uniformly, so corner and centre values of a footing alone do not differ; use Boussinesq for differential settlement within a footing.');
  if (!includeNeighbours) notes.push('Neighbouring footings are ignored: each footing is checked alone.');
  return notes;
}
