/** A clay (sub)layer creeping after primary consolidation. */
export interface SecondaryCompressionSettlementInput {
  /** Thickness of the (sub)layer, m (> 0). */
  readonly thicknessM: number;
  /** Secondary compression index Cα = Δe/Δlog10 t, dimensionless (≥ 0). */
  readonly cAlpha: number;
  /** Void ratio at the end of primary consolidation, ep, dimensionless (> 0). */
  readonly voidRatioAtEndOfPrimary: number;
  /** Time at the end of primary consolidation, t1, years (> 0). */
  readonly endOfPrimaryYears: number;
  /** Time at which the settlement is wanted (the design life), t2, years (> 0). */
  readonly designLifeYears: number;
}

/**
 * Secondary compression (creep) settlement after primary consolidation:
 * Ss = Cα′·H·log10(t2/t1), with Cα′ = Cα/(1 + ep). Zero when the design life
 * ends before primary consolidation does.
 *
 * Assumptions: Cα constant with time and stress; secondary compression starts
 * when primary ends (Mesri's view, the textbook one).
 * Source: Das, *Principles of Geotechnical Engineering*, secondary consolidation
 * settlement; Holtz & Kovacs, *An Introduction to Geotechnical Engineering*, ch. 9.
 *
 * @param input thickness in m, indices dimensionless, times in years
 * @returns Ss in m
 * @throws RangeError for thickness ≤ 0, Cα < 0, ep ≤ 0, non-positive times, or non-finite input
 * @example secondaryCompressionSettlement({ thicknessM: 5, cAlpha: 0.02, voidRatioAtEndOfPrimary: 1, endOfPrimaryYears: 2, designLifeYears: 50 }) // 0.06990
 */
export function secondaryCompressionSettlement(input: SecondaryCompressionSettlementInput): number {
  const { thicknessM, cAlpha, voidRatioAtEndOfPrimary, endOfPrimaryYears, designLifeYears } = input;
  const name = 'secondaryCompressionSettlement';
  if (!(thicknessM > 0) || !Number.isFinite(thicknessM)) throw new RangeError(`${name} requires a finite thicknessM > 0`);
  if (!(cAlpha >= 0) || !Number.isFinite(cAlpha)) throw new RangeError(`${name} requires a finite cAlpha >= 0`);
  if (!(voidRatioAtEndOfPrimary > 0) || !Number.isFinite(voidRatioAtEndOfPrimary)) throw new RangeError(`${name} requires a finite voidRatioAtEndOfPrimary > 0`);
  if (!(endOfPrimaryYears > 0) || !(designLifeYears > 0) || !Number.isFinite(endOfPrimaryYears) || !Number.isFinite(designLifeYears)) {
    throw new RangeError(`${name} requires finite endOfPrimaryYears > 0 and designLifeYears > 0`);
  }
  if (designLifeYears <= endOfPrimaryYears) return 0;
  return (cAlpha / (1 + voidRatioAtEndOfPrimary)) * thicknessM * Math.log10(designLifeYears / endOfPrimaryYears);
}
