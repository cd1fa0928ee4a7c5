import { describe, expect, it } from 'vitest';
import type { Footing } from './footing.types.js';
import { footingPressureKpa } from './footing-pressure.js';
import { stressIncrease2to1 } from './stress-increase-2to1.js';
import { stressIncreaseFromFootings } from './stress-increase-from-footings.js';
import { stressIncreaseRectangle } from './stress-increase-rectangle.js';

const a: Footing = { id: 'A', xM: 0, yM: 0, widthM: 2, lengthM: 2, depthM: 1, loadKn: 400 };
const b: Footing = { id: 'B', xM: 4, yM: 0, widthM: 3, lengthM: 3, depthM: 1.5, pressureKpa: 150 };

describe('stressIncreaseFromFootings({ footings, xM, yM, depthBelowGroundM, method, ownFootingId, includeNeighbours })', () => {
  it('adds every footing’s Boussinesq contribution with z below each footing’s own base', () => {
    const result = stressIncreaseFromFootings({ footings: [a, b], xM: 0, yM: 0, depthBelowGroundM: 3, method: 'boussinesq', ownFootingId: 'A' });
    const own = stressIncreaseRectangle({ pressureKpa: 100, widthM: 2, lengthM: 2, xM: 0, yM: 0, depthM: 2 });
    const neighbour = stressIncreaseRectangle({ pressureKpa: 150, widthM: 3, lengthM: 3, xM: -4, yM: 0, depthM: 1.5 });
    expect(result.ownKpa).toBeCloseTo(own, 12);
    expect(result.neighboursKpa).toBeCloseTo(neighbour, 12);
    expect(result.totalKpa).toBeCloseTo(own + neighbour, 12);
  });

  it('ignores neighbours when asked', () => {
    const result = stressIncreaseFromFootings({ footings: [a, b], xM: 0, yM: 0, depthBelowGroundM: 3, method: 'boussinesq', ownFootingId: 'A', includeNeighbours: false });
    expect(result.neighboursKpa).toBe(0);
    expect(result.totalKpa).toBe(result.ownKpa);
  });

  it('with 2:1 counts a neighbour only inside its spread area', () => {
    // B's spread at z = 1.5 m is 4.5 m square around x = 4: it reaches x = 1.75 m, not x = 0.
    const atA = stressIncreaseFromFootings({ footings: [a, b], xM: 0, yM: 0, depthBelowGroundM: 3, method: '2to1', ownFootingId: 'A' });
    expect(atA.neighboursKpa).toBe(0);
    expect(atA.ownKpa).toBeCloseTo(stressIncrease2to1({ loadKn: 400, widthM: 2, lengthM: 2, depthM: 2 }), 12);
    const between = stressIncreaseFromFootings({ footings: [a, b], xM: 2, yM: 0, depthBelowGroundM: 3, method: '2to1', ownFootingId: 'A' });
    expect(between.neighboursKpa).toBeCloseTo(stressIncrease2to1({ loadKn: 150 * 9, widthM: 3, lengthM: 3, depthM: 1.5 }), 12);
  });

  it('takes nothing from a footing whose base is at or below the point', () => {
    const result = stressIncreaseFromFootings({ footings: [a, b], xM: 4, yM: 0, depthBelowGroundM: 1.2, method: 'boussinesq' });
    expect(result.totalKpa).toBeCloseTo(stressIncreaseRectangle({ pressureKpa: 100, widthM: 2, lengthM: 2, xM: 4, yM: 0, depthM: 0.2 }), 12);
  });

  it('throws RangeError without ownFootingId when neighbours are ignored, and for a non-positive depth', () => {
    expect(() => stressIncreaseFromFootings({ footings: [a], xM: 0, yM: 0, depthBelowGroundM: 2, method: 'boussinesq', includeNeighbours: false })).toThrow(
      new RangeError('stressIncreaseFromFootings requires ownFootingId when includeNeighbours is false'),
    );
    expect(() => stressIncreaseFromFootings({ footings: [a], xM: 0, yM: 0, depthBelowGroundM: 0, method: 'boussinesq' })).toThrow(
      new RangeError('stressIncreaseFromFootings requires finite depthBelowGroundM > 0'),
    );
    expect(() => stressIncreaseFromFootings({ footings: [a], xM: Number.NaN, yM: 0, depthBelowGroundM: 2, method: 'boussinesq' })).toThrow(
      new RangeError('stressIncreaseFromFootings requires finite xM and yM'),
    );
  });
});

describe('footingPressureKpa(footing)', () => {
  it('is Q/(B·L) for a load, or the given pressure', () => {
    expect(footingPressureKpa(a)).toBe(100);
    expect(footingPressureKpa(b)).toBe(150);
  });

  it('throws RangeError for a non-positive side or a missing load', () => {
    expect(() => footingPressureKpa({ ...a, widthM: 0 })).toThrow(new RangeError('footingPressureKpa requires finite widthM > 0 and lengthM > 0 (footing A)'));
    expect(() => footingPressureKpa({ id: 'C', xM: 0, yM: 0, widthM: 1, lengthM: 1, depthM: 0 } as unknown as Footing)).toThrow(
      new RangeError('footingPressureKpa requires a finite loadKn or pressureKpa (footing C)'),
    );
  });
});
