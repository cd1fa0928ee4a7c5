import type { ConsolidationCase } from './primary-consolidation-settlement.js';
import type { AngularDistortionVerdict } from './judge-angular-distortion.js';
import type { DrainageBoundary, PreconsolidationBasis, SoilProfile } from '../profile/soil-profile.types.js';
import type { Footing, FootingShape, PressureBasis, StressMethod } from '../stress/footing.types.js';

/** Choices for a settlement check; every one has a stated default. */
export interface SettlementCheckOptions {
  /** Sublayers per compressible layer. Give this or sublayerMaxThicknessM; default: maximum 0.5 m. */
  readonly sublayerCount?: number;
  /** Largest sublayer thickness, m. */
  readonly sublayerMaxThicknessM?: number;
  /** Add the neighbours' stresses and elastic settlements. Default true. */
  readonly includeNeighbours?: boolean;
  /** Default 'boussinesq'. */
  readonly stressMethod?: StressMethod;
  /** Time for secondary compression, years after loading. Default 50. */
  readonly designLifeYears?: number;
  /** Times for the settlement–time curve, years; default 41 points from 0.01 to 100 years on log t. */
  readonly timesYears?: readonly number[];
  /**
   * 'centre' or 'centre-and-corners' (the corners of a rectangle or square, the
   * rim points on the axes of a circle, the two edges of a strip: see
   * EvaluationPointLabel). Default 'centre-and-corners'.
   */
  readonly evaluationPoints?: 'centre' | 'centre-and-corners';
  /** Share of primary consolidation taken as its end, where secondary compression starts (fraction). Default 0.95. */
  readonly endOfPrimaryShare?: number;
  /** Angular distortion the design must keep within. Default 1/500 (both Bjerrum 1963 and Skempton & MacDonald 1956). */
  readonly designAngularDistortion?: number;
  /** Only judge pairs of footings closer than this, m (centre to centre). Default: every pair. */
  readonly pairMaxDistanceM?: number;
  /**
   * Reduce each footing's immediate settlement under itself by Fox's (1948)
   * depth factor If(L/B, Df/B, ν of the layer below the base). Neighbours'
   * contributions are not reduced (Fox's factor is for the loaded area's own
   * mean settlement; leaving them whole errs on the side of more settlement).
   * Default false: Fox assumes the soil above the base is in place and
   * bonded to the footing, which an excavated and backfilled pit is not.
   */
  readonly applyFoxDepthFactor?: boolean;
  /** Total settlement a footing may reach, m; omitted: totals are not judged. */
  readonly totalSettlementLimitM?: number;
}

/** The whole check's input. */
export interface SettlementCheckInput {
  readonly profile: SoilProfile;
  readonly footings: readonly Footing[];
  readonly options?: SettlementCheckOptions;
}

/** How a layer's primary consolidation settlement is worked out. */
export type PrimaryMethod = 'e-log-stress' | 'mv';

/** The branch a sublayer's primary settlement used: an e–log σ′ case, or 'volume-compressibility' (mv·Δσ′·H). */
export type SublayerConsolidationCase = ConsolidationCase | 'volume-compressibility';

/** The parameters a layer contributed, as used, so every number can be traced. */
export interface LayerParametersUsed {
  readonly layerIndex: number;
  readonly name: string;
  readonly topDepthM: number;
  readonly bottomDepthM: number;
  readonly unitWeightKnPerM3: number;
  readonly saturatedUnitWeightKnPerM3: number;
  readonly compressible: boolean;
  readonly e0: number | null;
  readonly cc: number | null;
  readonly cs: number | null;
  /** Coefficient of volume compressibility as given, m²/kN. */
  readonly mvM2PerKn: number | null;
  /** 'e-log-stress' where e0 and cc are given, 'mv' where only mv is; null for a layer that does not consolidate. */
  readonly primaryMethod: PrimaryMethod | null;
  /**
   * How σ′p was carried through the layer: a constant σ′p, a constant OCR, a
   * constant POP = σ′p − σ′v0, or assumed normally consolidated; null for a
   * layer that does not consolidate, or an mv layer given no σ′p.
   */
  readonly preconsolidationBasis: PreconsolidationBasis | null;
  /** The constant σ′p given, kPa (basis 'preconsolidation-stress'). */
  readonly preconsolidationKpa: number | null;
  /** The OCR given (basis 'ocr'). */
  readonly ocr: number | null;
  /** The POP given, kPa (basis 'pre-overburden-pressure'). */
  readonly preOverburdenPressureKpa: number | null;
  readonly cvM2PerYr: number | null;
  readonly cAlpha: number | null;
  readonly elasticModulusKpa: number | null;
  readonly poissonRatio: number | null;
  readonly drainageTop: DrainageBoundary | null;
  readonly drainageBottom: DrainageBoundary | null;
  readonly drainagePathM: number | null;
  /** Time at which primary consolidation is taken to end (endOfPrimaryShare), years. */
  readonly endOfPrimaryYears: number | null;
}

