import type { CsvDelimiter } from '@porestack/types';
import Papa from 'papaparse';

const CANDIDATES: readonly CsvDelimiter[] = [';', '\t', ',', '|'];
/** Characters looked at: enough for title rows, a header and some dozens of readings. */
const SAMPLE_CHARACTERS = 64 * 1024;
const SAMPLE_LINES = 60;

/**
 * The delimiter that splits the lines of the file's start most evenly: for each candidate,
 * the lines are split (quotes respected) and the most common width above one is counted;
 * the candidate that gives the most lines of one width wins. Title rows (one cell) and a
 * decimal comma (which splits "0,5" but not "0") cannot outvote the rows of readings. A
 * semicolon is tried first, so a tie between ';' and ',' goes to ';' (decimal commas).
 * @returns ',' when no candidate splits any line.
 */
export function guessDelimiter(text: string): CsvDelimiter {
  const sample = text.slice(0, SAMPLE_CHARACTERS).replace(/^\uFEFF/, '');
  // The last line of the sample may be cut short.
  const lines = sample.split(/\r?\n/).slice(0, SAMPLE_LINES + 1);
  if (lines.length > SAMPLE_LINES) lines.pop();
  const body = lines.filter((line) => line.trim() !== '').join('\n');
  let best: { delimiter: CsvDelimiter; score: number } = { delimiter: ',', score: 0 };
  for (const delimiter of CANDIDATES) {
    const { data } = Papa.parse<string[]>(body, { delimiter, skipEmptyLines: true });
    const widths = new Map<number, number>();
    for (const cells of data) {
      let width = cells.length;
      while (width > 0 && (cells[width - 1] as string).trim() === '') width -= 1;
      if (width > 1) widths.set(width, (widths.get(width) ?? 0) + 1);
    }
    const score = Math.max(0, ...widths.values());
    if (score > best.score) best = { delimiter, score };
  }
  return best.delimiter;
}
