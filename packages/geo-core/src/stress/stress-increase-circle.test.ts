import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { gaussLegendreRule } from '../settlement/gauss-legendre-rule.js';
import { stressIncreaseCircle } from './stress-increase-circle.js';
import { stressIncreaseRectangle } from './stress-increase-rectangle.js';

// An independent quadrature of Boussinesq's point load over the circle: 96-point Gauss–Legendre
// in ρ (from the centre) times 192-point Gauss–Legendre in θ, Cartesian distance to the point.
const { nodes: nodesRho, weights: weightsRho } = gaussLegendreRule(96);
const { nodes: nodesTheta, weights: weightsTheta } = gaussLegendreRule(192);
const bruteForceInfluence = (radiusM: number, offsetM: number, depthM: number): number => {
  let sum = 0;
  nodesRho.forEach((u, i) => {
    const rho = (radiusM / 2) * (1 + u);
    nodesTheta.forEach((v, j) => {
      const theta = Math.PI * (1 + v);
      const dx = rho * Math.cos(theta) - offsetM;
      const dy = rho * Math.sin(theta);
      const r2 = dx * dx + dy * dy + depthM * depthM;
      sum += (weightsRho[i] ?? 0) * (weightsTheta[j] ?? 0) * (radiusM / 2) * Math.PI * rho * ((3 * depthM ** 3) / (2 * Math.PI * r2 ** 2.5));
    });
  });
  return sum;
};

