// The public surface of @porestack/geo-core: every export is listed by name.

// ── Laboratory: oedometer test reduction ─────────────────────────────────────
export { GEO_CORE_VERSION } from './constants/geo-core-version.js';
export { analyzeConsolidationTest } from './lab/analyze-consolidation-test.js';
export type {
  ComplianceCalibrationPoint,
  ConsolidationIncrementInput,
  ConsolidationPicks,
  ConsolidationSpecimenInput,
  ConsolidationTestInput,
  Drainage,
  IncrementExclusion,
  IncrementPicks,
} from './lab/consolidation-test-input.js';
export type {
  AppliedPick,
  CasagrandeIncrementResult,
  CompressionIndexFit,
  ConsolidationIncrementResult,
  ConsolidationTestResult,
  ExcludedIncrement,
  RecompressionIndexFit,
  TaylorIncrementResult,
} from './lab/consolidation-test-result.js';
export type { ConsolidationWarning, ConsolidationWarningCode } from './lab/consolidation-warning.js';
export type { CompressionLine, StressVoidRatioLine, StressVoidRatioPoint } from './lab/compression-curve-types.js';
export { heightOfSolidsMm } from './lab/height-of-solids.js';
export { coefficientOfVolumeCompressibilityM2PerKn } from './lab/volume-compressibility.js';
export type { VolumeCompressibilityInput } from './lab/volume-compressibility.js';
export { hydraulicConductivityMPerS } from './lab/hydraulic-conductivity.js';
export { voidRatioFromHeight } from './lab/void-ratio-from-height.js';
export { apparatusDeflectionAtStress } from './lab/apparatus-deflection-at-stress.js';
export { loadingKinds } from './lab/loading-kinds.js';
export type { LoadingKind } from './lab/loading-kinds.js';
export { fitCompressionLine } from './lab/fit-compression-line.js';
export { selectVirginLine } from './lab/select-virgin-line.js';
export { casagrandePreconsolidation, CASAGRANDE_CURVATURE_CONVENTION } from './lab/casagrande-preconsolidation.js';
export type { CasagrandePreconsolidationConstruction, CasagrandePreconsolidationResult } from './lab/casagrande-preconsolidation.js';
export { pachecoSilvaPreconsolidation } from './lab/pacheco-silva-preconsolidation.js';
export type { PachecoSilvaPreconsolidationConstruction, PachecoSilvaPreconsolidationResult } from './lab/pacheco-silva-preconsolidation.js';
export { sampleQualityLunne } from './lab/sample-quality-lunne.js';
export type { SampleQualityAssessment, SampleQualityCategory } from './lab/sample-quality-lunne.js';
export { generateSyntheticConsolidationTest } from './lab/synthetic/generate-synthetic-consolidation-test.js';
export type { SyntheticConsolidationTest, SyntheticIncrementTruth } from './lab/synthetic/generate-synthetic-consolidation-test.js';
export { DEFAULT_SYNTHETIC_CONSOLIDATION_PARAMETERS } from './lab/synthetic/synthetic-consolidation-parameters.js';
export type { SyntheticConsolidationParameters } from './lab/synthetic/synthetic-consolidation-parameters.js';
export { firstLoadingVoidRatio } from './lab/synthetic/first-loading-void-ratio.js';
export type { FirstLoadingCurve } from './lab/synthetic/first-loading-void-ratio.js';
export { logSpacedReadingTimesMin, STANDARD_READING_TIMES_MIN } from './lab/synthetic/log-spaced-reading-times.js';
export { degreeOfConsolidation } from './time-curves/degree-of-consolidation.js';
export { timeFactorForDegree } from './time-curves/time-factor-for-degree.js';
export { coefficientOfConsolidationM2PerYr } from './time-curves/coefficient-of-consolidation.js';
export { TIME_FACTOR_AT_FIFTY_PERCENT } from './time-curves/time-factor-at-fifty-percent.js';
export { TIME_FACTOR_AT_NINETY_PERCENT } from './time-curves/time-factor-at-ninety-percent.js';
export { taylorSquareRootTime } from './time-curves/taylor-square-root-time.js';
export type { TaylorConstruction, TaylorPicks, TaylorSquareRootTimeResult } from './time-curves/taylor-square-root-time.js';
export { casagrandeLogTime } from './time-curves/casagrande-log-time.js';
export type { CasagrandeConstruction, CasagrandeLogTimeResult, CasagrandePicks } from './time-curves/casagrande-log-time.js';
export type { TimeCurveLine, TimeCurvePoint, TimeCurveWarning, TimeDeformationReading, ValueSource } from './time-curves/time-curve-types.js';
export { readingsFromCsv, READINGS_CSV_HEADER } from './readings/readings-from-csv.js';
export type { ReadingsCsvError, ReadingsCsvResult } from './readings/readings-from-csv.js';
export { dialReadingsToDeformation } from './readings/dial-readings-to-deformation.js';
export type { DialGauge, DialReading } from './readings/dial-readings-to-deformation.js';

