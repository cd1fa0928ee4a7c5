import { z } from 'zod';
import { isoDateTime, nonNegativeNumber, numberIn, positiveNumber, ActorSchema } from './design-fields.js';

/**
 * A ground model: the designer's idealised profile of one site, saved as immutable revisions.
 * Depths are metres below ground level; layers run from the top down.
 */

/** granular: settles immediately (E′, ν); compressible: consolidates (e0, Cc, σ′p, cv, Cα). */
export const LAYER_KINDS = ['granular', 'compressible'] as const;
export const LayerKindSchema = z.enum(LAYER_KINDS);
export type LayerKind = z.infer<typeof LayerKindSchema>;

export const DrainageBoundarySchema = z.enum(['free', 'impermeable']);
export type DrainageBoundaryKind = z.infer<typeof DrainageBoundarySchema>;

/** Where a compressible layer's parameters come from. Values entered by hand are marked so wherever they show. */
export const LayerSourceInputSchema = z.discriminatedUnion('kind', [
  z.object({ kind: z.literal('record'), recordId: z.uuid(), versionId: z.uuid() }),
  z.object({ kind: z.literal('set'), setId: z.uuid(), setRevisionId: z.uuid() }),
  z.object({ kind: z.literal('hand') }),
]);
export type LayerSourceInput = z.infer<typeof LayerSourceInputSchema>;

/**
 * How σ′p varies through a layer from the value at the reference depth: 'ocr' keeps σ′p/σ′v0
 * constant, 'pop' keeps σ′p − σ′v0 constant (a crust, or ground once loaded), 'constant' keeps
 * σ′p itself constant.
 */
export const PRECONSOLIDATION_CARRIES = ['ocr', 'pop', 'constant'] as const;

/** Which cv a record-sourced layer takes: the lowest of the test's increments, or cv over the layer's design stress range. */
export const CV_BASES = ['lowest', 'design-range'] as const;
export const CvBasisSchema = z.enum(CV_BASES);
export type CvBasis = z.infer<typeof CvBasisSchema>;
export const PreconsolidationCarrySchema = z.enum(PRECONSOLIDATION_CARRIES);
export type PreconsolidationCarry = z.infer<typeof PreconsolidationCarrySchema>;

/** Which lab index a record-sourced layer uses on the overconsolidated branch. */
export const RECOMPRESSION_INDEX_KINDS = ['Cr', 'Cs'] as const;
export const RecompressionIndexKindSchema = z.enum(RECOMPRESSION_INDEX_KINDS);

/**
 * A compressible layer's parameters as the designer sends them. With a record or set source
 * the server takes every value from the source except those named in `entered` (values typed
 * over the source); with a hand source every value is entered.
 */
export const CompressibleParametersInputSchema = z.object({
  e0: positiveNumber('initial void ratio e0', '').max(10, { message: 'An e0 above 10 is not a soil; check the value.' }).nullable().default(null),
  cc: positiveNumber('compression index Cc', '').max(5, { message: 'A Cc above 5 is implausible; check the value.' }).nullable().default(null),
  recompressionIndex: nonNegativeNumber('recompression index', '').max(2).nullable().default(null),
  /** Cr or Cs; with a record source, Cr where the test measured one unless Cs is asked for. */
  recompressionIndexKind: RecompressionIndexKindSchema.nullable().default(null),
  preconsolidationCarry: PreconsolidationCarrySchema.default('ocr'),
  /** σ′p at `preconsolidationDepthM` (kPa); null with no OCR either: normally consolidated. */
  preconsolidationKpa: positiveNumber('preconsolidation stress σ′p', 'kPa').nullable().default(null),
  preconsolidationDepthM: nonNegativeNumber('depth of the σ′p value', 'm').nullable().default(null),
  /** An OCR given directly (hand entry, or a characteristic set's adopted OCR). */
  ocr: numberIn('OCR', 1, 100).nullable().default(null),
  cvM2PerYr: positiveNumber('coefficient of consolidation cv', 'm²/yr').max(100_000).nullable().default(null),
  /** With a record source: 'design-range' reads cv from the test's increments between σ′v0 and cvFinalStressKpa at the layer's mid-depth. */
  cvBasis: CvBasisSchema.default('lowest'),
  /** The effective stress the layer ends at under the load, kPa (σ′v0 + Δσ′ at mid-depth), for a 'design-range' cv. */
  cvFinalStressKpa: positiveNumber('final effective stress for cv', 'kPa').nullable().default(null),
  cAlpha: nonNegativeNumber('secondary compression index Cα', '').max(1).nullable().default(null),
  /** Parameter names typed over the source's value ('e0', 'cc', …); ignored for a hand source. */
  entered: z.array(z.enum(['e0', 'cc', 'recompressionIndex', 'preconsolidationKpa', 'ocr', 'cvM2PerYr', 'cAlpha'])).max(7).default([]),
});
export type CompressibleParametersInput = z.input<typeof CompressibleParametersInputSchema>;

