/** The two void ratios of an increment and the stress change between them. */
export interface VolumeCompressibilityInput {
  /** Void ratio at the start of the increment, e1 (> 0). */
  readonly voidRatioBefore: number;
  /** Void ratio at its end, e2 (> −1). */
  readonly voidRatioAfter: number;
  /** Effective stress increase Δσ′ over the increment, kPa (≠ 0). */
  readonly stressIncreaseKpa: number;
  /**
   * Which void ratio the volume is referred to: 'start' (default; mv = (ΔH/H1)/Δσ′ as ASTM
   * D2435/D2435M and the lab reduction take it) or 'mean' (1 + (e1 + e2)/2, as some textbook
   * solutions do, e.g. Smith's *Elements of Soil Mechanics*, Example 12.1).
   */
  readonly reference?: 'start' | 'mean';
}

/**
 * Coefficient of volume compressibility of an increment,
 * mv = av/(1 + e_ref) = −Δe/(Δσ′·(1 + e_ref)): the volumetric strain per unit
 * stress in one-dimensional compression. With e_ref = e1 it equals
 * (ΔH/H1)/Δσ′; referred to the mean void ratio it is a few per cent larger for
 * a large increment, the convention some worked solutions use.
 *
 * Source: Craig's *Soil Mechanics*, ch. "Consolidation" (mv = (1/(1 + e0))·(e0 − e1)/(σ′1 − σ′0));
 * Das, *Principles of Geotechnical Engineering*, ch. "Compressibility of soil" (mv = av/(1 + eav)).
 *
 * @param input void ratios (dimensionless), Δσ′ in kPa, the reference void ratio
 * @returns mv in m²/kN (= 1/kPa; 1 m²/MN = 0.001 m²/kN)
 * @throws RangeError for a void ratio not finite, e1 ≤ 0, e2 ≤ −1, Δσ′ zero or not finite, or an unknown reference
 * @example coefficientOfVolumeCompressibilityM2PerKn({ voidRatioBefore: 0.94, voidRatioAfter: 0.82, stressIncreaseKpa: 100 }) // 0.000619 (0.12/(1.94 × 100))
 */
export function coefficientOfVolumeCompressibilityM2PerKn(input: VolumeCompressibilityInput): number {
  const name = 'coefficientOfVolumeCompressibilityM2PerKn';
  const { voidRatioBefore: e1, voidRatioAfter: e2, stressIncreaseKpa } = input;
  const reference = input.reference ?? 'start';
  if (!(e1 > 0) || !Number.isFinite(e1) || !(e2 > -1) || !Number.isFinite(e2)) throw new RangeError(`${name} requires finite void ratios, voidRatioBefore > 0 and voidRatioAfter > -1`);
  if (stressIncreaseKpa === 0 || !Number.isFinite(stressIncreaseKpa)) throw new RangeError(`${name} requires a finite, non-zero stressIncreaseKpa`);
  if (reference !== 'start' && reference !== 'mean') throw new RangeError(`${name} requires reference 'start' or 'mean'`);
  const referenceVoidRatio = reference === 'start' ? e1 : (e1 + e2) / 2;
  return (e1 - e2) / (stressIncreaseKpa * (1 + referenceVoidRatio));
}
