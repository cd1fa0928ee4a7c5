import { z } from 'zod';

/*
 * geo-core's ConsolidationTestResult as a zod schema: what the API stores and answers, and what
 * the web reads. Written out field by field and checked against geo-core's own type at compile
 * time (consolidation-result.check.ts), so a field renamed or retyped in geo-core fails `tsc -b`
 * here instead of breaking a page in the browser. Field meanings and units: geo-core's doc
 * comments on the same names.
 */

const ValueSourceSchema = z.enum(['automatic', 'pick']);

export const StressVoidRatioPointSchema = z.object({ stressKpa: z.number(), voidRatio: z.number() });
export type StressVoidRatioPoint = z.infer<typeof StressVoidRatioPointSchema>;

export const StressVoidRatioLineSchema = z.object({ start: StressVoidRatioPointSchema, end: StressVoidRatioPointSchema });
export type StressVoidRatioLine = z.infer<typeof StressVoidRatioLineSchema>;

export const TimeCurvePointSchema = z.object({ timeMin: z.number(), deformationMm: z.number() });
export type TimeCurvePoint = z.infer<typeof TimeCurvePointSchema>;

export const TimeCurveLineSchema = z.object({ start: TimeCurvePointSchema, end: TimeCurvePointSchema });
export type TimeCurveLine = z.infer<typeof TimeCurveLineSchema>;

const incrementDrainage = {
  heightAtFiftyPercentMm: z.number(),
  drainagePathMm: z.number(),
  cvM2PerYr: z.number(),
};

export const TaylorIncrementResultSchema = z.object({
  d0Mm: z.number(),
  d0Source: ValueSourceSchema,
  d90Mm: z.number(),
  d100Mm: z.number(),
  d50Mm: z.number(),
  t90Min: z.number(),
  t90Source: ValueSourceSchema,
  t50Min: z.number().nullable(),
  initialSlopeMmPerRootMin: z.number(),
  pointsOnInitialLine: z.number(),
  initialLine: TimeCurveLineSchema,
  offsetLine: TimeCurveLineSchema,
  ...incrementDrainage,
});
export type TaylorIncrementResult = z.infer<typeof TaylorIncrementResultSchema>;

export const CasagrandeIncrementResultSchema = z.object({
  d0Mm: z.number(),
  d0Source: ValueSourceSchema,
  d0TimePairMin: z.object({ firstMin: z.number(), secondMin: z.number() }),
  d0PairCount: z.number(),
  d100Mm: z.number().nullable(),
  d100Source: ValueSourceSchema,
  t100Min: z.number().nullable(),
  d50Mm: z.number(),
  t50Min: z.number(),
  t50Source: ValueSourceSchema,
  inflectionTimeMin: z.number(),
  tangentLine: TimeCurveLineSchema.nullable(),
  secondaryLine: TimeCurveLineSchema.nullable(),
  secondarySlopeMmPerLogCycle: z.number().nullable(),
  ...incrementDrainage,
});
export type CasagrandeIncrementResult = z.infer<typeof CasagrandeIncrementResultSchema>;

export const ConsolidationIncrementResultSchema = z.object({
  index: z.number(),
  stressKpa: z.number(),
  kind: z.enum(['loading', 'unloading', 'reloading']),
  readingCount: z.number(),
  apparatusDeflectionMm: z.number(),
  deformationEndMm: z.number(),
  heightEndMm: z.number(),
  strainEnd: z.number(),
  voidRatioEnd: z.number(),
  heightEndOfPrimaryMm: z.number().nullable(),
  strainEndOfPrimary: z.number().nullable(),
  voidRatioEndOfPrimary: z.number().nullable(),
  avPerMPa: z.number().nullable(),
  mvPerMPa: z.number().nullable(),
  taylor: TaylorIncrementResultSchema.nullable(),
  casagrande: CasagrandeIncrementResultSchema.nullable(),
  cvTaylorM2PerYr: z.number().nullable(),
  cvCasagrandeM2PerYr: z.number().nullable(),
  secondaryCompressionIndex: z.number().nullable(),
  modifiedSecondaryCompressionIndex: z.number().nullable(),
  hydraulicConductivityMPerS: z.number().nullable(),
  hydraulicConductivityBasis: z.enum(['taylor', 'casagrande']).nullable(),
});
export type ConsolidationIncrementResult = z.infer<typeof ConsolidationIncrementResultSchema>;

export const CompressionLineSchema = z.object({ voidRatioPerLogCycle: z.number(), voidRatioAtOneKpa: z.number() });

export const CompressionIndexFitSchema = z.object({
  value: z.number(),
  line: CompressionLineSchema,
  rSquared: z.number(),
  incrementIndices: z.array(z.number()),
  source: ValueSourceSchema,
});
export type CompressionIndexFit = z.infer<typeof CompressionIndexFitSchema>;

export const RecompressionIndexFitSchema = CompressionIndexFitSchema.extend({ branch: z.enum(['reloading', 'initial-loading']) });
export type RecompressionIndexFit = z.infer<typeof RecompressionIndexFitSchema>;

