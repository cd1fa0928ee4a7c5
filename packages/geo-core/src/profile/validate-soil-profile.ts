import type { SoilLayer, SoilProfile } from './soil-profile.types.js';

/**
 * Checks a ground model before any calculation uses it, so a bad field is
 * named once, plainly, instead of surfacing as a NaN deep in a settlement sum.
 *
 * Rules: finite ground level; water table depth ≥ 0; γw, where given, between
 * 9 and 10.5 kN/m³ (fresh water 9.81, often rounded to 10; sea water about
 * 10.05 — a value outside is a unit slip, such as 62.4 lbf/ft³); at least one layer; each
 * layer with thickness > 0 and unit weights > 0; where given, e0 > 0, cc ≥ 0,
 * cs ≥ 0, mv > 0, σ′p > 0, OCR ≥ 1, POP ≥ 0 (at most one of σ′p, OCR and POP), cv > 0, Cα ≥ 0, E > 0,
 * 0 ≤ ν ≤ 0.5; a layer with cv needs drainage at its top and bottom.
 *
 * @param profile the ground model (m, kN/m³, kPa, m²/yr)
 * @param caller name of the public function, for the message
 * @throws RangeError('<caller> requires …') naming the first bad field and layer
 * @example validateSoilProfile(profile, 'runSettlementCheck') // returns nothing when the profile is sound
 */
export function validateSoilProfile(profile: SoilProfile, caller: string): void {
  const fail = (condition: string): never => {
    throw new RangeError(`${caller} requires ${condition}`);
  };
  if (!Number.isFinite(profile.groundLevelM)) fail('a finite groundLevelM');
  if (!(profile.waterTableDepthM >= 0) || !Number.isFinite(profile.waterTableDepthM)) fail('a finite waterTableDepthM >= 0');
  const waterUnitWeight = profile.waterUnitWeightKnPerM3;
  if (waterUnitWeight !== undefined && !(waterUnitWeight >= 9 && waterUnitWeight <= 10.5)) {
    fail('waterUnitWeightKnPerM3 between 9 and 10.5 kN/m³ (9.81 for fresh water, or 10 where the reference rounds it)');
  }
  if (profile.layers.length === 0) fail('at least one soil layer');
  profile.layers.forEach((layer, index) => validateLayer(layer, `layer ${index + 1} (${layer.name})`, fail));
}

function validateLayer(layer: SoilLayer, where: string, fail: (condition: string) => never): void {
  const positive = (value: number | undefined, field: string) => {
    if (value !== undefined && !(value > 0 && Number.isFinite(value))) fail(`${field} > 0 in ${where}`);
  };
  const nonNegative = (value: number | undefined, field: string) => {
    if (value !== undefined && !(value >= 0 && Number.isFinite(value))) fail(`${field} >= 0 in ${where}`);
  };
  if (!(layer.thicknessM > 0) || !Number.isFinite(layer.thicknessM)) fail(`thicknessM > 0 in ${where}`);
  if (!(layer.unitWeightKnPerM3 > 0 && Number.isFinite(layer.unitWeightKnPerM3)) || !(layer.saturatedUnitWeightKnPerM3 > 0 && Number.isFinite(layer.saturatedUnitWeightKnPerM3))) {
    fail(`unitWeightKnPerM3 > 0 and saturatedUnitWeightKnPerM3 > 0 in ${where}`);
  }
  positive(layer.e0, 'e0');
  nonNegative(layer.cc, 'cc');
  nonNegative(layer.cs, 'cs');
  positive(layer.mvM2PerKn, 'mvM2PerKn');
  positive(layer.preconsolidationKpa, 'preconsolidationKpa');
  if (layer.ocr !== undefined && !(layer.ocr >= 1 && Number.isFinite(layer.ocr))) fail(`ocr >= 1 in ${where}`);
  nonNegative(layer.preOverburdenPressureKpa, 'preOverburdenPressureKpa');
  const preconsolidationGiven = [layer.preconsolidationKpa, layer.ocr, layer.preOverburdenPressureKpa].filter((value) => value !== undefined).length;
  if (preconsolidationGiven > 1) fail(`only one of preconsolidationKpa, ocr and preOverburdenPressureKpa in ${where}`);
  positive(layer.cvM2PerYr, 'cvM2PerYr');
  nonNegative(layer.cAlpha, 'cAlpha');
  positive(layer.elasticModulusKpa, 'elasticModulusKpa');
  if (layer.poissonRatio !== undefined && !(layer.poissonRatio >= 0 && layer.poissonRatio <= 0.5)) fail(`0 <= poissonRatio <= 0.5 in ${where}`);
  if (layer.cc !== undefined && layer.e0 === undefined) fail(`e0 wherever cc is given, in ${where}`);
  if (layer.cvM2PerYr !== undefined && (layer.drainageTop === undefined || layer.drainageBottom === undefined)) {
    fail(`drainageTop and drainageBottom wherever cvM2PerYr is given, in ${where}`);
  }
}
