import { z } from 'zod';
import { ActorSchema, isoDateTime } from './design-fields.js';

/**
 * A characteristic set: approved soil record versions of one stratum, their statistics, and the
 * value the designer adopts for each parameter (with a note). Saved as immutable revisions that
 * record which versions they used.
 */

/** The parameters a set characterises; σ′p itself varies with depth, so a set adopts OCR. */
export const SET_PARAMETERS = ['e0', 'cc', 'cr', 'cs', 'ocr', 'cvM2PerYr', 'cAlpha'] as const;
export const SetParameterSchema = z.enum(SET_PARAMETERS);
export type SetParameter = z.infer<typeof SetParameterSchema>;

export const SET_PARAMETER_LABELS: Record<SetParameter, string> = {
  e0: 'e0',
  cc: 'Cc',
  cr: 'Cr',
  cs: 'Cs',
  ocr: 'OCR',
  cvM2PerYr: 'cv (m²/yr)',
  cAlpha: 'Cα',
};

/** How the adopted value was chosen. */
export const ADOPTION_BASES = ['mean', 'student-t-bound', 'schneider', 'chosen'] as const;
export const AdoptionBasisSchema = z.enum(ADOPTION_BASES);
export type AdoptionBasis = z.infer<typeof AdoptionBasisSchema>;

export const AdoptedValueSchema = z.object({
  value: z.number({ error: 'Enter the adopted value as a number.' }).positive({ message: 'An adopted value must be greater than zero.' }).nullable(),
  basis: AdoptionBasisSchema,
  note: z.string().trim().max(1000).default(''),
});
export type AdoptedValue = z.input<typeof AdoptedValueSchema>;

export const CharacteristicSetInputSchema = z.object({
  name: z.string().trim().min(1, { message: 'Name the stratum the set describes (e.g. "Soft grey clay").' }).max(120),
  note: z.string().trim().max(2000).default(''),
  versionIds: z.array(z.uuid()).min(1, { message: 'Pick at least one approved soil record version.' }).max(200),
  adopted: z.partialRecord(SetParameterSchema, AdoptedValueSchema).default({}),
});
export type CharacteristicSetInput = z.input<typeof CharacteristicSetInputSchema>;

export const SetStatisticsQuerySchema = z.object({ versionIds: z.array(z.uuid()).min(1, { message: 'Pick at least one approved soil record version.' }).max(200) });
export type SetStatisticsQuery = z.infer<typeof SetStatisticsQuerySchema>;

/** One approved version in a set, with the values the statistics use. */
export const SetMemberSchema = z.object({
  recordId: z.uuid(),
  versionId: z.uuid(),
  version: z.number().int(),
  /** The record has a newer approved version than the one in the set. */
  newerVersion: z.number().int().nullable(),
  testReference: z.string(),
  boreholeName: z.string(),
  sampleReference: z.string(),
  depthM: z.number(),
  values: z.object({
    e0: z.number().nullable(),
    cc: z.number().nullable(),
    cr: z.number().nullable(),
    cs: z.number().nullable(),
    ocr: z.number().nullable(),
    cvM2PerYr: z.number().nullable(),
    cAlpha: z.number().nullable(),
    preconsolidationKpa: z.number().nullable(),
  }),
});
export type SetMember = z.infer<typeof SetMemberSchema>;

export const ParameterStatisticsSchema = z.object({
  parameter: SetParameterSchema,
  count: z.number().int(),
  scale: z.enum(['linear', 'log']),
  mean: z.number().nullable(),
  standardDeviation: z.number().nullable(),
  coefficientOfVariation: z.number().nullable(),
  meanLowerBound95: z.number().nullable(),
  meanUpperBound95: z.number().nullable(),
  schneiderLower: z.number().nullable(),
  schneiderUpper: z.number().nullable(),
  unfavourableSide: z.enum(['lower', 'upper']),
  /** Why that side is unfavourable for settlement, in words. */
  unfavourableReason: z.string(),
  characteristicStudentT: z.number().nullable(),
  characteristicSchneider: z.number().nullable(),
  warnings: z.array(z.string()),
});
export type ParameterStatistics = z.infer<typeof ParameterStatisticsSchema>;

export const SetStatisticsSchema = z.object({
  members: z.array(SetMemberSchema),
  statistics: z.array(ParameterStatisticsSchema),
});
export type SetStatistics = z.infer<typeof SetStatisticsSchema>;

export const CharacteristicSetRevisionSchema = z.object({
  id: z.uuid(),
  setId: z.uuid(),
  revision: z.number().int(),
  name: z.string(),
  note: z.string(),
  adopted: z.partialRecord(SetParameterSchema, z.object({ value: z.number().nullable(), basis: AdoptionBasisSchema, note: z.string() })),
  members: z.array(SetMemberSchema),
  statistics: z.array(ParameterStatisticsSchema),
  createdBy: ActorSchema,
  createdAt: isoDateTime,
});
export type CharacteristicSetRevision = z.infer<typeof CharacteristicSetRevisionSchema>;

export const CharacteristicSetSummarySchema = z.object({
  id: z.uuid(),
  projectId: z.uuid(),
  name: z.string(),
  currentRevision: z.number().int(),
  currentRevisionId: z.uuid(),
  memberCount: z.number().int(),
  /** Members whose record has a newer approved version: revise the set to take them in. */
  membersWithNewerVersions: z.number().int(),
  updatedAt: isoDateTime,
});
export type CharacteristicSetSummary = z.infer<typeof CharacteristicSetSummarySchema>;

export const CharacteristicSetDetailSchema = CharacteristicSetSummarySchema.extend({
  current: CharacteristicSetRevisionSchema,
  revisions: z.array(z.object({ id: z.uuid(), revision: z.number().int(), note: z.string(), createdBy: ActorSchema, createdAt: isoDateTime })),
});
export type CharacteristicSetDetail = z.infer<typeof CharacteristicSetDetailSchema>;
