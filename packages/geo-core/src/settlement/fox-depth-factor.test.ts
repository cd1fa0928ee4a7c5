import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { elasticInfluenceFactor } from './elastic-influence-factor.js';
import { foxDepthFactor } from './fox-depth-factor.js';
import { gaussLegendreRule } from './gauss-legendre-rule.js';

describe('foxDepthFactor(lengthToWidthRatio, depthToWidthRatio, poissonRatio)', () => {
  it('is 1 at the surface and tends to Kelvin’s full-space ratio (3 − 4ν)/(8(1 − ν)²) at great depth', () => {
    expect(foxDepthFactor(1, 0, 0.3)).toBe(1);
    for (const nu of [0, 0.3, 0.5]) {
      const kelvin = (3 - 4 * nu) / (8 * (1 - nu) ** 2);
      expect(foxDepthFactor(1, 1000, nu)).toBeCloseTo(kelvin, 3);
      expect(foxDepthFactor(1, 1000, nu)).toBeGreaterThan(kelvin);
    }
  });

  it('agrees with an independent Cartesian quadrature of Mindlin’s kernel (D/B = 1, L/B = 2, ν = 0.25)', () => {
    // J1 from the closed-form average factor: mean surface settlement q·B(1 − ν²)/E·αav
    // = q(1 − ν²)/(πE·A)·4J1, so J1 = π·B²·L·αav/4. J2, J3, J5 are smooth at h = 2D = 2B:
    // a 48 × 48 Gauss–Legendre product rule over the weight (B − u)(L − v).
    const b = 1;
    const l = 2;
    const d = 1;
    const nu = 0.25;
    const h = 2 * d;
    const j1 = (Math.PI * b * b * l * (elasticInfluenceFactor('rectangle', l / b, 'average') ?? 0)) / 4;
    const { nodes, weights } = gaussLegendreRule(48);
    let j2 = 0;
    let j3 = 0;
    let j5 = 0;
    nodes.forEach((xu, i) => {
      nodes.forEach((xv, k) => {
        const u = (b / 2) * (1 + xu);
        const v = (l / 2) * (1 + xv);
        const w = ((weights[i] ?? 0) * (weights[k] ?? 0) * (b / 2) * (l / 2) * (b - u) * (l - v));
        const r = Math.sqrt(u * u + v * v + h * h);
        j2 += w / r;
        j3 += w / r ** 3;
        j5 += w / r ** 5;
      });
    });
    const surface = 8 * (1 - nu) ** 2;
    const expected = ((3 - 4 * nu) * j1 + (surface - (3 - 4 * nu)) * j2 + (10 - 16 * nu) * d * d * j3 + 24 * d ** 4 * j5) / (surface * j1);
    expect(foxDepthFactor(l / b, d / b, nu)).toBeCloseTo(expected, 10);
  });

  it('property: falls as the footing goes deeper, and is within (Kelvin ratio, 1]', () => {
    fc.assert(
      fc.property(fc.double({ min: 1, max: 10, noNaN: true }), fc.double({ min: 0.01, max: 5, noNaN: true }), fc.double({ min: 0, max: 0.5, noNaN: true }), (lb, db, nu) => {
        const shallow = foxDepthFactor(lb, db, nu);
        expect(foxDepthFactor(lb, db * 1.5, nu)).toBeLessThan(shallow);
        expect(shallow).toBeLessThanOrEqual(1);
        expect(shallow).toBeGreaterThan((3 - 4 * nu) / (8 * (1 - nu) ** 2));
      }),
      { numRuns: 60 },
    );
  });

  it('is larger for longer footings and for higher ν at the same Df/B, as the published chart’s curves are ordered', () => {
    expect(foxDepthFactor(5, 0.6, 0.3)).toBeGreaterThan(foxDepthFactor(2, 0.6, 0.3));
    expect(foxDepthFactor(2, 0.6, 0.3)).toBeGreaterThan(foxDepthFactor(1, 0.6, 0.3));
    expect(foxDepthFactor(1, 0.6, 0.5)).toBeGreaterThan(foxDepthFactor(1, 0.6, 0.4));
    expect(foxDepthFactor(1, 0.6, 0.4)).toBeGreaterThan(foxDepthFactor(1, 0.6, 0.3));
  });

  it('throws RangeError for L/B < 1, D/B < 0 or ν outside 0–0.5', () => {
    expect(() => foxDepthFactor(0.5, 1, 0.3)).toThrow(new RangeError('foxDepthFactor requires a finite lengthToWidthRatio >= 1'));
    expect(() => foxDepthFactor(1, -1, 0.3)).toThrow(new RangeError('foxDepthFactor requires a finite depthToWidthRatio >= 0'));
    expect(() => foxDepthFactor(1, Infinity, 0.3)).toThrow(new RangeError('foxDepthFactor requires a finite depthToWidthRatio >= 0'));
    expect(() => foxDepthFactor(1, 1, 0.6)).toThrow(new RangeError('foxDepthFactor requires 0 <= poissonRatio <= 0.5'));
  });
});
