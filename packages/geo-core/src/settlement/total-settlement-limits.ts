/** One published limit of total settlement and what it applies to. */
export interface TotalSettlementLimit {
  readonly source: 'Skempton & MacDonald (1956)' | 'EN 1997-1:2004 Annex H';
  /** The limit, m. */
  readonly totalSettlementM: number;
  readonly appliesTo: string;
  readonly description: string;
}

/**
 * Published limits of total settlement for isolated shallow foundations, for
 * a check's default limit with its source named. Skempton & MacDonald (1956),
 * "The allowable settlements of buildings", Proc. ICE 5(3):727–768 (maximum
 * settlements for isolated foundations that kept angular distortion within
 * 1/300 in the buildings they studied); EN 1997-1:2004 Annex H (informative:
 * total settlements up to 50 mm are often acceptable for normal structures
 * with isolated foundations). The figures are those quoted in the textbooks
 * (e.g. Das, *Principles of Foundation Engineering*, tolerable settlement of
 * buildings); the original papers were not at hand to check them against.
 */
export const TOTAL_SETTLEMENT_LIMITS: readonly TotalSettlementLimit[] = [
  { source: 'Skempton & MacDonald (1956)', totalSettlementM: 0.065, appliesTo: 'isolated foundations on clay', description: 'maximum settlement found compatible with an angular distortion of 1/300' },
  { source: 'Skempton & MacDonald (1956)', totalSettlementM: 0.04, appliesTo: 'isolated foundations on sand', description: 'maximum settlement found compatible with an angular distortion of 1/300' },
  { source: 'EN 1997-1:2004 Annex H', totalSettlementM: 0.05, appliesTo: 'isolated shallow foundations of normal structures', description: 'often acceptable, provided relative rotations stay within limits' },
];
