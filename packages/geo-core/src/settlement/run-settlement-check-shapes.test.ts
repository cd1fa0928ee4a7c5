import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import type { SoilProfile } from '../profile/soil-profile.types.js';
import type { Footing } from '../stress/footing.types.js';
import { stressIncreaseCircle } from '../stress/stress-increase-circle.js';
import { stressIncreaseStrip } from '../stress/stress-increase-strip.js';
import { primaryConsolidationSettlement } from './primary-consolidation-settlement.js';
import { runSettlementCheck } from './run-settlement-check.js';

// Hand-calculation profile (invented): 4 m of sand over 4 m of normally consolidated clay, water table at 2 m.
const sandOverClay: SoilProfile = {
  groundLevelM: 10,
  waterTableDepthM: 2,
  layers: [
    { name: 'sand', thicknessM: 4, unitWeightKnPerM3: 18, saturatedUnitWeightKnPerM3: 20 },
    { name: 'clay', thicknessM: 4, unitWeightKnPerM3: 19, saturatedUnitWeightKnPerM3: 19, e0: 1, cc: 0.35, cs: 0.06, cvM2PerYr: 2, drainageTop: 'free', drainageBottom: 'free' },
  ],
};
const deepElastic: SoilProfile = {
  groundLevelM: 0,
  waterTableDepthM: 0,
  layers: [{ name: 'stiff clay', thicknessM: 2000, unitWeightKnPerM3: 20, saturatedUnitWeightKnPerM3: 20, elasticModulusKpa: 20_000, poissonRatio: 0.3 }],
};
const circle: Footing = { id: 'C1', shape: 'circle', xM: 0, yM: 0, widthM: 2, depthM: 1, pressureKpa: 200 };
const strip: Footing = { id: 'W1', shape: 'strip', xM: 0, yM: 0, widthM: 1.5, depthM: 1, loadKnPerM: 180 };

