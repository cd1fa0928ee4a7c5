import type { SoilProfile } from '../profile/soil-profile.types.js';
import { prepareSettlementModel } from '../settlement/prepare-settlement-model.js';
import type { Footing, FootingShape, StressMethod } from '../stress/footing.types.js';
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
  /** The shape sized ('rectangle' where none was given). */
  readonly shape: FootingShape;
  /** B found, m (the diameter for a circle, the width across for a strip); null when none works. */
  readonly widthM: number | null;
  /** L, m, for a rectangle or square; null for a circle or strip, or when no width works. */
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
 * The smallest width (a rectangle of the given L/B, a square, a circle's
 * diameter or a strip's width) whose total settlement at the
 * centre — immediate + primary + secondary, as in runSettlementCheck — stays
 * within a target, for a fixed load. Settlement falls as a footing with a
 * fixed load (kN, or kN/m for a strip; net, or gross less the overburden
 * removed) widens (lower pressure, stress spread deeper), so the search is a
 * bisection on the width bracket (findWidthByBisection), to 5 mm by default.
 *
 * @param input profile, footing (m, kN), target (m), bounds (m), neighbours, options
 * @returns the width and its settlement, or null and the reason
 * @throws RangeError for an invalid profile, an unknown shape, load ≤ 0 (loadKnPerM for a strip, loadKn otherwise),
 *   bounds not 0 < min < max, target ≤ 0, L/B < 1, or L/B given for a shape other than a rectangle
 * @example sizeFootingForSettlement({ profile, footing: { depthM: 1, loadKn: 1200 }, targetSettlementM: 0.025, minWidthM: 1, maxWidthM: 6 }).widthM
 */
export function sizeFootingForSettlement(input: SizeFootingForSettlementInput): SizeFootingResult {
  return sizeFootingToTarget(input, 'sizeFootingForSettlement');
}

/** Shared by both sizing functions: validates, prepares the model once, bisects. */
export function sizeFootingToTarget(input: SizeFootingForSettlementInput, caller: string): SizeFootingResult {
  const { profile, footing, targetSettlementM, minWidthM, maxWidthM } = input;
  const options = input.options ?? {};
  const shape = footing.shape ?? 'rectangle';
  if (shape !== 'rectangle' && shape !== 'square' && shape !== 'circle' && shape !== 'strip') {
    throw new RangeError(`${caller} requires shape 'rectangle', 'square', 'circle' or 'strip'`);
  }
  if (shape === 'strip') {
    if (!(footing.loadKnPerM !== undefined && footing.loadKnPerM > 0 && Number.isFinite(footing.loadKnPerM))) throw new RangeError(`${caller} requires a finite loadKnPerM > 0 for a strip`);
  } else if (!(footing.loadKn !== undefined && footing.loadKn > 0 && Number.isFinite(footing.loadKn))) {
    throw new RangeError(`${caller} requires a finite loadKn > 0`);
  }
  if (!(minWidthM > 0 && maxWidthM > minWidthM && Number.isFinite(maxWidthM))) throw new RangeError(`${caller} requires 0 < minWidthM < maxWidthM`);
  if (!(targetSettlementM > 0) || !Number.isFinite(targetSettlementM)) throw new RangeError(`${caller} requires a finite targetSettlementM > 0`);
  if (shape !== 'rectangle' && footing.lengthToWidthRatio !== undefined) throw new RangeError(`${caller} requires no lengthToWidthRatio for a ${shape}`);
  const ratio = footing.lengthToWidthRatio ?? 1;
  if (!(ratio >= 1) || !Number.isFinite(ratio)) throw new RangeError(`${caller} requires lengthToWidthRatio >= 1`);
  const lengthAt = (widthM: number) => (shape === 'rectangle' ? widthM * ratio : shape === 'square' ? widthM : null);
  if (options.sublayerCount !== undefined && options.sublayerMaxThicknessM !== undefined) throw new RangeError(`${caller} requires either sublayerCount or sublayerMaxThicknessM, not both`);
  const spacing = options.sublayerCount !== undefined ? { count: options.sublayerCount } : { maxThicknessM: options.sublayerMaxThicknessM ?? 0.5 };
  const model = prepareSettlementModel(profile, spacing, options.endOfPrimaryShare ?? 0.95, caller);
  if (!(footing.depthM >= 0 && footing.depthM < model.profileBottomM)) throw new RangeError(`${caller} requires depthM >= 0 and above the bottom of the profile`);
  const neighbours = input.neighbours ?? [];
  if (footing.pressureBasis !== undefined && footing.pressureBasis !== 'net' && footing.pressureBasis !== 'gross') throw new RangeError(`${caller} requires pressureBasis 'net' or 'gross'`);
  const trial = { profile, model, footing, neighbours, method: options.stressMethod ?? 'boussinesq', includeNeighbours: neighbours.length > 0, designLifeYears: options.designLifeYears ?? 50 } as const;
  const settlementOf = (widthM: number) => footingSettlementForWidth(trial, widthM);
  const outcome = findWidthByBisection(settlementOf, targetSettlementM, minWidthM, maxWidthM, options.widthToleranceM ?? 0.005);
  const mm = (m: number) => `${(m * 1000).toFixed(1)} mm`;
  if (outcome.status === 'above-bracket') {
    return {
      status: 'no-width-within-bounds',
      shape,
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
      shape,
      widthM: minWidthM,
      lengthM: lengthAt(minWidthM),
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
    shape,
    widthM: outcome.x,
    lengthM: lengthAt(outcome.x),
    settlementM: outcome.valueAtX,
    targetSettlementM,
    settlementAtMinWidthM: settlementOf(minWidthM),
    settlementAtMaxWidthM: settlementOf(maxWidthM),
    iterations: outcome.iterations,
    warnings: [],
  };
}
