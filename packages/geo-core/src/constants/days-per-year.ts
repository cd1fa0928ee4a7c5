/**
 * Days in one year, used wherever consolidation coefficients or times change
 * between seconds, minutes, days and years.
 *
 * The Julian year of 365.25 days: it is the year behind the published factors
 * 1 cm²/s = 3155.76 m²/yr and 1 mm²/min = 0.52596 m²/yr, so our conversions
 * reproduce the figures printed on laboratory sheets.
 */
export const DAYS_PER_YEAR = 365.25;
