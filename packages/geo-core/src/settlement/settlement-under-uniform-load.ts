import type { SoilProfile } from '../profile/soil-profile.types.js';
import { settlementTimeCurve } from '../time-rate/settlement-time-curve.js';
import { timeForPrimaryShare } from '../time-rate/time-for-primary-share.js';
import { consolidatingLayersOf } from './consolidating-layers-of.js';
import { prepareSettlementModel } from './prepare-settlement-model.js';
import { primaryForSublayer, secondaryForSublayer } from './settlement-at-point.js';
import { SETTLEMENT_CAUTION } from './settlement-caution.js';
import type { LayerParametersUsed, SublayerSettlementRow } from './settlement-check.types.js';

/** A load wide enough, against the depth of the compressible layers, to stress them one-dimensionally. */
export interface UniformLoadSettlementInput {
  readonly profile: SoilProfile;
  /** The vertical stress increase, kPa (> 0), the same at every depth below ground level. */
  readonly stressIncreaseKpa: number;
  readonly options?: {
    /** Sublayers per compressible layer; give this or sublayerMaxThicknessM (default: at most 0.5 m). */
    readonly sublayerCount?: number;
    readonly sublayerMaxThicknessM?: number;
    /** Years after loading for secondary compression; default 50. */
    readonly designLifeYears?: number;
    /** Share of primary consolidation taken as its end (fraction); default 0.95. */
    readonly endOfPrimaryShare?: number;
    /** Times for the settlement–time curve, years; default 41 points from 0.01 to 100 years on log t. */
    readonly timesYears?: readonly number[];
  };
}

/** The settlement of the ground surface under the uniform load. */
export interface UniformLoadSettlementResult {
  readonly method: {
    readonly stressIncreaseKpa: number;
    readonly sublayerSpacing: { readonly count: number } | { readonly maxThicknessM: number };
    readonly designLifeYears: number;
    readonly endOfPrimaryShare: number;
    readonly notes: readonly string[];
  };
  readonly layers: readonly LayerParametersUsed[];
  readonly primaryM: number;
  readonly secondaryM: number;
  readonly totalM: number;
  readonly sublayers: readonly SublayerSettlementRow[];
  readonly primaryByLayer: ReadonlyArray<{ readonly layerIndex: number; readonly primarySettlementM: number }>;
  readonly timeCurve: ReadonlyArray<{ readonly timeYears: number; readonly settlementM: number }>;
  readonly timeTo50PercentYears: number | null;
  readonly timeTo90PercentYears: number | null;
  readonly warnings: readonly string[];
  readonly caution: string;
}

/**
 * One-dimensional consolidation settlement under a uniform stress increase — a fill or raft
 * much wider than the compressible layers are deep, or a check where Δσ is given directly —
 * summed over sublayers with σ′0 and σ′p at each mid-depth (Terzaghi's e–log σ′ in its three
 * cases, or mv·Δσ′·H), secondary compression over the design life from Cα, and the time rate
 * from Terzaghi's U(Tv) per layer on its own drainage path. No immediate settlement: under
 * one-dimensional loading the ground does not strain sideways.
 *
 * Source: Terzaghi (1943); Das, *Principles of Geotechnical Engineering*, ch. "Compressibility
 * of soil" (the settlement of a clay layer under a given Δσ).
 *
 * @param input profile, stress increase (kPa) and options
 * @returns the settlement, per-sublayer rows and the settlement–time curve, plain data
 * @throws RangeError('settlementUnderUniformLoad requires …') for a non-positive stress increase, an invalid profile or option
 * @example settlementUnderUniformLoad({ profile, stressIncreaseKpa: 200, options: { sublayerCount: 1 } }).primaryM // 0.513 for the clay of S1
 */
