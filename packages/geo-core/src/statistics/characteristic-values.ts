import { mean, sampleStandardDeviation } from 'simple-statistics';
import type { UnfavourableSide } from './settlement-unfavourable-side.js';
import { studentTQuantile } from './student-t-quantile.js';

/** Below this count the spread of the sample is itself too uncertain to lean on (our convention, not a code rule). */
const FEW_TESTS = 5;

/** Test results of one parameter in one stratum. */
export interface CharacteristicValuesInput {
  /** The approved test values, in the parameter's own unit (e.g. m²/yr for cv). */
  readonly values: readonly number[];
  /** 'log' for parameters that spread over orders of magnitude, such as cv; default 'linear'. */
  readonly scale?: 'linear' | 'log';
  /** The side that makes the check worse (see SETTLEMENT_UNFAVOURABLE_SIDE). */
  readonly unfavourableSide: UnfavourableSide;
}

/** Summary statistics and cautious estimates; every number is null where the sample cannot give it. */
export interface CharacteristicValuesResult {
  readonly count: number;
  readonly scale: 'linear' | 'log';
  /** Arithmetic mean (linear) or geometric mean 10^mean(log10 x) (log), in the parameter's unit. */
  readonly mean: number;
  /** Sample standard deviation: in the parameter's unit (linear) or in log10 units (log). */
  readonly standardDeviation: number | null;
  /** s/mean (linear only; a log-scale COV has no meaning). */
  readonly coefficientOfVariation: number | null;
  /** t(0.95, n − 1), the one-sided 95 % Student-t quantile used. */
  readonly tQuantile: number | null;
  /** One-sided 95 % lower and upper confidence bounds on the mean, Xm ∓ t·s/√n (back-transformed on a log scale). */
  readonly meanLowerBound95: number | null;
  readonly meanUpperBound95: number | null;
  /** Schneider (1997): Xm·(1 ∓ COV/2) = Xm ∓ s/2 (on a log scale 10^(m ∓ s/2)). */
  readonly schneiderLower: number | null;
  readonly schneiderUpper: number | null;
  readonly unfavourableSide: UnfavourableSide;
  /** The Student-t bound on the unfavourable side. */
  readonly characteristicStudentT: number | null;
  /** Schneider's estimate on the unfavourable side. */
  readonly characteristicSchneider: number | null;
  readonly warnings: readonly string[];
}

/**
 * Characteristic values of one parameter from several tests on a stratum:
 * count, mean, standard deviation, coefficient of variation, the one-sided
 * Student-t 95 % confidence bounds on the mean Xm ∓ t(0.95, n − 1)·s/√n, and
 * Schneider's cautious estimate Xk = Xm·(1 − COV/2) (and its upper mirror).
 * On the log scale the statistics are of log10 x and are transformed back.
 *
 * Assumptions: the tests sample one stratum; the governing value is a mean over
 * a large volume (settlement), which is why the bound is on the mean and not a
 * 5 % fractile of single values.
 * Source: EN 1997-1:2004 §2.4.5.2; Schneider (1997), Definition and
 * determination of characteristic soil properties, Proc. 14th ICSMFE Hamburg;
 * Student's t table (e.g. any statistics handbook).
 *
 * @param input values in the parameter's unit, the scale, the unfavourable side
 * @returns statistics, bounds and the characteristic value on the unfavourable side, with warnings
 * @throws RangeError when there are no values, a value is not finite, or a log-scale value is not positive
 * @example characteristicValues({ values: [0.30, 0.34, 0.28, 0.36, 0.32], unfavourableSide: 'upper' }) // mean 0.32, sd 0.03162, upper bound 0.3501, Schneider upper 0.3358
 */
export function characteristicValues(input: CharacteristicValuesInput): CharacteristicValuesResult {
  const { values, unfavourableSide } = input;
  const scale = input.scale ?? 'linear';
  if (values.length === 0) throw new RangeError('characteristicValues requires at least one value');
  if (!values.every(Number.isFinite)) throw new RangeError('characteristicValues requires finite values');
  if (scale === 'log' && !values.every((value) => value > 0)) throw new RangeError('characteristicValues requires positive values on a log scale');
  const sample = scale === 'log' ? values.map(Math.log10) : [...values];
  const back = (value: number) => (scale === 'log' ? 10 ** value : value);
  const count = sample.length;
  const sampleMean = mean(sample);
  const warnings: string[] = [];
  if (count < 2) {
    warnings.push('Only one test: no spread can be estimated, so no characteristic value is given. Add tests on this stratum or choose a cautious value by judgement.');
    return nullResult(count, scale, back(sampleMean), unfavourableSide, warnings);
  }
  if (count < FEW_TESTS) {
    warnings.push(`Only ${count} tests: the confidence bound is wide and the spread itself uncertain. Treat the characteristic value with caution or add tests.`);
  }
  const standardDeviation = sampleStandardDeviation(sample);
  const tQuantile = studentTQuantile(0.95, count - 1);
  const halfWidth = (tQuantile * standardDeviation) / Math.sqrt(count);
  const coefficientOfVariation = scale === 'linear' && sampleMean !== 0 ? standardDeviation / Math.abs(sampleMean) : null;
  const meanLowerBound95 = back(sampleMean - halfWidth);
  const meanUpperBound95 = back(sampleMean + halfWidth);
  const schneiderLower = back(sampleMean - standardDeviation / 2);
  const schneiderUpper = back(sampleMean + standardDeviation / 2);
  if (coefficientOfVariation !== null && coefficientOfVariation > 0.5) {
    warnings.push(`The coefficient of variation is ${(coefficientOfVariation * 100).toFixed(0)} %: the tests may mix different soils. Check the grouping into strata.`);
  }
  const upper = unfavourableSide === 'upper';
  return {
    count,
    scale,
    mean: back(sampleMean),
    standardDeviation,
    coefficientOfVariation,
    tQuantile,
    meanLowerBound95,
    meanUpperBound95,
    schneiderLower,
    schneiderUpper,
    unfavourableSide,
    characteristicStudentT: upper ? meanUpperBound95 : meanLowerBound95,
    characteristicSchneider: upper ? schneiderUpper : schneiderLower,
    warnings,
  };
}

function nullResult(count: number, scale: 'linear' | 'log', meanValue: number, unfavourableSide: UnfavourableSide, warnings: string[]): CharacteristicValuesResult {
  return {
    count,
    scale,
    mean: meanValue,
    standardDeviation: null,
    coefficientOfVariation: null,
    tQuantile: null,
    meanLowerBound95: null,
    meanUpperBound95: null,
    schneiderLower: null,
    schneiderUpper: null,
    unfavourableSide,
    characteristicStudentT: null,
    characteristicSchneider: null,
    warnings,
  };
}
