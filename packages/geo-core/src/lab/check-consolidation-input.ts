import type { ConsolidationTestInput } from './consolidation-test-input.js';

const positive = (value: number): boolean => value > 0 && Number.isFinite(value);
const optionalNonNegative = (value: number | undefined): boolean => value === undefined || (value >= 0 && Number.isFinite(value));

/**
 * The domain checks of analyzeConsolidationTest, thrown in its name (the
 * package's failure policy): positive dimensions and Gs, a known drainage, at
 * least one increment, each with its own finite index, a positive stress and
 * a reading; water contents ≥ 0; a positive in-situ stress and σ′p pick when
 * given. Masses are checked by resolveDryMass, readings by checkIncrementReadings.
 *
 * @param input the test as given.
 * @throws RangeError('analyzeConsolidationTest requires …') naming the first condition broken.
 * @example checkConsolidationInput(input) // returns nothing when the input is in domain
 */
export function checkConsolidationInput(input: ConsolidationTestInput): void {
  const { specimen, increments } = input;
  if (!positive(specimen.initialHeightMm) || !positive(specimen.diameterMm)) {
    throw new RangeError('analyzeConsolidationTest requires a positive initial height and diameter in mm');
  }
  if (!positive(specimen.specificGravity)) throw new RangeError('analyzeConsolidationTest requires a positive specific gravity');
  if (specimen.drainage !== 'double' && specimen.drainage !== 'single') {
    throw new RangeError("analyzeConsolidationTest requires drainage 'double' or 'single'");
  }
  if (increments.length === 0) throw new RangeError('analyzeConsolidationTest requires at least one increment');
  const seen = new Set<number>();
  for (const increment of increments) {
    if (!Number.isFinite(increment.index) || seen.has(increment.index)) {
      throw new RangeError('analyzeConsolidationTest requires each increment to have its own finite index');
    }
    seen.add(increment.index);
    if (!positive(increment.stressKpa)) throw new RangeError('analyzeConsolidationTest requires every increment stress to be a positive number of kPa');
    if (increment.readings.length === 0) throw new RangeError('analyzeConsolidationTest requires at least one reading in every increment');
  }
  if (!optionalNonNegative(specimen.finalWaterContent) || !optionalNonNegative(specimen.initialWaterContent)) {
    throw new RangeError('analyzeConsolidationTest requires water contents to be fractions ≥ 0');
  }
  if (specimen.inSituVerticalEffectiveStressKpa !== undefined && !positive(specimen.inSituVerticalEffectiveStressKpa)) {
    throw new RangeError('analyzeConsolidationTest requires the in-situ vertical effective stress to be a positive number of kPa');
  }
  if (input.picks?.preconsolidationStressKpa !== undefined && !positive(input.picks?.preconsolidationStressKpa)) {
    throw new RangeError('analyzeConsolidationTest requires a picked preconsolidation stress to be a positive number of kPa');
  }
}
