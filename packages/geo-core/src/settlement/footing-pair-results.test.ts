import { describe, expect, it } from 'vitest';
import { footingPairResults } from './footing-pair-results.js';
import type { FootingSettlementResult } from './settlement-check.types.js';

// Only the fields the pair judgement reads matter here; the rest are filled with zeros.
const result = (id: string, xM: number, totalM: number): FootingSettlementResult => ({
  id, shape: 'square', xM, yM: 0, widthM: 2, lengthM: 2, depthM: 1, pressureBasis: 'net', pressureKpa: 100, grossPressureKpa: null, overburdenRemovedKpa: null, loadKn: 400, loadKnPerM: null, immediateDepthFactor: 1,
  immediateM: 0, primaryM: totalM, secondaryM: 0, totalM, points: [], sublayers: [], primaryByLayer: [], timeCurve: [],
  timeTo50PercentYears: null, timeTo90PercentYears: null, withinTotalLimit: null,
});

describe('footingPairResults(footings, designAngularDistortion, maxDistanceM)', () => {
  it('δ = |S1 − S2| and δ/L between centres, judged against the design limit', () => {
    // Hand calculation: 40 mm and 25 mm at 6 m → δ = 15 mm, δ/L = 0.0025 = 1/400 > 1/500.
    const [pair] = footingPairResults([result('A', 0, 0.04), result('B', 6, 0.025)], 1 / 500);
    expect(pair?.differentialSettlementM).toBeCloseTo(0.015, 12);
    expect(pair?.angularDistortion).toBeCloseTo(1 / 400, 12);
    expect(pair?.withinDesignLimit).toBe(false);
    expect(pair?.verdicts[0]?.exceededLimit?.ratioLabel).toBe('1/500');
  });

  it('judges every pair, or only those closer than maxDistanceM', () => {
    const footings = [result('A', 0, 0.04), result('B', 6, 0.03), result('C', 30, 0.02)];
    expect(footingPairResults(footings, 1 / 500)).toHaveLength(3);
    expect(footingPairResults(footings, 1 / 500, 10).map((p) => p.footingIds)).toEqual([['A', 'B']]);
  });

  it('throws RangeError for footings sharing a centre or a non-positive distance filter', () => {
    expect(() => footingPairResults([result('A', 0, 0.04), result('B', 0, 0.03)], 1 / 500)).toThrow(
      new RangeError('footingPairResults requires footings at distinct centres (A and B coincide)'),
    );
    expect(() => footingPairResults([result('A', 0, 0.04)], 1 / 500, 0)).toThrow(new RangeError('footingPairResults requires maxDistanceM > 0'));
  });
});
