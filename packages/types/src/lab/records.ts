import { z } from 'zod';
import { JobStateSchema, TestStatusSchema } from './states.js';

const isoDate = z.iso.date({ message: 'Give the date as YYYY-MM-DD.' });
const isoDateTime = z.iso.datetime({ offset: true });
const text = (label: string, max = 200) =>
  z.string().trim().min(1, { message: `Enter the ${label}.` }).max(max, { message: `Keep the ${label} under ${max} characters.` });
const positive = (label: string, unit: string) =>
  z.number({ error: `Enter the ${label} as a number in ${unit}.` }).positive({ message: `The ${label} must be greater than zero (${unit}).` });

export const ProjectSummarySchema = z.object({
  id: z.uuid(),
  name: z.string(),
  reference: z.string(),
  clientName: z.string(),
  siteName: z.string(),
  designerIds: z.array(z.uuid()),
  boreholeCount: z.number().int(),
  testCount: z.number().int(),
  createdAt: isoDateTime,
});
export type ProjectSummary = z.infer<typeof ProjectSummarySchema>;

export const ProjectDesignerSchema = z.object({ userId: z.uuid(), name: z.string(), email: z.string() });
export type ProjectDesigner = z.infer<typeof ProjectDesignerSchema>;

export const ProjectDetailSchema = ProjectSummarySchema.extend({
  designers: z.array(ProjectDesignerSchema),
});
export type ProjectDetail = z.infer<typeof ProjectDetailSchema>;

export const ProjectCreateSchema = z.object({
  name: text('project name'),
  reference: text('project reference', 60),
  clientName: text('client name'),
  siteName: z.string().trim().max(200).default(''),
  /** Members of the organisation with the designer role who receive new soil record versions. */
  designerIds: z.array(z.uuid()).max(50).default([]),
});
export type ProjectCreate = z.infer<typeof ProjectCreateSchema>;

export const ProjectUpdateSchema = z
  .object({
    name: text('project name'),
    reference: text('project reference', 60),
    clientName: text('client name'),
    siteName: z.string().trim().max(200),
    designerIds: z.array(z.uuid()).max(50),
  })
  .partial();
export type ProjectUpdate = z.infer<typeof ProjectUpdateSchema>;

export const BoreholeSchema = z.object({
  id: z.uuid(),
  projectId: z.uuid(),
  name: z.string(),
  groundLevelMOd: z.number().nullable(),
  /** Depth of the groundwater below ground level, m; null when none was met. */
  waterTableDepthM: z.number().nullable(),
  sampleCount: z.number().int(),
  createdAt: isoDateTime,
});
export type Borehole = z.infer<typeof BoreholeSchema>;

export const BoreholeCreateSchema = z.object({
  name: text('borehole name', 60),
  groundLevelMOd: z.number().nullable().default(null),
  waterTableDepthM: z.number().min(0, { message: 'The water table depth is measured down from ground level, so it cannot be negative.' }).nullable().default(null),
});
export type BoreholeCreate = z.infer<typeof BoreholeCreateSchema>;

export const SampleSchema = z.object({
  id: z.uuid(),
  boreholeId: z.uuid(),
  projectId: z.uuid(),
  reference: z.string(),
  topDepthM: z.number(),
  bottomDepthM: z.number(),
  description: z.string(),
  /** Average bulk unit weight of the ground above the sample, kN/m³ (for the estimate). */
  bulkUnitWeightKnPerM3: z.number().nullable(),
  /** As entered; null when it is to be estimated. */
  inSituStressKpaEntered: z.number().nullable(),
  /** What the analysis uses: the entered value, else the estimate, else null. */
  inSituStressKpa: z.number().nullable(),
  inSituStressSource: z.enum(['entered', 'estimated']).nullable(),
  createdAt: isoDateTime,
});
export type Sample = z.infer<typeof SampleSchema>;

export const SampleCreateSchema = z
  .object({
    reference: text('sample reference', 60),
    topDepthM: z.number({ error: 'Enter the top depth in metres.' }).min(0, { message: 'Depths are below ground level and cannot be negative.' }),
    bottomDepthM: z.number({ error: 'Enter the bottom depth in metres.' }).min(0),
    description: z.string().trim().max(2000).default(''),
    bulkUnitWeightKnPerM3: positive('bulk unit weight', 'kN/m³').max(30, { message: 'A bulk unit weight above 30 kN/m³ is not a soil; check the value.' }).nullable().default(null),
    inSituStressKpa: positive('in-situ vertical effective stress', 'kPa').nullable().default(null),
  })
  .refine((s) => s.bottomDepthM >= s.topDepthM, { message: 'The bottom depth must not be above the top depth.', path: ['bottomDepthM'] });
export type SampleCreate = z.infer<typeof SampleCreateSchema>;

export const DrainageSchema = z.enum(['double', 'single']);

