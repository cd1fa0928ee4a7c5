import { describe, expect, it } from 'vitest';
import { circleDisplacementFactor } from './circle-displacement-factor.js';
import { completeEllipticIntegrals } from './complete-elliptic-integrals.js';
import { gaussLegendreRule } from './gauss-legendre-rule.js';

// Independent quadrature of Boussinesq's point-load displacement (1 + ν)/(2π)·[2(1 − ν)/R + z²/R³] over
// the circle: 96-point Gauss–Legendre in ρ times 192-point in θ about the centre.
const { nodes: nodesRho, weights: weightsRho } = gaussLegendreRule(96);
const { nodes: nodesTheta, weights: weightsTheta } = gaussLegendreRule(192);
const bruteForce = (a: number, r: number, z: number, nu: number): number => {
  let sum = 0;
  nodesRho.forEach((u, i) => {
    const rho = (a / 2) * (1 + u);
    nodesTheta.forEach((v, j) => {
      const theta = Math.PI * (1 + v);
      const slant = Math.hypot(rho * Math.cos(theta) - r, rho * Math.sin(theta), z);
      sum += (weightsRho[i] ?? 0) * (weightsTheta[j] ?? 0) * (a / 2) * Math.PI * rho * ((1 + nu) / (2 * Math.PI)) * ((2 * (1 - nu)) / slant + (z * z) / slant ** 3);
    });
  });
  return sum;
};

describe('circleDisplacementFactor(radiusM, offsetM, depthM, poissonRatio)', () => {
  it('at the surface: 2(1 − ν²)a at the centre and 4(1 − ν²)a/π at the rim (Timoshenko & Goodier)', () => {
    expect(circleDisplacementFactor(1.5, 0, 0, 0.25)).toBeCloseTo(2 * 0.9375 * 1.5, 12);
    expect(circleDisplacementFactor(1.5, 1.5, 0, 0.25)).toBeCloseTo((4 * 0.9375 * 1.5) / Math.PI, 12);
  });

  it.each([
    [0.6, 0.8],
    [1, 0.5],
    [2.5, 0.8],
    [4, 3],
  ])('below the surface (r/a = %s, z/a = %s) agrees with an independent quadrature to 1e-8', (r, z) => {
    expect(Math.abs(circleDisplacementFactor(1, r, z, 0.3) - bruteForce(1, r, z, 0.3))).toBeLessThan(1e-8);
  });

  it('the surface closed forms are the limit of the integral below: continuous at z → 0 inside and outside', () => {
    for (const r of [0.4, 2]) expect(circleDisplacementFactor(1, r, 1e-7, 0.3)).toBeCloseTo(circleDisplacementFactor(1, r, 0, 0.3), 5);
  });
});

describe('completeEllipticIntegrals(modulus)', () => {
  it('gives K(0) = E(0) = π/2 and Legendre’s relation E·K′ + E′·K − K·K′ = π/2 at k = 0.6, k′ = 0.8', () => {
    expect(completeEllipticIntegrals(0)).toEqual({ k: Math.PI / 2, e: Math.PI / 2 });
    const a = completeEllipticIntegrals(0.6);
    const b = completeEllipticIntegrals(0.8);
    expect(a.e * b.k + b.e * a.k - a.k * b.k).toBeCloseTo(Math.PI / 2, 13);
  });

  it('throws RangeError outside 0 ≤ k < 1', () => {
    expect(() => completeEllipticIntegrals(1)).toThrow(new RangeError('completeEllipticIntegrals requires 0 <= modulus < 1'));
  });
});
