import type { PreconsolidationBasis, SoilLayer } from './soil-profile.types.js';

/** σ′p of a layer at one depth as its basis gives it, before any comparison with σ′v0. */
export interface LayerPreconsolidation {
  readonly preconsolidationKpa: number;
  readonly basis: PreconsolidationBasis;
}

/**
 * The preconsolidation stress a layer's own fields give at a depth where the
 * in-situ vertical effective stress is σ′v0: the constant σ′p; OCR·σ′v0; σ′v0 +
 * POP; or σ′v0 itself when none is given (normally consolidated, the cautious
 * assumption). Inputs are validated by the callers (validateSoilProfile).
 *
 * Why POP: ground unloaded by the removal of a uniform overburden Δσ′ (erosion,
 * excavation, a melted ice sheet) keeps σ′p = σ′v0 + Δσ′ at every depth, so
 * σ′p − σ′v0 is constant while OCR falls with depth; a constant OCR describes
 * instead a layer whose σ′p grows in proportion to σ′v0 (ageing).
 * Source: OCR = σ′p/σ′v0 as defined in Das, *Principles of Geotechnical
 * Engineering*, ch. "Compressibility of soil"; POP is the trade's name for the difference.
 *
 * @param layer the layer (kPa, dimensionless)
 * @param effectiveStressKpa σ′v0 at the depth, kPa
 * @returns σ′p in kPa (may be below σ′v0 for a constant σ′p; the caller decides) and its basis
 * @example layerPreconsolidation({ name: 'clay', thicknessM: 4, unitWeightKnPerM3: 18, saturatedUnitWeightKnPerM3: 18, preOverburdenPressureKpa: 40 }, 60) // { preconsolidationKpa: 100, basis: 'pre-overburden-pressure' }
 */
export function layerPreconsolidation(layer: SoilLayer, effectiveStressKpa: number): LayerPreconsolidation {
  if (layer.preconsolidationKpa !== undefined) return { preconsolidationKpa: layer.preconsolidationKpa, basis: 'preconsolidation-stress' };
  if (layer.ocr !== undefined) return { preconsolidationKpa: layer.ocr * effectiveStressKpa, basis: 'ocr' };
  if (layer.preOverburdenPressureKpa !== undefined) return { preconsolidationKpa: effectiveStressKpa + layer.preOverburdenPressureKpa, basis: 'pre-overburden-pressure' };
  return { preconsolidationKpa: effectiveStressKpa, basis: 'assumed-normally-consolidated' };
}
