import type { CvStressPoint } from '../time-rate/cv-at-stress-range.js';
import type { ConsolidationIncrementResult } from './consolidation-test-result.js';

/** The parts of a reduced increment the cv points need (a stored ConsolidationTestResult's increments fit). */
export type CvIncrement = Pick<ConsolidationIncrementResult, 'index' | 'stressKpa' | 'kind' | 'cvTaylorM2PerYr' | 'cvCasagrandeM2PerYr'>;

/**
 * The cv points of a reduced oedometer test, for cvAtStressRange: one point
 * per first-loading increment with a cv by the chosen method, placed at the
 * middle of the increment on the log-stress axis, √(σ′before·σ′after) — where
 * it sits on the e–log σ′ plot it was measured across. The first increment,
 * loaded from the unrecorded seating stress, is placed at its applied stress.
 * Unloading and reloading increments are left out: a reload retraces stresses
 * the specimen has already carried and consolidates far faster than the first
 * loading across them, which the field does not repeat.
 *
 * Source: ASTM D2435/D2435M-11 (2020) §12.3 (cv per increment, plotted against
 * stress); the placement is our stated convention (an arithmetic mean of the
 * two stresses, also in use, would sit 6 % higher on doubling loads).
 *
 * @param increments the test's increments in test order (ConsolidationTestResult.increments)
 * @param method 'taylor' (√t, the cv behind k) or 'casagrande' (log t)
 * @returns points in increasing stress, kPa and m²/yr; empty when no loading increment has a cv
 * @throws RangeError for an unknown method
 * @example cvPointsFromTestResult(result.increments, 'taylor') // [{ stressKpa: 25, cvM2PerYr: … }, { stressKpa: 35.36, … }, …]
 */
export function cvPointsFromTestResult(increments: readonly CvIncrement[], method: 'taylor' | 'casagrande'): CvStressPoint[] {
  if (method !== 'taylor' && method !== 'casagrande') throw new RangeError("cvPointsFromTestResult requires method 'taylor' or 'casagrande'");
  const points: CvStressPoint[] = [];
  let previousStressKpa = 0;
  for (const increment of increments) {
    const cvM2PerYr = method === 'taylor' ? increment.cvTaylorM2PerYr : increment.cvCasagrandeM2PerYr;
    if (increment.kind === 'loading' && cvM2PerYr !== null && cvM2PerYr > 0) {
      points.push({ stressKpa: previousStressKpa > 0 ? Math.sqrt(previousStressKpa * increment.stressKpa) : increment.stressKpa, cvM2PerYr });
    }
    previousStressKpa = increment.stressKpa;
  }
  return points.sort((a, b) => a.stressKpa - b.stressKpa);
}
