import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { elasticInfluenceFactor } from './elastic-influence-factor.js';
import { foxDepthFactor } from './fox-depth-factor.js';
import { gaussLegendreRule } from './gauss-legendre-rule.js';
import { immediateSettlementFiniteLayer } from './immediate-settlement-finite-layer.js';
import { steinbrennerFactors } from './steinbrenner-factors.js';
import { steinbrennerFactorsInto } from './steinbrenner-factors-into.js';

describe('steinbrennerFactors(lengthRatio, depthRatio)', () => {
  it('m′ = n′ = 1 and m′ = 2, n′ = 10 give the hand calculations written out (six decimals)', () => {
    // m′ = n′ = 1: A0 = A1 = ln(2.414214 × 1.414214/2.732051) = ln 1.249689 = 0.222895; F1 = 0.445789/π = 0.141899;
    // A2 = 1/√3, F2 = (1/2π)(π/6) = 0.083333.
    // m′ = 2, n′ = 10: A0 = 2 ln(3.236068 × 10.198039/(2 × 11.246951)) = 2 × 0.383310 = 0.766620;
    // A1 = ln(4.236068 × 10.049876/12.246951) = 1.245919; F1 = 2.012539/π = 0.640611;
    // F2 = (10/2π)·atan(2/(10 × 10.246951)) = 1.591549 × 0.019516 = 0.031060.
    expect(Math.abs(steinbrennerFactors(1, 1).f1 - 0.141899)).toBeLessThanOrEqual(0.000001);
    expect(Math.abs(steinbrennerFactors(1, 1).f2 - 0.083333)).toBeLessThanOrEqual(0.000001);
    expect(Math.abs(steinbrennerFactors(2, 10).f1 - 0.640611)).toBeLessThanOrEqual(0.000001);
    expect(Math.abs(steinbrennerFactors(2, 10).f2 - 0.03106)).toBeLessThanOrEqual(0.000001);
  });

  it('is the half-space corner displacement at the surface less that at depth H (the route Steinbrenner took; independent quadrature)', () => {
    // Boussinesq's point-load displacement (1 + ν)/(2πE)·[2(1 − ν)/R + z²/R³] summed over the B × L corner rectangle,
    // in closed form along each ray from the corner: F(ρ) = 2(1 − ν)(√(ρ² + z²) − z) + z − z²/√(ρ² + z²); then
    // 48-point Gauss–Legendre over the angle on each side of the diagonal. B = 1, ν = 0.3.
    const { nodes, weights } = gaussLegendreRule(48);
    const nu = 0.3;
    const cornerDisplacement = (lengthM: number, depthM: number) => {
      const radial = (rho: number) => {
        const slant = Math.hypot(rho, depthM);
        return 2 * (1 - nu) * (slant - depthM) + depthM - (depthM * depthM) / slant;
      };
      const diagonal = Math.atan2(lengthM, 1);
      const part = (from: number, to: number, reach: (theta: number) => number) =>
        nodes.reduce((sum, u, i) => sum + (weights[i] ?? 0) * ((to - from) / 2) * radial(reach(from + ((to - from) / 2) * (1 + u))), 0);
      return ((1 + nu) / (2 * Math.PI)) * (part(0, diagonal, (t) => 1 / Math.cos(t)) + part(diagonal, Math.PI / 2, (t) => lengthM / Math.sin(t)));
    };
    for (const [m, n] of [[1, 1], [2, 3], [5, 0.5]] as const) {
      const { f1, f2 } = steinbrennerFactors(m, n);
      const steinbrenner = (1 - nu * nu) * (f1 + ((1 - 2 * nu) / (1 - nu)) * f2);
      expect(Math.abs(steinbrenner - (cornerDisplacement(m, 0) - cornerDisplacement(m, n)))).toBeLessThan(1e-9);
    }
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
    expect(() => steinbrennerFactors(0, 1)).toThrow(new RangeError('steinbrennerFactors requires lengthRatio > 0'));
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

  it('centre of a 1 m × 2 m footing on a 5 m layer: m′ = 2, n′ = 10 (hand calculation)', () => {
    // α = 4, B′ = 0.5 m; F1 = 0.640611, F2 = 0.031060 (worked out above); Is = 0.640611 + (0.4/0.7) × 0.031060 = 0.658360;
    // Se = 150 × 4 × 0.5 × 0.91/10 400 × 0.658360 = 0.017282 m. With the founding depth 1 m, Fox's If multiplies it.
    const layered = { pressureKpa: 150, widthM: 1, lengthM: 2, layerThicknessM: 5, elasticModulusKpa: 10_400, poissonRatio: 0.3, position: 'centre' as const };
    expect(immediateSettlementFiniteLayer(layered).settlementM).toBeCloseTo(0.017282, 6);
    expect(immediateSettlementFiniteLayer({ ...layered, foundationDepthM: 1 }).settlementM).toBeCloseTo(0.017282 * foxDepthFactor(2, 1, 0.3), 6);
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

describe('immediateSettlementFiniteLayer — squares, circles and strips', () => {
  const base = { pressureKpa: 100, widthM: 2, lengthM: 2, elasticModulusKpa: 10_000, poissonRatio: 0.3 };

  it('a circle on a half-space gives the published factors: centre 1, rim 2/π (Timoshenko & Goodier, Theory of Elasticity)', () => {
    // Se = q·D·(1 − ν²)/E·α = 100 × 2 × 0.91/10 000 × α = 0.0182·α m.
    const centre = immediateSettlementFiniteLayer({ ...base, shape: 'circle', layerThicknessM: Infinity, position: 'centre' });
    const rim = immediateSettlementFiniteLayer({ ...base, shape: 'circle', layerThicknessM: Infinity, position: 'corner' });
    expect(centre.settlementM).toBeCloseTo(0.0182, 12);
    expect(centre.shapeFactor).toBeCloseTo(1, 12);
    expect(rim.shapeFactor).toBeCloseTo(2 / Math.PI, 12);
    expect(centre.f1).toBeNull();
  });

  it('a circle on a finite layer is W(0) − W(H): hand calculation on the axis', () => {
    // On the axis W(z) = (1 + ν)·[z − z²/√(a² + z²) + 2(1 − ν)(√(a² + z²) − z)]; a = 1 m, H = 1 m, ν = 0.3:
    // W(0) = 1.3 × 1.4 × 1 = 1.82 m; W(1) = 1.3 × [1 − 1/1.414214 + 1.4 × 0.414214] = 1.3 × 0.872792 = 1.134630 m;
    // Se = 100 × (1.82 − 1.134630)/10 000 = 0.0068537 m.
    expect(immediateSettlementFiniteLayer({ ...base, shape: 'circle', layerThicknessM: 1, position: 'centre' }).settlementM).toBeCloseTo(0.0068537, 7);
  });

  it('property: a circle settles between its inscribed and circumscribed squares wherever the method’s kernel is positive — ν = 0 on any layer, any ν on a half-space', () => {
    // Steinbrenner's route integrates εz = [σz − ν(σx + σy)]/E of the half-space over the layer. With ν > 0 on
    // a thin layer the wider load's larger lateral stresses cut the strain, so a bigger footing can settle less
    // there (measured: H = 0.1 m, ν = 0.5 gives 9.4e-5, 7.4e-5 and 6.7e-5 m for the inscribed square, the circle
    // and the circumscribed square) and no such bound holds. With ν = 0, or over an infinite depth (where the
    // surface displacement kernel is positive), more loaded area means more settlement at every point.
    // On a thin layer all three agree to rounding: a 1e-9 relative margin.
    fc.assert(
      fc.property(fc.double({ min: 0.05, max: 30, noNaN: true }), fc.double({ min: 0, max: 0.5, noNaN: true }), fc.boolean(), (thicknessM, poissonRatio, halfSpace) => {
        const nu = halfSpace ? poissonRatio : 0;
        const layerThicknessM = halfSpace ? Infinity : thicknessM;
        const settle = (shape: 'circle' | 'square', widthM: number) =>
          immediateSettlementFiniteLayer({ ...base, poissonRatio: nu, widthM, lengthM: widthM, shape, layerThicknessM, position: 'centre' }).settlementM;
        const circle = settle('circle', 2);
        expect(circle).toBeGreaterThanOrEqual(settle('square', Math.SQRT2) * (1 - 1e-9));
        expect(circle).toBeLessThanOrEqual(settle('square', 2) * (1 + 1e-9));
      }),
    );
  });

  it('property: a strip is the limit of a long rectangle (L = 10⁵·B), at the centre and at an edge', () => {
    // A corner rectangle of length L′ misses (1/2π)·n′²/(2m′)… of F1 against the infinite one: below 1e-9 here.
    fc.assert(
      fc.property(fc.double({ min: 0.1, max: 20, noNaN: true }), fc.constantFrom('centre' as const, 'corner' as const), (layerThicknessM, position) => {
        const strip = immediateSettlementFiniteLayer({ ...base, shape: 'strip', layerThicknessM, position }).settlementM;
        const centreOfLong = immediateSettlementFiniteLayer({ ...base, lengthM: 2e5, layerThicknessM, position: 'centre' }).settlementM;
        // An edge of the strip is the middle of a long side: two corner rectangles of B × L/2.
        const edgeOfLong = 2 * immediateSettlementFiniteLayer({ ...base, lengthM: 1e5, layerThicknessM, position: 'corner' }).settlementM;
        expect(strip).toBeCloseTo(position === 'centre' ? centreOfLong : edgeOfLong, 9);
      }),
    );
  });

  it('steinbrennerFactors in the strip limit: m′ = Infinity equals m′ = 10⁷, F1 = ln(1 + n′²)/(2π), F2 = (n′/2π)·atan(1/n′)', () => {
    // Hand calculation at n′ = 1: F1 = ln 2/(2π) = 0.110318; F2 = (1/2π)(π/4) = 0.125.
    expect(steinbrennerFactors(Infinity, 1).f1).toBeCloseTo(0.110318, 6);
    expect(steinbrennerFactors(Infinity, 1).f2).toBeCloseTo(0.125, 12);
    for (const n of [0.2, 1, 5, 40]) {
      expect(steinbrennerFactors(Infinity, n).f1).toBeCloseTo(steinbrennerFactors(1e7, n).f1, 6);
      expect(steinbrennerFactors(Infinity, n).f2).toBeCloseTo(steinbrennerFactors(1e7, n).f2, 6);
    }
  });

  it('throws RangeError for a strip on a half-space, Fox’s depth from a circle or strip, or a square with L ≠ B', () => {
    expect(() => immediateSettlementFiniteLayer({ ...base, shape: 'strip', layerThicknessM: Infinity, position: 'centre' })).toThrow(
      new RangeError('immediateSettlementFiniteLayer requires a finite layerThicknessM under a strip: a strip on an elastic half-space settles without bound'),
    );
    expect(() => steinbrennerFactors(Infinity, Infinity)).toThrow(RangeError);
    expect(() => immediateSettlementFiniteLayer({ ...base, shape: 'circle', layerThicknessM: 3, position: 'centre', foundationDepthM: 1 })).toThrow(
      new RangeError("immediateSettlementFiniteLayer requires depthFactor, not foundationDepthM, for a circle: Fox's (1948) solution is for rectangles"),
    );
    expect(() => immediateSettlementFiniteLayer({ ...base, shape: 'square', lengthM: 3, layerThicknessM: 3, position: 'centre' })).toThrow(
      new RangeError('immediateSettlementFiniteLayer requires lengthM = widthM for a square'),
    );
  });
});