export const CompliancePointSchema = z.object({
  stressKpa: z.number().nonnegative({ message: 'Calibration stresses cannot be negative.' }),
  deflectionMm: z.number({ error: 'Enter the apparatus deflection in mm.' }),
});
export type CompliancePoint = z.infer<typeof CompliancePointSchema>;

/** The specimen as set up; water contents are fractions (0.45, not 45 %). */
export const SpecimenSchema = z.object({
  initialHeightMm: z.number().positive().nullable(),
  diameterMm: z.number().positive().nullable(),
  specificGravity: z.number().min(2, { message: 'Gs is usually 2.5–2.9; values below 2 are not soil solids.' }).max(3.5).nullable(),
  dryMassG: z.number().positive().nullable(),
  initialWaterContent: z.number().min(0).max(10).nullable(),
  wetMassG: z.number().positive().nullable(),
  finalWaterContent: z.number().min(0).max(10).nullable(),
  drainage: DrainageSchema,
});
export type Specimen = z.infer<typeof SpecimenSchema>;

export const TestCreateSchema = z.object({
  reference: text('test reference', 60),
  /** The technician who runs the test; the creator when left out. */
  technicianId: z.uuid().optional(),
  specimen: SpecimenSchema.partial().default({ drainage: 'double' }),
  apparatusName: z.string().trim().max(120).default(''),
  compliance: z.array(CompliancePointSchema).max(100).default([]),
  startedOn: isoDate.nullable().default(null),
  finishedOn: isoDate.nullable().default(null),
});
export type TestCreate = z.infer<typeof TestCreateSchema>;

export const TestUpdateSchema = z
  .object({
    reference: text('test reference', 60),
    technicianId: z.uuid(),
    specimen: SpecimenSchema.partial(),
    apparatusName: z.string().trim().max(120),
    compliance: z.array(CompliancePointSchema).max(100),
    startedOn: isoDate.nullable(),
    finishedOn: isoDate.nullable(),
  })
  .partial();
export type TestUpdate = z.infer<typeof TestUpdateSchema>;

/** The few numbers a list or queue shows; null until analysed. */
export const KeyParametersSchema = z.object({
  initialVoidRatio: z.number().nullable(),
  compressionIndex: z.number().nullable(),
  swellIndex: z.number().nullable(),
  preconsolidationStressKpa: z.number().nullable(),
  overconsolidationRatio: z.number().nullable(),
  cvMinM2PerYr: z.number().nullable(),
  cvMaxM2PerYr: z.number().nullable(),
  sampleQuality: z.string().nullable(),
});
export type KeyParameters = z.infer<typeof KeyParametersSchema>;

export const AnalysisSummarySchema = z.object({
  id: z.uuid(),
  createdAt: isoDateTime,
  geoCoreVersion: z.string(),
  inputsHash: z.string(),
  warningCount: z.number().int(),
  keyParameters: KeyParametersSchema,
});
export type AnalysisSummary = z.infer<typeof AnalysisSummarySchema>;

export const TestSummarySchema = z.object({
  id: z.uuid(),
  reference: z.string(),
  status: TestStatusSchema,
  projectId: z.uuid(),
  projectName: z.string(),
  boreholeId: z.uuid(),
  boreholeName: z.string(),
  sampleId: z.uuid(),
  sampleReference: z.string(),
  topDepthM: z.number(),
  technicianId: z.uuid(),
  technicianName: z.string(),
  submittedAt: isoDateTime.nullable(),
  updatedAt: isoDateTime,
});
export type TestSummary = z.infer<typeof TestSummarySchema>;

export const TestDetailSchema = TestSummarySchema.extend({
  specimen: SpecimenSchema,
  apparatusName: z.string(),
  compliance: z.array(CompliancePointSchema),
  startedOn: isoDate.nullable(),
  finishedOn: isoDate.nullable(),
  inSituStressKpa: z.number().nullable(),
  latestUploadId: z.uuid().nullable(),
  picks: z.record(z.string(), z.unknown()),
  latestAnalysis: AnalysisSummarySchema.nullable(),
  /** The newest analysis job for this test, if one is queued or running. */
  pendingJobId: z.uuid().nullable(),
  /** The newest analysis job in any state, so a failure is still shown after the fact. */
  latestAnalysisJob: z
    .object({
      id: z.uuid(),
      state: JobStateSchema,
      message: z.string().nullable(),
      updatedAt: isoDateTime,
    })
    .nullable(),
  /** The latest change request's comment while the test is sent back. */
  changesRequestedComment: z.string().nullable(),
  createdAt: isoDateTime,
});
export type TestDetail = z.infer<typeof TestDetailSchema>;

export const TestListQuerySchema = z.object({
  projectId: z.uuid().optional(),
  boreholeId: z.uuid().optional(),
  sampleId: z.uuid().optional(),
  status: TestStatusSchema.optional(),
  technicianId: z.uuid().optional(),
});
export type TestListQuery = z.infer<typeof TestListQuerySchema>;
