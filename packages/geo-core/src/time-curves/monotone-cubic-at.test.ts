import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { monotoneCubicAt } from './monotone-cubic-at.js';

const increasingXs = fc
  .uniqueArray(fc.double({ min: 0, max: 100, noNaN: true }), { minLength: 2, maxLength: 10, comparator: (a, b) => Math.abs(a - b) < 0.01 })
  .map((values) => Float64Array.from([...values].sort((a, b) => a - b)));

/** Evaluate the interpolant anywhere inside the data, by finding the segment that holds x. */
function at(xs: Float64Array, ys: Float64Array, x: number): number {
  let segment = 0;
  while (segment < xs.length - 2 && x > (xs[segment + 1] as number)) segment += 1;
  return monotoneCubicAt(xs, ys, segment, x);
}

describe('monotoneCubicAt(xs, ys, segment, x)', () => {
  it('reproduces the data at both ends of every segment', () => {
    fc.assert(
      fc.property(increasingXs, fc.array(fc.double({ min: -5, max: 5, noNaN: true }), { minLength: 10, maxLength: 10 }), (xs, values) => {
        const ys = Float64Array.from(xs, (_, index) => values[index] as number);
        for (let segment = 0; segment + 1 < xs.length; segment += 1) {
          expect(monotoneCubicAt(xs, ys, segment, xs[segment] as number)).toBeCloseTo(ys[segment] as number, 10);
          expect(monotoneCubicAt(xs, ys, segment, xs[segment + 1] as number)).toBeCloseTo(ys[segment + 1] as number, 10);
        }
      }),
    );
  });

  it('gives a monotone curve through monotone data (Fritsch & Carlson 1980): no wiggle between readings', () => {
    fc.assert(
      fc.property(increasingXs, fc.array(fc.double({ min: 0, max: 3, noNaN: true }), { minLength: 10, maxLength: 10 }), (xs, steps) => {
        let total = 0;
        const ys = Float64Array.from(xs, (_, index) => (total += steps[index] as number));
        const first = xs[0] as number;
        const span = (xs[xs.length - 1] as number) - first;
        let previous = -Infinity;
        for (let sample = 0; sample <= 400; sample += 1) {
          const value = at(xs, ys, first + (span * sample) / 400);
          expect(value).toBeGreaterThanOrEqual(previous - 1e-12);
          previous = value;
        }
      }),
    );
  });

  it('reproduces straight data: the line itself, so its second differences (curvature) vanish', () => {
    const xs = Float64Array.of(0, 1, 2.5, 4, 7);
    const ys = Float64Array.from(xs, (x) => 0.3 - 0.2 * x);
    for (let x = 0.1; x < 6.9; x += 0.37) {
      expect(at(xs, ys, x)).toBeCloseTo(0.3 - 0.2 * x, 12);
      expect(at(xs, ys, x - 0.05) - 2 * at(xs, ys, x) + at(xs, ys, x + 0.05)).toBeCloseTo(0, 12);
    }
  });

  it('holds a flat segment flat', () => {
    const xs = Float64Array.of(0, 1, 2, 3);
    const ys = Float64Array.of(0, 1, 1, 2);
    expect(monotoneCubicAt(xs, ys, 1, 1.5)).toBe(1);
  });

  it('throws a RangeError for a segment outside the arrays', () => {
    expect(() => monotoneCubicAt(Float64Array.of(0, 1), Float64Array.of(0, 1), 1, 0.5)).toThrow('monotoneCubicAt requires');
  });
});
