import { z } from 'zod';
import { ConsolidationTestResultSchema } from './consolidation-result.js';
import { SoilRecordVersionSchema } from './review.js';

const isoDate = z.iso.date();

/** The project as its results page heads it. */
export const ResultsProjectSchema = z.object({
  id: z.uuid(),
  name: z.string(),
  reference: z.string(),
  clientName: z.string(),
  siteName: z.string(),
});
export type ResultsProject = z.infer<typeof ResultsProjectSchema>;

/** One issued result: a test's current approved soil record version, with where it was taken. */
export const IssuedResultSchema = z.object({
  recordId: z.uuid(),
  testId: z.uuid(),
  testReference: z.string(),
  boreholeName: z.string(),
  sampleReference: z.string(),
  topDepthM: z.number(),
  bottomDepthM: z.number(),
  description: z.string(),
  /** In-situ vertical effective stress used for OCR and sample quality, kPa. */
  inSituStressKpa: z.number().nullable(),
  current: SoilRecordVersionSchema,
});
export type IssuedResult = z.infer<typeof IssuedResultSchema>;

export const ResultsSampleSchema = z.object({
  id: z.uuid(),
  reference: z.string(),
  topDepthM: z.number(),
  bottomDepthM: z.number(),
  description: z.string(),
  /** How many of its tests have an approved version. */
  issuedTestCount: z.number().int(),
});
export const ResultsBoreholeSchema = z.object({
  id: z.uuid(),
  name: z.string(),
  groundLevelMOd: z.number().nullable(),
  waterTableDepthM: z.number().nullable(),
  samples: z.array(ResultsSampleSchema),
});
export type ResultsBorehole = z.infer<typeof ResultsBoreholeSchema>;

/** GET /projects/:projectId/results — a project's approved results for everyone who may read it. */
export const ProjectResultsSchema = z.object({
  project: ResultsProjectSchema,
  boreholes: z.array(ResultsBoreholeSchema),
  results: z.array(IssuedResultSchema),
});
export type ProjectResults = z.infer<typeof ProjectResultsSchema>;

/**
 * The specimen as the approved analysis used it. Fractions, not per cent (water contents,
 * degrees of saturation). Null where the lab did not give what it is derived from.
 */
export const IssuedSpecimenSchema = z.object({
  initialHeightMm: z.number(),
  diameterMm: z.number(),
  areaMm2: z.number(),
  dryMassG: z.number(),
  specificGravity: z.number(),
  heightOfSolidsMm: z.number(),
  drainage: z.enum(['double', 'single']),
  initialVoidRatio: z.number(),
  initialWaterContent: z.number().nullable(),
  initialDegreeOfSaturation: z.number().nullable(),
  finalHeightMm: z.number(),
  finalVoidRatio: z.number(),
  finalWaterContent: z.number().nullable(),
  finalDegreeOfSaturation: z.number().nullable(),
});
export type IssuedSpecimen = z.infer<typeof IssuedSpecimenSchema>;

/** GET /soil-records/:recordId/versions/:version/summary — one approved version as issued. */
export const IssuedTestSummarySchema = z.object({
  recordId: z.uuid(),
  currentVersion: z.number().int(),
  version: SoilRecordVersionSchema,
  project: ResultsProjectSchema,
  borehole: z.object({ name: z.string(), groundLevelMOd: z.number().nullable(), waterTableDepthM: z.number().nullable() }),
  sample: z.object({ reference: z.string(), topDepthM: z.number(), bottomDepthM: z.number(), description: z.string() }),
  test: z.object({ id: z.uuid(), reference: z.string(), startedOn: isoDate.nullable(), finishedOn: isoDate.nullable() }),
  specimen: IssuedSpecimenSchema,
  /** The reviewer's reason when an automatic choice (σ′p, a time-curve point) was overridden. */
  overrideReason: z.string().nullable(),
  /** geo-core's ConsolidationTestResult of the approved analysis: the curves and constructions to draw. */
  result: ConsolidationTestResultSchema,
});
export type IssuedTestSummary = z.infer<typeof IssuedTestSummarySchema>;
