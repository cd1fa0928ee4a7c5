import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import type { SoilProfile } from '../profile/soil-profile.types.js';
import type { Footing } from '../stress/footing.types.js';
import { foxDepthFactor } from './fox-depth-factor.js';
import { runSettlementCheck } from './run-settlement-check.js';

// Hand-calculation profile (invented; the checks below are worked by hand in the comments; the published
// settlement examples are in published-settlement-checks.test.ts): 4 m of sand over
// 4 m of clay, water table 2 m below ground.
const sandOverClay = (clay: Partial<SoilProfile['layers'][number]> = {}): SoilProfile => ({
  groundLevelM: 10,
  waterTableDepthM: 2,
  layers: [
    { name: 'sand', thicknessM: 4, unitWeightKnPerM3: 18, saturatedUnitWeightKnPerM3: 20 },
    { name: 'clay', thicknessM: 4, unitWeightKnPerM3: 19, saturatedUnitWeightKnPerM3: 19, e0: 1, cc: 0.35, cs: 0.06, ...clay },
  ],
});
const footing: Footing = { id: 'F1', xM: 0, yM: 0, widthM: 2, lengthM: 2, depthM: 1, loadKn: 800 };

describe('runSettlementCheck({ profile, footings, options })', () => {
  it('normally consolidated clay under a square footing reproduces the hand calculation', () => {
    // Hand calculation, one sublayer at 6 m: σ′0 = 2×18 + 2×(20 − 9.81) + 2×(19 − 9.81) = 74.76 kPa.
    // q = 800/4 = 200 kPa; z = 5 m below the base, m = n = 1/5 = 0.2, I = 0.0179 (Newmark/Fadum table)
    // → Δσ = 4 × 0.0179 × 200 = 14.32 kPa. Sc = 0.35 × 4/2 × log10(89.08/74.76) = 0.0533 m.
    // The table's four decimals on I (±0.00005) allow ±0.04 kPa on Δσ, ±0.00014 m on Sc.
    const result = runSettlementCheck({ profile: sandOverClay(), footings: [footing], options: { sublayerCount: 1, evaluationPoints: 'centre' } });
    const [row] = result.footings[0]?.sublayers ?? [];
    expect(row?.initialEffectiveStressKpa).toBeCloseTo(74.76, 9);
    expect(Math.abs((row?.stressIncreaseKpa ?? 0) - 14.32)).toBeLessThanOrEqual(0.04);
    expect(row?.consolidationCase).toBe('normally-consolidated');
    expect(Math.abs((result.footings[0]?.primaryM ?? 0) - 0.0533)).toBeLessThanOrEqual(0.00014);
    expect(result.warnings.some((w) => /treated as normally consolidated/.test(w))).toBe(true);
  });

  it('works out σ′0 with the profile’s γw and states it in the result (γw = 10 kN/m³)', () => {
    // Hand calculation at 6 m with γw = 10: σ′0 = 2×18 + 2×(20 − 10) + 2×(19 − 10) = 74 kPa (74.76 with 9.81).
    const profile = { ...sandOverClay(), waterUnitWeightKnPerM3: 10 };
    const result = runSettlementCheck({ profile, footings: [footing], options: { sublayerCount: 1, evaluationPoints: 'centre' } });
    expect(result.footings[0]?.sublayers[0]?.initialEffectiveStressKpa).toBeCloseTo(74, 9);
    expect(result.method.waterUnitWeightKnPerM3).toBe(10);
    expect(runSettlementCheck({ profile: sandOverClay(), footings: [footing] }).method.waterUnitWeightKnPerM3).toBe(9.81);
  });

  it('names γw in the message when a saturated unit weight does not exceed it', () => {
    const profile: SoilProfile = {
      groundLevelM: 0,
      waterTableDepthM: 0,
      waterUnitWeightKnPerM3: 10,
      layers: [{ name: 'clay', thicknessM: 4, unitWeightKnPerM3: 10, saturatedUnitWeightKnPerM3: 10, e0: 1, cc: 0.35 }],
    };
    expect(() => runSettlementCheck({ profile, footings: [footing] })).toThrow(
      new RangeError('runSettlementCheck requires a positive effective stress in layer 1 (clay); check that saturated unit weights exceed the unit weight of water, 10 kN/m³'),
    );
  });

  it('overconsolidated clay passing σ′p reproduces the hand calculation', () => {
    // Same loading with σ′p = 80 kPa: Sc = 0.06 × 2 × log10(80/74.76) + 0.35 × 2 × log10(89.08/80) = 0.0362 m (± 0.0001 from I's decimals).
    const result = runSettlementCheck({ profile: sandOverClay({ preconsolidationKpa: 80 }), footings: [footing], options: { sublayerCount: 1, evaluationPoints: 'centre' } });
    expect(result.footings[0]?.sublayers[0]?.consolidationCase).toBe('overconsolidated-crossing');
    expect(Math.abs((result.footings[0]?.primaryM ?? 0) - 0.0362)).toBeLessThanOrEqual(0.0001);
  });

  it('overconsolidated clay staying below σ′p uses Cs alone', () => {
    // OCR = 2 at every depth: σ′p = 149.5 kPa > 89.08 kPa → Sc = 0.06 × 2 × log10(89.08/74.76) = 0.00913 m.
    const result = runSettlementCheck({ profile: sandOverClay({ ocr: 2 }), footings: [footing], options: { sublayerCount: 1, evaluationPoints: 'centre' } });
    expect(result.footings[0]?.sublayers[0]?.consolidationCase).toBe('overconsolidated-below');
    expect(Math.abs((result.footings[0]?.primaryM ?? 0) - 0.00913)).toBeLessThanOrEqual(0.00003);
  });

  it('POP carries σ′p = σ′0 + POP through the layer and the result states the basis', () => {
    // Same loading with POP = 10 kPa: σ′p = 74.76 + 10 = 84.76 kPa < σ′1 = 89.08 kPa, so the sublayer crosses σ′p:
    // Sc = 0.06 × 2 × log10(84.76/74.76) + 0.35 × 2 × log10(89.08/84.76) = 0.00654 + 0.01511 = 0.0217 m (± 0.0001 from I's decimals).
    const result = runSettlementCheck({ profile: sandOverClay({ preOverburdenPressureKpa: 10 }), footings: [footing], options: { sublayerCount: 1, evaluationPoints: 'centre' } });
    const row = result.footings[0]?.sublayers[0];
    expect(row?.preconsolidationKpa).toBeCloseTo(84.76, 9);
    expect(row?.consolidationCase).toBe('overconsolidated-crossing');
    expect(Math.abs((result.footings[0]?.primaryM ?? 0) - 0.0217)).toBeLessThanOrEqual(0.0001);
    expect(result.layers[1]).toMatchObject({ preconsolidationBasis: 'pre-overburden-pressure', preOverburdenPressureKpa: 10, ocr: null, preconsolidationKpa: null });
  });

  it('property: POP 0 gives the same settlements as OCR 1, and POP = (OCR − 1)·σ′0 the same as that OCR in one sublayer', () => {
    fc.assert(
      fc.property(fc.double({ min: 100, max: 3000, noNaN: true }), fc.double({ min: 1, max: 3, noNaN: true }), (loadKn, ocr) => {
        const run = (clay: Partial<SoilProfile['layers'][number]>) =>
          runSettlementCheck({ profile: sandOverClay(clay), footings: [{ ...footing, loadKn }], options: { sublayerCount: 1, evaluationPoints: 'centre' } }).footings[0]?.totalM ?? Number.NaN;
        expect(run({ preOverburdenPressureKpa: 0 })).toBe(run({ ocr: 1 }));
        // σ′0 = 74.76 kPa at the one mid-depth (hand calculation above).
        expect(run({ preOverburdenPressureKpa: (ocr - 1) * 74.76 })).toBeCloseTo(run({ ocr }), 12);
      }),
      { numRuns: 30 },
    );
  });

  it('finer sublayers converge: 40 and 80 slices agree within 0.5 %', () => {
    const run = (count: number) => runSettlementCheck({ profile: sandOverClay(), footings: [footing], options: { sublayerCount: count, evaluationPoints: 'centre' } }).footings[0]?.primaryM ?? 0;
    expect(Math.abs(run(40) - run(80)) / run(80)).toBeLessThan(0.005);
  });

  it('immediate settlement on a very deep elastic layer equals the half-space formula q·B·(1 − ν²)/E·1.122', () => {
    // α = 1.1222 for the centre of a flexible square (the closed form, worked by hand in elastic-influence-factor.test.ts);
    // a 2 km layer under a 2 m footing differs from the half-space by F2 ≈ 1e-3 of F1 — tolerance 0.2 %.
    const profile: SoilProfile = { groundLevelM: 0, waterTableDepthM: 0, layers: [{ name: 'stiff clay', thicknessM: 2000, unitWeightKnPerM3: 20, saturatedUnitWeightKnPerM3: 20, elasticModulusKpa: 20_000, poissonRatio: 0.3 }] };
    const result = runSettlementCheck({ profile, footings: [{ ...footing, depthM: 0 }] });
    const expected = ((200 * 2 * 0.91) / 20_000) * 1.122;
    expect(Math.abs((result.footings[0]?.immediateM ?? 0) - expected) / expected).toBeLessThan(0.002);
    const corner = result.footings[0]?.points.find((p) => p.label === 'corner-x+y+');
    expect(Math.abs((corner?.immediateM ?? 0) / (result.footings[0]?.immediateM ?? 1) - 0.5)).toBeLessThan(0.002);
  });

  it('splitting an elastic layer into two identical layers leaves immediate settlement unchanged', () => {
    const layer = { unitWeightKnPerM3: 19, saturatedUnitWeightKnPerM3: 19, elasticModulusKpa: 15_000, poissonRatio: 0.35 };
    const one: SoilProfile = { groundLevelM: 0, waterTableDepthM: 5, layers: [{ name: 'a', thicknessM: 10, ...layer }] };
    const two: SoilProfile = { groundLevelM: 0, waterTableDepthM: 5, layers: [{ name: 'a', thicknessM: 3.7, ...layer }, { name: 'b', thicknessM: 6.3, ...layer }] };
    const settle = (profile: SoilProfile) => runSettlementCheck({ profile, footings: [footing] }).footings[0]?.immediateM ?? 0;
    expect(settle(two)).toBeCloseTo(settle(one), 12);
  });

  it('neighbours add settlement and their stress is reported apart', () => {
    const footings: Footing[] = [footing, { ...footing, id: 'F2', xM: 3 }];
    const withNeighbours = runSettlementCheck({ profile: sandOverClay(), footings });
    const alone = runSettlementCheck({ profile: sandOverClay(), footings, options: { includeNeighbours: false } });
    expect(withNeighbours.footings[0]?.primaryM).toBeGreaterThan(alone.footings[0]?.primaryM ?? Infinity);
    expect(withNeighbours.footings[0]?.sublayers[0]?.neighboursStressIncreaseKpa).toBeGreaterThan(0);
    expect(alone.footings[0]?.sublayers[0]?.neighboursStressIncreaseKpa).toBe(0);
  });

  it('pairs: differential settlement, δ/L, and the published limit named', () => {
    const footings: Footing[] = [footing, { ...footing, id: 'F2', xM: 5, loadKn: 1600 }];
    const result = runSettlementCheck({ profile: sandOverClay(), footings, options: { includeNeighbours: false } });
    const [a, b] = result.footings;
    const [pair] = result.pairs;
    expect(pair?.differentialSettlementM).toBeCloseTo(Math.abs((a?.totalM ?? 0) - (b?.totalM ?? 0)), 12);
    expect(pair?.angularDistortion).toBeCloseTo((pair?.differentialSettlementM ?? 0) / 5, 12);
    expect(pair?.withinDesignLimit).toBe((pair?.angularDistortion ?? 0) <= 1 / 500);
    expect(pair?.verdicts.map((v) => v.source)).toEqual(['Bjerrum (1963)', 'Skempton & MacDonald (1956)']);
  });

  it('time rate: the layer’s t50 is 0.197·Hdr²/cv and the curve ends at immediate + primary', () => {
    // Double drainage, Hdr = 2 m, cv = 2 m²/yr: t50 = 0.1967 × 4/2 = 0.393 yr (table Tv 0.197 → 0.394, three figures).
    const profile = sandOverClay({ cvM2PerYr: 2, drainageTop: 'free', drainageBottom: 'free' });
    const result = runSettlementCheck({ profile, footings: [footing], options: { timesYears: [0, 1000] } });
    const f = result.footings[0];
    expect(Math.abs((f?.timeTo50PercentYears ?? 0) - 0.394)).toBeLessThanOrEqual(0.001);
    expect(f?.timeCurve[0]?.settlementM).toBe(f?.immediateM);
    expect(f?.timeCurve[1]?.settlementM).toBeCloseTo((f?.immediateM ?? 0) + (f?.primaryM ?? 0), 12);
    expect(result.layers[1]?.drainagePathM).toBe(2);
  });

  it('secondary compression over the design life from Cα, starting at 95 % of primary', () => {
    // One sublayer: t1 = Tv(0.95)·Hdr²/cv = 1.1290 × 4/2 = 2.258 yr; ep = 1 − 2 × Sc/4; Ss = Cα/(1 + ep) × 4 × log10(50/t1).
    const profile = sandOverClay({ cvM2PerYr: 2, cAlpha: 0.014, drainageTop: 'free', drainageBottom: 'free' });
    const result = runSettlementCheck({ profile, footings: [footing], options: { sublayerCount: 1, evaluationPoints: 'centre' } });
    const f = result.footings[0];
    const ep = 1 - (2 * (f?.primaryM ?? 0)) / 4;
    const t1 = result.layers[1]?.endOfPrimaryYears ?? 0;
    expect(t1).toBeCloseTo(1.129 * 2, 2);
    expect(f?.secondaryM).toBeCloseTo((0.014 / (1 + ep)) * 4 * Math.log10(50 / t1), 12);
    expect(f?.totalM).toBeCloseTo((f?.immediateM ?? 0) + (f?.primaryM ?? 0) + (f?.secondaryM ?? 0), 12);
  });

  it('records every layer parameter used and serialises to JSON without loss or NaN', () => {
    const result = runSettlementCheck({ profile: sandOverClay({ cvM2PerYr: 2, drainageTop: 'free', drainageBottom: 'impermeable' }), footings: [footing, { ...footing, id: 'F2', xM: 4 }] });
    expect(result.layers[1]).toMatchObject({ name: 'clay', e0: 1, cc: 0.35, cs: 0.06, cvM2PerYr: 2, drainagePathM: 4, preconsolidationBasis: 'assumed-normally-consolidated' });
    const text = JSON.stringify(result);
    expect(JSON.parse(text)).toEqual(result);
    expect(text).not.toMatch(/NaN|Infinity/);
  });

  it('property: settlement grows with load', () => {
    fc.assert(
      fc.property(fc.double({ min: 100, max: 3000, noNaN: true }), fc.double({ min: 1.05, max: 3, noNaN: true }), (loadKn, factor) => {
        const settle = (load: number) => runSettlementCheck({ profile: sandOverClay({ ocr: 1.3 }), footings: [{ ...footing, loadKn: load }], options: { sublayerCount: 8, evaluationPoints: 'centre' } }).footings[0]?.totalM ?? 0;
        expect(settle(loadKn * factor)).toBeGreaterThan(settle(loadKn));
      }),
      { numRuns: 40 },
    );
  });

  it('property: for a fixed load, settlement falls as the footing widens', () => {
    const profile: SoilProfile = { ...sandOverClay({ ocr: 1.3 }), layers: sandOverClay({ ocr: 1.3 }).layers.map((l) => ({ ...l, elasticModulusKpa: 20_000, poissonRatio: 0.3 })) };
    fc.assert(
      fc.property(fc.double({ min: 0.5, max: 5, noNaN: true }), fc.double({ min: 1.05, max: 2, noNaN: true }), (widthM, factor) => {
        const settle = (b: number) => runSettlementCheck({ profile, footings: [{ ...footing, widthM: b, lengthM: b }], options: { sublayerCount: 8, evaluationPoints: 'centre' } }).footings[0]?.totalM ?? 0;
        expect(settle(widthM * factor)).toBeLessThan(settle(widthM));
      }),
      { numRuns: 40 },
    );
  });

  it('judges each footing’s total against the limit given, and not at all without one', () => {
    const judged = (limit?: number) =>
      runSettlementCheck({ profile: sandOverClay(), footings: [footing], options: limit === undefined ? {} : { totalSettlementLimitM: limit } }).footings[0]?.withinTotalLimit;
    expect(judged()).toBeNull();
    expect(judged(0.065)).toBe(true);
    expect(judged(0.01)).toBe(false);
  });

  it('the 2:1 method runs and says its corners equal its centre for a lone footing', () => {
    const result = runSettlementCheck({ profile: sandOverClay(), footings: [footing], options: { stressMethod: '2to1' } });
    const f = result.footings[0];
    expect(f?.points[1]?.primaryM).toBeCloseTo(f?.primaryM ?? 0, 12);
    expect(result.method.notes.some((n) => /2V:1H/.test(n))).toBe(true);
  });

  it.each([
    [{ sublayerCount: 4, sublayerMaxThicknessM: 1 }, [footing], 'runSettlementCheck requires either sublayerCount or sublayerMaxThicknessM, not both'],
    [{ designLifeYears: 0 }, [footing], 'runSettlementCheck requires a finite designLifeYears > 0'],
    [{}, [footing, footing], 'runSettlementCheck requires unique footing ids (F1 repeats)'],
    [{}, [{ ...footing, depthM: 9 }], 'runSettlementCheck requires depthM >= 0 and above the bottom of the profile (footing F1)'],
    [{}, [], 'runSettlementCheck requires at least one footing'],
    [{ endOfPrimaryShare: 1 }, [footing], 'runSettlementCheck requires endOfPrimaryShare strictly between 0 and 1'],
  ])('throws RangeError for bad input (%#)', (options, footings, message) => {
    expect(() => runSettlementCheck({ profile: sandOverClay(), footings, options })).toThrow(new RangeError(message));
  });

  it('throws RangeError when an overconsolidated layer has no cs', () => {
    const profile = sandOverClay({ ocr: 1.5 });
    const { cs: _cs, ...clayWithoutCs } = profile.layers[1]!;
    expect(() => runSettlementCheck({ profile: { ...profile, layers: [profile.layers[0]!, clayWithoutCs] }, footings: [footing] })).toThrow(
      new RangeError('runSettlementCheck requires cs wherever the layer is overconsolidated (ocr > 1, preconsolidationKpa or preOverburdenPressureKpa > 0), in layer 2 (clay)'),
    );
  });
});