describe('stressIncreaseCircle({ pressureKpa, radiusM, depthM })', () => {
  // Hand calculations of q·[1 − (1 + (R/z)²)^−1.5]: z/R = 2 → 1 − 0.8^1.5 = 1 − 0.715542 = 0.284458;
  // z/R = 1 → 1 − 0.5^1.5 = 1 − 0.353553 = 0.646447; z/R = 0.5 → 1 − 0.2^1.5 = 1 − 0.089443 = 0.910557.
  it.each([
    [2, 0.284458],
    [1, 0.646447],
    [0.5, 0.910557],
  ])('at z/R = %s the ratio Δσz/q is %s (hand calculation, six decimals)', (depthOverRadius, expected) => {
    expect(Math.abs(stressIncreaseCircle({ pressureKpa: 1, radiusM: 1, depthM: depthOverRadius }) - expected)).toBeLessThanOrEqual(0.0000005);
  });

  it('property: falls as depth grows and never exceeds q', () => {
    fc.assert(
      fc.property(fc.double({ min: 0.01, max: 50, noNaN: true }), fc.double({ min: 0.01, max: 50, noNaN: true }), (radiusM, depthM) => {
        const upper = stressIncreaseCircle({ pressureKpa: 100, radiusM, depthM });
        expect(upper).toBeLessThanOrEqual(100);
        expect(stressIncreaseCircle({ pressureKpa: 100, radiusM, depthM: depthM * 1.5 })).toBeLessThan(upper);
      }),
    );
  });

  it('tends to Boussinesq’s point load 3P/(2πz²) for a small circle', () => {
    // P = q·πR² with R = 0.01 m, z = 5 m: the series 1 − (1 + a)^−1.5 = 1.5a(1 − 1.25a + …), a = (R/z)²,
    // puts the circle within 1.25a = 5e-6 of the point load.
    const pressureKpa = 1000;
    const pointLoadKpa = (3 * pressureKpa * Math.PI * 0.01 ** 2) / (2 * Math.PI * 25);
    expect(stressIncreaseCircle({ pressureKpa, radiusM: 0.01, depthM: 5 }) / pointLoadKpa).toBeCloseTo(1, 4);
  });

  it.each([
    [0.5, 0.5],
    [1, 0.5],
    [1, 1],
    [1.5, 1],
    [3, 2],
  ])('off the axis (r/R = %s, z/R = %s) agrees with an independent quadrature of the point load to 1e-9 of q', (offset, depth) => {
    expect(Math.abs(stressIncreaseCircle({ pressureKpa: 1, radiusM: 1, depthM: depth, radialOffsetM: offset }) - bruteForceInfluence(1, offset, depth))).toBeLessThan(1e-9);
  });

  it('is continuous onto the axis: a 1 µm offset gives the closed form', () => {
    expect(stressIncreaseCircle({ pressureKpa: 100, radiusM: 1.2, depthM: 0.7, radialOffsetM: 1e-6 })).toBeCloseTo(stressIncreaseCircle({ pressureKpa: 100, radiusM: 1.2, depthM: 0.7 }), 9);
  });

  it('equilibrium: Δσz integrated over the whole plane at any depth carries the load, 2π∫Δσz·r dr = q·πR²', () => {
    // Gauss–Legendre in r on [0, 40R] (the tail beyond carries (z/40R)²·… < 1e-3 of the load at z = R; it is
    // added in closed form from the point-load tail, 3P z³/(2π)∫ 2πr dr/(r²+z²)^2.5 = P·z³/(r²+z²)^1.5).
    const { nodes, weights } = gaussLegendreRule(200);
    const depthM = 1;
    const outerM = 40;
    let carriedKn = 0;
    nodes.forEach((u, i) => {
      const r = (outerM / 2) * (1 + u);
      carriedKn += (weights[i] ?? 0) * (outerM / 2) * 2 * Math.PI * r * stressIncreaseCircle({ pressureKpa: 1, radiusM: 1, depthM, radialOffsetM: r });
    });
    const tailKn = Math.PI * depthM ** 3 / (outerM * outerM + depthM * depthM) ** 1.5;
    expect((carriedKn + tailKn) / Math.PI).toBeCloseTo(1, 4);
  });

  it('property: at any point a circle lies between its inscribed and circumscribed squares (same pressure)', () => {
    // The point-load kernel is positive, so a larger loaded area gives more stress at every point:
    // inscribed square side D/√2 ⊂ circle of diameter D ⊂ circumscribed square side D.
    fc.assert(
      fc.property(
        fc.double({ min: 0, max: 4, noNaN: true }),
        fc.double({ min: 0, max: 2 * Math.PI, noNaN: true }),
        fc.double({ min: 0.05, max: 6, noNaN: true }),
        (offsetM, angle, depthM) => {
          const xM = offsetM * Math.cos(angle);
          const yM = offsetM * Math.sin(angle);
          const circle = stressIncreaseCircle({ pressureKpa: 100, radiusM: 1, depthM, radialOffsetM: offsetM });
          const inscribed = stressIncreaseRectangle({ pressureKpa: 100, widthM: Math.SQRT2, lengthM: Math.SQRT2, xM, yM, depthM });
          const circumscribed = stressIncreaseRectangle({ pressureKpa: 100, widthM: 2, lengthM: 2, xM, yM, depthM });
          expect(circle).toBeGreaterThanOrEqual(inscribed - 1e-9);
          expect(circle).toBeLessThanOrEqual(circumscribed + 1e-9);
        },
      ),
    );
  });

  it('throws RangeError for a non-positive radius or depth', () => {
    expect(() => stressIncreaseCircle({ pressureKpa: 1, radiusM: 1, depthM: 1, radialOffsetM: -1 })).toThrow(new RangeError('stressIncreaseCircle requires a finite radialOffsetM >= 0'));
    expect(() => stressIncreaseCircle({ pressureKpa: 1, radiusM: 0, depthM: 1 })).toThrow(new RangeError('stressIncreaseCircle requires finite radiusM > 0'));
    expect(() => stressIncreaseCircle({ pressureKpa: 1, radiusM: 1, depthM: -1 })).toThrow(new RangeError('stressIncreaseCircle requires finite depthM > 0'));
    expect(() => stressIncreaseCircle({ pressureKpa: Number.NaN, radiusM: 1, depthM: 1 })).toThrow(new RangeError('stressIncreaseCircle requires a finite pressureKpa'));
  });
});