export const GroundModelLayerInputSchema = z.object({
  name: z.string().trim().min(1, { message: 'Name the layer (e.g. "Soft grey clay").' }).max(120),
  kind: LayerKindSchema,
  thicknessM: positiveNumber('layer thickness', 'm').max(200, { message: 'A layer over 200 m thick is not plausible; check the value.' }),
  unitWeightKnPerM3: positiveNumber('unit weight above the water table', 'kN/m³'),
  saturatedUnitWeightKnPerM3: positiveNumber('unit weight below the water table', 'kN/m³'),
  elasticModulusKpa: positiveNumber('drained modulus E′', 'kPa').nullable().default(null),
  poissonRatio: numberIn('Poisson’s ratio ν', 0, 0.5).nullable().default(null),
  drainageTop: DrainageBoundarySchema.default('free'),
  drainageBottom: DrainageBoundarySchema.default('free'),
  source: LayerSourceInputSchema.nullable().default(null),
  parameters: CompressibleParametersInputSchema.nullable().default(null),
});
export type GroundModelLayerInput = z.input<typeof GroundModelLayerInputSchema>;

export const GroundModelContentInputSchema = z.object({
  groundLevelM: z.number({ error: 'Enter the ground level as a number in metres.' }).min(-1000).max(10_000).default(0),
  waterTableDepthM: nonNegativeNumber('water table depth', 'm'),
  waterUnitWeightKnPerM3: numberIn('unit weight of water γw', 9.7, 10.1).default(9.81),
  layers: z.array(GroundModelLayerInputSchema).min(1, { message: 'Add at least one layer.' }).max(60),
});
export type GroundModelContentInput = z.input<typeof GroundModelContentInputSchema>;

export const GroundModelCreateSchema = GroundModelContentInputSchema.extend({
  name: z.string().trim().min(1, { message: 'Name the ground model.' }).max(120),
  note: z.string().trim().max(2000).default(''),
  /** Saved despite the warnings (implausible unit weights …) once the designer has read them. */
  acceptWarnings: z.boolean().default(false),
});
export type GroundModelCreate = z.input<typeof GroundModelCreateSchema>;

export const GroundModelReviseSchema = GroundModelCreateSchema;
export type GroundModelRevise = z.input<typeof GroundModelReviseSchema>;

/** One parameter as resolved and stored: its value and where it came from. */
export const ResolvedValueSchema = z.object({ value: z.number().nullable(), origin: z.enum(['source', 'hand']) });
export type ResolvedValue = z.infer<typeof ResolvedValueSchema>;

/** A source as stored: ids plus the labels a person reads. */
export const LayerSourceSchema = z.discriminatedUnion('kind', [
  z.object({
    kind: z.literal('record'),
    recordId: z.uuid(),
    versionId: z.uuid(),
    version: z.number().int(),
    testId: z.uuid(),
    testReference: z.string(),
    boreholeName: z.string(),
    sampleReference: z.string(),
    sampleDepthM: z.number(),
  }),
  z.object({ kind: z.literal('set'), setId: z.uuid(), setRevisionId: z.uuid(), revision: z.number().int(), name: z.string() }),
  z.object({ kind: z.literal('hand') }),
]);
export type LayerSource = z.infer<typeof LayerSourceSchema>;

