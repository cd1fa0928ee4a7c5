import { verticalStressAtDepth, type SoilLayer, type SoilProfile } from '@porestack/geo-core';
import type { GroundModelContent, GroundModelLayer } from '@porestack/types';

export interface ProfileChoices {
  /** Keep E′ and ν (immediate settlement); false drops them. */
  immediate: boolean;
  /** Keep Cα (secondary compression); false drops it. */
  secondary: boolean;
}

/** geo-core's profile from a stored ground model, and how each layer's σ′p was carried. */
export interface ProfileFromContent {
  profile: SoilProfile;
  /** Per layer: the OCR or constant σ′p handed to geo-core (null for a layer with neither). */
  preconsolidation: Array<{ ocr: number | null; preconsolidationKpa: number | null }>;
  warnings: string[];
}

/** The stresses of the ground model alone (no σ′p is needed for them). */
function stressProfile(content: GroundModelContent): SoilProfile {
  return {
    groundLevelM: content.groundLevelM,
    waterTableDepthM: content.waterTableDepthM,
    layers: content.layers.map((layer) => ({ name: layer.name, thicknessM: layer.thicknessM, unitWeightKnPerM3: layer.unitWeightKnPerM3, saturatedUnitWeightKnPerM3: layer.saturatedUnitWeightKnPerM3 })),
  };
}

/** σ′v0 of the ground model at a depth; a depth below the profile is read at its bottom. */
export function effectiveStressAt(content: GroundModelContent, depthM: number): number {
  const bottomM = content.layers.reduce((sum, layer) => sum + layer.thicknessM, 0);
  return verticalStressAtDepth(stressProfile(content), Math.min(Math.max(depthM, 0), bottomM)).effectiveStressKpa;
}

/**
 * σ′p as geo-core takes it: an OCR constant through the layer, or a constant σ′p. A σ′p known at
 * one depth (a sample's) is carried by OCR = σ′p/σ′v0 at that depth of this ground model — so the
 * designer's unit weights and water table, not the lab's estimate, fix the in-situ stress.
 */
function preconsolidationOf(content: GroundModelContent, layer: GroundModelLayer, index: number, warnings: string[]) {
  const p = layer.parameters;
  if (p === null) return { ocr: null, preconsolidationKpa: null };
  const midDepthM = (layer.topDepthM + layer.bottomDepthM) / 2;
  if (p.ocr.value !== null) {
    return p.preconsolidationCarry === 'constant' ? { ocr: null, preconsolidationKpa: p.ocr.value * effectiveStressAt(content, midDepthM) } : { ocr: p.ocr.value, preconsolidationKpa: null };
  }
  if (p.preconsolidationKpa.value === null) return { ocr: null, preconsolidationKpa: null };
  if (p.preconsolidationCarry === 'constant') return { ocr: null, preconsolidationKpa: p.preconsolidationKpa.value };
  const atDepthM = p.preconsolidationDepthM ?? midDepthM;
  const inSituKpa = effectiveStressAt(content, atDepthM);
  if (!(inSituKpa > 0)) {
    warnings.push(`Layer ${index + 1} (${layer.name}): σ′v0 is zero at ${atDepthM.toFixed(2)} m, so no OCR can be had there; σ′p = ${p.preconsolidationKpa.value.toFixed(0)} kPa is kept constant through the layer.`);
    return { ocr: null, preconsolidationKpa: p.preconsolidationKpa.value };
  }
  const ocr = p.preconsolidationKpa.value / inSituKpa;
  if (ocr < 1) {
    warnings.push(
      `Layer ${index + 1} (${layer.name}): σ′p = ${p.preconsolidationKpa.value.toFixed(0)} kPa at ${atDepthM.toFixed(2)} m is below σ′v0 = ${inSituKpa.toFixed(0)} kPa of this ground model there (OCR ${ocr.toFixed(2)}); the layer is treated as normally consolidated. Check the unit weights and water table against the lab's.`,
    );
    return { ocr: 1, preconsolidationKpa: null };
  }
  return { ocr, preconsolidationKpa: null };
}

/** The stored ground model as geo-core's SoilProfile; E′/ν and Cα dropped when the check leaves them out. */
export function soilProfileFromContent(content: GroundModelContent, choices: ProfileChoices): ProfileFromContent {
  const warnings: string[] = [];
  const preconsolidation = content.layers.map((layer, index) => preconsolidationOf(content, layer, index, warnings));
  const layers = content.layers.map((layer, index): SoilLayer => {
    const p = layer.parameters;
    const pre = preconsolidation[index] ?? { ocr: null, preconsolidationKpa: null };
    const optional = (key: string, v: number | null | undefined) => (v === null || v === undefined ? {} : { [key]: v });
    return {
      name: layer.name,
      thicknessM: layer.thicknessM,
      unitWeightKnPerM3: layer.unitWeightKnPerM3,
      saturatedUnitWeightKnPerM3: layer.saturatedUnitWeightKnPerM3,
      ...(choices.immediate && layer.elasticModulusKpa !== null && layer.poissonRatio !== null ? { elasticModulusKpa: layer.elasticModulusKpa, poissonRatio: layer.poissonRatio } : {}),
      ...(layer.kind === 'compressible' && p !== null
        ? {
            ...optional('e0', p.e0.value),
            ...optional('cc', p.cc.value),
            ...optional('cs', p.recompressionIndex.value),
            ...optional('ocr', pre.ocr),
            ...optional('preconsolidationKpa', pre.preconsolidationKpa),
            ...optional('cvM2PerYr', p.cvM2PerYr.value),
            ...(choices.secondary ? optional('cAlpha', p.cAlpha.value) : {}),
            drainageTop: layer.drainageTop,
            drainageBottom: layer.drainageBottom,
          }
        : {}),
    };
  });
  return { profile: { groundLevelM: content.groundLevelM, waterTableDepthM: content.waterTableDepthM, layers }, preconsolidation, warnings };
}
