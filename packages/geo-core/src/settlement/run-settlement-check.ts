import { waterUnitWeightOf } from '../profile/water-unit-weight-of.js';
import { footingPressureKpa } from '../stress/footing-pressure.js';
import { overlappingFootingPairs } from '../stress/overlapping-footing-pairs.js';
import { prepareFooting } from '../stress/prepare-footing.js';
import type { PreparedFooting } from '../stress/prepared-footing.js';
import type { FootingShape } from '../stress/footing.types.js';
import { footingPairResults } from './footing-pair-results.js';
import { foxDepthFactor } from './fox-depth-factor.js';
import { footingSettlementResult } from './footing-settlement-result.js';
import { prepareSettlementModel, type SettlementModel } from './prepare-settlement-model.js';
import { SETTLEMENT_CAUTION } from './settlement-caution.js';
import type { SettlementCheckInput, SettlementCheckResult } from './settlement-check.types.js';

const DEFAULT_SUBLAYER_MAX_THICKNESS_M = 0.5;
const DEFAULT_DESIGN_LIFE_YEARS = 50;
const DEFAULT_END_OF_PRIMARY_SHARE = 0.95;
const DEFAULT_DESIGN_ANGULAR_DISTORTION = 1 / 500;

/**
 * The settlement check of a group of shallow footings on a layered profile:
 * for each footing, immediate settlement (layered Steinbrenner, optionally
 * reduced by Fox's depth factor), primary
 * consolidation per sublayer (Terzaghi's e–log σ′, all three cases) under the
 * stress of the footing and — unless switched off — its neighbours (Boussinesq
 * superposition or 2V:1H), secondary compression over the design life from Cα,
 * the settlement–time curve from Terzaghi's U(Tv) per clay layer, and for each
 * pair of footings the differential settlement and angular distortion judged
 * against Bjerrum (1963) and Skempton & MacDonald (1956).
 *
 * Footings may be rectangles, squares, circles (widthM the diameter) or strips
 * (plane strain, load per metre run or pressure); each footing's result names
 * its shape and the method names the stress method. A load or pressure is net
 * unless marked gross; a gross one loses σv0 at the founding depth
 * (netFootingPressure), and each footing's result states the net pressure used. Headline numbers are at
 * each footing's centre; the corners — or, for circles and strips, their
 * equivalents (EvaluationPointLabel) — are evaluated too unless
 * evaluationPoints is 'centre'. The result is plain data: it records the
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
  const applyFoxDepthFactor = options.applyFoxDepthFactor ?? false;
  if (!(designLifeYears > 0) || !Number.isFinite(designLifeYears)) throw new RangeError(`${caller} requires a finite designLifeYears > 0`);
  if (!(endOfPrimaryShare > 0 && endOfPrimaryShare < 1)) throw new RangeError(`${caller} requires endOfPrimaryShare strictly between 0 and 1`);
  if (!(designAngularDistortion > 0)) throw new RangeError(`${caller} requires designAngularDistortion > 0`);
  if (options.totalSettlementLimitM !== undefined && !(options.totalSettlementLimitM > 0)) throw new RangeError(`${caller} requires totalSettlementLimitM > 0`);
  if (options.timesYears !== undefined && !options.timesYears.every((t) => t >= 0 && Number.isFinite(t))) throw new RangeError(`${caller} requires every time in timesYears to be finite and >= 0`);
  if (stressMethod !== 'boussinesq' && stressMethod !== '2to1') throw new RangeError(`${caller} requires stressMethod 'boussinesq' or '2to1'`);

  const model = prepareSettlementModel(input.profile, spacing, endOfPrimaryShare, caller);
  const footingWarnings: string[] = [];
  const prepared = prepareFootings(input, model, caller, applyFoxDepthFactor, footingWarnings);
  const notes = methodNotes(stressMethod, includeNeighbours, applyFoxDepthFactor, new Set(prepared.map((footing) => footing.shape)));
  const footings = prepared.map((footing, ownIndex) =>
    footingSettlementResult({ model, prepared, ownIndex, stressMethod, includeNeighbours, designLifeYears, options }),
  );
  const pairs = footingPairResults(footings, designAngularDistortion, options.pairMaxDistanceM);
  return {
    method: { stressMethod, waterUnitWeightKnPerM3: waterUnitWeightOf(input.profile), includeNeighbours, sublayerSpacing: spacing, designLifeYears, endOfPrimaryShare, designAngularDistortion, applyFoxDepthFactor, notes },
    layers: model.layers,
    footings,
    pairs,
    warnings: [...model.warnings, ...footingWarnings, ...overlapWarnings(input.footings)],
    caution: SETTLEMENT_CAUTION,
  };
}

function prepareFootings(input: SettlementCheckInput, model: SettlementModel, caller: string, applyFoxDepthFactor: boolean, warnings: string[]): PreparedFooting[] {
  const footings = input.footings;
  if (footings.length === 0) throw new RangeError(`${caller} requires at least one footing`);
  const ids = new Set<string>();
  return footings.map((footing) => {
    if (ids.has(footing.id)) throw new RangeError(`${caller} requires unique footing ids (${footing.id} repeats)`);
    ids.add(footing.id);
    if (!Number.isFinite(footing.xM) || !Number.isFinite(footing.yM)) throw new RangeError(`${caller} requires finite xM and yM (footing ${footing.id})`);
    if (!(footing.depthM >= 0) || !(footing.depthM < model.profileBottomM)) {
      throw new RangeError(`${caller} requires depthM >= 0 and above the bottom of the profile (footing ${footing.id})`);
    }
    if (!(footingPressureKpa(footing) >= 0)) throw new RangeError(`${caller} requires a load or pressure >= 0 (footing ${footing.id}); uplift is outside this check`);
    const prepared = prepareFooting(footing, input.profile, warnings);
    const foxApplies = applyFoxDepthFactor && (prepared.shape === 'rectangle' || prepared.shape === 'square');
    return foxApplies ? { ...prepared, immediateDepthFactor: footingFoxDepthFactor(prepared, model) } : prepared;
  });
}

/** Fox's If for a footing, with ν of the elastic layer just below its base; 1 at the surface or with no elastic layer below. */
function footingFoxDepthFactor(footing: PreparedFooting, model: SettlementModel): number {
  const below = model.elasticLayers.find((layer) => layer.bottomDepthM > footing.depthM);
  if (below === undefined) return 1;
  const shortM = Math.min(footing.widthM, footing.lengthM);
  return foxDepthFactor(Math.max(footing.widthM, footing.lengthM) / shortM, footing.depthM / shortM, below.poissonRatio);
}