// ── Design: stresses, settlement, time rate, sizing, statistics, units ──────
export { DAYS_PER_YEAR } from './constants/days-per-year.js';
export { WATER_UNIT_WEIGHT_KN_PER_M3 } from './constants/water-unit-weight.js';

export { carryPreconsolidationFromSample } from './profile/carry-preconsolidation-from-sample.js';
export type { CarryPreconsolidationFromSampleInput, CarryPreconsolidationFromSampleResult } from './profile/carry-preconsolidation-from-sample.js';
export { preconsolidationStressAtDepth } from './profile/preconsolidation-stress-at-depth.js';
export { soilProfileWarnings } from './profile/soil-profile-warnings.js';
export type { PreconsolidationStressAtDepth } from './profile/preconsolidation-stress-at-depth.js';
export { splitIntoSublayers } from './profile/split-into-sublayers.js';
export type { SublayerSpacing } from './profile/split-into-sublayers.js';
export type { DrainageBoundary, PreconsolidationBasis, SoilLayer, SoilProfile, Sublayer, VerticalStressState } from './profile/soil-profile.types.js';
export { validateSoilProfile } from './profile/validate-soil-profile.js';
export { verticalStressAtDepth } from './profile/vertical-stress-at-depth.js';

export { cornerInfluenceFactor } from './stress/corner-influence-factor.js';
export { footingPressureKpa } from './stress/footing-pressure.js';
export type { Footing, FootingLoad, FootingPlan, FootingShape, PressureBasis, StressMethod } from './stress/footing.types.js';
export { netFootingPressure } from './stress/net-footing-pressure.js';
export { overlappingFootingPairs } from './stress/overlapping-footing-pairs.js';
export type { NetFootingPressure } from './stress/net-footing-pressure.js';
export { stressIncrease2to1 } from './stress/stress-increase-2to1.js';
export type { StressIncrease2to1Input } from './stress/stress-increase-2to1.js';
export { stressIncrease2to1Circle } from './stress/stress-increase-2to1-circle.js';
export type { StressIncrease2to1CircleInput } from './stress/stress-increase-2to1-circle.js';
export { stressIncrease2to1Strip } from './stress/stress-increase-2to1-strip.js';
export type { StressIncrease2to1StripInput } from './stress/stress-increase-2to1-strip.js';
export { stressIncreaseCircle } from './stress/stress-increase-circle.js';
export type { StressIncreaseCircleInput } from './stress/stress-increase-circle.js';
export { stressIncreaseFromFootings } from './stress/stress-increase-from-footings.js';
export type { StressIncreaseFromFootingsInput, StressIncreaseFromFootingsResult } from './stress/stress-increase-from-footings.js';
export { stressIncreaseRectangle } from './stress/stress-increase-rectangle.js';
export type { StressIncreaseRectangleInput } from './stress/stress-increase-rectangle.js';
export { stressIncreaseStrip } from './stress/stress-increase-strip.js';
export type { StressIncreaseStripInput } from './stress/stress-increase-strip.js';

