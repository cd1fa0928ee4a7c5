import type { ImportField } from '@porestack/types';
import { CLOCK_WORDS, DEFORMATION_WORDS, DIAL_WORDS, ELAPSED_WORDS, INCREMENT_WORDS, OTHER_WORDS, STRESS_WORDS, wordScore } from './header-words.js';
import { lengthUnitOf, splitHeader, stressUnitOf, timeUnitOf, type HeaderParts } from './header-units.js';

/** The column chosen for a field, with its header split into words and unit. */
export interface GuessedColumn {
  readonly name: string;
  readonly parts: HeaderParts;
}

export type GuessedColumns = Record<ImportField, GuessedColumn | null>;

/**
 * How strongly a header names each field: by its words (see header-words.ts), or, failing
 * words, by its unit alone (a column "[kPa]" holds a stress). A time column named as
 * elapsed time outranks a clock or a date; columns of other things (temperature, notes,
 * strain in %) name no field.
 */
function fieldScores(parts: HeaderParts): Record<ImportField, number> {
  const none = { increment: 0, stress: 0, elapsedTime: 0, deformation: 0 };
  if (wordScore(parts.words, OTHER_WORDS) > 0 || parts.unit === '%') return none;
  const unit = parts.unit;
  const elapsed = wordScore(parts.words, ELAPSED_WORDS);
  const clock = wordScore(parts.words, CLOCK_WORDS);
  return {
    increment: wordScore(parts.words, INCREMENT_WORDS) * 10,
    stress: wordScore(parts.words, STRESS_WORDS) * 10 + (unit !== null && stressUnitOf(unit) !== null ? 5 : 0),
    elapsedTime: (elapsed > 0 ? 20 + elapsed : clock * 5) + (unit !== null && timeUnitOf(unit) !== null ? 5 : 0),
    deformation: Math.max(wordScore(parts.words, DEFORMATION_WORDS), wordScore(parts.words, DIAL_WORDS)) * 10 + (unit !== null && lengthUnitOf(unit) !== null ? 5 : 0),
  };
}

/**
 * Each field's column from the header's words and units, in the common languages of lab
 * equipment. Fields take the best-scoring column still free, the increment first (so "Load
 * step" is not taken for the stress), then time, deformation and stress; a column is used
 * once. A field no column names is null (the person chooses).
 */
export function guessColumns(header: readonly string[]): GuessedColumns {
  const columns = header
    .map((name) => ({ name, parts: splitHeader(name) }))
    .filter((column, position) => column.name !== '' && header.indexOf(column.name) === position)
    .map((column) => ({ ...column, scores: fieldScores(column.parts) }));
  const taken = new Set<string>();
  const pick = (field: ImportField): GuessedColumn | null => {
    let best: (typeof columns)[number] | null = null;
    for (const column of columns) {
      if (taken.has(column.name) || column.scores[field] === 0) continue;
      // An increment number outranks a stress only on its own words, never on a shared one.
      if (field === 'increment' && column.scores.stress > column.scores.increment) continue;
      if (best === null || column.scores[field] > best.scores[field]) best = column;
    }
    if (best) taken.add(best.name);
    return best ? { name: best.name, parts: best.parts } : null;
  };
  const increment = pick('increment');
  const elapsedTime = pick('elapsedTime');
  const deformation = pick('deformation');
  const stress = pick('stress');
  return { increment, stress, elapsedTime, deformation };
}

/** Whether a deformation column's words say it is a gauge reading (zero, division, direction). */
export function namesAGauge(column: GuessedColumn): boolean {
  return wordScore(column.parts.words, DIAL_WORDS) > 0;
}
