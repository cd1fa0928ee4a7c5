import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { naturalQuinticSpline } from './natural-quintic-spline.js';

const sortedDistinct = fc
  .uniqueArray(fc.double({ min: -3, max: 3, noNaN: true }), { minLength: 3, maxLength: 12, comparator: (a, b) => Math.abs(a - b) < 0.05 })
  .map((values) => [...values].sort((a, b) => a - b));

describe('naturalQuinticSpline(xs, ys)', () => {
  it('passes through every data point', () => {
    fc.assert(
      fc.property(sortedDistinct, fc.array(fc.double({ min: -2, max: 2, noNaN: true }), { minLength: 12, maxLength: 12 }), (xs, values) => {
        const ys = xs.map((_, index) => values[index] as number);
        const spline = naturalQuinticSpline(xs, ys);
        xs.forEach((x, index) => expect(spline(x).value).toBeCloseTo(ys[index] as number, 8));
      }),
    );
  });

  it('reproduces straight data exactly: the line itself, its slope, and zero curvature everywhere', () => {
    fc.assert(
      fc.property(sortedDistinct, fc.double({ min: -1, max: 1, noNaN: true }), fc.double({ min: -1, max: 1, noNaN: true }), (xs, intercept, slope) => {
        const spline = naturalQuinticSpline(xs, xs.map((x) => intercept + slope * x));
        for (const x of [xs[0] as number, ((xs[0] as number) + (xs[1] as number)) / 2, xs[xs.length - 1] as number]) {
          const sample = spline(x);
          expect(sample.value).toBeCloseTo(intercept + slope * x, 8);
          expect(sample.slope).toBeCloseTo(slope, 7);
          expect(sample.secondDerivative).toBeCloseTo(0, 6);
        }
      }),
    );
  });

  it('reproduces quadratic data exactly (its polynomial part is quadratic): f = x² gives f″ = 2 between the points', () => {
    const xs = [0, 0.3, 1, 1.7, 2.2, 3];
    const spline = naturalQuinticSpline(xs, xs.map((x) => x * x));
    expect(spline(1.35).value).toBeCloseTo(1.8225, 9);
    expect(spline(1.35).slope).toBeCloseTo(2.7, 8);
    expect(spline(0.65).secondDerivative).toBeCloseTo(2, 7);
  });

  it('is symmetric for mirrored data: f(−x) = f(x) when the points are mirrored', () => {
    const xs = [-2, -1, -0.4, 0.4, 1, 2];
    const spline = naturalQuinticSpline(xs, xs.map((x) => Math.abs(x) ** 1.5));
    for (const x of [0.2, 0.7, 1.6]) expect(spline(-x).value).toBeCloseTo(spline(x).value, 10);
  });

  it('puts the sharpest bend between the points when the data do (a cubic spline could only put it on one)', () => {
    // Two straight lines meeting at x = 0.5, sampled at whole numbers: the bend is midway between 0 and 1.
    const xs = [-3, -2, -1, 0, 1, 2, 3, 4];
    const spline = naturalQuinticSpline(xs, xs.map((x) => (x < 0.5 ? 0 : -(x - 0.5))));
    let best = { x: 0, bend: -Infinity };
    for (let x = -1; x <= 2; x += 0.001) if (-spline(x).secondDerivative > best.bend) best = { x, bend: -spline(x).secondDerivative };
    expect(best.x).toBeGreaterThan(0.1);
    expect(best.x).toBeLessThan(0.9);
  });

  it.each([
    ['fewer than three points', [0, 1], [0, 1]],
    ['unequal lengths', [0, 1, 2], [0, 1]],
    ['abscissae that do not increase', [0, 1, 1], [0, 1, 2]],
    ['a value that is not finite', [0, 1, 2], [0, Number.NaN, 2]],
  ])('throws a RangeError for %s', (_, xs, ys) => {
    expect(() => naturalQuinticSpline(xs, ys)).toThrow('naturalQuinticSpline requires');
  });
});
