import { describe, expect, it } from 'vitest';
import { selectVirginLine } from './select-virgin-line.js';

const curve = (voidRatios: readonly number[]) => voidRatios.map((voidRatio, index) => ({ stressKpa: 25 * 2 ** index, voidRatio }));

describe('selectVirginLine(loadingPoints)', () => {
  it('walks down from the two highest points while each segment is at least 0.85 × as steep as the line so far (hand-made curve)', () => {
    // Segment slopes per doubling (Δe over 0.30103 decade): 0.01, 0.02, 0.09, 0.10, 0.10, 0.10 → per cycle 0.033, 0.066,
    // 0.299, 0.332, 0.332, 0.332. From the top the line has slope 0.332; 0.299 ≥ 0.85 × 0.332 = 0.282 joins; 0.066 does not.
    expect(selectVirginLine(curve([1.2, 1.19, 1.17, 1.08, 0.98, 0.88, 0.78]))).toEqual([2, 3, 4, 5, 6]);
  });

  it('takes every point of a straight line', () => {
    expect(selectVirginLine(curve([1.2, 1.1, 1.0, 0.9]))).toEqual([0, 1, 2, 3]);
  });

  it('needs two points: two give both, one gives none', () => {
    expect(selectVirginLine(curve([1.0, 0.9]))).toEqual([0, 1]);
    expect(selectVirginLine(curve([1.0]))).toEqual([]);
  });

  it('takes steeper segments below the top (it stops only where the curve flattens towards recompression)', () => {
    // The top segment (0.033 per cycle) is flatter than the one below it (0.332): the walk goes on through both.
    expect(selectVirginLine(curve([1.0, 0.9, 0.89]))).toEqual([0, 1, 2]);
  });

  it('stops at a point 0.04 decade below σ′p on a rounded knee that a 0.8 rule would have taken (the reason for 0.85)', () => {
    // Segments (per doubling) 0.08 then 0.10, 0.10: 0.08/0.10 = 0.8 < 0.85 — left out.
    expect(selectVirginLine(curve([1.2, 1.12, 1.02, 0.92]))).toEqual([1, 2, 3]);
  });
});
