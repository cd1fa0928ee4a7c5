import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { convertUnit } from './convert-unit.js';
import { UNIT_CONVERSION_TABLE, type UnitName } from './unit-conversion-table.js';

// Each row: one of the unit, its value in the base unit as NIST SP 811 (2008),
// appendix B.8/B.9 prints it (7 significant figures unless exact), and half the
// last printed digit as the tolerance, because that is all the print promises.
const PRINTED_FACTORS: ReadonlyArray<readonly [UnitName, UnitName, number, number, string]> = [
  ['kgfPerCm2', 'kPa', 98.0665, 0, 'NIST SP 811: kgf/cm² = 9.806 65 E+04 Pa, exact'],
  ['psi', 'kPa', 6.894757, 5e-7, 'NIST SP 811: lbf/in² = 6.894 757 E+03 Pa'],
  ['psf', 'kPa', 0.04788026, 5e-9, 'NIST SP 811: lbf/ft² = 4.788 026 E+01 Pa'],
  ['tsf', 'kPa', 95.76052, 5e-6, 'NIST SP 811 psf × 2000 (tsf = 2000 lbf/ft²); printed to seven figures as 95.7605'],
  ['MPa', 'kPa', 1000, 0, 'SI prefix, exact'],
  ['in', 'mm', 25.4, 0, 'NIST SP 811: in = 2.54 E-02 m, exact'],
  ['ft', 'mm', 304.8, 0, 'NIST SP 811: ft = 3.048 E-01 m, exact'],
  ['cm', 'mm', 10, 0, 'SI prefix, exact'],
  ['cm2PerS', 'm2PerYr', 3155.76, 1e-9, 'exact with the 365.25-day year (1e-4 m² × 31 557 600 s)'],
  ['m2PerS', 'm2PerYr', 31_557_600, 0, 'exact with the 365.25-day year'],
  ['mm2PerMin', 'm2PerYr', 0.52596, 1e-12, 'exact with the 365.25-day year; printed as 0.52596'],
  ['pcf', 'knPerM3', 0.1570875, 5e-8, 'NIST SP 811: lb/ft³ = 1.601 846 E+01 kg/m³, × 9.806 65 m/s²; printed to six figures as 0.157087'],
];

describe('convertUnit(value, fromUnit, toUnit)', () => {
  it.each(PRINTED_FACTORS)('one %s is the published number of %s (%s)', (from, to, expected, tolerance) => {
    expect(Math.abs(convertUnit(1, from, to) - expected)).toBeLessThanOrEqual(tolerance + 1e-12 * expected);
  });

  it.each(PRINTED_FACTORS)('the published number of %s converts back to one %s', (from, to, _expected, _tol) => {
    expect(convertUnit(convertUnit(1, from, to), to, from)).toBeCloseTo(1, 12);
  });

  it('round-trips any finite value between any two units of the same quantity', () => {
    const names = Object.keys(UNIT_CONVERSION_TABLE) as UnitName[];
    const pairs = names.flatMap((a) =>
      names.filter((b) => UNIT_CONVERSION_TABLE[a].quantity === UNIT_CONVERSION_TABLE[b].quantity).map((b) => [a, b] as const),
    );
    fc.assert(
      fc.property(fc.constantFrom(...pairs), fc.double({ min: -1e6, max: 1e6, noNaN: true }), ([a, b], value) => {
        const back = convertUnit(convertUnit(value, a, b), b, a);
        expect(Math.abs(back - value)).toBeLessThanOrEqual(1e-12 * Math.max(1, Math.abs(value)));
      }),
    );
  });

  it('returns the value unchanged when both units are the same', () => {
    expect(convertUnit(12.5, 'psi', 'psi')).toBe(12.5);
  });

  it('throws RangeError when the units measure different quantities', () => {
    expect(() => convertUnit(1, 'psi', 'mm')).toThrow(new RangeError('convertUnit requires units of the same quantity (got pressure and length)'));
  });

  it('throws RangeError when the value is not finite', () => {
    expect(() => convertUnit(Number.NaN, 'psi', 'kPa')).toThrow(new RangeError('convertUnit requires a finite value'));
    expect(() => convertUnit(Infinity, 'psi', 'kPa')).toThrow(RangeError);
  });

  it('throws RangeError for a unit the table does not list', () => {
    expect(() => convertUnit(1, 'furlong' as UnitName, 'mm')).toThrow(
      new RangeError('convertUnit requires units listed in UNIT_CONVERSION_TABLE'),
    );
  });
});
