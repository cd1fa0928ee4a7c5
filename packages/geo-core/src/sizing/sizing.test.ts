import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import type { SoilProfile } from '../profile/soil-profile.types.js';
import type { Footing } from '../stress/footing.types.js';
import type { FootingToSize } from './footing-settlement-for-width.js';
import { runSettlementCheck } from '../settlement/run-settlement-check.js';
import { findWidthByBisection } from './find-width-by-bisection.js';
import { sizeFootingForSettlement } from './size-footing-for-settlement.js';
import { sizeFootingToMatchSettlement } from './size-footing-to-match-settlement.js';

const profile: SoilProfile = {
  groundLevelM: 3,
  waterTableDepthM: 1.5,
  layers: [
    { name: 'sand', thicknessM: 3, unitWeightKnPerM3: 18, saturatedUnitWeightKnPerM3: 20, elasticModulusKpa: 30_000, poissonRatio: 0.3 },
    { name: 'clay', thicknessM: 6, unitWeightKnPerM3: 18.5, saturatedUnitWeightKnPerM3: 18.5, e0: 1.1, cc: 0.3, cs: 0.05, ocr: 1.4, cvM2PerYr: 1.5, cAlpha: 0.01, drainageTop: 'free', drainageBottom: 'free', elasticModulusKpa: 8_000, poissonRatio: 0.35 },
  ],
};
const settlementOf = (widthM: number, loadKn: number, ratio = 1) =>
  runSettlementCheck({ profile, footings: [{ id: 'S', xM: 0, yM: 0, widthM, lengthM: widthM * ratio, depthM: 1, loadKn }], options: { evaluationPoints: 'centre' } }).footings[0]?.totalM ?? Number.NaN;

describe('findWidthByBisection(f, target, low, high, toleranceX)', () => {
  it('finds x with f(x) ≤ target within the tolerance of the true root', () => {
    const outcome = findWidthByBisection((b) => 1 / b, 0.25, 1, 10, 1e-9);
    expect(outcome.status).toBe('found');
    if (outcome.status === 'found') {
      expect(outcome.x).toBeCloseTo(4, 8);
      expect(outcome.valueAtX).toBeLessThanOrEqual(0.25);
    }
  });

  it('reports which side of the bracket the target lies on', () => {
    expect(findWidthByBisection((b) => 1 / b, 2, 1, 10, 1e-6).status).toBe('below-bracket');
    expect(findWidthByBisection((b) => 1 / b, 0.01, 1, 10, 1e-6).status).toBe('above-bracket');
  });

  it('throws RangeError for a bad bracket, tolerance, or a non-finite f', () => {
    expect(() => findWidthByBisection((b) => b, 1, 2, 1, 1e-6)).toThrow(new RangeError('findWidthByBisection requires finite low < high'));
    expect(() => findWidthByBisection((b) => b, 1, 1, 2, 0)).toThrow(new RangeError('findWidthByBisection requires toleranceX > 0'));
    expect(() => findWidthByBisection(() => Number.NaN, 1, 1, 2, 1e-3)).toThrow(RangeError);
  });
});