describe('runSettlementCheck — mv layers and Fox’s depth factor', () => {
  const sand = { name: 'sand', thicknessM: 4, unitWeightKnPerM3: 18, saturatedUnitWeightKnPerM3: 20 };
  const mvClay = { name: 'clay', thicknessM: 4, unitWeightKnPerM3: 19, saturatedUnitWeightKnPerM3: 19, mvM2PerKn: 0.0004 };
  const footingAlone: Footing = { id: 'F1', xM: 0, yM: 0, widthM: 2, lengthM: 2, depthM: 1, loadKn: 800 };

  it('a layer with mv and no Cc settles by mv·Δσ′·H per sublayer, row by row', () => {
    const profile: SoilProfile = { groundLevelM: 0, waterTableDepthM: 2, layers: [sand, mvClay] };
    const result = runSettlementCheck({ profile, footings: [footingAlone], options: { sublayerCount: 4, evaluationPoints: 'centre' } });
    const rows = result.footings[0]?.sublayers ?? [];
    expect(rows).toHaveLength(4);
    for (const row of rows) {
      expect(row.consolidationCase).toBe('volume-compressibility');
      expect(row.primarySettlementM).toBeCloseTo(0.0004 * row.stressIncreaseKpa * row.thicknessM, 15);
    }
    expect(result.footings[0]?.primaryM).toBeCloseTo(rows.reduce((sum, row) => sum + row.primarySettlementM, 0), 15);
    expect(result.layers[1]).toMatchObject({ compressible: true, primaryMethod: 'mv', mvM2PerKn: 0.0004, preconsolidationBasis: null });
    expect(result.warnings.some((w) => /treated as normally consolidated/.test(w))).toBe(false);
  });

  it('uses Cc where a layer has both, and says so', () => {
    const profile: SoilProfile = { groundLevelM: 0, waterTableDepthM: 2, layers: [sand, { ...mvClay, e0: 1, cc: 0.35 }] };
    const result = runSettlementCheck({ profile, footings: [footingAlone], options: { sublayerCount: 2, evaluationPoints: 'centre' } });
    expect(result.footings[0]?.sublayers[0]?.consolidationCase).toBe('normally-consolidated');
    expect(result.layers[1]?.primaryMethod).toBe('e-log-stress');
    expect(result.warnings.some((w) => /both Cc and mv/.test(w))).toBe(true);
  });

  it('leaves out secondary compression of an mv layer without e0, and says so', () => {
    const profile: SoilProfile = { groundLevelM: 0, waterTableDepthM: 2, layers: [sand, { ...mvClay, cAlpha: 0.01, cvM2PerYr: 2, drainageTop: 'free', drainageBottom: 'free' }] };
    const result = runSettlementCheck({ profile, footings: [footingAlone], options: { sublayerCount: 2, evaluationPoints: 'centre' } });
    expect(result.footings[0]?.sublayers[0]?.secondarySettlementM).toBeNull();
    expect(result.footings[0]?.timeTo50PercentYears).not.toBeNull();
    expect(result.warnings.some((w) => /mv and Cα but no e0/.test(w))).toBe(true);
  });

  it('throws RangeError for mv ≤ 0', () => {
    const profile: SoilProfile = { groundLevelM: 0, waterTableDepthM: 2, layers: [sand, { ...mvClay, mvM2PerKn: 0 }] };
    expect(() => runSettlementCheck({ profile, footings: [footingAlone] })).toThrow(new RangeError('runSettlementCheck requires mvM2PerKn > 0 in layer 2 (clay)'));
  });

  it('applyFoxDepthFactor scales a lone footing’s immediate settlement by If(L/B, Df/B, ν below the base), and nothing else', () => {
    const elastic = { elasticModulusKpa: 20_000, poissonRatio: 0.3 };
    const profile: SoilProfile = { groundLevelM: 0, waterTableDepthM: 2, layers: [{ ...sand, ...elastic }, { ...mvClay, ...elastic, poissonRatio: 0.45 }] };
    const off = runSettlementCheck({ profile, footings: [footingAlone], options: { evaluationPoints: 'centre' } });
    const on = runSettlementCheck({ profile, footings: [footingAlone], options: { evaluationPoints: 'centre', applyFoxDepthFactor: true } });
    const expected = foxDepthFactor(1, 0.5, 0.3);
    expect(on.footings[0]?.immediateDepthFactor).toBe(expected);
    expect(off.footings[0]?.immediateDepthFactor).toBe(1);
    expect(on.footings[0]?.immediateM).toBeCloseTo(expected * (off.footings[0]?.immediateM ?? 0), 15);
    expect(on.footings[0]?.primaryM).toBe(off.footings[0]?.primaryM);
    expect(on.method.applyFoxDepthFactor).toBe(true);
    expect(on.method.notes.some((n) => /Fox’s \(1948\) depth factor/.test(n))).toBe(true);
  });

  it('applyFoxDepthFactor leaves the neighbours’ shares of immediate settlement whole', () => {
    const profile: SoilProfile = { groundLevelM: 0, waterTableDepthM: 2, layers: [{ ...sand, elasticModulusKpa: 20_000, poissonRatio: 0.3 }, mvClay] };
    const pair: Footing[] = [footingAlone, { ...footingAlone, id: 'F2', xM: 4 }];
    const alone = (fox: boolean) => runSettlementCheck({ profile, footings: pair, options: { evaluationPoints: 'centre', includeNeighbours: false, applyFoxDepthFactor: fox } }).footings[0]?.immediateM ?? 0;
    const together = (fox: boolean) => runSettlementCheck({ profile, footings: pair, options: { evaluationPoints: 'centre', applyFoxDepthFactor: fox } }).footings[0]?.immediateM ?? 0;
    expect(together(true) - alone(true)).toBeCloseTo(together(false) - alone(false), 15);
  });
});
