import { describe, expect, it } from 'vitest';
import { characteristicValues } from './characteristic-values.js';
import { SETTLEMENT_UNFAVOURABLE_SIDE } from './settlement-unfavourable-side.js';

describe('characteristicValues({ values, scale, unfavourableSide })', () => {
  it('Cc from five tests: mean, sd, COV, Student-t and Schneider on the upper (unfavourable) side', () => {
    // Hand calculation: mean 0.32; squared deviations 0.0004 + 0.0004 + 0.0016 + 0.0016 + 0 = 0.004,
    // s = √(0.004/4) = 0.031623, COV = 0.098821; t(0.95, 4) = 2.132 (t table);
    // upper bound 0.32 + 2.1318 × 0.031623/√5 = 0.35015; Schneider upper 0.32 + 0.031623/2 = 0.33581.
    const result = characteristicValues({ values: [0.3, 0.34, 0.28, 0.36, 0.32], unfavourableSide: SETTLEMENT_UNFAVOURABLE_SIDE.cc });
    expect(result.count).toBe(5);
    expect(result.mean).toBeCloseTo(0.32, 12);
    expect(result.standardDeviation).toBeCloseTo(0.031623, 6);
    expect(result.coefficientOfVariation).toBeCloseTo(0.098821, 6);
    expect(result.meanUpperBound95).toBeCloseTo(0.35015, 5);
    expect(result.meanLowerBound95).toBeCloseTo(0.28985, 5);
    expect(result.schneiderUpper).toBeCloseTo(0.33581, 5);
    expect(result.characteristicStudentT).toBe(result.meanUpperBound95);
    expect(result.characteristicSchneider).toBe(result.schneiderUpper);
    expect(result.warnings).toEqual([]);
  });

  it('Schneider lower is Xm·(1 − COV/2)', () => {
    const result = characteristicValues({ values: [10, 12, 14], unfavourableSide: 'lower' });
    expect(result.schneiderLower).toBeCloseTo(12 * (1 - (result.coefficientOfVariation ?? 0) / 2), 12);
    expect(result.characteristicSchneider).toBe(result.schneiderLower);
  });

  it('cv on a log scale: geometric mean and bounds transformed back, lower side unfavourable', () => {
    // Hand calculation: log10 of 1, 10, 100 = 0, 1, 2 → mean 1 (geometric mean 10), s = 1 (log10 units);
    // t(0.95, 2) = 2.920 → lower bound 10^(1 − 2.92/√3) = 10^(−0.6858) = 0.2062 m²/yr; Schneider 10^0.5 = 3.162.
    const result = characteristicValues({ values: [1, 10, 100], scale: 'log', unfavourableSide: SETTLEMENT_UNFAVOURABLE_SIDE.cv });
    expect(result.mean).toBeCloseTo(10, 12);
    expect(result.standardDeviation).toBeCloseTo(1, 12);
    expect(result.coefficientOfVariation).toBeNull();
    expect(result.characteristicStudentT).toBeCloseTo(0.2062, 3);
    expect(result.characteristicSchneider).toBeCloseTo(3.1623, 4);
  });

  it('warns when fewer than five tests are available', () => {
    expect(characteristicValues({ values: [1, 2, 3], unfavourableSide: 'upper' }).warnings[0]).toMatch(/Only 3 tests/);
  });

  it('answers null bounds with a warning for a single test', () => {
    const result = characteristicValues({ values: [0.3], unfavourableSide: 'upper' });
    expect(result.mean).toBe(0.3);
    expect(result.standardDeviation).toBeNull();
    expect(result.characteristicStudentT).toBeNull();
    expect(result.warnings[0]).toMatch(/Only one test/);
  });

  it('warns when the spread suggests mixed strata (COV above 50 %)', () => {
    expect(characteristicValues({ values: [0.1, 0.5, 0.9, 0.2, 1.2], unfavourableSide: 'upper' }).warnings.some((w) => /mix different soils/.test(w))).toBe(true);
  });

  it('throws RangeError for no values, non-finite values, or non-positive values on a log scale', () => {
    expect(() => characteristicValues({ values: [], unfavourableSide: 'upper' })).toThrow(new RangeError('characteristicValues requires at least one value'));
    expect(() => characteristicValues({ values: [1, Number.NaN], unfavourableSide: 'upper' })).toThrow(new RangeError('characteristicValues requires finite values'));
    expect(() => characteristicValues({ values: [1, 0], scale: 'log', unfavourableSide: 'lower' })).toThrow(new RangeError('characteristicValues requires positive values on a log scale'));
  });
});
