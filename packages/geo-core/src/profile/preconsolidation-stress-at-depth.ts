import { layerPreconsolidation } from './layer-preconsolidation.js';
import type { PreconsolidationBasis, SoilProfile } from './soil-profile.types.js';
import { validateSoilProfile } from './validate-soil-profile.js';
import { verticalStressAtDepth } from './vertical-stress-at-depth.js';

/** Stresses and σ′p at one depth, as the settlement check takes them. */
export interface PreconsolidationStressAtDepth {
  readonly layerIndex: number;
  readonly totalStressKpa: number;
  readonly porePressureKpa: number;
  readonly effectiveStressKpa: number;
  /** σ′p used: the layer's basis applied at this depth, raised to σ′v0 where it falls below; null in a layer that does not consolidate (or an mv layer given no σ′p). */
  readonly preconsolidationKpa: number | null;
  readonly basis: PreconsolidationBasis | null;
  /** True where the layer's σ′p fell below σ′v0 and was raised to it (taken as normally consolidated there). */
  readonly raisedToInSituStress: boolean;
}

/**
 * σv, u, σ′v0 and σ′p at a depth of a ground model, σ′p carried through each
 * compressible layer on the layer's own basis: constant σ′p, σ′p = OCR·σ′v0,
 * σ′p = σ′v0 + POP, or σ′p = σ′v0 where nothing is given. Where a constant
 * σ′p falls below σ′v0 it is raised to σ′v0 (normally consolidated there) —
 * the same rule the settlement check applies, so a profile drawn from this
 * function shows exactly the σ′p the check used. A depth on a boundary belongs
 * to the layer above.
 *
 * Source: Terzaghi's effective stress (verticalStressAtDepth); σ′p carried by
 * layerPreconsolidation (constant σ′p, OCR or POP; see there why POP).
 *
 * @param profile the ground model (m, kN/m³, kPa)
 * @param depthM depth below ground level, m (within the profile)
 * @returns stresses in kPa, σ′p (kPa) or null outside compressible layers, and the basis
 * @throws RangeError for an invalid profile or a depth outside it
 * @example preconsolidationStressAtDepth({ groundLevelM: 0, waterTableDepthM: 0, waterUnitWeightKnPerM3: 10, layers: [{ name: 'clay', thicknessM: 10, unitWeightKnPerM3: 18, saturatedUnitWeightKnPerM3: 18, e0: 1, cc: 0.3, cs: 0.05, preOverburdenPressureKpa: 30 }] }, 5) // effectiveStressKpa 40, preconsolidationKpa 70, basis 'pre-overburden-pressure'
 */
export function preconsolidationStressAtDepth(profile: SoilProfile, depthM: number): PreconsolidationStressAtDepth {
  validateSoilProfile(profile, 'preconsolidationStressAtDepth');
  const state = verticalStressAtDepth(profile, depthM);
  let layerIndex = 0;
  let bottomM = profile.layers[0]?.thicknessM ?? 0;
  while (depthM > bottomM && layerIndex + 1 < profile.layers.length) {
    layerIndex += 1;
    bottomM += profile.layers[layerIndex]?.thicknessM ?? 0;
  }
  const layer = profile.layers[layerIndex];
  const elogStress = layer !== undefined && layer.e0 !== undefined && layer.cc !== undefined;
  // An mv layer carries σ′p only where one is given: its settlement does not use it.
  const mvWithPreconsolidation =
    layer !== undefined && !elogStress && layer.mvM2PerKn !== undefined && (layer.preconsolidationKpa ?? layer.ocr ?? layer.preOverburdenPressureKpa) !== undefined;
  if (layer === undefined || !(elogStress || mvWithPreconsolidation)) return { layerIndex, ...state, preconsolidationKpa: null, basis: null, raisedToInSituStress: false };
  const { preconsolidationKpa, basis } = layerPreconsolidation(layer, state.effectiveStressKpa);
  return {
    layerIndex,
    ...state,
    preconsolidationKpa: Math.max(preconsolidationKpa, state.effectiveStressKpa),
    basis,
    raisedToInSituStress: preconsolidationKpa < state.effectiveStressKpa,
  };
}
