import type { ConsolidationTestResult, KeyParameters } from '@porestack/types';

const EMPTY: KeyParameters = {
  initialVoidRatio: null,
  compressionIndex: null,
  swellIndex: null,
  preconsolidationStressKpa: null,
  overconsolidationRatio: null,
  cvMinM2PerYr: null,
  cvMaxM2PerYr: null,
  sampleQuality: null,
};

/** cv of every increment by either method, for the range shown in lists and versions. */
export function cvRange(result: ConsolidationTestResult): { min: number | null; max: number | null } {
  const values = result.increments
    .flatMap((increment) => [increment.cvTaylorM2PerYr, increment.cvCasagrandeM2PerYr])
    .filter((value): value is number => value !== null && Number.isFinite(value) && value > 0);
  if (values.length === 0) return { min: null, max: null };
  return { min: Math.min(...values), max: Math.max(...values) };
}

/**
 * Cα for the record: the median of the loading increments beyond σ′p (where secondary
 * compression matters for design), else of every loading increment that has one.
 */
export function representativeSecondaryIndex(result: ConsolidationTestResult): number | null {
  const pKpa = result.preconsolidation.adoptedKpa;
  const all = result.increments.filter((i) => i.secondaryCompressionIndex !== null && i.kind !== 'unloading');
  const virgin = pKpa === null ? [] : all.filter((i) => i.stressKpa > pKpa);
  const chosen = (virgin.length > 0 ? virgin : all).map((i) => i.secondaryCompressionIndex as number).sort((a, b) => a - b);
  if (chosen.length === 0) return null;
  const middle = Math.floor(chosen.length / 2);
  return chosen.length % 2 === 1 ? (chosen[middle] as number) : ((chosen[middle - 1] as number) + (chosen[middle] as number)) / 2;
}

export function keyParametersFrom(result: ConsolidationTestResult | null): KeyParameters {
  if (!result) return EMPTY;
  const cv = cvRange(result);
  return {
    initialVoidRatio: result.initialVoidRatio,
    compressionIndex: result.compressionIndex,
    swellIndex: result.swellIndex,
    preconsolidationStressKpa: result.preconsolidation.adoptedKpa,
    overconsolidationRatio: result.overconsolidationRatio,
    cvMinM2PerYr: cv.min,
    cvMaxM2PerYr: cv.max,
    sampleQuality: result.sampleQuality?.category ?? null,
  };
}
