import { describe, expect, it } from 'vitest';
import { elasticInfluenceFactor } from './elastic-influence-factor.js';
import { foxDepthFactor } from './fox-depth-factor.js';
import { immediateSettlementFiniteLayer } from './immediate-settlement-finite-layer.js';
import { steinbrennerFactors } from './steinbrenner-factors.js';
import { steinbrennerFactorsInto } from './steinbrenner-factors-into.js';

describe('steinbrennerFactors(lengthRatio, depthRatio)', () => {
  it('m′ = n′ = 1 gives the published F1 = 0.142 and F2 = 0.083 (Das, Principles of Foundation Engineering, F1/F2 tables, from memory)', () => {
    const { f1, f2 } = steinbrennerFactors(1, 1);
    expect(Math.abs(f1 - 0.142)).toBeLessThanOrEqual(0.0005);
    expect(Math.abs(f2 - 0.083)).toBeLessThanOrEqual(0.0005);
  });

  it('F2 at m′ = n′ = 1 is exactly 1/12: (1/2π)·atan(1/√3) = (1/2π)(π/6)', () => {
    expect(steinbrennerFactors(1, 1).f2).toBeCloseTo(1 / 12, 14);
  });

  it('tends to the half-space corner factor as the layer deepens, with F2 → 0', () => {
    for (const m of [1, 2, 5]) {
      const deep = steinbrennerFactors(m, 1e6);
      expect(deep.f1).toBeCloseTo(elasticInfluenceFactor('rectangle', m, 'corner') ?? 0, 5);
      expect(steinbrennerFactors(m, Infinity).f1).toBeCloseTo(elasticInfluenceFactor('rectangle', m, 'corner') ?? 0, 12);
      expect(deep.f2).toBeLessThan(1e-5);
    }
  });

  it('F1 grows with layer thickness', () => {
    expect(steinbrennerFactors(2, 2).f1).toBeGreaterThan(steinbrennerFactors(2, 1).f1);
  });

  it('is zero for a layer of no thickness', () => {
    expect(steinbrennerFactors(1, 0)).toEqual({ f1: 0, f2: 0 });
  });

  it('throws RangeError for m′ ≤ 0 or n′ < 0', () => {
    expect(() => steinbrennerFactors(0, 1)).toThrow(new RangeError('steinbrennerFactors requires a finite lengthRatio > 0'));
    expect(() => steinbrennerFactors(1, -1)).toThrow(new RangeError('steinbrennerFactors requires depthRatio >= 0'));
  });
});

describe('immediateSettlementFiniteLayer({ pressureKpa, widthM, lengthM, layerThicknessM, elasticModulusKpa, poissonRatio, position, depthFactor })', () => {
  const base = { pressureKpa: 100, widthM: 2, lengthM: 2, layerThicknessM: 1, elasticModulusKpa: 10_000, poissonRatio: 0.3, position: 'centre' as const };

  it('centre of a square on a layer H = B/2: four corners of B/2 with m′ = 1, n′ = 1', () => {
    // Hand calculation: Is = F1 + (1 − 0.6)/(0.7)·F2 = 0.14189 + 0.57143 × 0.08333 = 0.18951;
    // Se = 100 × 4 × 1 × 0.91/10 000 × 0.18951 = 0.0068982 m.
    expect(immediateSettlementFiniteLayer(base).settlementM).toBeCloseTo(0.0068982, 6);
  });

  it('on a very deep layer equals the half-space value q·B·(1 − ν²)/E·α', () => {
    const deep = immediateSettlementFiniteLayer({ ...base, layerThicknessM: Infinity }).settlementM;
    const halfSpace = ((100 * 2 * 0.91) / 10_000) * (elasticInfluenceFactor('rectangle', 1, 'centre') ?? 0);
    expect(deep).toBeCloseTo(halfSpace, 12);
  });

  it('is scaled by the given Fox depth factor', () => {
    expect(immediateSettlementFiniteLayer({ ...base, depthFactor: 0.8 }).settlementM).toBeCloseTo(0.8 * immediateSettlementFiniteLayer(base).settlementM, 12);
  });

  it('with foundationDepthM works out Fox’s If itself and reports it', () => {
    const buried = immediateSettlementFiniteLayer({ ...base, foundationDepthM: 1 });
    expect(buried.depthFactor).toBe(foxDepthFactor(1, 0.5, 0.3));
    expect(buried.settlementM).toBeCloseTo(buried.depthFactor * immediateSettlementFiniteLayer(base).settlementM, 15);
    expect(immediateSettlementFiniteLayer(base).depthFactor).toBe(1);
  });

  it('throws RangeError for both depthFactor and foundationDepthM, or a negative depth', () => {
    expect(() => immediateSettlementFiniteLayer({ ...base, depthFactor: 0.8, foundationDepthM: 1 })).toThrow(new RangeError('immediateSettlementFiniteLayer requires depthFactor or foundationDepthM, not both'));
    expect(() => immediateSettlementFiniteLayer({ ...base, foundationDepthM: -1 })).toThrow(new RangeError('immediateSettlementFiniteLayer requires a finite foundationDepthM >= 0'));
  });

  it('throws RangeError for a bad depth factor, L < B, a non-positive thickness or modulus', () => {
    expect(() => immediateSettlementFiniteLayer({ ...base, depthFactor: 1.2 })).toThrow(new RangeError('immediateSettlementFiniteLayer requires 0 < depthFactor <= 1'));
    expect(() => immediateSettlementFiniteLayer({ ...base, lengthM: 1 })).toThrow(new RangeError('immediateSettlementFiniteLayer requires finite widthM > 0 and lengthM >= widthM'));
    expect(() => immediateSettlementFiniteLayer({ ...base, layerThicknessM: 0 })).toThrow(new RangeError('immediateSettlementFiniteLayer requires layerThicknessM > 0'));
    expect(() => immediateSettlementFiniteLayer({ ...base, elasticModulusKpa: -1 })).toThrow(new RangeError('immediateSettlementFiniteLayer requires a finite elasticModulusKpa > 0'));
    expect(() => immediateSettlementFiniteLayer({ ...base, poissonRatio: -0.1 })).toThrow(new RangeError('immediateSettlementFiniteLayer requires 0 <= poissonRatio <= 0.5'));
  });
});

describe('steinbrennerFactorsInto(lengthRatio, depthRatio, out)', () => {
  it('writes exactly what steinbrennerFactors returns, including n′ = 0 and n′ = ∞', () => {
    const out = new Float64Array(2);
    for (const m of [1, 1.3, 2, 7.5]) {
      for (const n of [0, 0.2, 1, 4, 30, Infinity]) {
        steinbrennerFactorsInto(m, n, out);
        const { f1, f2 } = steinbrennerFactors(m, n);
        expect([out[0], out[1]]).toEqual([f1, f2]);
      }
    }
  });
});
