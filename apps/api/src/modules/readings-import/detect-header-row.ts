import { guessColumns } from './guess-columns.js';
import { cellText, type Cell, type RawRow } from './raw-table.js';
import { dateTimeMinutes, durationMinutes, numberIn } from './read-time.js';

/** Title rows above the column names are looked for this far down. */
const SEARCH_ROWS = 30;

/** A cell that holds a reading's value: a number (either decimal mark), a duration or a date-time. */
export function holdsValue(cell: Cell | undefined): boolean {
  if (typeof cell === 'number') return true;
  const text = cellText(cell);
  if (text === '') return false;
  return typeof numberIn(text, true) === 'number' || typeof numberIn(text, false) === 'number' || durationMinutes(text) !== null || dateTimeMinutes(text, 'dmy') !== null;
}

/**
 * The row that holds the column names, below any title rows (a lab's name, the test, a
 * date). A candidate has at least two cells of text and few values; it scores for the
 * fields its names give (guessColumns), for rows of values below it, and for its width.
 * The best scores win; on a tie, the higher row. Row 1 when nothing looks like names.
 */
export function detectHeaderRow(rows: readonly RawRow[]): number {
  const top = rows.slice(0, SEARCH_ROWS);
  let best = { rowNumber: rows[0]?.rowNumber ?? 1, score: -1 };
  top.forEach((row, position) => {
    const filled = row.cells.filter((cell) => cellText(cell) !== '');
    const texts = filled.filter((cell) => !holdsValue(cell));
    if (texts.length < 2 || texts.length < 0.6 * filled.length) return;
    const below = top.slice(position + 1, position + 5);
    const valueRows = below.filter((next) => next.cells.filter(holdsValue).length >= 2).length;
    const guessed = guessColumns(row.cells.map((cell) => cellText(cell)));
    const fields = Object.values(guessed).filter((column) => column !== null).length;
    const score = fields * 10 + (valueRows >= 2 ? 20 : 0) + texts.length;
    if (score > best.score) best = { rowNumber: row.rowNumber, score };
  });
  return best.rowNumber;
}
