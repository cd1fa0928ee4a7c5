import { splitIntoSublayers, type SublayerSpacing } from '../profile/split-into-sublayers.js';
import { layerPreconsolidation } from '../profile/layer-preconsolidation.js';
import type { PreconsolidationBasis, SoilProfile, Sublayer } from '../profile/soil-profile.types.js';
import { soilProfileWarnings } from '../profile/soil-profile-warnings.js';
import { validateSoilProfile } from '../profile/validate-soil-profile.js';
import { verticalStressAtDepth } from '../profile/vertical-stress-at-depth.js';
import { waterUnitWeightOf } from '../profile/water-unit-weight-of.js';
import { timeFactorForDegree } from '../time-curves/time-factor-for-degree.js';
import { drainagePathLengthM } from '../time-rate/drainage-path-length.js';
import type { LayerParametersUsed, PrimaryMethod } from './settlement-check.types.js';

/** A sublayer with everything the settlement sum needs, fixed before any footing is looked at. */
export interface PreparedSublayer extends Sublayer {
  readonly initialEffectiveStressKpa: number;
  readonly preconsolidationKpa: number;
  /** How primary settlement is worked out: e–log σ′ (Cc, Cs, σ′p) or mv·Δσ′·H. */
  readonly primaryMethod: PrimaryMethod;
  /** null only on an mv layer given without e0. */
  readonly e0: number | null;
  /** 0 on an mv layer. */
  readonly cc: number;
  readonly cs: number;
  /** m²/kN; null on an e–log σ′ layer. */
  readonly mvM2PerKn: number | null;
  readonly cAlpha: number | null;
  readonly endOfPrimaryYears: number | null;
}

/** A layer with a modulus, for immediate settlement. */
export interface PreparedElasticLayer {
  readonly layerIndex: number;
  readonly topDepthM: number;
  readonly bottomDepthM: number;
  readonly elasticModulusKpa: number;
  readonly poissonRatio: number;
}

/** The ground model as the settlement check uses it. */
export interface SettlementModel {
  readonly sublayers: readonly PreparedSublayer[];
  /** The sublayers' mid-depths below ground, m, packed for the stress loop. */
  readonly midDepthsM: Float64Array;
  readonly elasticLayers: readonly PreparedElasticLayer[];
  readonly layers: readonly LayerParametersUsed[];
  readonly profileBottomM: number;
  readonly warnings: readonly string[];
}

/**
 * Turns a soil profile into the sublayers and elastic layers a settlement check
 * integrates over: σ′0 and σ′p at each sublayer's mid-depth, the drainage path
 * and end of primary consolidation of each clay layer, and a record of every
 * parameter used. A careful designer's defaults, each stated in a warning:
 * σ′p carried through each layer as a constant, by OCR or by POP
 * (layerPreconsolidation); none given → normally consolidated (the cautious
 * choice); σ′p below the in-situ stress at some depth → that part normally consolidated. A layer
 * with mv and no Cc settles by mv·Δσ′·H; with both, Cc is used and said so.
 *
 * @param profile the ground model
 * @param spacing sublayer count or maximum thickness
 * @param endOfPrimaryShare share of primary consolidation taken as its end (fraction)
 * @param caller public function name for messages
 * @returns the prepared model
 * @throws RangeError for an invalid profile, a missing cs on an overconsolidated layer, or a non-positive effective stress
 * @example prepareSettlementModel(profile, { maxThicknessM: 0.5 }, 0.95, 'runSettlementCheck').sublayers.length // 8 for a 4 m clay
 */
