import { footingPressureKpa } from '../stress/footing-pressure.js';
import type { PreparedFooting } from '../stress/footing-stress-contribution.js';
import type { Footing } from '../stress/footing.types.js';
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
  const applyFoxDepthFactor = options.applyFoxDepthFactor ?? false;
  if (!(designLifeYears > 0) || !Number.isFinite(designLifeYears)) throw new RangeError(`${caller} requires a finite designLifeYears > 0`);
  if (!(endOfPrimaryShare > 0 && endOfPrimaryShare < 1)) throw new RangeError(`${caller} requires endOfPrimaryShare strictly between 0 and 1`);
  if (!(designAngularDistortion > 0)) throw new RangeError(`${caller} requires designAngularDistortion > 0`);
  if (options.totalSettlementLimitM !== undefined && !(options.totalSettlementLimitM > 0)) throw new RangeError(`${caller} requires totalSettlementLimitM > 0`);
  if (options.timesYears !== undefined && !options.timesYears.every((t) => t >= 0 && Number.isFinite(t))) throw new RangeError(`${caller} requires every time in timesYears to be finite and >= 0`);
  if (stressMethod !== 'boussinesq' && stressMethod !== '2to1') throw new RangeError(`${caller} requires stressMethod 'boussinesq' or '2to1'`);

  const model = prepareSettlementModel(input.profile, spacing, endOfPrimaryShare, caller);
  const prepared = prepareFootings(input.footings, model, caller, applyFoxDepthFactor);
  const notes = methodNotes(stressMethod, includeNeighbours, applyFoxDepthFactor);
  const footings = prepared.map((footing, ownIndex) =>
    footingSettlementResult({ model, prepared, ownIndex, stressMethod, includeNeighbours, designLifeYears, options }),
  );
  const pairs = footingPairResults(footings, designAngularDistortion, options.pairMaxDistanceM);
  return {
    method: { stressMethod, includeNeighbours, sublayerSpacing: spacing, designLifeYears, endOfPrimaryShare, designAngularDistortion, applyFoxDepthFactor, notes },
    layers: model.layers,
    footings,
    pairs,
    warnings: [...model.warnings],
    caution: SETTLEMENT_CAUTION,
  };
}

function prepareFootings(footings: readonly Footing[], model: SettlementModel, caller: string, applyFoxDepthFactor: boolean): PreparedFooting[] {
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
    const prepared = { id: footing.id, xM: footing.xM, yM: footing.yM, widthM: footing.widthM, lengthM: footing.lengthM, depthM: footing.depthM, pressureKpa };
    return applyFoxDepthFactor ? { ...prepared, immediateDepthFactor: footingFoxDepthFactor(prepared, model) } : prepared;
  });
}

/** Fox's If for a footing, with ν of the elastic layer just below its base; 1 at the surface or with no elastic layer below. */
function footingFoxDepthFactor(footing: PreparedFooting, model: SettlementModel): number {
  const below = model.elasticLayers.find((layer) => layer.bottomDepthM > footing.depthM);
  if (below === undefined) return 1;
  const shortM = Math.min(footing.widthM, footing.lengthM);
  return foxDepthFactor(Math.max(footing.widthM, footing.lengthM) / shortM, footing.depthM / shortM, below.poissonRatio);
}

function methodNotes(stressMethod: 'boussinesq' | '2to1', includeNeighbours: boolean, applyFoxDepthFactor: boolean): string[] {
  const notes = [
    'Stresses below each footing base; footings are flexible and loaded by the given net pressure.',
    'Primary settlement per sublayer from Cc, Cs, e0 and σ′p at mid-depth (Terzaghi, e–log σ′), or from mv·Δσ′·H on a layer given mv and no Cc.',
    applyFoxDepthFactor
      ? 'Immediate settlement from Steinbrenner’s factors over the layers with E and ν; each footing’s own share reduced by Fox’s (1948) depth factor (ν of the layer below its base), its neighbours’ shares not.'
      : 'Immediate settlement from Steinbrenner’s factors over the layers with E and ν, without a depth (Fox) reduction.',
    'Secondary compression from Cα over the design life, starting at the end of primary consolidation; Cα·Cs/Cc where a sublayer stays overconsolidated (Mesri & Godlewski 1977).',
  ];
  if (stressMethod === '2to1') notes.push('The 2V:1H method spreads the load uniformly, so corner and centre values of a footing alone do not differ; use Boussinesq for differential settlement within a footing.');
  if (!includeNeighbours) notes.push('Neighbouring footings are ignored: each footing is checked alone.');
  return notes;
}