export const CasagrandePreconsolidationConstructionSchema = z.object({
  preconsolidationStressKpa: z.number(),
  curvatureConvention: z.string(),
  maximumCurvaturePoint: StressVoidRatioPointSchema,
  maximumCurvatureSearch: z.enum(['whole-curve', 'off-virgin-line']),
  searchRange: z.object({ fromStressKpa: z.number(), toStressKpa: z.number() }),
  maximumCurvature: z.number(),
  tangentSlopePerLogCycle: z.number(),
  horizontalLine: StressVoidRatioLineSchema,
  tangentLine: StressVoidRatioLineSchema,
  bisectorLine: StressVoidRatioLineSchema,
  virginLine: StressVoidRatioLineSchema,
  intersection: StressVoidRatioPointSchema,
  interpolant: z.array(StressVoidRatioPointSchema),
});
export type CasagrandePreconsolidationConstruction = z.infer<typeof CasagrandePreconsolidationConstructionSchema>;

export const PachecoSilvaPreconsolidationConstructionSchema = z.object({
  preconsolidationStressKpa: z.number(),
  pointA: StressVoidRatioPointSchema,
  pointB: StressVoidRatioPointSchema,
  pointC: StressVoidRatioPointSchema,
  initialVoidRatioLine: StressVoidRatioLineSchema,
  virginLine: StressVoidRatioLineSchema,
  verticalLine: StressVoidRatioLineSchema,
  horizontalLine: StressVoidRatioLineSchema,
});
export type PachecoSilvaPreconsolidationConstruction = z.infer<typeof PachecoSilvaPreconsolidationConstructionSchema>;

export const AppliedPickSchema = z.object({
  target: z.enum(['preconsolidationStressKpa', 'virginLine', 'taylor.t90Min', 'taylor.d0Mm', 'casagrande.t50Min', 'casagrande.d0Mm', 'casagrande.d100Mm']),
  incrementIndex: z.number().nullable(),
  value: z.union([z.number(), z.object({ firstIncrementIndex: z.number(), lastIncrementIndex: z.number() })]),
  applied: z.boolean(),
});
export type AppliedPick = z.infer<typeof AppliedPickSchema>;

export const CONSOLIDATION_WARNING_CODES = [
  'few-virgin-points',
  'no-virgin-line',
  'no-unload-branch',
  'no-recompression-branch',
  'primary-not-reached',
  'short-secondary-line',
  'time-curve-not-drawn',
  'time-curves-not-applied',
  'non-monotonic-time',
  'readings-backwards',
  'pick-outside-data',
  'pick-not-applied',
  'compliance-outside-calibration',
  'mass-inconsistent',
  'preconsolidation-not-found',
  'sample-quality-not-assessed',
] as const;

export const ConsolidationWarningSchema = z.object({
  code: z.enum(CONSOLIDATION_WARNING_CODES),
  message: z.string(),
  incrementIndex: z.number().nullable(),
});
export type ConsolidationWarning = z.infer<typeof ConsolidationWarningSchema>;

export const SampleQualitySchema = z.object({
  method: z.literal('Lunne, Berre & Strandvik (1997)'),
  voidRatioAtInSituStress: z.number(),
  voidRatioChangeRatio: z.number(),
  category: z.enum(['very good to excellent', 'good to fair', 'poor', 'very poor']).nullable(),
  overconsolidationBand: z.enum(['1-2', '2-4']).nullable(),
});

/** The whole reduction of one consolidation test, as geo-core's analyzeConsolidationTest returns it. */
export const ConsolidationTestResultSchema = z.object({
  geoCoreVersion: z.string(),
  specimen: z.object({
    areaMm2: z.number(),
    dryMassG: z.number(),
    dryMassSource: z.enum(['given', 'from-wet-mass']),
    heightOfSolidsMm: z.number(),
    initialHeightMm: z.number(),
    drainage: z.enum(['double', 'single']),
    initialDegreeOfSaturation: z.number().nullable(),
    finalVoidRatio: z.number(),
    finalDegreeOfSaturation: z.number().nullable(),
  }),
  initialVoidRatio: z.number(),
  increments: z.array(ConsolidationIncrementResultSchema),
  compressionIndex: z.number().nullable(),
  compressionRatio: z.number().nullable(),
  compressionFit: CompressionIndexFitSchema.nullable(),
  recompressionIndex: z.number().nullable(),
  recompressionRatio: z.number().nullable(),
  recompressionFit: RecompressionIndexFitSchema.nullable(),
  swellIndex: z.number().nullable(),
  swellFit: CompressionIndexFitSchema.nullable(),
  preconsolidation: z.object({
    casagrandeKpa: z.number().nullable(),
    pachecoSilvaKpa: z.number().nullable(),
    adoptedKpa: z.number().nullable(),
    adoptedFrom: z.enum(['pick', 'casagrande', 'pacheco-silva']).nullable(),
    casagrande: CasagrandePreconsolidationConstructionSchema.nullable(),
    pachecoSilva: PachecoSilvaPreconsolidationConstructionSchema.nullable(),
  }),
  inSituVerticalEffectiveStressKpa: z.number().nullable(),
  overconsolidationRatio: z.number().nullable(),
  sampleQuality: SampleQualitySchema.nullable(),
  picksApplied: z.array(AppliedPickSchema),
  warnings: z.array(ConsolidationWarningSchema),
});
export type ConsolidationTestResult = z.infer<typeof ConsolidationTestResultSchema>;
