import { describe, expect, it } from 'vitest';
import { runSettlementCheck } from '../settlement/run-settlement-check.js';
import type { Footing } from './footing.types.js';
import { overlappingFootingPairs } from './overlapping-footing-pairs.js';

const square = (id: string, xM: number, yM: number): Footing => ({ id, shape: 'square', xM, yM, widthM: 2, depthM: 1, loadKn: 400 });
const circle = (id: string, xM: number, yM: number): Footing => ({ id, shape: 'circle', xM, yM, widthM: 2, depthM: 1, loadKn: 300 });
const strip = (id: string, xM: number): Footing => ({ id, shape: 'strip', xM, yM: 0, widthM: 1, depthM: 1, loadKnPerM: 100 });

describe('overlappingFootingPairs(footings)', () => {
  it.each([
    ['two squares sharing area', [square('A', 0, 0), square('B', 1.9, 0)], [['A', 'B']]],
    ['two squares only touching', [square('A', 0, 0), square('B', 2, 0)], []],
    ['a circle reaching into a square’s side', [square('A', 0, 0), circle('B', 1.9, 0)], [['A', 'B']]],
    // The circle's centre is (1.8, 1.8) from the square's; its nearest corner is at 0.8·√2 = 1.13 m > 1 m.
    ['a circle beside a square’s corner, clear of it', [square('A', 0, 0), circle('B', 1.8, 1.8)], []],
    ['two circles closer than the sum of their radii (1.98 m < 2 m)', [circle('A', 0, 0), circle('B', 1.4, 1.4)], [['A', 'B']]],
    ['two circles whose bounding squares overlap but the discs do not (2.12 m)', [circle('A', 0, 0), circle('B', 1.5, 1.5)], []],
    ['a strip crossing a square far along its length', [square('A', 0, 40), strip('W', 1.4)], [['A', 'W']]],
    ['a strip clear of a circle', [circle('A', 0, 0), strip('W', 1.6)], []],
  ] as const)('%s', (_, footings, expected) => {
    expect(overlappingFootingPairs(footings)).toEqual(expected);
  });

  it('the settlement check warns, naming both footings', () => {
    const profile = { groundLevelM: 0, waterTableDepthM: 1, layers: [{ name: 'clay', thicknessM: 8, unitWeightKnPerM3: 18, saturatedUnitWeightKnPerM3: 18, e0: 1, cc: 0.3 }] };
    const result = runSettlementCheck({ profile, footings: [square('A', 0, 0), square('B', 1.5, 0)] });
    expect(result.warnings).toContain('Footings A and B overlap on plan. Both loads are added where they overlap, which is rarely meant: check their positions and sizes in the schedule.');
  });
});
