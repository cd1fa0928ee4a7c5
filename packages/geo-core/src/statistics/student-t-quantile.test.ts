import { describe, expect, it } from 'vitest';
import { studentTQuantile } from './student-t-quantile.js';

// One-sided critical values of Student's t as printed in the standard t table
// (e.g. the table of percentage points in any statistics handbook; three decimals,
// from memory). Tolerance: half a unit of the third decimal.
const T_TABLE: ReadonlyArray<readonly [number, number, number]> = [
  [0.95, 1, 6.314],
  [0.95, 2, 2.92],
  [0.95, 3, 2.353],
  [0.95, 4, 2.132],
  [0.95, 5, 2.015],
  [0.95, 6, 1.943],
  [0.95, 7, 1.895],
  [0.95, 8, 1.86],
  [0.95, 9, 1.833],
  [0.95, 10, 1.812],
  [0.95, 15, 1.753],
  [0.95, 20, 1.725],
  [0.95, 30, 1.697],
  [0.95, 60, 1.671],
  [0.95, 120, 1.658],
  [0.975, 1, 12.706],
  [0.975, 10, 2.228],
  [0.99, 5, 3.365],
];

describe('studentTQuantile(probability, degreesOfFreedom)', () => {
  it.each(T_TABLE)('t(%s, ν = %s) is the published %s', (probability, dof, expected) => {
    expect(Math.abs(studentTQuantile(probability, dof) - expected)).toBeLessThanOrEqual(0.0005);
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
