import { casagrandeLogTime } from '../time-curves/casagrande-log-time.js';
import { coefficientOfConsolidationM2PerYr } from '../time-curves/coefficient-of-consolidation.js';
import { taylorSquareRootTime } from '../time-curves/taylor-square-root-time.js';
import { TIME_FACTOR_AT_FIFTY_PERCENT } from '../time-curves/time-factor-at-fifty-percent.js';
import { TIME_FACTOR_AT_NINETY_PERCENT } from '../time-curves/time-factor-at-ninety-percent.js';
import type { TimeCurveWarning, TimeDeformationReading } from '../time-curves/time-curve-types.js';
import type { Drainage, IncrementPicks } from './consolidation-test-input.js';
import type { CasagrandeIncrementResult, TaylorIncrementResult } from './consolidation-test-result.js';

export interface IncrementTimeCurves {
  readonly taylor: TaylorIncrementResult | null;
  readonly casagrande: CasagrandeIncrementResult | null;
  readonly warnings: readonly TimeCurveWarning[];
}

/**
 * Both time-curve methods for one loading or reloading increment, with the
 * drainage path and cv each gives. Hdr follows ASTM D2435/D2435M §12.3: the
 * specimen height at 50 % consolidation of the increment (H0 minus the
 * apparatus-corrected d50 of that method), halved for double drainage.
 *
 * @param readings the increment's readings in time order.
 * @param picks the reviewer's overrides for this increment, if any.
 * @param initialHeightMm H0, mm; @param apparatusDeflectionMm deflection to subtract, mm; @param drainage double or single.
 * @returns Taylor's and Casagrande's results (null where not drawn) and warnings.
 * @throws RangeError as taylorSquareRootTime and casagrandeLogTime do.
 * @example analyzeIncrementTimeCurves(readings, undefined, 20, 0, 'double').taylor?.cvM2PerYr
 */
export function analyzeIncrementTimeCurves(
  readings: readonly TimeDeformationReading[],
  picks: IncrementPicks | undefined,
  initialHeightMm: number,
  apparatusDeflectionMm: number,
  drainage: Drainage,
): IncrementTimeCurves {
  const taylor = taylorSquareRootTime(readings, picks?.taylor ?? {});
  const casagrande = casagrandeLogTime(readings, picks?.casagrande ?? {});
  const warnings: TimeCurveWarning[] = [...taylor.warnings, ...casagrande.warnings];
  const drainageOf = (d50Mm: number): { heightAtFiftyPercentMm: number; drainagePathMm: number } | null => {
    const heightAtFiftyPercentMm = initialHeightMm - (d50Mm - apparatusDeflectionMm);
    if (!(heightAtFiftyPercentMm > 0)) return null;
    return { heightAtFiftyPercentMm, drainagePathMm: drainage === 'double' ? heightAtFiftyPercentMm / 2 : heightAtFiftyPercentMm };
  };
  let taylorResult: TaylorIncrementResult | null = null;
  if (taylor.construction !== null) {
    const path = drainageOf(taylor.construction.d50Mm);
    if (path !== null && taylor.construction.t90Min > 0) {
      taylorResult = { ...taylor.construction, ...path, cvM2PerYr: coefficientOfConsolidationM2PerYr(TIME_FACTOR_AT_NINETY_PERCENT, path.drainagePathMm, taylor.construction.t90Min) };
    }
  }
  let casagrandeResult: CasagrandeIncrementResult | null = null;
  if (casagrande.construction !== null) {
    const path = drainageOf(casagrande.construction.d50Mm);
    if (path !== null && casagrande.construction.t50Min > 0) {
      casagrandeResult = { ...casagrande.construction, ...path, cvM2PerYr: coefficientOfConsolidationM2PerYr(TIME_FACTOR_AT_FIFTY_PERCENT, path.drainagePathMm, casagrande.construction.t50Min) };
    }
  }
  return { taylor: taylorResult, casagrande: casagrandeResult, warnings };
}
