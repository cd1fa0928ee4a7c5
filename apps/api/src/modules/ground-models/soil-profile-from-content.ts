import { carryPreconsolidationFromSample, verticalStressAtDepth, type SoilLayer, type SoilProfile } from '@porestack/geo-core';
import type { GroundModelContent, GroundModelLayer } from '@porestack/types';

export interface ProfileChoices {
  /** Keep E′ and ν (immediate settlement); false drops them. */
  immediate: boolean;
  /** Keep Cα (secondary compression); false drops it. */
  secondary: boolean;
}

/** How σ′p reaches geo-core for one layer: exactly one of the three, or none (normally consolidated). */
type PreconsolidationFields = { ocr: number } | { preOverburdenPressureKpa: number } | { preconsolidationKpa: number } | Record<string, never>;

/** geo-core's profile from a stored ground model, and how each layer's σ′p was carried. */
export interface ProfileFromContent {
  profile: SoilProfile;
  /** Per layer: the σ′p fields handed to geo-core. */
  preconsolidation: PreconsolidationFields[];
  warnings: string[];
}

/** The stresses of the ground model alone (no σ′p is needed for them). */
function stressProfile(content: GroundModelContent): SoilProfile {
  return {
    groundLevelM: content.groundLevelM,
    waterTableDepthM: content.waterTableDepthM,
    waterUnitWeightKnPerM3: content.waterUnitWeightKnPerM3,
    layers: content.layers.map((layer) => ({ name: layer.name, thicknessM: layer.thicknessM, unitWeightKnPerM3: layer.unitWeightKnPerM3, saturatedUnitWeightKnPerM3: layer.saturatedUnitWeightKnPerM3 })),
  };
}

/** A depth clamped into the profile (a sample below its bottom is read at the bottom). */
function withinProfile(content: GroundModelContent, depthM: number): number {
  const bottomM = content.layers.reduce((sum, layer) => sum + layer.thicknessM, 0);
  return Math.min(Math.max(depthM, 0), bottomM);
}

/** σ′v0 of the ground model at a depth, with its γw. */
export function effectiveStressAt(content: GroundModelContent, depthM: number): number {
  return verticalStressAtDepth(stressProfile(content), withinProfile(content, depthM)).effectiveStressKpa;
}

const BASIS = { ocr: 'ocr', pop: 'pre-overburden-pressure', constant: 'preconsolidation-stress' } as const;

/**
 * σ′p as geo-core takes it. A σ′p known at one depth (a sample's) is carried through the layer
 * by geo-core's carryPreconsolidationFromSample — OCR or POP at that depth of this ground model,
 * so the designer's unit weights, water table and γw, not the lab's estimate, fix the in-situ
 * stress. An OCR given directly (hand, or a set's adopted OCR) is used as it is, or turned
 * into POP or a constant σ′p at the layer's mid-depth.
 */
function preconsolidationOf(content: GroundModelContent, layer: GroundModelLayer, index: number, warnings: string[]): PreconsolidationFields {
  const p = layer.parameters;
  if (p === null) return {};
  const midDepthM = (layer.topDepthM + layer.bottomDepthM) / 2;
  const label = `Layer ${index + 1} (${layer.name})`;
  if (p.ocr.value !== null) {
    if (p.preconsolidationCarry === 'ocr') return { ocr: p.ocr.value };
    const midKpa = effectiveStressAt(content, midDepthM);
    return p.preconsolidationCarry === 'pop' ? { preOverburdenPressureKpa: (p.ocr.value - 1) * midKpa } : { preconsolidationKpa: p.ocr.value * midKpa };
  }
  if (p.preconsolidationKpa.value === null) return {};
  const atDepthM = withinProfile(content, p.preconsolidationDepthM ?? midDepthM);
  if (!(effectiveStressAt(content, atDepthM) > 0)) {
    warnings.push(`${label}: σ′v0 is zero at ${atDepthM.toFixed(2)} m, so σ′p = ${p.preconsolidationKpa.value.toFixed(0)} kPa is kept constant through the layer.`);
    return { preconsolidationKpa: p.preconsolidationKpa.value };
  }
  const carried = carryPreconsolidationFromSample({ profile: stressProfile(content), sampleDepthM: atDepthM, preconsolidationKpa: p.preconsolidationKpa.value, basis: BASIS[p.preconsolidationCarry] });
  warnings.push(...carried.warnings.map((w) => `${label}: ${w}`));
  return carried.layerFields;
}

/** The stored ground model as geo-core's SoilProfile; E′/ν and Cα dropped when the check leaves them out. */
export function soilProfileFromContent(content: GroundModelContent, choices: ProfileChoices): ProfileFromContent {
  const warnings: string[] = [];
  const preconsolidation = content.layers.map((layer, index) => preconsolidationOf(content, layer, index, warnings));
  const layers = content.layers.map((layer, index): SoilLayer => {
    const p = layer.parameters;
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
            ...preconsolidation[index],
            ...optional('cvM2PerYr', p.cvM2PerYr.value),
            ...(choices.secondary ? optional('cAlpha', p.cAlpha.value) : {}),
            drainageTop: layer.drainageTop,
            drainageBottom: layer.drainageBottom,
          }
        : {}),
    };
  });
  return {
    profile: { groundLevelM: content.groundLevelM, waterTableDepthM: content.waterTableDepthM, waterUnitWeightKnPerM3: content.waterUnitWeightKnPerM3, layers },
    preconsolidation,
    warnings,
  };
}
