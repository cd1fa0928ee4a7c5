import type { CsvDelimiter } from '@porestack/types';
import Papa from 'papaparse';

const CANDIDATES: readonly CsvDelimiter[] = [';', '\t', ',', '|'];
/** Characters looked at: enough for title rows, a header and some dozens of readings. */
const SAMPLE_CHARACTERS = 64 * 1024;
const SAMPLE_LINES = 60;

/**
 * The delimiter that splits the lines of the file's start most evenly: for each candidate,
 * the lines are split (quotes respected) and the most common width above one is counted
 * (empty cells included, so a header and its rows split alike); the candidate that gives the
 * most lines of one width wins, and between near equals (within a tenth) the one giving more
 * columns. Title rows (one cell) and decimal commas (which split "0,5" but not "0", or split
 * every row alike into fewer pieces than the semicolons do) cannot outvote the readings.
 * @returns ',' when no candidate splits any line.
 */
export function guessDelimiter(text: string): CsvDelimiter {
  const sample = text.slice(0, SAMPLE_CHARACTERS).replace(/^\uFEFF/, '');
  // The last line of the sample may be cut short.
  const lines = sample.split(/\r?\n/).slice(0, SAMPLE_LINES + 1);
  if (lines.length > SAMPLE_LINES) lines.pop();
  const body = lines.filter((line) => line.trim() !== '').join('\n');
  let best: { delimiter: CsvDelimiter; lines: number; width: number } = { delimiter: ',', lines: 0, width: 0 };
  for (const delimiter of CANDIDATES) {
    const { data } = Papa.parse<string[]>(body, { delimiter, skipEmptyLines: true });
    const widths = new Map<number, number>();
    for (const cells of data) if (cells.length > 1) widths.set(cells.length, (widths.get(cells.length) ?? 0) + 1);
    let modal = { lines: 0, width: 0 };
    for (const [width, count] of widths) if (count > modal.lines || (count === modal.lines && width > modal.width)) modal = { lines: count, width };
    const clearlyMore = modal.lines > best.lines * 1.1;
    const aboutAsMany = modal.lines >= best.lines * 0.9;
    if (clearlyMore || (aboutAsMany && modal.width > best.width && modal.lines > 0)) best = { delimiter, ...modal };
  }
  return best.delimiter;
}
