import { guessFromMapping, ImportMappingSchema, type ImportMapping, type ImportProfile, type MappingGuess, type MappingSuggestion } from '@porestack/types';
import { CANONICAL_MAPPING } from './detect-layout.js';
import type { GuessedMapping } from './guess-mapping.js';
import { firstSheetRows, headerOf, type RawTable } from './raw-table.js';

/** The guess as an import mapping, when every setting it needs is there (else null). */
export function mappingFromGuess(guess: MappingGuess): ImportMapping | null {
  const reading = guess.deformationReading;
  const parsed = ImportMappingSchema.safeParse({
    ...(guess.delimiter ? { delimiter: guess.delimiter } : {}),
    decimalSeparator: guess.decimalSeparator,
    headerRow: guess.headerRow,
    sheets: guess.sheets,
    stressFrom: guess.stressFrom,
    columns: guess.columns,
    units: guess.units,
    time: guess.time,
    deformationReading:
      reading.kind === 'deformation'
        ? { kind: 'deformation' }
        : { kind: 'dial', divisionSize: reading.divisionSize, increasesWithCompression: reading.increasesWithCompression, ...(reading.zeroReading === null ? {} : { zeroReading: reading.zeroReading }) },
  });
  return parsed.success ? parsed.data : null;
}

export function guessedSuggestion(guessed: GuessedMapping): MappingSuggestion {
  const mapping = guessed.open.length === 0 ? mappingFromGuess(guessed.guess) : null;
  return { source: 'guess', profile: null, guess: guessed.guess, reasons: guessed.reasons, open: guessed.open, mapping };
}

export function canonicalSuggestion(): MappingSuggestion {
  return { source: 'canonical', profile: null, guess: guessFromMapping(CANONICAL_MAPPING), reasons: {}, open: [], mapping: CANONICAL_MAPPING };
}

/**
 * The saved profile that fits the file: every column it maps is in the file's header at
 * the profile's header row (a workbook of one sheet per increment needs two sheets or more),
 * and, when a header row was chosen, the profile uses that row. Of several, the one mapping
 * the most columns; a profile wins over any guess.
 */
export function matchingProfile(table: RawTable, profiles: readonly ImportProfile[], chosenHeaderRow: number | null): ImportProfile | null {
  const rows = firstSheetRows(table);
  let best: { profile: ImportProfile; columns: number } | null = null;
  for (const profile of profiles) {
    const mapping = profile.mapping;
    if (chosenHeaderRow !== null && mapping.headerRow !== chosenHeaderRow) continue;
    if (mapping.sheets === 'each' && table.sheets.length < 2) continue;
    if (mapping.delimiter !== undefined && table.delimiter !== null && mapping.delimiter !== table.delimiter) continue;
    const header = headerOf(rows, mapping.headerRow).map((name) => name.trim().toLowerCase());
    const names = Object.entries(mapping.columns)
      .filter(([field, name]) => name !== null && !(field === 'stress' && mapping.stressFrom === 'sheetName'))
      .map(([, name]) => (name as string).trim().toLowerCase());
    if (!names.every((name) => header.includes(name))) continue;
    if (best === null || names.length > best.columns) best = { profile, columns: names.length };
  }
  return best?.profile ?? null;
}

export function profileSuggestion(profile: ImportProfile): MappingSuggestion {
  return {
    source: 'profile',
    profile: { id: profile.id, name: profile.name },
    guess: guessFromMapping(profile.mapping),
    reasons: { headerRow: `The saved profile “${profile.name}” fits this file's columns.` },
    open: [],
    mapping: profile.mapping,
  };
}