describe('runSettlementCheck — circles, squares and strips', () => {
  it('a circle’s primary settlement reproduces the hand calculation on its axis', () => {
    // One sublayer at 6 m: σ′0 = 74.76 kPa (as in the rectangle checks); z = 5 m below the base, R = 1 m:
    // Δσ = 200 × [1 − 1.04^−1.5] = 200 × (1 − 0.942866) = 11.427 kPa; Sc = 0.35 × 4/2 × log10(86.187/74.76) = 0.7 × 0.061774 = 0.04324 m.
    const result = runSettlementCheck({ profile: sandOverClay, footings: [circle], options: { sublayerCount: 1, evaluationPoints: 'centre' } });
    const row = result.footings[0]?.sublayers[0];
    expect(Math.abs((row?.stressIncreaseKpa ?? 0) - 11.427)).toBeLessThan(0.0005);
    expect(Math.abs((result.footings[0]?.primaryM ?? 0) - 0.04324)).toBeLessThan(0.000005);
  });

  it('a circle on a very deep elastic layer: centre q·D·(1 − ν²)/E·1 and rim 2/π of it (Timoshenko & Goodier)', () => {
    // A 2 km layer under a 2 m circle differs from the half-space by about (a/H)·… < 0.1 %: tolerance 0.2 %.
    const result = runSettlementCheck({ profile: deepElastic, footings: [{ ...circle, depthM: 0 }] });
    const f = result.footings[0];
    const expected = (200 * 2 * 0.91) / 20_000;
    expect(Math.abs((f?.immediateM ?? 0) - expected) / expected).toBeLessThan(0.002);
    for (const label of ['edge-x-', 'edge-x+', 'edge-y-', 'edge-y+'] as const) {
      const point = f?.points.find((p) => p.label === label);
      expect(Math.abs((point?.immediateM ?? 0) / (f?.immediateM ?? 1) - 2 / Math.PI)).toBeLessThan(0.002);
    }
  });

  it('evaluates each shape at its own points and reports shape, length and load by shape', () => {
    const footings: Footing[] = [
      { id: 'R', xM: 0, yM: 0, widthM: 2, lengthM: 3, depthM: 1, loadKn: 600 },
      { id: 'S', shape: 'square', xM: 10, yM: 0, widthM: 2, depthM: 1, loadKn: 400 },
      { ...circle, xM: 20 },
      { ...strip, xM: 30 },
    ];
    const result = runSettlementCheck({ profile: sandOverClay, footings, options: { includeNeighbours: false } });
    const [r, s, c, w] = result.footings;
    expect(r?.points.map((p) => p.label)).toEqual(['centre', 'corner-x-y-', 'corner-x+y-', 'corner-x-y+', 'corner-x+y+']);
    expect(s?.points.map((p) => [p.label, p.xM, p.yM])).toContainEqual(['corner-x+y+', 11, 1]);
    expect(c?.points.map((p) => [p.label, p.xM, p.yM])).toEqual([['centre', 20, 0], ['edge-x-', 19, 0], ['edge-x+', 21, 0], ['edge-y-', 20, -1], ['edge-y+', 20, 1]]);
    expect(w?.points.map((p) => [p.label, p.xM, p.yM])).toEqual([['centre', 30, 0], ['edge-x-', 29.25, 0], ['edge-x+', 30.75, 0]]);
    expect([r?.shape, s?.shape, c?.shape, w?.shape]).toEqual(['rectangle', 'square', 'circle', 'strip']);
    expect([r?.lengthM, s?.lengthM, c?.lengthM, w?.lengthM]).toEqual([3, 2, null, null]);
    // Hand calculations: 100 kPa × 6 m²; 100 kPa × 4 m²; 200 kPa × π m²; a strip has 180 kN/m at 120 kPa.
    expect([r?.pressureKpa, s?.pressureKpa, c?.pressureKpa, w?.pressureKpa]).toEqual([100, 100, 200, 120]);
    expect(r?.loadKn).toBeCloseTo(600, 12);
    expect(c?.loadKn).toBeCloseTo(200 * Math.PI, 12);
    expect([w?.loadKn, w?.loadKnPerM, r?.loadKnPerM]).toEqual([null, 180, null]);
    expect(result.method.notes.some((n) => n.startsWith('Circles:'))).toBe(true);
    expect(result.method.notes.some((n) => n.startsWith('Strips are infinitely long'))).toBe(true);
    const text = JSON.stringify(result);
    expect(text).not.toMatch(/NaN|Infinity/);
  });

  it('a square given as a square equals the same rectangle', () => {
    const asSquare = runSettlementCheck({ profile: sandOverClay, footings: [{ id: 'S', shape: 'square', xM: 0, yM: 0, widthM: 2, depthM: 1, loadKn: 800 }] });
    const asRectangle = runSettlementCheck({ profile: sandOverClay, footings: [{ id: 'S', xM: 0, yM: 0, widthM: 2, lengthM: 2, depthM: 1, loadKn: 800 }] });
    expect(asSquare.footings[0]?.totalM).toBe(asRectangle.footings[0]?.totalM);
  });

  it('neighbours of other shapes add their own stress: a circle and a strip beside a rectangle', () => {
    const rectangle: Footing = { id: 'R', xM: 0, yM: 0, widthM: 2, lengthM: 2, depthM: 1, loadKn: 800 };
    const footings: Footing[] = [rectangle, { ...circle, xM: 4, yM: 3 }, { ...strip, xM: -3.5, yM: 40 }];
    const result = runSettlementCheck({ profile: sandOverClay, footings, options: { sublayerCount: 1, evaluationPoints: 'centre' } });
    // Mid-clay at 6 m is 5 m below both bases; the circle is 5 m away on plan, the strip's centre line 3.5 m (q = 120 kPa).
    const expected = stressIncreaseCircle({ pressureKpa: 200, radiusM: 1, depthM: 5, radialOffsetM: 5 }) + stressIncreaseStrip({ pressureKpa: 120, widthM: 1.5, xM: 3.5, depthM: 5 });
    expect(result.footings[0]?.sublayers[0]?.neighboursStressIncreaseKpa).toBeCloseTo(expected, 12);
  });

  it('property: a strip is the limit of a long rectangle (L = 10⁵·B) in the whole check, centre and edges', () => {
    const profile: SoilProfile = {
      ...sandOverClay,
      layers: [
        { ...sandOverClay.layers[0]!, elasticModulusKpa: 25_000, poissonRatio: 0.3 },
        { ...sandOverClay.layers[1]!, cAlpha: 0.012, elasticModulusKpa: 6_000, poissonRatio: 0.35 },
      ],
    };
    fc.assert(
      fc.property(fc.double({ min: 0.6, max: 3, noNaN: true }), fc.double({ min: 40, max: 300, noNaN: true }), fc.constantFrom('boussinesq' as const, '2to1' as const), (widthM, pressureKpa, stressMethod) => {
        const run = (footing: Footing) => runSettlementCheck({ profile, footings: [footing], options: { stressMethod, sublayerCount: 8 } }).footings[0];
        const asStrip = run({ id: 'W', shape: 'strip', xM: 0, yM: 0, widthM, depthM: 1, pressureKpa });
        const asLong = run({ id: 'W', xM: 0, yM: 0, widthM, lengthM: 1e5 * widthM, depthM: 1, pressureKpa });
        // Boussinesq: the rectangle's ends are 10⁵·B away (measured gap below 1e-9 relative). 2V:1H spreads a finite
        // rectangle's load over L + z as well, a share z/L ≤ 7/6e4 = 1.2e-4 of the strip's.
        const relativeGap = Math.abs((asStrip?.totalM ?? Number.NaN) / (asLong?.totalM ?? Number.NaN) - 1);
        expect(relativeGap).toBeLessThan(stressMethod === 'boussinesq' ? 1e-6 : 2e-4);
        const edge = (label: string) => asStrip?.points.find((p) => p.label === label)?.totalM ?? Number.NaN;
        expect(edge('edge-x+')).toBeCloseTo(edge('edge-x-'), 12);
        // The strip's edge is the middle of the long rectangle's side: read there by an unloaded 1 cm probe footing,
        // whose settlement is all the long rectangle's.
        const probe: Footing = { id: 'P', xM: widthM / 2, yM: 0, widthM: 0.01, lengthM: 0.01, depthM: 1, pressureKpa: 0 };
        const atSide = runSettlementCheck({ profile, footings: [{ id: 'W', xM: 0, yM: 0, widthM, lengthM: 1e5 * widthM, depthM: 1, pressureKpa }, probe], options: { stressMethod, sublayerCount: 8 } });
        const sideGap = Math.abs(edge('edge-x+') / (atSide.footings[1]?.totalM ?? Number.NaN) - 1);
        expect(sideGap).toBeLessThan(stressMethod === 'boussinesq' ? 1e-6 : 2e-4);
      }),
      { numRuns: 12 },
    );
  });

  it('property: a circle’s primary and secondary settlement lie between its inscribed and circumscribed squares’ (Boussinesq, same pressure)', () => {
    fc.assert(
      fc.property(fc.double({ min: 0.5, max: 4, noNaN: true }), fc.double({ min: 20, max: 400, noNaN: true }), (diameterM, pressureKpa) => {
        const settle = (footing: Footing) => runSettlementCheck({ profile: sandOverClay, footings: [footing], options: { sublayerCount: 8, evaluationPoints: 'centre' } }).footings[0]?.totalM ?? Number.NaN;
        const ofCircle = settle({ id: 'F', shape: 'circle', xM: 0, yM: 0, widthM: diameterM, depthM: 1, pressureKpa });
        const inscribed = settle({ id: 'F', shape: 'square', xM: 0, yM: 0, widthM: diameterM / Math.SQRT2, depthM: 1, pressureKpa });
        const circumscribed = settle({ id: 'F', shape: 'square', xM: 0, yM: 0, widthM: diameterM, depthM: 1, pressureKpa });
        expect(ofCircle).toBeGreaterThan(inscribed);
        expect(ofCircle).toBeLessThan(circumscribed);
      }),
      { numRuns: 25 },
    );
  });

  it('2V:1H under a strip and a circle: q·B/(B + z) and q·D²/(D + z)² (hand calculation)', () => {
    // Strip: q = 120 kPa, B = 1.5 m, z = 5 m → 120 × 1.5/6.5 = 27.692 kPa. Circle: 200 × 2²/7² = 16.327 kPa.
    const run = (footing: Footing) =>
      runSettlementCheck({ profile: sandOverClay, footings: [footing], options: { stressMethod: '2to1', sublayerCount: 1, evaluationPoints: 'centre' } }).footings[0]?.sublayers[0];
    const underStrip = run(strip);
    const underCircle = run(circle);
    expect(underStrip?.stressIncreaseKpa).toBeCloseTo((120 * 1.5) / 6.5, 12);
    expect(underCircle?.stressIncreaseKpa).toBeCloseTo((200 * 4) / 49, 12);
    expect(underStrip?.primarySettlementM).toBeCloseTo(
      primaryConsolidationSettlement({ thicknessM: 4, e0: 1, cc: 0.35, cs: 0.06, initialEffectiveStressKpa: 74.76, stressIncreaseKpa: (120 * 1.5) / 6.5, preconsolidationKpa: 74.76 }).settlementM,
      9,
    );
  });

  it('Fox’s depth factor is applied to rectangles and squares only, and the check says so', () => {
    const profile: SoilProfile = { ...deepElastic, layers: [{ ...deepElastic.layers[0]!, thicknessM: 30 }] };
    const withFox = runSettlementCheck({ profile, footings: [circle, { ...strip, xM: 50 }], options: { applyFoxDepthFactor: true, includeNeighbours: false } });
    expect(withFox.footings.map((f) => f.immediateDepthFactor)).toEqual([1, 1]);
    expect(withFox.method.notes).toContain('Fox’s depth factor is for rectangles: circles and strips keep their immediate settlement unreduced (more settlement, not less).');
  });
});
