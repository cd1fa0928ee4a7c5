import type { ConsolidatingLayer } from './consolidating-layer.types.js';
import { settlementAtTime } from './settlement-at-time.js';

/** One point of the settlement–time curve. */
export interface SettlementTimePoint {
  readonly timeYears: number;
  /** Primary consolidation settlement reached, m. */
  readonly primarySettlementM: number;
  /** Immediate + primary reached, m (secondary is reported separately, at the design life). */
  readonly settlementM: number;
}

/**
 * The settlement–time curve of a footing: immediate settlement at once, plus
 * the primary settlement reached at each time (settlementAtTime). Without
 * times given, 41 points spaced evenly on log t from 0.01 to 100 years — the
 * scale a consolidation curve is read on.
 *
 * Source: Terzaghi (1943); Das, *Principles of Geotechnical Engineering*, ch. "Consolidation".
 *
 * @param layers clay layers (m, m²/yr, drainage)
 * @param immediateSettlementM settlement at the moment of loading, m (≥ 0)
 * @param timesYears times to report, years (each ≥ 0); omitted: the default log series
 * @returns points in the order of the times
 * @throws RangeError for a negative immediate settlement or a negative time
 * @example settlementTimeCurve(layers, 0.005, [0, 1, 10]) // three points starting at 0.005 m
 */
export function settlementTimeCurve(layers: readonly ConsolidatingLayer[], immediateSettlementM: number, timesYears?: readonly number[]): SettlementTimePoint[] {
  if (!(immediateSettlementM >= 0) || !Number.isFinite(immediateSettlementM)) throw new RangeError('settlementTimeCurve requires a finite immediateSettlementM >= 0');
  const times = timesYears ?? Array.from({ length: 41 }, (_, index) => 10 ** (-2 + index / 10));
  return times.map((timeYears) => {
    const primarySettlementM = settlementAtTime(layers, timeYears).settlementM;
    return { timeYears, primarySettlementM, settlementM: immediateSettlementM + primarySettlementM };
  });
}
