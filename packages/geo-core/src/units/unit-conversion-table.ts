import { DAYS_PER_YEAR } from '../constants/days-per-year.js';

// Exact definitions behind the imperial and gravitational units (NIST SP 811,
// 2008 edition, appendix B): the factors below are built from these, so no
// rounded seven-digit figure is compounded by a second conversion.
const POUND_MASS_KG = 0.45359237;
const FOOT_M = 0.3048;
const INCH_M = 0.0254;
const STANDARD_GRAVITY_M_PER_S2 = 9.80665;
const POUND_FORCE_N = POUND_MASS_KG * STANDARD_GRAVITY_M_PER_S2;
const SECONDS_PER_YEAR = DAYS_PER_YEAR * 24 * 3600;

/** The physical quantity a unit measures; conversions never cross quantities. */
export type UnitQuantity = 'pressure' | 'length' | 'coefficientOfConsolidation' | 'unitWeight';

/** One row of the table: what the unit measures, its symbol, and how many base units one of it is. */
export interface UnitDefinition {
  readonly quantity: UnitQuantity;
  readonly symbol: string;
  /** Base units per one of this unit; bases are kPa, mm, m²/yr and kN/m³. */
  readonly baseUnitsPerUnit: number;
}

/**
 * The one unit table of the package. Bases: kPa for pressure, mm for length,
 * m²/yr for the coefficient of consolidation, kN/m³ for unit weight — the units
 * the core computes in. Factors follow NIST SP 811 (2008), appendix B.8:
 * 1 kgf/cm² = 98.0665 kPa, 1 psi = 6.894757 kPa, 1 psf = 0.04788026 kPa,
 * 1 tsf (2000 lbf/ft²) = 95.76052 kPa, 1 in = 25.4 mm, 1 ft = 304.8 mm, 1 lbf/ft³ = 0.1570875 kN/m³;
 * years are Julian (365.25 d), so 1 cm²/s = 3155.76 m²/yr.
 */
export const UNIT_CONVERSION_TABLE = {
  kPa: { quantity: 'pressure', symbol: 'kPa', baseUnitsPerUnit: 1 },
  MPa: { quantity: 'pressure', symbol: 'MPa', baseUnitsPerUnit: 1000 },
  kgfPerCm2: { quantity: 'pressure', symbol: 'kgf/cm²', baseUnitsPerUnit: (STANDARD_GRAVITY_M_PER_S2 * 1e4) / 1000 },
  tsf: { quantity: 'pressure', symbol: 'tsf', baseUnitsPerUnit: (2000 * POUND_FORCE_N) / (FOOT_M * FOOT_M) / 1000 },
  psf: { quantity: 'pressure', symbol: 'psf', baseUnitsPerUnit: POUND_FORCE_N / (FOOT_M * FOOT_M) / 1000 },
  psi: { quantity: 'pressure', symbol: 'psi', baseUnitsPerUnit: POUND_FORCE_N / (INCH_M * INCH_M) / 1000 },
  mm: { quantity: 'length', symbol: 'mm', baseUnitsPerUnit: 1 },
  cm: { quantity: 'length', symbol: 'cm', baseUnitsPerUnit: 10 },
  m: { quantity: 'length', symbol: 'm', baseUnitsPerUnit: 1000 },
  in: { quantity: 'length', symbol: 'in', baseUnitsPerUnit: INCH_M * 1000 },
  ft: { quantity: 'length', symbol: 'ft', baseUnitsPerUnit: FOOT_M * 1000 },
  m2PerYr: { quantity: 'coefficientOfConsolidation', symbol: 'm²/yr', baseUnitsPerUnit: 1 },
  cm2PerS: { quantity: 'coefficientOfConsolidation', symbol: 'cm²/s', baseUnitsPerUnit: 1e-4 * SECONDS_PER_YEAR },
  m2PerS: { quantity: 'coefficientOfConsolidation', symbol: 'm²/s', baseUnitsPerUnit: SECONDS_PER_YEAR },
  mm2PerMin: { quantity: 'coefficientOfConsolidation', symbol: 'mm²/min', baseUnitsPerUnit: 1e-6 * (SECONDS_PER_YEAR / 60) },
  knPerM3: { quantity: 'unitWeight', symbol: 'kN/m³', baseUnitsPerUnit: 1 },
  pcf: { quantity: 'unitWeight', symbol: 'lbf/ft³', baseUnitsPerUnit: POUND_FORCE_N / (FOOT_M * FOOT_M * FOOT_M) / 1000 },
} as const satisfies Record<string, UnitDefinition>;

/** A unit the table knows, e.g. `'kgfPerCm2'` or `'cm2PerS'`. */
export type UnitName = keyof typeof UNIT_CONVERSION_TABLE;
