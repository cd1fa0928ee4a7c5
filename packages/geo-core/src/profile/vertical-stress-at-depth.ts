import type { SoilProfile, VerticalStressState } from './soil-profile.types.js';
import { waterUnitWeightOf } from './water-unit-weight-of.js';

/**
 * Total vertical stress, pore pressure and vertical effective stress at a depth:
 * σv = Σ γ·h over the layers above (bulk γ above the water table, saturated γ
 * below), u = γw·(z − zw) below the water table, σ′v = σv − u (Terzaghi's
 * effective stress principle). γw is the profile's waterUnitWeightKnPerM3,
 * 9.81 kN/m³ when not given.
 *
 * Assumptions: hydrostatic pore pressure from the water table down, no
 * artesian or perched water, ground level flat.
 * Source: Das, *Principles of Geotechnical Engineering*, ch. "In situ stresses".
 *
 * @param profile the ground model (m, kN/m³)
 * @param depthM depth below ground level, m (0 ≤ depth ≤ bottom of the profile)
 * @returns stresses in kPa
 * @throws RangeError when the depth is negative, not finite or below the last layer, or γw is outside 9–10.5 kN/m³
 * @example verticalStressAtDepth({ groundLevelM: 0, waterTableDepthM: 1, layers: [{ name: 'clay', thicknessM: 10, unitWeightKnPerM3: 18, saturatedUnitWeightKnPerM3: 19.81 }] }, 3) // { totalStressKpa: 57.62, porePressureKpa: 19.62, effectiveStressKpa: 38 }
 * @example verticalStressAtDepth({ groundLevelM: 0, waterTableDepthM: 1, waterUnitWeightKnPerM3: 10, layers: [{ name: 'clay', thicknessM: 10, unitWeightKnPerM3: 18, saturatedUnitWeightKnPerM3: 20 }] }, 3) // { totalStressKpa: 58, porePressureKpa: 20, effectiveStressKpa: 38 }
 */
export function verticalStressAtDepth(profile: SoilProfile, depthM: number): VerticalStressState {
  if (!(depthM >= 0) || !Number.isFinite(depthM)) throw new RangeError('verticalStressAtDepth requires a finite depthM >= 0');
  const waterTableDepthM = profile.waterTableDepthM;
  const waterUnitWeightKnPerM3 = waterUnitWeightOf(profile);
  if (!(waterUnitWeightKnPerM3 >= 9 && waterUnitWeightKnPerM3 <= 10.5)) {
    throw new RangeError('verticalStressAtDepth requires waterUnitWeightKnPerM3 between 9 and 10.5 kN/m³');
  }
  let totalStressKpa = 0;
  let layerTopM = 0;
  for (const layer of profile.layers) {
    const layerBottomM = layerTopM + layer.thicknessM;
    const sliceBottomM = Math.min(depthM, layerBottomM);
    const dryM = Math.max(0, Math.min(sliceBottomM, waterTableDepthM) - layerTopM);
    const wetM = Math.max(0, sliceBottomM - Math.max(layerTopM, waterTableDepthM));
    totalStressKpa += dryM * layer.unitWeightKnPerM3 + wetM * layer.saturatedUnitWeightKnPerM3;
    if (depthM <= layerBottomM) {
      const porePressureKpa = Math.max(0, depthM - waterTableDepthM) * waterUnitWeightKnPerM3;
      return { totalStressKpa, porePressureKpa, effectiveStressKpa: totalStressKpa - porePressureKpa };
    }
    layerTopM = layerBottomM;
  }
  throw new RangeError(`verticalStressAtDepth requires a depth within the profile (bottom at ${layerTopM} m)`);
}
