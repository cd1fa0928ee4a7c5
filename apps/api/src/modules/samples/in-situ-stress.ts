import { WATER_UNIT_WEIGHT_KN_PER_M3 } from '@porestack/geo-core';

export interface InSituStress {
  kpa: number | null;
  source: 'entered' | 'estimated' | null;
}

/**
 * The in-situ vertical effective stress at the middle of the sample.
 *
 * Entered values win. Otherwise it is estimated for a uniform soil with hydrostatic
 * groundwater: σ′v = γ·z − γw·max(0, z − zw), with z the mid-depth of the sample (m),
 * γ the average bulk unit weight above it (kN/m³), zw the water table depth (m) and
 * γw = 9.81 kN/m³. No water table recorded means no groundwater was met: σ′v = γ·z.
 * Without a unit weight there is no estimate (null), and the analysis skips OCR and
 * sample quality with a warning.
 */
export function inSituStress(sample: {
  topDepthM: number;
  bottomDepthM: number;
  bulkUnitWeightKnPerM3: number | null;
  inSituStressKpa: number | null;
}, waterTableDepthM: number | null): InSituStress {
  if (sample.inSituStressKpa !== null) return { kpa: sample.inSituStressKpa, source: 'entered' };
  if (sample.bulkUnitWeightKnPerM3 === null) return { kpa: null, source: null };
  const depthM = (sample.topDepthM + sample.bottomDepthM) / 2;
  const porePressureKpa = waterTableDepthM === null ? 0 : WATER_UNIT_WEIGHT_KN_PER_M3 * Math.max(0, depthM - waterTableDepthM);
  const kpa = sample.bulkUnitWeightKnPerM3 * depthM - porePressureKpa;
  return kpa > 0 ? { kpa, source: 'estimated' } : { kpa: null, source: null };
}
