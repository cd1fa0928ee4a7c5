import type { SoilProfile } from './soil-profile.types.js';
import { validateSoilProfile } from './validate-soil-profile.js';
import { verticalStressAtDepth } from './vertical-stress-at-depth.js';

/** A σ′p measured on a sample, and how it is to be carried through the layer. */
export interface CarryPreconsolidationFromSampleInput {
  /** The ground model the sample comes from (its unit weights, water table and γw give σ′v0). */
  readonly profile: SoilProfile;
  /** Depth of the sample below ground level, m (within the profile). */
  readonly sampleDepthM: number;
  /** σ′p adopted for the sample (the soil record's value), kPa (> 0). */
  readonly preconsolidationKpa: number;
  /** 'ocr': σ′p/σ′v0 held constant; 'pre-overburden-pressure': σ′p − σ′v0 held constant; 'preconsolidation-stress': σ′p itself held constant. */
  readonly basis: 'ocr' | 'pre-overburden-pressure' | 'preconsolidation-stress';
}

/** The SoilLayer field to set, and the numbers behind it. */
export interface CarryPreconsolidationFromSampleResult {
  /** Exactly one of the three SoilLayer fields, ready to spread into the layer. */
  readonly layerFields: { readonly ocr: number } | { readonly preOverburdenPressureKpa: number } | { readonly preconsolidationKpa: number };
  /** σ′v0 at the sample depth, kPa. */
  readonly effectiveStressAtSampleKpa: number;
  /** σ′p/σ′v0 at the sample, as measured (may be below 1). */
  readonly ocrAtSample: number;
  /** σ′p − σ′v0 at the sample, kPa, as measured (may be negative). */
  readonly preOverburdenPressureAtSampleKpa: number;
  /** True when σ′p lay below σ′v0 and the layer was set normally consolidated (OCR 1, POP 0). */
  readonly raisedToInSituStress: boolean;
  readonly warnings: readonly string[];
}

/**
 * Turns a σ′p measured on one sample into the field that carries it through
 * the sample's layer: OCR = σ′p/σ′v0(zs), or POP = σ′p − σ′v0(zs), or σ′p itself,
 * with σ′v0 at the sample depth zs from the ground model (verticalStressAtDepth,
 * the model's own γw). The settlement check then rebuilds σ′p at every depth
 * (layerPreconsolidation), and at zs it gives back the measured σ′p exactly.
 *
 * A σ′p below σ′v0 at the sample (OCR < 1: a disturbed sample, or ground still
 * consolidating) cannot be carried as OCR or POP; the layer is then set
 * normally consolidated (OCR 1 or POP 0) and a warning says so. As a
 * constant σ′p it is passed on as measured: the check raises it to σ′v0
 * wherever it falls below, and warns there.
 *
 * @param input profile, sample depth (m), σ′p (kPa) and the basis
 * @returns the layer field and σ′v0, OCR and POP at the sample
 * @throws RangeError for an invalid profile, a depth outside it, a σ′p not positive, or σ′v0 = 0 at the sample
 * @example carryPreconsolidationFromSample({ profile, sampleDepthM: 6, preconsolidationKpa: 120, basis: 'pre-overburden-pressure' }).layerFields // { preOverburdenPressureKpa: 45.24 } where σ′v0(6 m) = 74.76 kPa
 */
export function carryPreconsolidationFromSample(input: CarryPreconsolidationFromSampleInput): CarryPreconsolidationFromSampleResult {
  const caller = 'carryPreconsolidationFromSample';
  const { profile, sampleDepthM, preconsolidationKpa, basis } = input;
  validateSoilProfile(profile, caller);
  if (!(preconsolidationKpa > 0) || !Number.isFinite(preconsolidationKpa)) throw new RangeError(`${caller} requires a finite preconsolidationKpa > 0`);
  if (basis !== 'ocr' && basis !== 'pre-overburden-pressure' && basis !== 'preconsolidation-stress') {
    throw new RangeError(`${caller} requires basis 'ocr', 'pre-overburden-pressure' or 'preconsolidation-stress'`);
  }
  const effectiveStressAtSampleKpa = verticalStressAtDepth(profile, sampleDepthM).effectiveStressKpa;
  if (!(effectiveStressAtSampleKpa > 0)) throw new RangeError(`${caller} requires a positive effective stress at the sample depth (${sampleDepthM} m)`);
  const ocrAtSample = preconsolidationKpa / effectiveStressAtSampleKpa;
  const preOverburdenPressureAtSampleKpa = preconsolidationKpa - effectiveStressAtSampleKpa;
  const below = preconsolidationKpa < effectiveStressAtSampleKpa;
  const numbers = { effectiveStressAtSampleKpa, ocrAtSample, preOverburdenPressureAtSampleKpa };
  if (basis === 'preconsolidation-stress') return { layerFields: { preconsolidationKpa }, ...numbers, raisedToInSituStress: false, warnings: [] };
  const warnings = below
    ? [
        `σ′p of ${preconsolidationKpa.toFixed(1)} kPa is below the in-situ effective stress of ${effectiveStressAtSampleKpa.toFixed(1)} kPa at ${sampleDepthM} m (OCR ${ocrAtSample.toFixed(2)}): the sample may be disturbed, or the ground may still be consolidating. The layer is taken as normally consolidated; check the sample quality and the ground model.`,
      ]
    : [];
  const layerFields = basis === 'ocr' ? { ocr: below ? 1 : ocrAtSample } : { preOverburdenPressureKpa: below ? 0 : preOverburdenPressureAtSampleKpa };
  return { layerFields, ...numbers, raisedToInSituStress: below, warnings };
}
