/**
 * The parts of geo-core's ConsolidationTestResult that the page draws and tabulates. The API
 * stores and returns the whole result; the web app reads it through these shapes only.
 */
export type StressPoint = { stressKpa: number; voidRatio: number };
export type LinePoints = { start: StressPoint; end: StressPoint };
export type TimePoint = { timeMin: number; deformationMm: number };
export type TimeLine = { start: TimePoint; end: TimePoint };
export type ValueSource = 'automatic' | 'pick';

export type TaylorConstruction = {
  d0Mm: number;
  d0Source: ValueSource;
  d90Mm: number;
  d100Mm: number;
  d50Mm: number;
  t90Min: number;
  t90Source: ValueSource;
  t50Min: number | null;
  initialLine: TimeLine;
  offsetLine: TimeLine;
  cvM2PerYr: number;
};

export type CasagrandeTimeConstruction = {
  d0Mm: number;
  d0Source: ValueSource;
  d100Mm: number | null;
  d100Source: ValueSource;
  t100Min: number | null;
  d50Mm: number;
  t50Min: number;
  t50Source: ValueSource;
  tangentLine: TimeLine | null;
  secondaryLine: TimeLine | null;
  cvM2PerYr: number;
};

export type AnalysisIncrement = {
  index: number;
  stressKpa: number;
  kind: 'loading' | 'unloading' | 'reloading';
  readingCount: number;
  /** Why the reviewer left this increment out of the analysis; null (or absent in older results) when it is in. */
  excludedReason?: string | null;
  strainEnd: number;
  voidRatioEnd: number;
  mvPerMPa: number | null;
  taylor: TaylorConstruction | null;
  casagrande: CasagrandeTimeConstruction | null;
  cvTaylorM2PerYr: number | null;
  cvCasagrandeM2PerYr: number | null;
  secondaryCompressionIndex: number | null;
  hydraulicConductivityMPerS: number | null;
};

type FitSource = { source: ValueSource; incrementIndices: readonly number[] } | null;

export type AnalysisWarning = { code: string; message: string; incrementIndex: number | null };

export type AnalysisResult = {
  geoCoreVersion: string;
  initialVoidRatio: number;
  increments: readonly AnalysisIncrement[];
  compressionIndex: number | null;
  compressionRatio: number | null;
  compressionFit: FitSource;
  recompressionIndex: number | null;
  recompressionRatio: number | null;
  swellIndex: number | null;
  preconsolidation: {
    casagrandeKpa: number | null;
    pachecoSilvaKpa: number | null;
    adoptedKpa: number | null;
    adoptedFrom: 'pick' | 'casagrande' | 'pacheco-silva' | null;
    casagrande: {
      preconsolidationStressKpa: number;
      maximumCurvaturePoint: StressPoint;
      horizontalLine: LinePoints;
      tangentLine: LinePoints;
      bisectorLine: LinePoints;
      virginLine: LinePoints;
      intersection: StressPoint;
      interpolant: readonly StressPoint[];
    } | null;
    pachecoSilva: {
      preconsolidationStressKpa: number;
      pointA: StressPoint;
      pointB: StressPoint;
      pointC: StressPoint;
      initialVoidRatioLine: LinePoints;
      virginLine: LinePoints;
      verticalLine: LinePoints;
      horizontalLine: LinePoints;
    } | null;
  };
  inSituVerticalEffectiveStressKpa: number | null;
  overconsolidationRatio: number | null;
  sampleQuality: { voidRatioChangeRatio: number; category: string | null } | null;
  picksApplied: readonly { target: string; incrementIndex: number | null; applied: boolean }[];
  /** Increments left out of the analysis, with the reason (absent in results from before it existed). */
  excludedIncrements?: readonly { index: number; stressKpa: number; reason: string }[];
  warnings: readonly AnalysisWarning[];
};
