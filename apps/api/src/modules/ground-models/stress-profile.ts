import { preconsolidationStressAtDepth } from '@porestack/geo-core';
import type { GroundModelContent, SetMember, StressProfile } from '@porestack/types';
import { soilProfileFromContent } from './soil-profile-from-content.js';

const POINTS_PER_LAYER = 12;

/**
 * What the profile drawing plots: σv, u, σ′v0 and the σ′p the check will use against depth,
 * layer by layer (each layer's points run from its top to its bottom, so σ′p may jump at a
 * boundary), and the samples whose values the layers use.
 */
export function stressProfile(content: GroundModelContent, setMembers: ReadonlyMap<string, readonly SetMember[]>): StressProfile {
  const { profile, warnings } = soilProfileFromContent(content, { immediate: true, secondary: true });
  // Summed as geo-core sums it, so the last point is never a rounding error below the profile.
  const bottomM = profile.layers.reduce((sum, layer) => sum + layer.thicknessM, 0);
  const points = content.layers.flatMap((layer) =>
    Array.from({ length: POINTS_PER_LAYER }, (_, step) => {
      const depthM = Math.min(bottomM, step === POINTS_PER_LAYER - 1 ? layer.bottomDepthM : layer.topDepthM + (layer.thicknessM * step) / (POINTS_PER_LAYER - 1));
      // A layer's top is also the layer above's bottom: read it just inside this layer.
      const at = preconsolidationStressAtDepth(profile, step === 0 && depthM > 0 ? Math.min(bottomM, depthM + 1e-9) : depthM);
      return { depthM, totalStressKpa: at.totalStressKpa, porePressureKpa: at.porePressureKpa, effectiveStressKpa: at.effectiveStressKpa, preconsolidationKpa: at.preconsolidationKpa };
    }),
  );
  const samples = content.layers.flatMap((layer, layerIndex) => {
    const source = layer.source;
    if (source?.kind === 'record') {
      return [{ layerIndex, label: `${source.boreholeName} ${source.sampleReference} (${source.testReference} v${source.version})`, depthM: source.sampleDepthM, preconsolidationKpa: layer.parameters?.preconsolidationKpa.value ?? null }];
    }
    if (source?.kind === 'set') {
      return (setMembers.get(source.setRevisionId) ?? []).map((member) => ({
        layerIndex,
        label: `${member.boreholeName} ${member.sampleReference} (${member.testReference} v${member.version}, in ${source.name})`,
        depthM: member.depthM,
        preconsolidationKpa: member.values.preconsolidationKpa,
      }));
    }
    return [];
  });
  return { points, samples, warnings };
}