export const ResolvedCompressibleParametersSchema = z.object({
  e0: ResolvedValueSchema,
  cc: ResolvedValueSchema,
  recompressionIndex: ResolvedValueSchema.extend({ kind: RecompressionIndexKindSchema.nullable() }),
  preconsolidationCarry: PreconsolidationCarrySchema,
  preconsolidationKpa: ResolvedValueSchema,
  preconsolidationDepthM: z.number().nullable(),
  ocr: ResolvedValueSchema,
  /** basis: how the value was had, in words; cvBasis/cvFinalStressKpa: the designer's choice, kept for the next save. */
  cvM2PerYr: ResolvedValueSchema.extend({ basis: z.string(), cvBasis: CvBasisSchema.default('lowest'), cvFinalStressKpa: z.number().nullable().default(null) }),
  cAlpha: ResolvedValueSchema,
});
export type ResolvedCompressibleParameters = z.infer<typeof ResolvedCompressibleParametersSchema>;

export const GroundModelLayerSchema = z.object({
  name: z.string(),
  kind: LayerKindSchema,
  topDepthM: z.number(),
  bottomDepthM: z.number(),
  thicknessM: z.number(),
  unitWeightKnPerM3: z.number(),
  saturatedUnitWeightKnPerM3: z.number(),
  elasticModulusKpa: z.number().nullable(),
  poissonRatio: z.number().nullable(),
  drainageTop: DrainageBoundarySchema,
  drainageBottom: DrainageBoundarySchema,
  source: LayerSourceSchema.nullable(),
  parameters: ResolvedCompressibleParametersSchema.nullable(),
});
export type GroundModelLayer = z.infer<typeof GroundModelLayerSchema>;

export const GroundModelContentSchema = z.object({
  groundLevelM: z.number(),
  waterTableDepthM: z.number(),
  waterUnitWeightKnPerM3: z.number(),
  layers: z.array(GroundModelLayerSchema),
});
export type GroundModelContent = z.infer<typeof GroundModelContentSchema>;

/** σv, u, σ′v0 and σ′p against depth, and the samples behind the layers, for the profile drawing. */
export const StressProfileSchema = z.object({
  points: z.array(
    z.object({ depthM: z.number(), totalStressKpa: z.number(), porePressureKpa: z.number(), effectiveStressKpa: z.number(), preconsolidationKpa: z.number().nullable() }),
  ),
  samples: z.array(z.object({ layerIndex: z.number().int(), label: z.string(), depthM: z.number(), preconsolidationKpa: z.number().nullable() })),
  /** Warnings that do not stop a save (implausible unit weights …), each naming its layer. */
  warnings: z.array(z.string()),
});
export type StressProfile = z.infer<typeof StressProfileSchema>;

export const GroundModelRevisionSchema = z.object({
  id: z.uuid(),
  groundModelId: z.uuid(),
  revision: z.number().int(),
  note: z.string(),
  content: GroundModelContentSchema,
  profile: StressProfileSchema,
  createdBy: ActorSchema,
  createdAt: isoDateTime,
});
export type GroundModelRevision = z.infer<typeof GroundModelRevisionSchema>;

export const GroundModelSummarySchema = z.object({
  id: z.uuid(),
  projectId: z.uuid(),
  name: z.string(),
  currentRevision: z.number().int(),
  layerCount: z.number().int(),
  updatedAt: isoDateTime,
});
export type GroundModelSummary = z.infer<typeof GroundModelSummarySchema>;

export const GroundModelDetailSchema = GroundModelSummarySchema.extend({
  current: GroundModelRevisionSchema,
  revisions: z.array(z.object({ revision: z.number().int(), note: z.string(), createdBy: ActorSchema, createdAt: isoDateTime })),
});
export type GroundModelDetail = z.infer<typeof GroundModelDetailSchema>;

/** A ground model being edited, resolved without saving: values, stresses, and what is wrong with it. */
export const GroundModelPreviewSchema = z.object({
  content: GroundModelContentSchema,
  profile: StressProfileSchema.nullable(),
  errors: z.array(z.object({ path: z.string(), message: z.string() })),
  warnings: z.array(z.object({ path: z.string(), message: z.string() })),
});
export type GroundModelPreview = z.infer<typeof GroundModelPreviewSchema>;
