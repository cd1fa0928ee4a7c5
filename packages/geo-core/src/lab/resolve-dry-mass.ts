import type { ConsolidationSpecimenInput } from './consolidation-test-input.js';

/** Given and derived dry masses further apart than this fraction are reported. */
const MASS_AGREEMENT_FRACTION = 0.01;

export interface ResolvedDryMass {
  readonly dryMassG: number;
  readonly source: 'given' | 'from-wet-mass';
  /** Relative difference between the given dry mass and wet/(1 + w0), when both could be had and they disagree by more than 1 %. */
  readonly disagreement: number | null;
}

/**
 * Dry mass of the specimen: the given oven-dry mass, or Md = Mwet/(1 + w0)
 * (ASTM D2216 definition of water content). When both can be had the given
 * dry mass is used and a disagreement over 1 % is returned for a warning.
 *
 * @param specimen the specimen input.
 * @returns the dry mass in g and where it came from.
 * @throws RangeError when neither a positive dry mass nor a positive wet mass with a water content ≥ 0 is given.
 * @example resolveDryMass({ initialHeightMm: 20, diameterMm: 50, specificGravity: 2.7, drainage: 'double', wetMassG: 150, initialWaterContent: 0.5 }).dryMassG // 100
 */
export function resolveDryMass(specimen: ConsolidationSpecimenInput): ResolvedDryMass {
  const { dryMassG, wetMassG, initialWaterContent } = specimen;
  if (dryMassG !== undefined && !(dryMassG > 0 && Number.isFinite(dryMassG))) {
    throw new RangeError('resolveDryMass requires the dry mass to be a positive number of grams');
  }
  const derivable =
    wetMassG !== undefined && initialWaterContent !== undefined && wetMassG > 0 && Number.isFinite(wetMassG) && initialWaterContent >= 0 && Number.isFinite(initialWaterContent);
  const derived = derivable ? (wetMassG as number) / (1 + (initialWaterContent as number)) : null;
  if (dryMassG !== undefined) {
    const difference = derived === null ? 0 : Math.abs(derived - dryMassG) / dryMassG;
    return { dryMassG, source: 'given', disagreement: difference > MASS_AGREEMENT_FRACTION ? difference : null };
  }
  if (derived === null) {
    throw new RangeError('resolveDryMass requires a dry mass, or a wet mass with an initial water content (fraction ≥ 0)');
  }
  return { dryMassG: derived, source: 'from-wet-mass', disagreement: null };
}
