import { describe, expect, it } from 'vitest';
import { ANGULAR_DISTORTION_LIMITS } from './angular-distortion-limits.js';
import { TOTAL_SETTLEMENT_LIMITS } from './total-settlement-limits.js';

describe('TOTAL_SETTLEMENT_LIMITS and ANGULAR_DISTORTION_LIMITS', () => {
  it('hold the textbook figures: 65 mm (clay) and 40 mm (sand) after Skempton & MacDonald (1956), 50 mm after EN 1997-1 Annex H', () => {
    expect(TOTAL_SETTLEMENT_LIMITS.map((limit) => [limit.source, limit.totalSettlementM, limit.appliesTo])).toEqual([
      ['Skempton & MacDonald (1956)', 0.065, 'isolated foundations on clay'],
      ['Skempton & MacDonald (1956)', 0.04, 'isolated foundations on sand'],
      ['EN 1997-1:2004 Annex H', 0.05, 'isolated shallow foundations of normal structures'],
    ]);
  });

  it('hold Bjerrum’s (1963) six limits from 1/750 to 1/150 and Skempton & MacDonald’s three, strictest first in each', () => {
    const bySource = (source: string) => ANGULAR_DISTORTION_LIMITS.filter((limit) => limit.source === source).map((limit) => limit.ratioLabel);
    expect(bySource('Bjerrum (1963)')).toEqual(['1/750', '1/600', '1/500', '1/300', '1/250', '1/150']);
    expect(bySource('Skempton & MacDonald (1956)')).toEqual(['1/500', '1/300', '1/150']);
    for (const limit of ANGULAR_DISTORTION_LIMITS) expect(limit.angularDistortion).toBeCloseTo(1 / Number(limit.ratioLabel.slice(2)), 15);
  });
});
