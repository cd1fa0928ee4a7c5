import type { SoilProfile } from '../profile/soil-profile.types.js';
import { prepareSettlementModel } from '../settlement/prepare-settlement-model.js';
import type { Footing, StressMethod } from '../stress/footing.types.js';
import { findWidthByBisection } from './find-width-by-bisection.js';
import { footingSettlementForWidth, type FootingToSize } from './footing-settlement-for-width.js';

/** Search bounds and ground model for sizing. */
export interface SizeFootingForSettlementInput {
  readonly profile: SoilProfile;
  readonly footing: FootingToSize;
  /** The total settlement at the centre not to be exceeded, m (> 0). */
  readonly targetSettlementM: number;
  /** Smallest and largest widths to consider, m. */
  readonly minWidthM: number;
  readonly maxWidthM: number;
  /** Footings whose loads also stress the ground under this one; default none. */
  readonly neighbours?: readonly Footing[];
  readonly options?: {
    readonly stressMethod?: StressMethod;
    readonly sublayerCount?: number;
    readonly sublayerMaxThicknessM?: number;
    readonly designLifeYears?: number;
    readonly endOfPrimaryShare?: number;
    /** Width resolution, m; default 0.005 (5 mm, finer than any footing is set out). */
    readonly widthToleranceM?: number;
  };
}

/** The width found, or null with a plain statement of why. */
export interface SizeFootingResult {
  readonly status: 'found' | 'minimum-width-suffices' | 'no-width-within-bounds';
  readonly widthM: number | null;
  readonly lengthM: number | null;
  /** Total settlement at the centre for the width returned, m. */
  readonly settlementM: number | null;
  readonly targetSettlementM: number;
  /** Settlements at the two bounds, m, so the answer can be checked by eye. */
  readonly settlementAtMinWidthM: number;
  readonly settlementAtMaxWidthM: number;
  readonly iterations: number;
  readonly warnings: readonly string[];
}

/**
 * The smallest width (square, or the given L/B) whose total settlement at the
 * centre — immediate + primary + secondary, as in runSettlementCheck — stays
 * within a target, for a fixed load. Settlement falls as a footing with a
 * fixed load widens (lower pressure, stress spread deeper), so the search is a
 * bisection on the width bracket (findWidthByBisection), to 5 mm by default.
 *
 * @param input profile, footing (m, kN), target (m), bounds (m), neighbours, options
 * @returns the width and its settlement, or null and the reason
 * @throws RangeError for an invalid profile, load ≤ 0, bounds not 0 < min < max, target ≤ 0, L/B < 1
 * @example sizeFootingForSettlement({ profile, footing: { depthM: 1, loadKn: 1200 }, targetSettlementM: 0.025, minWidthM: 1, maxWidthM: 6 }).widthM
 */
export function sizeFootingForSettlement(input: SizeFootingForSettlementInput): SizeFootingResult {
  return sizeFootingToTarget(input, 'sizeFootingForSettlement');
}

/** Shared by both sizing functions: validates, prepares the model once, bisects. */
export function sizeFootingToTarget(input: SizeFootingForSettlementInput, caller: string): SizeFootingResult {
  const { profile, footing, targetSettlementM, minWidthM, maxWidthM } = input;
  const options = input.options ?? {};
  if (!(footing.loadKn > 0) || !Number.isFinite(footing.loadKn)) throw new RangeError(`${caller} requires a finite loadKn > 0`);
  if (!(minWidthM > 0 && maxWidthM > minWidthM && Number.isFinite(maxWidthM))) throw new RangeError(`${caller} requires 0 < minWidthM < maxWidthM`);
  if (!(targetSettlementM > 0) || !Number.isFinite(targetSettlementM)) throw new RangeError(`${caller} requires a finite targetSettlementM > 0`);
  const ratio = footing.lengthToWidthRatio ?? 1;
  if (!(ratio >= 1) || !Number.isFinite(ratio)) throw new RangeError(`${caller} requires lengthToWidthRatio >= 1`);
  if (options.sublayerCount !== undefined && options.sublayerMaxThicknessM !== undefined) throw new RangeError(`${caller} requires either sublayerCount or sublayerMaxThicknessM, not both`);
  const spacing = options.sublayerCount !== undefined ? { count: options.sublayerCount } : { maxThicknessM: options.sublayerMaxThicknessM ?? 0.5 };
  const model = prepareSettlementModel(profile, spacing, options.endOfPrimaryShare ?? 0.95, caller);
  if (!(footing.depthM >= 0 && footing.depthM < model.profileBottomM)) throw new RangeError(`${caller} requires depthM >= 0 and above the bottom of the profile`);
  const neighbours = input.neighbours ?? [];
  const trial = { model, footing, neighbours, method: options.stressMethod ?? 'boussinesq', includeNeighbours: neighbours.length > 0, designLifeYears: options.designLifeYears ?? 50 } as const;
  const settlementOf = (widthM: number) => footingSettlementForWidth(trial, widthM);
  const outcome = findWidthByBisection(settlementOf, targetSettlementM, minWidthM, maxWidthM, options.widthToleranceM ?? 0.005);
  const mm = (m: number) => `${(m * 1000).toFixed(1)} mm`;
  if (outcome.status === 'above-bracket') {
    return {
      status: 'no-width-within-bounds',
      widthM: null,
      lengthM: null,
      settlementM: null,
      targetSettlementM,
      settlementAtMinWidthM: outcome.valueAtLow,
      settlementAtMaxWidthM: outcome.valueAtHigh,
      iterations: 0,
      warnings: [
        `No width between ${minWidthM} m and ${maxWidthM} m keeps the settlement within ${mm(targetSettlementM)}: even at ${maxWidthM} m it is ${mm(outcome.valueAtHigh)}. Widen the bounds, reduce the load, or consider ground improvement or piles.`,
      ],
    };
  }
  if (outcome.status === 'below-bracket') {
    return {
      status: 'minimum-width-suffices',
      widthM: minWidthM,
      lengthM: minWidthM * ratio,
      settlementM: outcome.valueAtLow,
      targetSettlementM,
      settlementAtMinWidthM: outcome.valueAtLow,
      settlementAtMaxWidthM: outcome.valueAtHigh,
      iterations: 0,
      warnings: [`The smallest width allowed, ${minWidthM} m, already settles only ${mm(outcome.valueAtLow)}; bearing capacity, not settlement, will decide the size.`],
    };
  }
  return {
    status: 'found',
    widthM: outcome.x,
    lengthM: outcome.x * ratio,
    settlementM: outcome.valueAtX,
    targetSettlementM,
    settlementAtMinWidthM: settlementOf(minWidthM),
    settlementAtMaxWidthM: settlementOf(maxWidthM),
    iterations: outcome.iterations,
    warnings: [],
  };
}
