import { z } from 'zod';

/**
 * geo-core's settlement results as the API stores and answers them. The API checks at compile
 * time that these schemas and geo-core's SettlementCheckResult and UniformLoadSettlementResult
 * describe the same data (apps/api/src/modules/settlement-checks/result-contract.ts), so a field
 * renamed in geo-core fails the type check instead of the browser.
 */

const drainage = z.enum(['free', 'impermeable']);
const consolidationCase = z.enum(['normally-consolidated', 'overconsolidated-below', 'overconsolidated-crossing', 'volume-compressibility']);

export const LayerParametersUsedSchema = z.object({
  layerIndex: z.number().int(),
  name: z.string(),
  topDepthM: z.number(),
  bottomDepthM: z.number(),
  unitWeightKnPerM3: z.number(),
  saturatedUnitWeightKnPerM3: z.number(),
  compressible: z.boolean(),
  e0: z.number().nullable(),
  cc: z.number().nullable(),
  cs: z.number().nullable(),
  mvM2PerKn: z.number().nullable(),
  primaryMethod: z.enum(['e-log-stress', 'mv']).nullable(),
  preconsolidationBasis: z.enum(['preconsolidation-stress', 'ocr', 'pre-overburden-pressure', 'assumed-normally-consolidated']).nullable(),
  preconsolidationKpa: z.number().nullable(),
  ocr: z.number().nullable(),
  preOverburdenPressureKpa: z.number().nullable(),
  cvM2PerYr: z.number().nullable(),
  cAlpha: z.number().nullable(),
  elasticModulusKpa: z.number().nullable(),
  poissonRatio: z.number().nullable(),
  drainageTop: drainage.nullable(),
  drainageBottom: drainage.nullable(),
  drainagePathM: z.number().nullable(),
  endOfPrimaryYears: z.number().nullable(),
});

export const SublayerSettlementRowSchema = z.object({
  layerIndex: z.number().int(),
  layerName: z.string(),
  topDepthM: z.number(),
  bottomDepthM: z.number(),
  midDepthM: z.number(),
  thicknessM: z.number(),
  initialEffectiveStressKpa: z.number(),
  preconsolidationKpa: z.number(),
  ownStressIncreaseKpa: z.number(),
  neighboursStressIncreaseKpa: z.number(),
  stressIncreaseKpa: z.number(),
  consolidationCase,
  primarySettlementM: z.number(),
  secondarySettlementM: z.number().nullable(),
});
export type SublayerSettlementRow = z.infer<typeof SublayerSettlementRowSchema>;

const pointLabel = z.enum(['centre', 'corner-x-y-', 'corner-x+y-', 'corner-x-y+', 'corner-x+y+', 'edge-x-', 'edge-x+', 'edge-y-', 'edge-y+']);
export const PointSettlementSchema = z.object({
  label: pointLabel,
  xM: z.number(),
  yM: z.number(),
  immediateM: z.number(),
  primaryM: z.number(),
  secondaryM: z.number(),
  totalM: z.number(),
});

const timePoint = z.object({ timeYears: z.number(), settlementM: z.number() });
const layerShare = z.object({ layerIndex: z.number().int(), primarySettlementM: z.number() });

export const FootingSettlementResultSchema = z.object({
  id: z.string(),
  shape: z.enum(['rectangle', 'square', 'circle', 'strip']),
  xM: z.number(),
  yM: z.number(),
  widthM: z.number(),
  /** null for a circle and a strip. */
  lengthM: z.number().nullable(),
  depthM: z.number(),
  pressureBasis: z.enum(['net', 'gross']),
  /** Net pressure at founding level, kPa. */
  pressureKpa: z.number(),
  grossPressureKpa: z.number().nullable(),
  overburdenRemovedKpa: z.number().nullable(),
  loadKn: z.number().nullable(),
  loadKnPerM: z.number().nullable(),
  immediateDepthFactor: z.number(),
  immediateM: z.number(),
  primaryM: z.number(),
  secondaryM: z.number(),
  totalM: z.number(),
  points: z.array(PointSettlementSchema),
  sublayers: z.array(SublayerSettlementRowSchema),
  primaryByLayer: z.array(layerShare),
  timeCurve: z.array(timePoint),
  timeTo50PercentYears: z.number().nullable(),
  timeTo90PercentYears: z.number().nullable(),
  withinTotalLimit: z.boolean().nullable(),
});
export type FootingSettlementResult = z.infer<typeof FootingSettlementResultSchema>;

const AngularDistortionLimitSchema = z.object({
  source: z.enum(['Bjerrum (1963)', 'Skempton & MacDonald (1956)']),
  angularDistortion: z.number(),
  ratioLabel: z.string(),
  description: z.string(),
});

export const AngularDistortionVerdictSchema = z.object({
  source: z.enum(['Bjerrum (1963)', 'Skempton & MacDonald (1956)']),
  exceededLimit: AngularDistortionLimitSchema.nullable(),
  nextLimit: AngularDistortionLimitSchema.nullable(),
  statement: z.string(),
});

export const FootingPairResultSchema = z.object({
  footingIds: z.tuple([z.string(), z.string()]),
  distanceM: z.number(),
  differentialSettlementM: z.number(),
  angularDistortion: z.number(),
  withinDesignLimit: z.boolean(),
  verdicts: z.array(AngularDistortionVerdictSchema),
});
export type FootingPairResult = z.infer<typeof FootingPairResultSchema>;

export const SettlementCheckResultSchema = z.object({
  method: z.object({
    stressMethod: z.enum(['boussinesq', '2to1']),
    waterUnitWeightKnPerM3: z.number(),
    includeNeighbours: z.boolean(),
    sublayerSpacing: z.union([z.object({ count: z.number() }), z.object({ maxThicknessM: z.number() })]),
    designLifeYears: z.number(),
    endOfPrimaryShare: z.number(),
    designAngularDistortion: z.number(),
    applyFoxDepthFactor: z.boolean(),
    notes: z.array(z.string()),
  }),
  layers: z.array(LayerParametersUsedSchema),
  footings: z.array(FootingSettlementResultSchema),
  pairs: z.array(FootingPairResultSchema),
  warnings: z.array(z.string()),
  caution: z.string(),
});
export type SettlementCheckResult = z.infer<typeof SettlementCheckResultSchema>;

export const UniformLoadSettlementResultSchema = z.object({
  method: z.object({
    stressIncreaseKpa: z.number(),
    sublayerSpacing: z.union([z.object({ count: z.number() }), z.object({ maxThicknessM: z.number() })]),
    designLifeYears: z.number(),
    endOfPrimaryShare: z.number(),
    notes: z.array(z.string()),
  }),
  layers: z.array(LayerParametersUsedSchema),
  primaryM: z.number(),
  secondaryM: z.number(),
  totalM: z.number(),
  sublayers: z.array(SublayerSettlementRowSchema),
  primaryByLayer: z.array(layerShare),
  timeCurve: z.array(timePoint),
  timeTo50PercentYears: z.number().nullable(),
  timeTo90PercentYears: z.number().nullable(),
  warnings: z.array(z.string()),
  caution: z.string(),
});
export type UniformLoadSettlementResult = z.infer<typeof UniformLoadSettlementResultSchema>;
