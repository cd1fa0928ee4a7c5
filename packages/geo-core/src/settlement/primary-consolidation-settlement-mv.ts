/** One (sub)layer described by its coefficient of volume compressibility. */
export interface PrimaryConsolidationSettlementMvInput {
  /** Thickness of the (sub)layer, m (> 0). */
  readonly thicknessM: number;
  /**
   * Coefficient of volume compressibility mv = (ΔH/H1)/Δσ′ over the stress
   * range the layer will see, m²/kN (= 1/kPa; 1 m²/MN = 0.001 m²/kN), ≥ 0.
   */
  readonly mvM2PerKn: number;
  /** Vertical effective stress increase Δσ′ at mid-depth (the final excess pore pressure dissipated), kPa (≥ 0). */
  readonly stressIncreaseKpa: number;
}

/**
 * Primary consolidation settlement of one clay (sub)layer from its
 * coefficient of volume compressibility (the oedometer settlement):
 * Sc = mv·Δσ′·H.
 *
 * Assumptions: one-dimensional strain; mv measured in the oedometer over the
 * stress range from σ′0 to σ′0 + Δσ′ at this depth (mv falls as stress
 * rises, so a value from another range misstates settlement — split thick
 * layers and give mv for each); linear over that range.
 * Source: Craig's *Soil Mechanics*, ch. "Consolidation" (the oedometer
 * settlement sc = mv·Δσ′·H); Das, *Principles of Geotechnical Engineering*,
 * ch. "Compressibility of soil" (mv = av/(1 + e)).
 *
 * @param input thickness in m, mv in m²/kN, Δσ′ in kPa
 * @returns settlement in m
 * @throws RangeError for thickness ≤ 0, mv < 0, Δσ′ < 0 or non-finite input
 * @example primaryConsolidationSettlementMv({ thicknessM: 2, mvM2PerKn: 0.0003, stressIncreaseKpa: 50 }) // 0.03
 */
export function primaryConsolidationSettlementMv(input: PrimaryConsolidationSettlementMvInput): number {
  const { thicknessM, mvM2PerKn, stressIncreaseKpa } = input;
  const name = 'primaryConsolidationSettlementMv';
  if (!(thicknessM > 0) || !Number.isFinite(thicknessM)) throw new RangeError(`${name} requires a finite thicknessM > 0`);
  if (!(mvM2PerKn >= 0) || !Number.isFinite(mvM2PerKn)) throw new RangeError(`${name} requires a finite mvM2PerKn >= 0`);
  if (!(stressIncreaseKpa >= 0) || !Number.isFinite(stressIncreaseKpa)) throw new RangeError(`${name} requires a finite stressIncreaseKpa >= 0`);
  return mvM2PerKn * stressIncreaseKpa * thicknessM;
}
