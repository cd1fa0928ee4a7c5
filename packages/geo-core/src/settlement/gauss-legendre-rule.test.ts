import { describe, expect, it } from 'vitest';
import { gaussLegendreRule } from './gauss-legendre-rule.js';

describe('gaussLegendreRule(pointCount)', () => {
  it('two points: ∓1/√3, weights 1 (Abramowitz & Stegun, table 25.4)', () => {
    const { nodes, weights } = gaussLegendreRule(2);
    expect(nodes[0]).toBeCloseTo(-1 / Math.sqrt(3), 15);
    expect(nodes[1]).toBeCloseTo(1 / Math.sqrt(3), 15);
    expect([...weights]).toEqual([expect.closeTo(1, 15), expect.closeTo(1, 15)]);
  });

  it('five points: the published nodes 0, ±0.5384693101, ±0.9061798459 and weights 0.5688888889, 0.4786286705, 0.2369268851 (A&S table 25.4)', () => {
    const { nodes, weights } = gaussLegendreRule(5);
    expect([...nodes].map((x) => Number(x.toFixed(10)))).toEqual([-0.9061798459, -0.5384693101, 0, 0.5384693101, 0.9061798459]);
    expect([...weights].map((w) => Number(w.toFixed(10)))).toEqual([0.2369268851, 0.4786286705, 0.5688888889, 0.4786286705, 0.2369268851]);
  });

  it('integrates every polynomial of degree 2n − 1 exactly', () => {
    for (const n of [1, 3, 8, 24]) {
      const { nodes, weights } = gaussLegendreRule(n);
      const degree = 2 * n - 1;
      const even = degree - 1;
      const integral = (power: number) => nodes.reduce((sum, x, i) => sum + (weights[i] ?? 0) * x ** power, 0);
      expect(integral(even)).toBeCloseTo(2 / (even + 1), 13);
      expect(integral(degree)).toBeCloseTo(0, 13);
    }
  });

  it('throws RangeError for a count that is not an integer in 1–200', () => {
    expect(() => gaussLegendreRule(0)).toThrow(new RangeError('gaussLegendreRule requires an integer pointCount from 1 to 200'));
    expect(() => gaussLegendreRule(2.5)).toThrow(new RangeError('gaussLegendreRule requires an integer pointCount from 1 to 200'));
  });
});