describe('sizeFootingForSettlement({ profile, footing, targetSettlementM, minWidthM, maxWidthM, neighbours, options })', () => {
  it('property: the width found, put back into the settlement check, meets the target, and 5 mm narrower does not', () => {
    fc.assert(
      fc.property(fc.double({ min: 400, max: 2500, noNaN: true }), fc.constantFrom(1, 1.5, 2), (loadKn, ratio) => {
        const targetSettlementM = 0.04;
        const result = sizeFootingForSettlement({ profile, footing: { depthM: 1, loadKn, lengthToWidthRatio: ratio }, targetSettlementM, minWidthM: 0.5, maxWidthM: 12 });
        if (result.status !== 'found') return;
        const widthM = result.widthM ?? Number.NaN;
        expect(settlementOf(widthM, loadKn, ratio)).toBeLessThanOrEqual(targetSettlementM);
        expect(settlementOf(widthM - 0.005, loadKn, ratio)).toBeGreaterThan(targetSettlementM);
        expect(result.lengthM).toBeCloseTo(widthM * ratio, 12);
      }),
      { numRuns: 15 },
    );
  });

  it('says plainly when no width within the bounds works', () => {
    const result = sizeFootingForSettlement({ profile, footing: { depthM: 1, loadKn: 5000 }, targetSettlementM: 0.005, minWidthM: 1, maxWidthM: 3 });
    expect(result.status).toBe('no-width-within-bounds');
    expect(result.widthM).toBeNull();
    expect(result.warnings[0]).toMatch(/^No width between 1 m and 3 m keeps the settlement within 5.0 mm/);
  });

  it('answers the minimum width when it already suffices', () => {
    const result = sizeFootingForSettlement({ profile, footing: { depthM: 1, loadKn: 50 }, targetSettlementM: 0.5, minWidthM: 1, maxWidthM: 3 });
    expect(result.status).toBe('minimum-width-suffices');
    expect(result.widthM).toBe(1);
  });

  it('a neighbour makes the footing wider for the same target', () => {
    const alone = sizeFootingForSettlement({ profile, footing: { depthM: 1, loadKn: 1200 }, targetSettlementM: 0.05, minWidthM: 0.5, maxWidthM: 12 });
    const crowded = sizeFootingForSettlement({
      profile,
      footing: { depthM: 1, loadKn: 1200 },
      targetSettlementM: 0.05,
      minWidthM: 0.5,
      maxWidthM: 12,
      neighbours: [{ id: 'N', xM: 4, yM: 0, widthM: 2.5, lengthM: 2.5, depthM: 1, loadKn: 1200 }],
    });
    expect(crowded.widthM ?? 0).toBeGreaterThan(alone.widthM ?? Infinity);
  });

  it('throws RangeError for a non-positive load, bad bounds or target, and L/B below 1', () => {
    const base = { profile, footing: { depthM: 1, loadKn: 1000 }, targetSettlementM: 0.03, minWidthM: 1, maxWidthM: 5 };
    expect(() => sizeFootingForSettlement({ ...base, footing: { depthM: 1, loadKn: 0 } })).toThrow(new RangeError('sizeFootingForSettlement requires a finite loadKn > 0'));
    expect(() => sizeFootingForSettlement({ ...base, minWidthM: 5 })).toThrow(new RangeError('sizeFootingForSettlement requires 0 < minWidthM < maxWidthM'));
    expect(() => sizeFootingForSettlement({ ...base, targetSettlementM: 0 })).toThrow(new RangeError('sizeFootingForSettlement requires a finite targetSettlementM > 0'));
    expect(() => sizeFootingForSettlement({ ...base, footing: { depthM: 1, loadKn: 1000, lengthToWidthRatio: 0.5 } })).toThrow(new RangeError('sizeFootingForSettlement requires lengthToWidthRatio >= 1'));
  });
});

describe('sizeFootingForSettlement — circles, squares and strips', () => {
  const settle = (footing: Footing) => runSettlementCheck({ profile, footings: [footing], options: { evaluationPoints: 'centre' } }).footings[0]?.totalM ?? Number.NaN;

  it('property: a circle’s diameter and a strip’s width found meet the target, and 5 mm less does not', () => {
    fc.assert(
      fc.property(fc.double({ min: 300, max: 2000, noNaN: true }), fc.double({ min: 80, max: 400, noNaN: true }), (loadKn, loadKnPerM) => {
        const targetSettlementM = 0.04;
        const circle = sizeFootingForSettlement({ profile, footing: { shape: 'circle', depthM: 1, loadKn }, targetSettlementM, minWidthM: 0.5, maxWidthM: 12 });
        if (circle.status === 'found') {
          const widthM = circle.widthM ?? Number.NaN;
          expect(settle({ id: 'S', shape: 'circle', xM: 0, yM: 0, widthM, depthM: 1, loadKn })).toBeLessThanOrEqual(targetSettlementM);
          expect(settle({ id: 'S', shape: 'circle', xM: 0, yM: 0, widthM: widthM - 0.005, depthM: 1, loadKn })).toBeGreaterThan(targetSettlementM);
          expect([circle.shape, circle.lengthM]).toEqual(['circle', null]);
        }
        const strip = sizeFootingForSettlement({ profile, footing: { shape: 'strip', depthM: 1, loadKnPerM }, targetSettlementM, minWidthM: 0.3, maxWidthM: 12 });
        if (strip.status === 'found') {
          const widthM = strip.widthM ?? Number.NaN;
          expect(settle({ id: 'S', shape: 'strip', xM: 0, yM: 0, widthM, depthM: 1, loadKnPerM })).toBeLessThanOrEqual(targetSettlementM);
          expect(settle({ id: 'S', shape: 'strip', xM: 0, yM: 0, widthM: widthM - 0.005, depthM: 1, loadKnPerM })).toBeGreaterThan(targetSettlementM);
          expect([strip.shape, strip.lengthM]).toEqual(['strip', null]);
        }
      }),
      { numRuns: 8 },
    );
  });

  it('a square sizes as the rectangle with L/B = 1 and reports L = B', () => {
    const base = { profile, targetSettlementM: 0.04, minWidthM: 0.5, maxWidthM: 12 };
    const square = sizeFootingForSettlement({ ...base, footing: { shape: 'square', depthM: 1, loadKn: 1500 } });
    const rectangle = sizeFootingForSettlement({ ...base, footing: { depthM: 1, loadKn: 1500 } });
    expect([square.shape, square.widthM, square.lengthM]).toEqual(['square', rectangle.widthM, rectangle.widthM]);
  });

  it('matches a circle to a square reference', () => {
    const reference: Footing = { id: 'C1', shape: 'square', xM: 0, yM: 0, widthM: 2, depthM: 1, loadKn: 800 };
    const result = sizeFootingToMatchSettlement({ profile, reference, footing: { shape: 'circle', depthM: 1, loadKn: 1400 }, minWidthM: 1, maxWidthM: 10 });
    expect(result.targetSettlementM).toBeCloseTo(settle(reference), 12);
    expect(settle({ id: 'D', shape: 'circle', xM: 0, yM: 0, widthM: result.widthM ?? 0, depthM: 1, loadKn: 1400 })).toBeLessThanOrEqual(result.targetSettlementM);
  });

  it('throws RangeError for a strip without loadKnPerM or a circle given L/B', () => {
    const base = { profile, targetSettlementM: 0.03, minWidthM: 1, maxWidthM: 5 };
    expect(() => sizeFootingForSettlement({ ...base, footing: { shape: 'strip', depthM: 1, loadKnPerM: 0 } })).toThrow(
      new RangeError('sizeFootingForSettlement requires a finite loadKnPerM > 0 for a strip'),
    );
    expect(() => sizeFootingForSettlement({ ...base, footing: { shape: 'circle', depthM: 1, loadKn: 500, lengthToWidthRatio: 2 } as unknown as FootingToSize })).toThrow(
      new RangeError('sizeFootingForSettlement requires no lengthToWidthRatio for a circle'),
    );
  });
});

