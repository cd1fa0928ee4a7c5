import { judgeAngularDistortion } from './judge-angular-distortion.js';
import type { FootingPairResult, FootingSettlementResult } from './settlement-check.types.js';

/**
 * Differential settlement and angular distortion for every pair of footings
 * (closer than maxDistanceM, if given): δ = |S1 − S2| between centres,
 * β = δ/L with L the centre-to-centre distance, judged against the published
 * limits (judgeAngularDistortion) and against the design limit.
 *
 * Angular distortion is meaningful between adjacent supports; distant pairs
 * give small β by construction, which is why the distance filter exists.
 * Source: Skempton & MacDonald (1956); Bjerrum (1963); EN 1997-1 Annex H
 * (definitions of differential settlement and relative rotation).
 *
 * @param footings footing results with centre totals (m) and positions (m)
 * @param designAngularDistortion the limit the design must keep, dimensionless
 * @param maxDistanceM only pairs closer than this, m; undefined: all pairs
 * @returns one row per pair
 * @throws RangeError when two footings share a centre or maxDistanceM is not positive
 * @example footingPairResults(check.footings, 1 / 500)[0].angularDistortion
 */
export function footingPairResults(footings: readonly FootingSettlementResult[], designAngularDistortion: number, maxDistanceM?: number): FootingPairResult[] {
  if (maxDistanceM !== undefined && !(maxDistanceM > 0)) throw new RangeError('footingPairResults requires maxDistanceM > 0');
  const pairs: FootingPairResult[] = [];
  for (let i = 0; i < footings.length; i += 1) {
    for (let j = i + 1; j < footings.length; j += 1) {
      const a = footings[i];
      const b = footings[j];
      if (a === undefined || b === undefined) continue;
      const distanceM = Math.hypot(a.xM - b.xM, a.yM - b.yM);
      if (distanceM === 0) throw new RangeError(`footingPairResults requires footings at distinct centres (${a.id} and ${b.id} coincide)`);
      if (maxDistanceM !== undefined && distanceM > maxDistanceM) continue;
      const differentialSettlementM = Math.abs(a.totalM - b.totalM);
      const angularDistortion = differentialSettlementM / distanceM;
      pairs.push({
        footingIds: [a.id, b.id],
        distanceM,
        differentialSettlementM,
        angularDistortion,
        withinDesignLimit: angularDistortion <= designAngularDistortion,
        verdicts: judgeAngularDistortion(angularDistortion),
      });
    }
  }
  return pairs;
}
