import { describe, expect, it } from 'vitest';
import type { Footing } from './footing.types.js';
import { footingPressureKpa } from './footing-pressure.js';
import { stressIncrease2to1 } from './stress-increase-2to1.js';
import { stressIncreaseFromFootings } from './stress-increase-from-footings.js';
import { stressIncreaseCircle } from './stress-increase-circle.js';
import { stressIncreaseRectangle } from './stress-increase-rectangle.js';
import { stressIncreaseStrip } from './stress-increase-strip.js';

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

  it('takes each neighbour by its own shape: a circle off its axis, a strip across its width', () => {
    const circle: Footing = { id: 'C', shape: 'circle', xM: 3, yM: 4, widthM: 2, depthM: 1, pressureKpa: 120 };
    const strip: Footing = { id: 'W', shape: 'strip', xM: -2, yM: 50, widthM: 1.2, depthM: 0.5, loadKnPerM: 180 };
    const result = stressIncreaseFromFootings({ footings: [a, circle, strip], xM: 0, yM: 0, depthBelowGroundM: 3, method: 'boussinesq', ownFootingId: 'A' });
    // The circle's centre is 5 m away on plan, its base 2 m above the point; the strip's centre line 2 m away
    // (its station yM plays no part), 2.5 m above the point, at q = 180/1.2 = 150 kPa.
    const fromCircle = stressIncreaseCircle({ pressureKpa: 120, radiusM: 1, depthM: 2, radialOffsetM: 5 });
    const fromStrip = stressIncreaseStrip({ pressureKpa: 150, widthM: 1.2, xM: 2, depthM: 2.5 });
    expect(result.neighboursKpa).toBeCloseTo(fromCircle + fromStrip, 12);
    const spread = stressIncreaseFromFootings({ footings: [a, circle, strip], xM: 0, yM: 0, depthBelowGroundM: 3, method: '2to1', ownFootingId: 'A' });
    // 2V:1H: the circle's spread (diameter 4 m) does not reach 5 m; the strip's (1.2 + 2.5 = 3.7 m wide) reaches 1.85 m, not 2 m.
    expect(spread.neighboursKpa).toBe(0);
    const onStrip = stressIncreaseFromFootings({ footings: [strip], xM: -1, yM: 0, depthBelowGroundM: 3, method: '2to1' });
    expect(onStrip.totalKpa).toBeCloseTo((150 * 1.2) / 3.7, 12);
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

  it('spreads a load over each shape’s plan: Q/B² for a square, 4Q/(πD²) for a circle, Q′/B for a strip', () => {
    // Hand calculations: 900/3² = 100 kPa; 4 × 314.159265/(π × 2²) = 100 kPa; 150/1.5 = 100 kPa.
    expect(footingPressureKpa({ id: 'S', shape: 'square', xM: 0, yM: 0, widthM: 3, depthM: 1, loadKn: 900 })).toBe(100);
    expect(footingPressureKpa({ id: 'S', shape: 'square', xM: 0, yM: 0, widthM: 3, lengthM: 3, depthM: 1, loadKn: 900 })).toBe(100);
    expect(footingPressureKpa({ id: 'C', shape: 'circle', xM: 0, yM: 0, widthM: 2, depthM: 1, loadKn: Math.PI * 100 })).toBeCloseTo(100, 12);
    expect(footingPressureKpa({ id: 'W', shape: 'strip', xM: 0, yM: 0, widthM: 1.5, depthM: 1, loadKnPerM: 150 })).toBe(100);
    expect(footingPressureKpa({ id: 'W', shape: 'strip', xM: 0, yM: 0, widthM: 1.5, depthM: 1, pressureKpa: 80 })).toBe(80);
  });

  it.each([
    [{ ...a, widthM: 0 }, 'footingPressureKpa requires a finite widthM > 0 (footing A)'],
    [{ ...a, lengthM: -1 }, 'footingPressureKpa requires finite widthM > 0 and lengthM > 0 (footing A)'],
    [{ id: 'C', xM: 0, yM: 0, widthM: 1, lengthM: 1, depthM: 0 }, 'footingPressureKpa requires a finite loadKn, loadKnPerM or pressureKpa (footing C)'],
    [{ id: 'S', shape: 'square', xM: 0, yM: 0, widthM: 2, lengthM: 3, depthM: 0, loadKn: 1 }, 'footingPressureKpa requires a square\'s lengthM, if given, to equal its widthM (footing S)'],
    [{ id: 'R', shape: 'circle', xM: 0, yM: 0, widthM: 2, lengthM: 2, depthM: 0, loadKn: 1 }, 'footingPressureKpa requires no lengthM for a circle (widthM is the diameter) (footing R)'],
    [{ id: 'W', shape: 'strip', xM: 0, yM: 0, widthM: 2, depthM: 0, loadKn: 1 }, 'footingPressureKpa requires loadKnPerM or pressureKpa for a strip, not loadKn (footing W)'],
    [{ id: 'R', xM: 0, yM: 0, widthM: 2, lengthM: 2, depthM: 0, loadKnPerM: 1 }, 'footingPressureKpa requires loadKn or pressureKpa for a rectangle; loadKnPerM is for strips (footing R)'],
    [{ id: 'H', shape: 'hexagon', xM: 0, yM: 0, widthM: 2, depthM: 0, loadKn: 1 }, "footingPressureKpa requires shape 'rectangle', 'square', 'circle' or 'strip' (footing H)"],
  ])('throws RangeError for a bad size, shape or load (%#)', (footing, message) => {
    expect(() => footingPressureKpa(footing as unknown as Footing)).toThrow(new RangeError(message));
  });
});
