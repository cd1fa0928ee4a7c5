import { UNIT_CONVERSION_TABLE, type UnitName } from './unit-conversion-table.js';

/**
 * Converts a value between two units of the same quantity, through the table's
 * base unit: value × (base per `fromUnit`) ÷ (base per `toUnit`).
 *
 * Meant for the edges of the system (imports, forms, reports); the core itself
 * computes in kPa, m, m²/yr and kN/m³ only.
 *
 * Source: factors from NIST SP 811 (2008), appendix B (see UNIT_CONVERSION_TABLE).
 *
 * @param value the number to convert, in `fromUnit`
 * @param fromUnit unit of `value`
 * @param toUnit unit wanted
 * @returns the value in `toUnit`
 * @throws RangeError when `value` is not finite or the units measure different quantities
 * @example convertUnit(1, 'kgfPerCm2', 'kPa') // 98.0665
 * @example convertUnit(1, 'cm2PerS', 'm2PerYr') // 3155.76
 */
export function convertUnit(value: number, fromUnit: UnitName, toUnit: UnitName): number {
  if (!Number.isFinite(value)) throw new RangeError('convertUnit requires a finite value');
  const from = UNIT_CONVERSION_TABLE[fromUnit];
  const to = UNIT_CONVERSION_TABLE[toUnit];
  if (from === undefined || to === undefined) throw new RangeError('convertUnit requires units listed in UNIT_CONVERSION_TABLE');
  if (from.quantity !== to.quantity) {
    throw new RangeError(`convertUnit requires units of the same quantity (got ${from.quantity} and ${to.quantity})`);
  }
  if (fromUnit === toUnit) return value;
  return (value * from.baseUnitsPerUnit) / to.baseUnitsPerUnit;
}
