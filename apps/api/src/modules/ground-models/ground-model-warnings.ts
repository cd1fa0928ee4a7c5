import type { GroundModelContent } from '@porestack/types';
import type { FieldIssue } from '../../errors/domain-error.js';

/** Most soils weigh 14–23 kN/m³; outside a wider band than that a value is more likely a typing slip. */
const PLAUSIBLE_UNIT_WEIGHT_KN_PER_M3 = { low: 12, high: 24 } as const;

/**
 * What is unusual but not impossible in a ground model: the designer sees each, naming its
 * layer and field, and saves only after acknowledging them.
 */
export function groundModelWarnings(content: GroundModelContent): FieldIssue[] {
  const warnings: FieldIssue[] = [];
  content.layers.forEach((layer, index) => {
    const label = `Layer ${index + 1} (${layer.name})`;
    for (const [field, words] of [
      ['unitWeightKnPerM3', 'above'],
      ['saturatedUnitWeightKnPerM3', 'below'],
    ] as const) {
      const weight = layer[field];
      if (weight < PLAUSIBLE_UNIT_WEIGHT_KN_PER_M3.low || weight > PLAUSIBLE_UNIT_WEIGHT_KN_PER_M3.high) {
        warnings.push({
          path: `layers.${index}.${field}`,
          message: `${label}: a unit weight of ${weight} kN/m³ ${words} the water table is unusual for soil (most lie between 14 and 23 kN/m³). Check the value.`,
        });
      }
    }
    if (layer.saturatedUnitWeightKnPerM3 < layer.unitWeightKnPerM3) {
      warnings.push({
        path: `layers.${index}.saturatedUnitWeightKnPerM3`,
        message: `${label}: the unit weight below the water table (${layer.saturatedUnitWeightKnPerM3} kN/m³) is less than above it (${layer.unitWeightKnPerM3} kN/m³). Check the two values.`,
      });
    }
    if (layer.source?.kind === 'record' && (layer.source.sampleDepthM < layer.topDepthM || layer.source.sampleDepthM > layer.bottomDepthM)) {
      warnings.push({
        path: `layers.${index}.source`,
        message: `${label} takes its values from a sample at ${layer.source.sampleDepthM.toFixed(2)} m, outside the layer (${layer.topDepthM.toFixed(2)}–${layer.bottomDepthM.toFixed(2)} m). Check that the sample belongs to this stratum.`,
      });
    }
  });
  return warnings;
}
