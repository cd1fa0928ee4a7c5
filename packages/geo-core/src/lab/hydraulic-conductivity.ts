import { DAYS_PER_YEAR } from '../constants/days-per-year.js';
import { WATER_UNIT_WEIGHT_KN_PER_M3 } from '../constants/water-unit-weight.js';

const SECONDS_PER_YEAR = DAYS_PER_YEAR * 86400;

/**
 * Hydraulic conductivity from an oedometer increment, k = cv·mv·γw — Terzaghi's
 * definition of the coefficient of consolidation, cv = k/(mv·γw), solved for k.
 *
 * Source: Terzaghi (1943); Craig's *Soil Mechanics*, ch. "Consolidation";
 * ASTM D2435/D2435M (k from cv and mv is an indirect estimate, not a permeability test).
 *
 * @param cvM2PerYr coefficient of consolidation, m²/yr (> 0)
 * @param mvM2PerKn coefficient of volume compressibility, m²/kN (≥ 0)
 * @param waterUnitWeightKnPerM3 γw, kN/m³ (> 0); default WATER_UNIT_WEIGHT_KN_PER_M3 (9.81)
 * @returns k in m/s
 * @throws RangeError when an argument is not finite, cv or γw not positive, or mv negative
 * @example hydraulicConductivityMPerS(1.5, 0.0005, 9.81) // 2.33e-10 (1.5/31 557 600 × 0.0005 × 9.81)
 */
export function hydraulicConductivityMPerS(cvM2PerYr: number, mvM2PerKn: number, waterUnitWeightKnPerM3: number = WATER_UNIT_WEIGHT_KN_PER_M3): number {
  if (!(cvM2PerYr > 0) || !Number.isFinite(cvM2PerYr)) throw new RangeError('hydraulicConductivityMPerS requires a finite cvM2PerYr > 0');
  if (!(mvM2PerKn >= 0) || !Number.isFinite(mvM2PerKn)) throw new RangeError('hydraulicConductivityMPerS requires a finite mvM2PerKn >= 0');
  if (!(waterUnitWeightKnPerM3 > 0) || !Number.isFinite(waterUnitWeightKnPerM3)) throw new RangeError('hydraulicConductivityMPerS requires a finite waterUnitWeightKnPerM3 > 0');
  return (cvM2PerYr / SECONDS_PER_YEAR) * mvM2PerKn * waterUnitWeightKnPerM3;
}
