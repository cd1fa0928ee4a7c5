/**
 * Unit weight of fresh water, γw, in kN/m³.
 *
 * 1000 kg/m³ × 9.81 m/s², the value the trade's textbooks use (Das, *Principles
 * of Geotechnical Engineering*; Craig's *Soil Mechanics*). The exact standard
 * gravity 9.80665 m/s² would change pore pressures by 0.03 %, far inside the
 * uncertainty of any unit weight measured on a soil sample.
 */
export const WATER_UNIT_WEIGHT_KN_PER_M3 = 9.81;
