import { timeFactorForDegree } from '../time-curves/time-factor-for-degree.js';
import type { ConsolidatingLayer } from './consolidating-layer.types.js';
import { drainagePathLengthM } from './drainage-path-length.js';
import { settlementAtTime } from './settlement-at-time.js';

/** The time found, or null with the reason. */
export interface TimeForPrimaryShareResult {
  readonly timeYears: number | null;
  readonly warnings: readonly string[];
}

/**
 * The time at which the settling clay layers together reach a given share of
 * their final primary settlement: the root of Σ Sci·Ui(t)/Σ Sci = share.
 *
 * One layer: t = Tv(U)·Hdr²/cv directly. Several: the weighted share rises
 * monotonically with t and lies between the layers' own times for that share,
 * so bisection on log t inside that bracket converges (to 1e-10 relative).
 * Source: Terzaghi (1943); Das, *Principles of Geotechnical Engineering*,
 * ch. "Consolidation" (time for a degree of consolidation).
 *
 * @param layers clay layers (m, m²/yr, drainage)
 * @param share the fraction of final primary settlement, strictly between 0 and 1 (not percent)
 * @returns years, or null and a warning when no layer settles or the share is out of reach
 * @throws RangeError when share is not strictly between 0 and 1
 * @example timeForPrimaryShare([{ primarySettlementM: 0.1, thicknessM: 4, cvM2PerYr: 1, drainageTop: 'free', drainageBottom: 'impermeable' }], 0.9) // timeYears ≈ 13.57 (0.848 × 16 / 1)
 */
export function timeForPrimaryShare(layers: readonly ConsolidatingLayer[], share: number): TimeForPrimaryShareResult {
  if (!(share > 0 && share < 1)) throw new RangeError('timeForPrimaryShare requires share strictly between 0 and 1');
  const settling = layers.filter((layer) => layer.primarySettlementM > 0);
  const finalM = settling.reduce((sum, layer) => sum + layer.primarySettlementM, 0);
  if (finalM === 0) return { timeYears: null, warnings: ['No clay layer has any primary settlement, so there is no time to reach a share of it.'] };
  const draining = settling.filter((layer) => drainagePathLengthM(layer) !== null);
  const reachableShare = draining.reduce((sum, layer) => sum + layer.primarySettlementM, 0) / finalM;
  if (share >= reachableShare) {
    return {
      timeYears: null,
      warnings: [`Only ${(reachableShare * 100).toFixed(1)} % of the primary settlement belongs to layers that can drain; ${(share * 100).toFixed(1)} % is never reached. Check the drainage given for the layers shown as impermeable on both faces.`],
    };
  }
  const ownTimes = draining.map((layer) => {
    const pathM = drainagePathLengthM(layer) ?? layer.thicknessM;
    return (timeFactorForDegree(share) * pathM * pathM) / layer.cvM2PerYr;
  });
  let lowYears = Math.min(...ownTimes);
  let highYears = Math.max(...ownTimes);
  if (draining.length === settling.length && lowYears === highYears) return { timeYears: lowYears, warnings: [] };
  // The undrained layers lower the weighted share, so the root may lie beyond the slowest layer's own time.
  while (settlementAtTime(settling, highYears).settlementM / finalM < share) highYears *= 2;
  for (let step = 0; step < 200 && highYears - lowYears > 1e-10 * highYears; step += 1) {
    const midYears = Math.sqrt(lowYears * highYears);
    if (settlementAtTime(settling, midYears).settlementM / finalM < share) lowYears = midYears;
    else highYears = midYears;
  }
  return { timeYears: Math.sqrt(lowYears * highYears), warnings: [] };
}
