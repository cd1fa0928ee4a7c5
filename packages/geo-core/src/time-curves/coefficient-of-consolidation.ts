import { DAYS_PER_YEAR } from '../constants/days-per-year.js';

/** mm²/min → m²/yr: 1e-6 m² per mm², 1440·365.25 minutes per year (0.52596). */
const MM2_PER_MIN_TO_M2_PER_YR = 1e-6 * 24 * 60 * DAYS_PER_YEAR;

/**
 * Coefficient of consolidation from a time factor and the time it took —
 * Terzaghi's definition Tv = cv·t/Hdr² solved for cv: cv = Tv·Hdr²/t.
 *
 * With Tv = 0.848 and t = t90 this is Taylor's (1948) formula, with Tv = 0.197
 * and t = t50 Casagrande & Fadum's (1940) (ASTM D2435/D2435M §12.3).
 *
 * @param timeFactor Tv at the chosen degree, dimensionless, > 0.
 * @param drainagePathMm Hdr, the longest drainage path, in mm, > 0.
 * @param timeMin time to reach that degree, in minutes, > 0.
 * @returns cv in m²/yr (365.25-day year).
 * @throws RangeError when any argument is not positive and finite.
 * @example coefficientOfConsolidationM2PerYr(0.197, 7.4, 12.5) // ≈ 0.454
 */
export function coefficientOfConsolidationM2PerYr(timeFactor: number, drainagePathMm: number, timeMin: number): number {
  if (!(timeFactor > 0 && Number.isFinite(timeFactor))) {
    throw new RangeError('coefficientOfConsolidationM2PerYr requires a positive finite time factor');
  }
  if (!(drainagePathMm > 0 && Number.isFinite(drainagePathMm))) {
    throw new RangeError('coefficientOfConsolidationM2PerYr requires a positive finite drainage path in mm');
  }
  if (!(timeMin > 0 && Number.isFinite(timeMin))) {
    throw new RangeError('coefficientOfConsolidationM2PerYr requires a positive finite time in minutes');
  }
  return ((timeFactor * drainagePathMm * drainagePathMm) / timeMin) * MM2_PER_MIN_TO_M2_PER_YR;
}