describe('sizeFootingToMatchSettlement({ profile, reference, footing, minWidthM, maxWidthM, options })', () => {
  it('gives the heavier footing the reference footing’s settlement, within the width tolerance', () => {
    const reference = { id: 'C1', xM: 0, yM: 0, widthM: 2, lengthM: 2, depthM: 1, loadKn: 800 };
    const result = sizeFootingToMatchSettlement({ profile, reference, footing: { depthM: 1, loadKn: 1400 }, minWidthM: 1, maxWidthM: 10 });
    const target = settlementOf(2, 800);
    expect(result.status).toBe('found');
    expect(result.targetSettlementM).toBeCloseTo(target, 12);
    expect(result.widthM ?? 0).toBeGreaterThan(2);
    expect(settlementOf(result.widthM ?? 0, 1400)).toBeLessThanOrEqual(target);
    expect(settlementOf((result.widthM ?? 0) - 0.005, 1400)).toBeGreaterThan(target);
  });

  it('takes a reference laid either way round: 2 m × 1 m sets the same target as 1 m × 2 m', () => {
    const size = (widthM: number, lengthM: number) =>
      sizeFootingToMatchSettlement({ profile, reference: { id: 'C1', xM: 0, yM: 0, widthM, lengthM, depthM: 1, loadKn: 800 }, footing: { depthM: 1, loadKn: 1400 }, minWidthM: 1, maxWidthM: 10 });
    expect(size(2, 1).targetSettlementM).toBeCloseTo(size(1, 2).targetSettlementM, 12);
  });

  it('throws RangeError for an unloaded reference or one founded below the profile', () => {
    const reference = { id: 'C1', xM: 0, yM: 0, widthM: 2, lengthM: 2, depthM: 1, loadKn: 800 };
    const base = { profile, footing: { depthM: 1, loadKn: 1400 }, minWidthM: 1, maxWidthM: 10 };
    expect(() => sizeFootingToMatchSettlement({ ...base, reference: { ...reference, loadKn: 0 } })).toThrow(
      new RangeError('sizeFootingToMatchSettlement requires the reference footing to carry a net load > 0'),
    );
    expect(() => sizeFootingToMatchSettlement({ ...base, reference: { ...reference, depthM: 9 } })).toThrow(
      new RangeError("sizeFootingToMatchSettlement requires the reference's depthM >= 0 and above the bottom of the profile"),
    );
  });
});
