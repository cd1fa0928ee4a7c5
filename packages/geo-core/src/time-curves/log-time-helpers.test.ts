import { describe, expect, it } from 'vitest';
import { logTimeCorrectedZero } from './log-time-corrected-zero.js';
import { steepestLogTimeTangent } from './steepest-log-time-tangent.js';

describe('logTimeCorrectedZero(logs, deformations, d100Mm)', () => {
  it('gives d0 = 2·d(t1) − d(4·t1) from the first pair (hand calculation: 2 × 0.10 − 0.15 = 0.05 mm)', () => {
    const zero = logTimeCorrectedZero(Float64Array.of(0, Math.log10(4)), Float64Array.of(0.1, 0.15), null);
    expect(zero?.d0Mm).toBeCloseTo(0.05, 12);
    expect(zero?.pairCount).toBe(1);
  });

  it('averages every pair of a parabolic early curve d = d0 + a·√t, each giving d0 exactly', () => {
    const logs = Float64Array.from({ length: 9 }, (_, index) => -1 + index * 0.25);
    const deformations = Float64Array.from(logs, (log) => 0.02 + 0.01 * Math.sqrt(10 ** log));
    const zero = logTimeCorrectedZero(logs, deformations, 1);
    expect(zero?.pairCount).toBeGreaterThan(1);
    expect(zero?.d0Mm).toBeCloseTo(0.02, 4);
  });

  it('returns null when the readings do not span a factor of four after the first', () => {
    expect(logTimeCorrectedZero(Float64Array.of(0, 0.5), Float64Array.of(0.1, 0.2), null)).toBeNull();
  });
});

describe('steepestLogTimeTangent(logs, deformations)', () => {
  it('finds the steepest window of a curve that steepens and then flattens, and passes through its centroid', () => {
    const logs = Float64Array.of(0, 1, 2, 3, 4);
    const deformations = Float64Array.of(0, 0.1, 0.5, 0.9, 1.0);
    const tangent = steepestLogTimeTangent(logs, deformations);
    // Centre 2: least squares through (1, 0.1), (2, 0.5), (3, 0.9) has slope 0.4 mm per cycle (hand calculation).
    expect(tangent?.index).toBe(2);
    expect(tangent?.slope).toBeCloseTo(0.4, 12);
    expect(tangent?.centroidLogTime).toBeCloseTo(2, 12);
    expect(tangent?.centroidDeformationMm).toBeCloseTo(0.5, 12);
  });

  it('returns null when the curve never steepens in compression', () => {
    expect(steepestLogTimeTangent(Float64Array.of(0, 1, 2), Float64Array.of(0.3, 0.2, 0.1))).toBeNull();
  });
});