export function prepareSettlementModel(profile: SoilProfile, spacing: SublayerSpacing, endOfPrimaryShare: number, caller: string): SettlementModel {
  validateSoilProfile(profile, caller);
  const warnings: string[] = soilProfileWarnings(profile);
  const timeFactorAtEnd = timeFactorForDegree(endOfPrimaryShare);
  let topDepthM = 0;
  const layers: LayerParametersUsed[] = profile.layers.map((layer, layerIndex) => {
    const bottomDepthM = topDepthM + layer.thicknessM;
    const primaryMethod: PrimaryMethod | null =
      layer.e0 !== undefined && layer.cc !== undefined ? 'e-log-stress' : layer.mvM2PerKn !== undefined ? 'mv' : null;
    const compressible = primaryMethod !== null;
    const overconsolidated =
      (layer.ocr !== undefined && layer.ocr > 1) || layer.preconsolidationKpa !== undefined || (layer.preOverburdenPressureKpa !== undefined && layer.preOverburdenPressureKpa > 0);
    if (primaryMethod === 'e-log-stress' && overconsolidated && layer.cs === undefined) {
      throw new RangeError(`${caller} requires cs wherever the layer is overconsolidated (ocr > 1, preconsolidationKpa or preOverburdenPressureKpa > 0), in layer ${layerIndex + 1} (${layer.name})`);
    }
    const basisGiven = layerPreconsolidation(layer, 1).basis;
    const preconsolidationBasis: PreconsolidationBasis | null = !compressible ? null : primaryMethod === 'mv' && basisGiven === 'assumed-normally-consolidated' ? null : basisGiven;
    if (primaryMethod === 'e-log-stress' && layer.mvM2PerKn !== undefined) {
      warnings.push(`Layer ${layerIndex + 1} (${layer.name}) has both Cc and mv; its primary settlement uses Cc, e0 and σ′p, which follow the stress level, and mv is not used. Remove one if that is not what you mean.`);
    }
    if (primaryMethod === 'mv' && layer.cAlpha !== undefined && layer.e0 === undefined) {
      warnings.push(`Layer ${layerIndex + 1} (${layer.name}) has mv and Cα but no e0, so Cα/(1 + ep) cannot be had and its secondary compression is left out. Give e0 to include it.`);
    }
    if (preconsolidationBasis === 'assumed-normally-consolidated') {
      warnings.push(`Layer ${layerIndex + 1} (${layer.name}) has no σ′p, OCR or POP; it is treated as normally consolidated, the cautious choice. Give σ′p from the oedometer tests to refine it.`);
    }
    const drainagePathM =
      compressible && layer.drainageTop !== undefined && layer.drainageBottom !== undefined
        ? drainagePathLengthM({ thicknessM: layer.thicknessM, drainageTop: layer.drainageTop, drainageBottom: layer.drainageBottom })
        : null;
    const endOfPrimaryYears = drainagePathM !== null && layer.cvM2PerYr !== undefined ? (timeFactorAtEnd * drainagePathM * drainagePathM) / layer.cvM2PerYr : null;
    if (compressible && layer.cvM2PerYr === undefined) {
      warnings.push(`Layer ${layerIndex + 1} (${layer.name}) has no cv: its primary settlement is in the totals but not in the settlement–time curve, and its secondary compression cannot be dated. Give cv to include them.`);
    } else if (compressible && drainagePathM === null) {
      warnings.push(`Layer ${layerIndex + 1} (${layer.name}) is impermeable at both faces: it cannot consolidate by vertical drainage, so it adds nothing to the settlement–time curve. Check its drainage boundaries.`);
    }
    topDepthM = bottomDepthM;
    return {
      layerIndex,
      name: layer.name,
      topDepthM: bottomDepthM - layer.thicknessM,
      bottomDepthM,
      unitWeightKnPerM3: layer.unitWeightKnPerM3,
      saturatedUnitWeightKnPerM3: layer.saturatedUnitWeightKnPerM3,
      compressible,
      e0: layer.e0 ?? null,
      cc: layer.cc ?? null,
      cs: layer.cs ?? null,
      mvM2PerKn: layer.mvM2PerKn ?? null,
      primaryMethod,
      preconsolidationBasis,
      preconsolidationKpa: layer.preconsolidationKpa ?? null,
      ocr: layer.ocr ?? null,
      preOverburdenPressureKpa: layer.preOverburdenPressureKpa ?? null,
      cvM2PerYr: layer.cvM2PerYr ?? null,
      cAlpha: layer.cAlpha ?? null,
      elasticModulusKpa: layer.elasticModulusKpa ?? null,
      poissonRatio: layer.poissonRatio ?? null,
      drainageTop: layer.drainageTop ?? null,
      drainageBottom: layer.drainageBottom ?? null,
      drainagePathM,
      endOfPrimaryYears,
    };
  });
  const clampedLayers = new Set<number>();
  const sublayers = splitIntoSublayers(profile, spacing).map((sublayer): PreparedSublayer => {
    const layer = profile.layers[sublayer.layerIndex];
    const used = layers[sublayer.layerIndex];
    if (layer === undefined || used === undefined || used.primaryMethod === null) throw new RangeError(`${caller} requires a consistent profile`);
    const initialEffectiveStressKpa = verticalStressAtDepth(profile, sublayer.midDepthM).effectiveStressKpa;
    if (!(initialEffectiveStressKpa > 0)) {
      throw new RangeError(`${caller} requires a positive effective stress in layer ${sublayer.layerIndex + 1} (${layer.name}); check that saturated unit weights exceed the unit weight of water, ${waterUnitWeightOf(profile)} kN/m³`);
    }
    const given = layerPreconsolidation(layer, initialEffectiveStressKpa).preconsolidationKpa;
    if (given < initialEffectiveStressKpa && used.primaryMethod === 'e-log-stress') clampedLayers.add(sublayer.layerIndex);
    const cc = used.primaryMethod === 'e-log-stress' ? (layer.cc ?? 0) : 0;
    return {
      ...sublayer,
      initialEffectiveStressKpa,
      preconsolidationKpa: Math.max(given, initialEffectiveStressKpa),
      primaryMethod: used.primaryMethod,
      e0: layer.e0 ?? null,
      cc,
      cs: used.primaryMethod === 'e-log-stress' ? (layer.cs ?? cc) : 0,
      mvM2PerKn: used.primaryMethod === 'mv' ? (layer.mvM2PerKn ?? null) : null,
      cAlpha: layer.cAlpha ?? null,
      endOfPrimaryYears: used.endOfPrimaryYears,
    };
  });
  for (const layerIndex of clampedLayers) {
    const layer = profile.layers[layerIndex];
    warnings.push(`In layer ${layerIndex + 1} (${layer?.name ?? ''}) the given σ′p is below the in-situ effective stress at some depths; those sublayers are treated as normally consolidated. Check σ′p against the stress profile.`);
  }
  const elasticLayers: PreparedElasticLayer[] = layers.flatMap((used) =>
    used.elasticModulusKpa !== null && used.poissonRatio !== null
      ? [{ layerIndex: used.layerIndex, topDepthM: used.topDepthM, bottomDepthM: used.bottomDepthM, elasticModulusKpa: used.elasticModulusKpa, poissonRatio: used.poissonRatio }]
      : [],
  );
  if (elasticLayers.length === 0) warnings.push('No layer has both an elastic modulus and a Poisson’s ratio, so immediate settlement is zero. Give E and ν where immediate settlement matters.');
  const midDepthsM = Float64Array.from(sublayers, (sublayer) => sublayer.midDepthM);
  return { sublayers, midDepthsM, elasticLayers, layers, profileBottomM: topDepthM, warnings };
}
