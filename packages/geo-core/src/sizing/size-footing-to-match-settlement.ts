import type { SoilProfile } from '../profile/soil-profile.types.js';
import { prepareSettlementModel } from '../settlement/prepare-settlement-model.js';
import { settlementAtPoint } from '../settlement/settlement-at-point.js';
import type { Footing } from '../stress/footing.types.js';
import { prepareFooting } from '../stress/prepare-footing.js';
import type { FootingToSize } from './footing-settlement-for-width.js';
import { sizeFootingToTarget, type SizeFootingForSettlementInput, type SizeFootingResult } from './size-footing-for-settlement.js';

/** The footing to size and the footing whose settlement it should match. */
export interface SizeFootingToMatchSettlementInput {
  readonly profile: SoilProfile;
  /** The footing whose total settlement (alone, under its own load) sets the target: any shape, load or pressure. */
  readonly reference: Footing;
  readonly footing: FootingToSize;
  readonly minWidthM: number;
  readonly maxWidthM: number;
  readonly options?: SizeFootingForSettlementInput['options'];
}

/**
 * The width that gives a footing the same total settlement at its centre as a
 * reference footing under its own load — the usual way to keep differential
 * settlement between differently loaded columns small. Both footings are taken
 * alone on the same profile (neighbours would make the target depend on the
 * answer); they may differ in shape (a circle matched to a square, say). The
 * width returned settles no more than the reference, within the width tolerance.
 *
 * @param input profile, reference footing (m, kN, kN/m or kPa), footing to size (m, kN or kN/m), bounds (m), options
 * @returns as sizeFootingForSettlement, with the reference's settlement as the target
 * @throws RangeError as sizeFootingForSettlement, or for a reference footing that is invalid, unloaded or founded outside the profile
 * @example sizeFootingToMatchSettlement({ profile, reference: { id: 'C1', xM: 0, yM: 0, widthM: 2, lengthM: 2, depthM: 1, loadKn: 800 }, footing: { depthM: 1, loadKn: 1400 }, minWidthM: 1, maxWidthM: 8 }).widthM
 */
export function sizeFootingToMatchSettlement(input: SizeFootingToMatchSettlementInput): SizeFootingResult {
  const caller = 'sizeFootingToMatchSettlement';
  const options = input.options ?? {};
  const spacing = options.sublayerCount !== undefined ? { count: options.sublayerCount } : { maxThicknessM: options.sublayerMaxThicknessM ?? 0.5 };
  const model = prepareSettlementModel(input.profile, spacing, options.endOfPrimaryShare ?? 0.95, caller);
  if (!(input.reference.depthM >= 0 && input.reference.depthM < model.profileBottomM)) throw new RangeError(`${caller} requires the reference's depthM >= 0 and above the bottom of the profile`);
  const reference = prepareFooting(input.reference, input.profile);
  if (!(reference.pressureKpa > 0)) throw new RangeError(`${caller} requires the reference footing to carry a net load > 0`);
  const targetSettlementM = settlementAtPoint({
    model,
    footings: [reference],
    ownIndex: 0,
    xM: reference.xM,
    yM: reference.yM,
    method: options.stressMethod ?? 'boussinesq',
    includeNeighbours: false,
    designLifeYears: options.designLifeYears ?? 50,
    withSublayers: false,
  }).totalM;
  return sizeFootingToTarget({ profile: input.profile, footing: input.footing, targetSettlementM, minWidthM: input.minWidthM, maxWidthM: input.maxWidthM, options }, caller);
}
