/** Which branch of the e–log σ′ curve a layer's loading uses. */
export type ConsolidationCase = 'normally-consolidated' | 'overconsolidated-below' | 'overconsolidated-crossing';

/** One (sub)layer and its loading, stresses at mid-depth. */
export interface PrimaryConsolidationSettlementInput {
  /** Thickness of the (sub)layer, m (> 0). */
  readonly thicknessM: number;
  /** Initial void ratio, dimensionless (> 0). */
  readonly e0: number;
  /** Compression index, dimensionless (≥ 0). */
  readonly cc: number;
  /** Recompression/swell index for the overconsolidated branch, dimensionless (≥ 0). */
  readonly cs: number;
  /** Initial vertical effective stress σ′0 at mid-depth, kPa (> 0). */
  readonly initialEffectiveStressKpa: number;
  /** Vertical stress increase Δσ at mid-depth, kPa (≥ 0). */
  readonly stressIncreaseKpa: number;
  /** Preconsolidation stress σ′p, kPa (≥ σ′0; equal means normally consolidated). */
  readonly preconsolidationKpa: number;
}

/** Settlement of the (sub)layer, m, and the branch used. */
export interface PrimaryConsolidationSettlementResult {
  readonly settlementM: number;
  readonly consolidationCase: ConsolidationCase;
}

/**
 * Primary consolidation settlement of one clay (sub)layer from the e–log σ′
 * idealisation (Terzaghi's one-dimensional theory), σ′1 = σ′0 + Δσ:
 * - normally consolidated (σ′p = σ′0): Sc = Cc·H/(1 + e0)·log10(σ′1/σ′0);
 * - overconsolidated, staying below σ′p (σ′1 ≤ σ′p): Sc = Cs·H/(1 + e0)·log10(σ′1/σ′0);
 * - overconsolidated, passing σ′p: Sc = Cs·H/(1 + e0)·log10(σ′p/σ′0) + Cc·H/(1 + e0)·log10(σ′1/σ′p).
 *
 * Assumptions: one-dimensional (oedometric) strain, stresses at mid-depth
 * representative of the (sub)layer — split thick layers — and bilinear e–log σ′.
 * Source: Das, *Principles of Geotechnical Engineering*, ch. "Compressibility of
 * soil", settlement from primary consolidation (the three equations);
 * Holtz & Kovacs, *An Introduction to Geotechnical Engineering*, ch. 8.
 *
 * @param input thickness in m, indices and e0 dimensionless, stresses in kPa
 * @returns settlement in m and the case used
 * @throws RangeError for thickness ≤ 0, e0 ≤ 0, negative indices, σ′0 ≤ 0, Δσ < 0,
 *   σ′p < σ′0 (an underconsolidated layer is outside this method) or non-finite input
 * @example primaryConsolidationSettlement({ thicknessM: 4, e0: 1, cc: 0.3, cs: 0.05, initialEffectiveStressKpa: 50, stressIncreaseKpa: 50, preconsolidationKpa: 50 }) // { settlementM: 0.1806, consolidationCase: 'normally-consolidated' }
 */
export function primaryConsolidationSettlement(input: PrimaryConsolidationSettlementInput): PrimaryConsolidationSettlementResult {
  const { thicknessM, e0, cc, cs, initialEffectiveStressKpa, stressIncreaseKpa, preconsolidationKpa } = input;
  const name = 'primaryConsolidationSettlement';
  if (!(thicknessM > 0) || !Number.isFinite(thicknessM)) throw new RangeError(`${name} requires a finite thicknessM > 0`);
  if (!(e0 > 0) || !Number.isFinite(e0)) throw new RangeError(`${name} requires a finite e0 > 0`);
  if (!(cc >= 0) || !(cs >= 0) || !Number.isFinite(cc) || !Number.isFinite(cs)) throw new RangeError(`${name} requires finite cc >= 0 and cs >= 0`);
  if (!(initialEffectiveStressKpa > 0) || !Number.isFinite(initialEffectiveStressKpa)) {
    throw new RangeError(`${name} requires a finite initialEffectiveStressKpa > 0`);
  }
  if (!(stressIncreaseKpa >= 0) || !Number.isFinite(stressIncreaseKpa)) throw new RangeError(`${name} requires a finite stressIncreaseKpa >= 0`);
  if (!(preconsolidationKpa >= initialEffectiveStressKpa) || !Number.isFinite(preconsolidationKpa)) {
    throw new RangeError(`${name} requires preconsolidationKpa >= initialEffectiveStressKpa`);
  }
  const finalEffectiveStressKpa = initialEffectiveStressKpa + stressIncreaseKpa;
  const perLogCycleM = thicknessM / (1 + e0);
  if (preconsolidationKpa === initialEffectiveStressKpa) {
    return { settlementM: cc * perLogCycleM * Math.log10(finalEffectiveStressKpa / initialEffectiveStressKpa), consolidationCase: 'normally-consolidated' };
  }
  if (finalEffectiveStressKpa <= preconsolidationKpa) {
    return { settlementM: cs * perLogCycleM * Math.log10(finalEffectiveStressKpa / initialEffectiveStressKpa), consolidationCase: 'overconsolidated-below' };
  }
  const settlementM =
    cs * perLogCycleM * Math.log10(preconsolidationKpa / initialEffectiveStressKpa) + cc * perLogCycleM * Math.log10(finalEffectiveStressKpa / preconsolidationKpa);
  return { settlementM, consolidationCase: 'overconsolidated-crossing' };
}