/** One sublayer under a footing's centre. */
export interface SublayerSettlementRow {
  readonly layerIndex: number;
  readonly layerName: string;
  readonly topDepthM: number;
  readonly bottomDepthM: number;
  readonly midDepthM: number;
  readonly thicknessM: number;
  readonly initialEffectiveStressKpa: number;
  readonly preconsolidationKpa: number;
  readonly ownStressIncreaseKpa: number;
  readonly neighboursStressIncreaseKpa: number;
  readonly stressIncreaseKpa: number;
  readonly consolidationCase: SublayerConsolidationCase;
  readonly primarySettlementM: number;
  /** null where the layer has no cv, so the end of primary cannot be fixed, or (mv layers) no e0. */
  readonly secondarySettlementM: number | null;
}

/**
 * Where on a footing a point lies: the centre; the four corners of a rectangle
 * or square; for a circle, the four points of its rim on the x and y axes
 * through its centre ('edge-x-' at x − D/2, and so on: the rim points nearest
 * and farthest from neighbours set out on the plan's grid); for a strip, its
 * two edges across the width at the footing's station ('edge-x-', 'edge-x+').
 */
export type EvaluationPointLabel =
  | 'centre'
  | 'corner-x-y-'
  | 'corner-x+y-'
  | 'corner-x-y+'
  | 'corner-x+y+'
  | 'edge-x-'
  | 'edge-x+'
  | 'edge-y-'
  | 'edge-y+';

/** Settlements at one point of a footing, m. */
export interface PointSettlement {
  readonly label: EvaluationPointLabel;
  readonly xM: number;
  readonly yM: number;
  readonly immediateM: number;
  readonly primaryM: number;
  readonly secondaryM: number;
  readonly totalM: number;
}

/** One footing's results; the headline numbers are at its centre. */
export interface FootingSettlementResult {
  readonly id: string;
  /** The footing's shape as used ('rectangle' where none was given). */
  readonly shape: FootingShape;
  readonly xM: number;
  readonly yM: number;
  /** B, m: the diameter for a circle, the width across for a strip. */
  readonly widthM: number;
  /** L, m: a square's side again; null for a circle and a strip. */
  readonly lengthM: number | null;
  readonly depthM: number;
  /** Whether the load was given net or gross. */
  readonly pressureBasis: PressureBasis;
  /** Net pressure at founding level used for every stress and settlement, kPa. */
  readonly pressureKpa: number;
  /** The gross pressure given, kPa; null for a net load. */
  readonly grossPressureKpa: number | null;
  /** σv0 at the founding depth taken off the gross pressure, kPa; null for a net load. */
  readonly overburdenRemovedKpa: number | null;
  /** Net total load, kN (net pressure × plan area); null for a strip. */
  readonly loadKn: number | null;
  /** Net load per metre run, kN/m (net pressure × width); null except for a strip. */
  readonly loadKnPerM: number | null;
  /** Fox's depth factor applied to the footing's own immediate settlement (1 when the option is off). */
  readonly immediateDepthFactor: number;
  readonly immediateM: number;
  readonly primaryM: number;
  readonly secondaryM: number;
  readonly totalM: number;
  readonly points: readonly PointSettlement[];
  readonly sublayers: readonly SublayerSettlementRow[];
  readonly primaryByLayer: ReadonlyArray<{ readonly layerIndex: number; readonly primarySettlementM: number }>;
  /** Immediate + primary reached at each time (centre). */
  readonly timeCurve: ReadonlyArray<{ readonly timeYears: number; readonly settlementM: number }>;
  /** Years to 50 % and 90 % of primary settlement at the centre; null where it cannot be had. */
  readonly timeTo50PercentYears: number | null;
  readonly timeTo90PercentYears: number | null;
  /** Total against totalSettlementLimitM; null when no limit was given. */
  readonly withinTotalLimit: boolean | null;
}

/** Differential settlement between two footing centres. */
export interface FootingPairResult {
  readonly footingIds: readonly [string, string];
  readonly distanceM: number;
  readonly differentialSettlementM: number;
  readonly angularDistortion: number;
  readonly withinDesignLimit: boolean;
  readonly verdicts: readonly AngularDistortionVerdict[];
}

/** The whole check's output: plain data, safe to serialise. */
export interface SettlementCheckResult {
  readonly method: {
    readonly stressMethod: StressMethod;
    /** γw the pore pressures and effective stresses were worked out with, kN/m³. */
    readonly waterUnitWeightKnPerM3: number;
    readonly includeNeighbours: boolean;
    readonly sublayerSpacing: { readonly count: number } | { readonly maxThicknessM: number };
    readonly designLifeYears: number;
    readonly endOfPrimaryShare: number;
    readonly designAngularDistortion: number;
    readonly applyFoxDepthFactor: boolean;
    readonly notes: readonly string[];
  };
  readonly layers: readonly LayerParametersUsed[];
  readonly footings: readonly FootingSettlementResult[];
  readonly pairs: readonly FootingPairResult[];
  readonly warnings: readonly string[];
  readonly caution: string;
}
