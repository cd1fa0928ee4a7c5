import type { ConsolidationIncrementInput, IncrementExclusion } from './consolidation-test-input.js';
import type { ExcludedIncrement } from './consolidation-test-result.js';

/** What the analysis needs of the reviewer's exclusions. */
export interface ResolvedExclusions {
  /** Reason by increment index, for the increments of the test that are left out. */
  readonly reasons: ReadonlyMap<number, string>;
  /** The same, in test order with each increment's stress, for the result. */
  readonly excluded: readonly ExcludedIncrement[];
  /** Exclusions naming an increment the test does not have. */
  readonly unknownIndices: readonly number[];
}

/**
 * Matches the reviewer's exclusions to the test's increments. An exclusion of an increment
 * the test does not have is returned apart (the analysis warns and ignores it); a second
 * exclusion of the same increment keeps the first reason.
 *
 * @param increments the test's increments in test order.
 * @param exclusions the picks' excludedIncrements (may be undefined).
 * @throws RangeError('analyzeConsolidationTest requires …') when a reason is blank, or when
 *   every increment would be left out (nothing would remain to analyse).
 * @example resolveExclusions([{ index: 1, stressKpa: 25, readings }], []).excluded // []
 */
export function resolveExclusions(
  increments: readonly ConsolidationIncrementInput[],
  exclusions: readonly IncrementExclusion[] | undefined,
): ResolvedExclusions {
  const reasons = new Map<number, string>();
  const unknownIndices: number[] = [];
  const indices = new Set(increments.map((increment) => increment.index));
  for (const exclusion of exclusions ?? []) {
    if (exclusion.reason.trim() === '') {
      throw new RangeError(`analyzeConsolidationTest requires a reason for leaving out increment ${exclusion.index}`);
    }
    if (!indices.has(exclusion.index)) unknownIndices.push(exclusion.index);
    else if (!reasons.has(exclusion.index)) reasons.set(exclusion.index, exclusion.reason.trim());
  }
  if (increments.length > 0 && reasons.size === increments.length) {
    throw new RangeError('analyzeConsolidationTest requires at least one increment left in the analysis');
  }
  const excluded = increments
    .filter((increment) => reasons.has(increment.index))
    .map((increment) => ({ index: increment.index, stressKpa: increment.stressKpa, reason: reasons.get(increment.index) as string }));
  return { reasons, excluded, unknownIndices };
}