export { ANGULAR_DISTORTION_LIMITS } from './settlement/angular-distortion-limits.js';
export type { AngularDistortionLimit } from './settlement/angular-distortion-limits.js';
export { TOTAL_SETTLEMENT_LIMITS } from './settlement/total-settlement-limits.js';
export type { TotalSettlementLimit } from './settlement/total-settlement-limits.js';
export { elasticInfluenceFactor } from './settlement/elastic-influence-factor.js';
export type { ElasticSettlementPosition } from './settlement/elastic-influence-factor.js';
export { footingPairResults } from './settlement/footing-pair-results.js';
export { foxDepthFactor } from './settlement/fox-depth-factor.js';
export { immediateSettlement } from './settlement/immediate-settlement.js';
export type { ImmediateSettlementInput, ImmediateSettlementResult } from './settlement/immediate-settlement.js';
export { immediateSettlementFiniteLayer } from './settlement/immediate-settlement-finite-layer.js';
export type { ImmediateSettlementFiniteLayerInput, ImmediateSettlementFiniteLayerResult } from './settlement/immediate-settlement-finite-layer.js';
export { judgeAngularDistortion } from './settlement/judge-angular-distortion.js';
export type { AngularDistortionVerdict } from './settlement/judge-angular-distortion.js';
export { primaryConsolidationSettlement } from './settlement/primary-consolidation-settlement.js';
export type { ConsolidationCase, PrimaryConsolidationSettlementInput, PrimaryConsolidationSettlementResult } from './settlement/primary-consolidation-settlement.js';
export { primaryConsolidationSettlementMv } from './settlement/primary-consolidation-settlement-mv.js';
export type { PrimaryConsolidationSettlementMvInput } from './settlement/primary-consolidation-settlement-mv.js';
export { runSettlementCheck } from './settlement/run-settlement-check.js';
export { SETTLEMENT_CAUTION } from './settlement/settlement-caution.js';
export { settlementUnderUniformLoad } from './settlement/settlement-under-uniform-load.js';
export type { UniformLoadSettlementInput, UniformLoadSettlementResult } from './settlement/settlement-under-uniform-load.js';
export { secondaryCompressionSettlement } from './settlement/secondary-compression-settlement.js';
export type { SecondaryCompressionSettlementInput } from './settlement/secondary-compression-settlement.js';
export type {
  EvaluationPointLabel,
  FootingPairResult,
  FootingSettlementResult,
  LayerParametersUsed,
  PointSettlement,
  PrimaryMethod,
  SettlementCheckInput,
  SettlementCheckOptions,
  SettlementCheckResult,
  SublayerConsolidationCase,
  SublayerSettlementRow,
} from './settlement/settlement-check.types.js';
export { steinbrennerFactors } from './settlement/steinbrenner-factors.js';
export type { SteinbrennerFactors } from './settlement/steinbrenner-factors.js';

export type { ConsolidatingLayer } from './time-rate/consolidating-layer.types.js';
export { drainagePathLengthM } from './time-rate/drainage-path-length.js';
export type { DrainagePathLengthInput } from './time-rate/drainage-path-length.js';
export { settlementAtTime } from './time-rate/settlement-at-time.js';
export type { SettlementAtTimeResult } from './time-rate/settlement-at-time.js';
export { settlementTimeCurve } from './time-rate/settlement-time-curve.js';
export type { SettlementTimePoint } from './time-rate/settlement-time-curve.js';
export { cvAtStressRange, CV_AT_STRESS_RANGE_CONVENTION } from './time-rate/cv-at-stress-range.js';
export type { CvAtStressRangeInput, CvAtStressRangeResult, CvStressPoint } from './time-rate/cv-at-stress-range.js';
export { cvPointsFromTestResult } from './lab/cv-points-from-test-result.js';
export type { CvIncrement } from './lab/cv-points-from-test-result.js';
export { timeForPrimaryShare } from './time-rate/time-for-primary-share.js';
export type { TimeForPrimaryShareResult } from './time-rate/time-for-primary-share.js';

export { findWidthByBisection } from './sizing/find-width-by-bisection.js';
export type { BisectionOutcome } from './sizing/find-width-by-bisection.js';
export type { FootingToSize } from './sizing/footing-settlement-for-width.js';
export { sizeFootingForSettlement } from './sizing/size-footing-for-settlement.js';
export type { SizeFootingForSettlementInput, SizeFootingResult } from './sizing/size-footing-for-settlement.js';
export { sizeFootingToMatchSettlement } from './sizing/size-footing-to-match-settlement.js';
export type { SizeFootingToMatchSettlementInput } from './sizing/size-footing-to-match-settlement.js';

export { characteristicValues } from './statistics/characteristic-values.js';
export type { CharacteristicValuesInput, CharacteristicValuesResult } from './statistics/characteristic-values.js';
export { SETTLEMENT_UNFAVOURABLE_SIDE } from './statistics/settlement-unfavourable-side.js';
export type { UnfavourableSide } from './statistics/settlement-unfavourable-side.js';
export { studentTQuantile } from './statistics/student-t-quantile.js';

export { convertUnit } from './units/convert-unit.js';
export { UNIT_CONVERSION_TABLE } from './units/unit-conversion-table.js';
export type { UnitDefinition, UnitName, UnitQuantity } from './units/unit-conversion-table.js';
