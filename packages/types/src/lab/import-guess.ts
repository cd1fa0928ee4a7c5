import { z } from 'zod';
import {
  CsvDelimiterSchema,
  ImportMappingSchema,
  LengthUnitSchema,
  SheetLayoutSchema,
  StressSourceSchema,
  StressUnitSchema,
  TimeReadingSchema,
  TimeUnitSchema,
  type ImportMapping,
} from './import-mapping.js';

/** The settings of the mapping step, by the names the form uses. */
export const MAPPING_SETTINGS = [
  'headerRow',
  'delimiter',
  'decimalSeparator',
  'sheets',
  'stressFrom',
  'increment',
  'stress',
  'elapsedTime',
  'deformation',
  'stressUnit',
  'timeUnit',
  'deformationUnit',
  'timeFormat',
  'timeOrigin',
  'dateOrder',
  'deformationKind',
  'dialZero',
  'dialDivision',
  'dialDirection',
] as const;
export const MappingSettingSchema = z.enum(MAPPING_SETTINGS);
export type MappingSetting = z.infer<typeof MappingSettingSchema>;

/** A mapping as far as it could be guessed: null where the technician has to choose. */
export const MappingGuessSchema = z.object({
  delimiter: CsvDelimiterSchema.nullable(),
  decimalSeparator: z.enum(['.', ',']),
  headerRow: z.number().int().min(1),
  sheets: SheetLayoutSchema,
  stressFrom: StressSourceSchema,
  columns: z.object({
    increment: z.string().nullable(),
    stress: z.string().nullable(),
    elapsedTime: z.string().nullable(),
    deformation: z.string().nullable(),
  }),
  units: z.object({ stress: StressUnitSchema, time: TimeUnitSchema, deformation: LengthUnitSchema }),
  time: TimeReadingSchema,
  deformationReading: z.object({
    kind: z.enum(['deformation', 'dial']),
    zeroReading: z.number().nullable(),
    divisionSize: z.number().nullable(),
    increasesWithCompression: z.boolean().nullable(),
  }),
});
export type MappingGuess = z.infer<typeof MappingGuessSchema>;

/**
 * What the mapping step starts from. `source`: the canonical layout, a saved profile whose
 * columns the file has, or a guess from the header words and the values. `reasons` says,
 * setting by setting, what a guess rests on; `open` lists what could not be guessed and
 * must be chosen; `mapping` is the whole guess, ready to import, once nothing is open.
 */
export const MappingSuggestionSchema = z.object({
  source: z.enum(['canonical', 'profile', 'guess']),
  profile: z.object({ id: z.string(), name: z.string() }).nullable(),
  guess: MappingGuessSchema,
  reasons: z.partialRecord(MappingSettingSchema, z.string()),
  open: z.array(MappingSettingSchema),
  mapping: ImportMappingSchema.nullable(),
});
export type MappingSuggestion = z.infer<typeof MappingSuggestionSchema>;

/** A complete mapping as a guess (a profile or the canonical mapping shown in the form). */
export function guessFromMapping(mapping: ImportMapping): MappingGuess {
  const dial = mapping.deformationReading.kind === 'dial' ? mapping.deformationReading : null;
  return {
    delimiter: mapping.delimiter ?? null,
    decimalSeparator: mapping.decimalSeparator,
    headerRow: mapping.headerRow,
    sheets: mapping.sheets,
    stressFrom: mapping.stressFrom,
    columns: { ...mapping.columns },
    units: { ...mapping.units },
    time: { ...mapping.time },
    deformationReading: {
      kind: mapping.deformationReading.kind,
      zeroReading: dial?.zeroReading ?? null,
      divisionSize: dial?.divisionSize ?? null,
      increasesWithCompression: dial?.increasesWithCompression ?? null,
    },
  };
}