export function settlementUnderUniformLoad(input: UniformLoadSettlementInput): UniformLoadSettlementResult {
  const caller = 'settlementUnderUniformLoad';
  const options = input.options ?? {};
  const { stressIncreaseKpa } = input;
  if (!(stressIncreaseKpa > 0) || !Number.isFinite(stressIncreaseKpa)) throw new RangeError(`${caller} requires a finite stressIncreaseKpa > 0`);
  if (options.sublayerCount !== undefined && options.sublayerMaxThicknessM !== undefined) throw new RangeError(`${caller} requires either sublayerCount or sublayerMaxThicknessM, not both`);
  const spacing = options.sublayerCount !== undefined ? { count: options.sublayerCount } : { maxThicknessM: options.sublayerMaxThicknessM ?? 0.5 };
  const designLifeYears = options.designLifeYears ?? 50;
  const endOfPrimaryShare = options.endOfPrimaryShare ?? 0.95;
  if (!(designLifeYears > 0) || !Number.isFinite(designLifeYears)) throw new RangeError(`${caller} requires a finite designLifeYears > 0`);
  if (!(endOfPrimaryShare > 0 && endOfPrimaryShare < 1)) throw new RangeError(`${caller} requires endOfPrimaryShare strictly between 0 and 1`);
  const model = prepareSettlementModel(input.profile, spacing, endOfPrimaryShare, caller);
  let primaryM = 0;
  let secondaryM = 0;
  const primaryByLayer = new Map<number, number>();
  const sublayers = model.sublayers.map((sublayer): SublayerSettlementRow => {
    const primary = primaryForSublayer(sublayer, stressIncreaseKpa);
    const secondary = secondaryForSublayer(sublayer, primary.settlementM, primary.consolidationCase === 'overconsolidated-below', designLifeYears);
    primaryM += primary.settlementM;
    secondaryM += secondary ?? 0;
    primaryByLayer.set(sublayer.layerIndex, (primaryByLayer.get(sublayer.layerIndex) ?? 0) + primary.settlementM);
    return {
      layerIndex: sublayer.layerIndex,
      layerName: sublayer.layerName,
      topDepthM: sublayer.topDepthM,
      bottomDepthM: sublayer.bottomDepthM,
      midDepthM: sublayer.midDepthM,
      thicknessM: sublayer.thicknessM,
      initialEffectiveStressKpa: sublayer.initialEffectiveStressKpa,
      preconsolidationKpa: sublayer.preconsolidationKpa,
      ownStressIncreaseKpa: stressIncreaseKpa,
      neighboursStressIncreaseKpa: 0,
      stressIncreaseKpa,
      consolidationCase: primary.consolidationCase,
      primarySettlementM: primary.settlementM,
      secondarySettlementM: secondary,
    };
  });
  const consolidating = consolidatingLayersOf(model, primaryByLayer);
  const shareTime = (share: number) => (consolidating.length === 0 ? null : timeForPrimaryShare(consolidating, share).timeYears);
  return {
    method: {
      stressIncreaseKpa,
      sublayerSpacing: spacing,
      designLifeYears,
      endOfPrimaryShare,
      notes: [
        'One-dimensional loading: the same stress increase at every depth, as under a fill or raft much wider than the compressible layers are deep.',
        'Primary settlement per sublayer from Cc, Cs, e0 and σ′p at mid-depth (Terzaghi, e–log σ′), or from mv·Δσ′·H on a layer given mv and no Cc.',
        'No immediate settlement: the ground does not strain sideways under one-dimensional loading.',
        'Secondary compression from Cα over the design life, starting at the end of primary consolidation; Cα·Cs/Cc where a sublayer stays overconsolidated (Mesri & Godlewski 1977).',
      ],
    },
    layers: model.layers,
    primaryM,
    secondaryM,
    totalM: primaryM + secondaryM,
    sublayers,
    primaryByLayer: [...primaryByLayer].map(([layerIndex, primarySettlementM]) => ({ layerIndex, primarySettlementM })),
    timeCurve: settlementTimeCurve(consolidating, 0, options.timesYears).map((point) => ({ timeYears: point.timeYears, settlementM: point.settlementM })),
    timeTo50PercentYears: shareTime(0.5),
    timeTo90PercentYears: shareTime(0.9),
    warnings: model.warnings.filter((warning) => !warning.startsWith('No layer has both an elastic modulus')),
    caution: SETTLEMENT_CAUTION,
  };
}
