import { describe, expect, it } from 'vitest';
import { gaussLegendreRule } from '../settlement/gauss-legendre-rule.js';
import { studentTQuantile } from './student-t-quantile.js';

// An independent route to each quantile: Student's density f(x) = c(ν)·(1 + x²/ν)^(−(ν+1)/2) integrated from 0 to
// t by 96-point Gauss–Legendre gives back p − ½. c(1) = 1/π, c(2) = 1/(2√2), and c(ν + 2) = c(ν)·((ν + 1)/ν)·√(ν/(ν + 2))
// (the Γ-function ratio stepped by Γ(x + 1) = x·Γ(x)).
const { nodes, weights } = gaussLegendreRule(96);
const densityConstant = (dof: number): number => {
  let c = dof % 2 === 1 ? 1 / Math.PI : 1 / (2 * Math.SQRT2);
  for (let nu = dof % 2 === 1 ? 1 : 2; nu < dof; nu += 2) c *= ((nu + 1) / nu) * Math.sqrt(nu / (nu + 2));
  return c;
};
const probabilityBelow = (t: number, dof: number): number =>
  0.5 + nodes.reduce((sum, u, i) => sum + (weights[i] ?? 0) * (t / 2) * densityConstant(dof) * (1 + ((t / 2) * (1 + u)) ** 2 / dof) ** (-(dof + 1) / 2), 0);

describe('studentTQuantile(probability, degreesOfFreedom)', () => {
  it.each([
    [0.95, 1],
    [0.95, 2],
    [0.95, 3],
    [0.95, 4],
    [0.95, 5],
    [0.95, 9],
    [0.95, 19],
    [0.95, 29],
    [0.975, 10],
    [0.99, 5],
  ])('t(%s, ν = %s) gives back its probability through the density integrated independently (1e-9)', (probability, dof) => {
    expect(Math.abs(probabilityBelow(studentTQuantile(probability, dof), dof) - probability)).toBeLessThan(1e-9);
  });

  it('t(0.95, ν = 4) is the closed form 2√(q − 1), q = cos(acos(√α)/3)/√α, α = 4p(1 − p) (hand calculation: 2.131847)', () => {
    // α = 4 × 0.95 × 0.05 = 0.19, √α = 0.435890, acos = 1.119770, /3 = 0.373257, cos = 0.931145, q = 2.136193, t = 2√1.136193 = 2.131847.
    const alpha = 4 * 0.95 * 0.05;
    const q = Math.cos(Math.acos(Math.sqrt(alpha)) / 3) / Math.sqrt(alpha);
    expect(studentTQuantile(0.95, 4)).toBeCloseTo(2 * Math.sqrt(q - 1), 9);
  });

  it('matches the closed forms for ν = 1 (Cauchy: tan(π(p − ½))) and ν = 2 ((2p − 1)·√(2/(1 − (2p − 1)²)))', () => {
    expect(studentTQuantile(0.95, 1)).toBeCloseTo(Math.tan(Math.PI * 0.45), 9);
    const a = 2 * 0.9 - 1;
    expect(studentTQuantile(0.9, 2)).toBeCloseTo(a * Math.sqrt(2 / (1 - a * a)), 9);
  });

  it('tends to the normal quantile 1.6449 for many degrees of freedom', () => {
    expect(studentTQuantile(0.95, 10_000)).toBeCloseTo(1.6449, 3);
  });

  it('is antisymmetric about the median', () => {
    expect(studentTQuantile(0.05, 7)).toBeCloseTo(-studentTQuantile(0.95, 7), 12);
    expect(studentTQuantile(0.5, 7)).toBe(0);
  });

  it('throws RangeError for a probability outside (0, 1) or a non-integer ν', () => {
    expect(() => studentTQuantile(1, 3)).toThrow(new RangeError('studentTQuantile requires probability strictly between 0 and 1'));
    expect(() => studentTQuantile(0.95, 2.5)).toThrow(new RangeError('studentTQuantile requires degreesOfFreedom to be an integer >= 1'));
    expect(() => studentTQuantile(0.95, 0)).toThrow(RangeError);
  });
});
