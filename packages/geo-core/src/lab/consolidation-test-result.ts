import type { CasagrandeConstruction } from '../time-curves/casagrande-log-time.js';
import type { TaylorConstruction } from '../time-curves/taylor-square-root-time.js';
import type { ValueSource } from '../time-curves/time-curve-types.js';
import type { CasagrandePreconsolidationConstruction } from './casagrande-preconsolidation.js';
import type { CompressionLine } from './compression-curve-types.js';
import type { ConsolidationWarning } from './consolidation-warning.js';
import type { Drainage } from './consolidation-test-input.js';
import type { LoadingKind } from './loading-kinds.js';
import type { PachecoSilvaPreconsolidationConstruction } from './pacheco-silva-preconsolidation.js';
import type { SampleQualityCategory } from './sample-quality-lunne.js';

/** A time-curve construction with the drainage path and cv it gives. */
export interface TaylorIncrementResult extends TaylorConstruction {
  /** Specimen height at d50 (apparatus-corrected), mm. */
  readonly heightAtFiftyPercentMm: number;
  /** Hdr used: half that height for double drainage, all of it for single, mm. */
  readonly drainagePathMm: number;
  readonly cvM2PerYr: number;
}

export interface CasagrandeIncrementResult extends CasagrandeConstruction {
  readonly heightAtFiftyPercentMm: number;
  readonly drainagePathMm: number;
  readonly cvM2PerYr: number;
}

/**
 * One increment's results. Deformations inside `taylor` and `casagrande`
 * are on the readings' own datum (before apparatus correction) so they draw
 * over the readings; heights, strains and void ratios are corrected.
 */
export interface ConsolidationIncrementResult {
  readonly index: number;
  readonly stressKpa: number;
  readonly kind: LoadingKind;
  readonly readingCount: number;
  /** Why the reviewer left this increment out of the analysis; null when it is in. */
  readonly excludedReason: string | null;
  /** Apparatus deflection subtracted from this increment's readings, mm. */
  readonly apparatusDeflectionMm: number;
  /** Corrected specimen deformation at the end of the increment since the start of the test, mm. */
  readonly deformationEndMm: number;
  readonly heightEndMm: number;
  /** ΔH/H0 at the end of the increment, fraction. */
  readonly strainEnd: number;
  readonly voidRatioEnd: number;
  /** At d100 of the log-time method; null when d100 was not found. */
  readonly heightEndOfPrimaryMm: number | null;
  readonly strainEndOfPrimary: number | null;
  readonly voidRatioEndOfPrimary: number | null;
  /** av = −Δe/Δσ′ from the end of the previous increment in the analysis, per MPa (null when left out). */
  readonly avPerMPa: number | null;
  /** mv = (ΔH/H1)/Δσ′, per MPa. */
  readonly mvPerMPa: number | null;
  readonly taylor: TaylorIncrementResult | null;
  readonly casagrande: CasagrandeIncrementResult | null;
  readonly cvTaylorM2PerYr: number | null;
  readonly cvCasagrandeM2PerYr: number | null;
  /** Cα = Δe/Δlog10 t of the secondary tail. */
  readonly secondaryCompressionIndex: number | null;
  /** Cα′ = Cα/(1 + ep), ep the void ratio at end of primary. */
  readonly modifiedSecondaryCompressionIndex: number | null;
  /** k = cv·mv·γw, m/s. */
  readonly hydraulicConductivityMPerS: number | null;
  /** Which cv gave k: Taylor's when available (it needs no secondary tail), else Casagrande's. */
  readonly hydraulicConductivityBasis: 'taylor' | 'casagrande' | null;
}

/** A fitted index with what it was fitted on. */
export interface CompressionIndexFit {
  readonly value: number;
  readonly line: CompressionLine;
  readonly rSquared: number;
  /** Increments whose end points were used. */
  readonly incrementIndices: readonly number[];
  readonly source: ValueSource;
}

export interface RecompressionIndexFit extends CompressionIndexFit {
  /** The reload branch, or the first loading below σ′p when the test has no reload. */
  readonly branch: 'reloading' | 'initial-loading';
}

/** An override as received, and whether it could be applied. */
export interface AppliedPick {
  readonly target: 'preconsolidationStressKpa' | 'virginLine' | 'taylor.t90Min' | 'taylor.d0Mm' | 'casagrande.t50Min' | 'casagrande.d0Mm' | 'casagrande.d100Mm';
  readonly incrementIndex: number | null;
  readonly value: number | { readonly firstIncrementIndex: number; readonly lastIncrementIndex: number };
  readonly applied: boolean;
}

/** An increment left out of the analysis, as the reviewer gave it (for reports and plots). */
export interface ExcludedIncrement {
  readonly index: number;
  readonly stressKpa: number;
  readonly reason: string;
}

export interface ConsolidationTestResult {
  /** GEO_CORE_VERSION that produced this result. */
  readonly geoCoreVersion: string;
  readonly specimen: {
    readonly areaMm2: number;
    readonly dryMassG: number;
    readonly dryMassSource: 'given' | 'from-wet-mass';
    readonly heightOfSolidsMm: number;
    readonly initialHeightMm: number;
    readonly drainage: Drainage;
    readonly initialDegreeOfSaturation: number | null;
    readonly finalVoidRatio: number;
    readonly finalDegreeOfSaturation: number | null;
  };
  readonly initialVoidRatio: number;
  readonly increments: readonly ConsolidationIncrementResult[];
  readonly compressionIndex: number | null;
  /** CR = Cc/(1 + e0). */
  readonly compressionRatio: number | null;
  readonly compressionFit: CompressionIndexFit | null;
  readonly recompressionIndex: number | null;
  /** RR = Cr/(1 + e0). */
  readonly recompressionRatio: number | null;
  readonly recompressionFit: RecompressionIndexFit | null;
  readonly swellIndex: number | null;
  readonly swellFit: CompressionIndexFit | null;
  readonly preconsolidation: {
    readonly casagrandeKpa: number | null;
    readonly pachecoSilvaKpa: number | null;
    /** σ′p used for OCR, Cr and sample quality: the pick, else Casagrande's, else Pacheco Silva's. */
    readonly adoptedKpa: number | null;
    readonly adoptedFrom: 'pick' | 'casagrande' | 'pacheco-silva' | null;
    readonly casagrande: CasagrandePreconsolidationConstruction | null;
    readonly pachecoSilva: PachecoSilvaPreconsolidationConstruction | null;
  };
  readonly inSituVerticalEffectiveStressKpa: number | null;
  readonly overconsolidationRatio: number | null;
  readonly sampleQuality: {
    readonly method: 'Lunne, Berre & Strandvik (1997)';
    readonly voidRatioAtInSituStress: number;
    /** Δe/e0. */
    readonly voidRatioChangeRatio: number;
    readonly category: SampleQualityCategory | null;
    readonly overconsolidationBand: '1-2' | '2-4' | null;
  } | null;
  readonly picksApplied: readonly AppliedPick[];
  /** Increments left out of the analysis, in test order (empty when none). */
  readonly excludedIncrements: readonly ExcludedIncrement[];
  readonly warnings: readonly ConsolidationWarning[];
}
