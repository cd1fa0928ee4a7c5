import { describe, expect, it } from 'vitest';
import type { SoilProfile } from '../profile/soil-profile.types.js';
import { runSettlementCheck } from './run-settlement-check.js';
import { settlementUnderUniformLoad } from './settlement-under-uniform-load.js';

// University of Maine, CIE 365 Soil Mechanics course notes (L. Zambrano-Cruzatty), "Consolidation",
// Example 7.1: sand 9 m (γsat 19.0, water table at 3 m, taken saturated above it), clay 10 m
// (γsat 17.4, e0 1.15, Cc 0.30), Δσ = 200 kPa given at mid-clay. Printed σ′0 = 150.1 kPa, settlement 0.513 m.
const example71: SoilProfile = {
  groundLevelM: 0,
  waterTableDepthM: 3,
  layers: [
    { name: 'sand', thicknessM: 9, unitWeightKnPerM3: 19, saturatedUnitWeightKnPerM3: 19 },
    { name: 'clay', thicknessM: 10, unitWeightKnPerM3: 17.4, saturatedUnitWeightKnPerM3: 17.4, e0: 1.15, cc: 0.3 },
  ],
};

describe('settlementUnderUniformLoad({ profile, stressIncreaseKpa, options })', () => {
  it('reproduces CIE 365 Example 7.1 (one layer, mid-depth stresses) within the 0.5 % the printed rounding allows', () => {
    const result = settlementUnderUniformLoad({ profile: example71, stressIncreaseKpa: 200, options: { sublayerCount: 1 } });
    const [row] = result.sublayers;
    expect(Math.abs((row?.initialEffectiveStressKpa ?? 0) - 150.1) / 150.1).toBeLessThan(0.005);
    expect(Math.abs(result.primaryM - 0.513) / 0.513).toBeLessThan(0.005);
    expect(row?.consolidationCase).toBe('normally-consolidated');
  });

  it('sums the same sublayers as a footing check would, with Δσ constant at every depth', () => {
    // Hand calculation, two 5 m sublayers of the clay: σ′0 at 11.5 m = 171 + 2.5·17.4 − 8.5·9.81 = 131.115 kPa,
    // at 16.5 m = 171 + 7.5·17.4 − 13.5·9.81 = 169.065 kPa;
    // Sc = 0.3·5/2.15·[log10(331.115/131.115) + log10(369.065/169.065)] = 0.69767·(0.40233 + 0.33904) = 0.51724 m.
    const result = settlementUnderUniformLoad({ profile: example71, stressIncreaseKpa: 200, options: { sublayerCount: 2 } });
    expect(result.sublayers.map((row) => row.midDepthM)).toEqual([11.5, 16.5]);
    expect(result.primaryM).toBeCloseTo(0.51724, 4);
    expect(result.sublayers.every((row) => row.stressIncreaseKpa === 200 && row.neighboursStressIncreaseKpa === 0)).toBe(true);
  });

  it('agrees with runSettlementCheck under a very wide 2V:1H footing, whose stress tends to q at every depth', () => {
    // 2V:1H: Δσ = q·B²/(B + z)²; with B = 10 km and z ≤ 19 m the factor is within 0.4 % of 1.
    const wide = runSettlementCheck({
      profile: example71,
      footings: [{ id: 'W', xM: 0, yM: 0, widthM: 10_000, lengthM: 10_000, depthM: 0, pressureKpa: 200 }],
      options: { sublayerCount: 4, stressMethod: '2to1', evaluationPoints: 'centre' },
    });
    const uniform = settlementUnderUniformLoad({ profile: example71, stressIncreaseKpa: 200, options: { sublayerCount: 4 } });
    expect(Math.abs(uniform.primaryM - (wide.footings[0]?.primaryM ?? 0)) / uniform.primaryM).toBeLessThan(0.004);
  });

  it('gives the time rate when the clay has cv and drains at both faces', () => {
    // One clay layer of 10 m drained both faces: Hdr = 5 m; t50 = 0.197·25/cv = 4.925/cv years (Terzaghi's table, Das).
    const profile: SoilProfile = { ...example71, layers: [example71.layers[0]!, { ...example71.layers[1]!, cvM2PerYr: 2, drainageTop: 'free', drainageBottom: 'free' }] };
    const result = settlementUnderUniformLoad({ profile, stressIncreaseKpa: 200, options: { sublayerCount: 1 } });
    expect(result.timeTo50PercentYears).toBeCloseTo(4.925 / 2, 1);
    expect(result.timeCurve.at(-1)?.settlementM).toBeCloseTo(result.primaryM, 3);
  });

  it('throws for a stress increase that is not positive', () => {
    expect(() => settlementUnderUniformLoad({ profile: example71, stressIncreaseKpa: 0 })).toThrow(/settlementUnderUniformLoad requires a finite stressIncreaseKpa > 0/);
  });
});