function methodNotes(stressMethod: 'boussinesq' | '2to1', includeNeighbours: boolean, applyFoxDepthFactor: boolean, shapes: ReadonlySet<FootingShape>): string[] {
  const notes = [
    'Stresses below each footing base; footings are flexible and loaded by their net pressure (a gross pressure less σv0 at the founding depth).',
    'Primary settlement per sublayer from Cc, Cs, e0 and σ′p at mid-depth (Terzaghi, e–log σ′), or from mv·Δσ′·H on a layer given mv and no Cc.',
    applyFoxDepthFactor
      ? 'Immediate settlement from Steinbrenner’s factors over the layers with E and ν; each footing’s own share reduced by Fox’s (1948) depth factor (ν of the layer below its base), its neighbours’ shares not.'
      : 'Immediate settlement from Steinbrenner’s factors over the layers with E and ν, without a depth (Fox) reduction.',
    'Secondary compression from Cα over the design life, starting at the end of primary consolidation; Cα·Cs/Cc where a sublayer stays overconsolidated (Mesri & Godlewski 1977).',
  ];
  if (shapes.has('circle')) {
    notes.push(
      stressMethod === 'boussinesq'
        ? 'Circles: Boussinesq’s point load integrated over the circle at any point (on the axis in closed form); immediate settlement from the half-space displacement under the circle, layer by layer as Steinbrenner’s method does for rectangles (centre factor 1 and edge factor 2/π on a half-space, Timoshenko & Goodier). Their “corners” are the four rim points on the x and y axes.'
        : 'Circles: the load spread over a circle of diameter D + z (2V:1H). Their “corners” are the four rim points on the x and y axes.',
    );
  }
  if (shapes.has('strip')) {
    notes.push(
      'Strips are infinitely long along y (plane strain), evaluated at their station yM: stress from the strip solution (Boussinesq) or q·B/(B + z) (2V:1H), immediate settlement from Steinbrenner’s factors in their infinitely-long limit. Their “corners” are the two edges across the width.',
    );
  }
  if (applyFoxDepthFactor && (shapes.has('circle') || shapes.has('strip'))) {
    notes.push('Fox’s depth factor is for rectangles: circles and strips keep their immediate settlement unreduced (more settlement, not less).');
  }
  if (stressMethod === '2to1') notes.push('The 2V:1H method spreads the load uniformly, so corner and centre values of a footing alone do not differ; use Boussinesq for differential settlement within a footing.');
  if (!includeNeighbours) notes.push('Neighbouring footings are ignored: each footing is checked alone.');
  return notes;
}

function overlapWarnings(footings: SettlementCheckInput['footings']): string[] {
  return overlappingFootingPairs(footings).map(
    ([a, b]) => `Footings ${a} and ${b} overlap on plan. Both loads are added where they overlap, which is rarely meant: check their positions and sizes in the schedule.`,
  );
}
