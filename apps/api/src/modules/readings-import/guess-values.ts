import type { DateOrder, TimeFormat } from '@porestack/types';
import { cellText, type Cell, type RawRow } from './raw-table.js';
import { dateTimeMinutes, durationMinutes, numberIn } from './read-time.js';

const COMMA_NUMBER = /^[+-]?\d+,\d+$/;
const POINT_NUMBER = /^[+-]?\d*\.\d+$/;
const YEAR_LAST = /^(\d{1,2})[/-](\d{1,2})[/-]\d{4}/;

/** The column's cells in the rows, as found. */
export function columnCells(rows: readonly RawRow[], position: number): Cell[] {
  return rows.map((row) => row.cells[position] ?? null);
}

/** ',' when the text values carry decimal commas (and no decimal points), with a sample for the reason. */
export function guessDecimalSeparator(cells: readonly Cell[]): { separator: '.' | ','; example: string | null } {
  let comma: string | null = null;
  let points = 0;
  for (const cell of cells) {
    if (typeof cell !== 'string') continue;
    const text = cell.trim();
    if (COMMA_NUMBER.test(text)) comma ??= text;
    else if (POINT_NUMBER.test(text)) points += 1;
  }
  return comma !== null && points === 0 ? { separator: ',', example: comma } : { separator: '.', example: null };
}

/** How the time cells are written: all durations, all date-times, else numbers; with an example. */
export function guessTimeFormat(cells: readonly Cell[]): { format: TimeFormat; example: string | null; dateOrder: DateOrder; dateOrderKnown: boolean } {
  const texts = cells.map((cell) => cellText(cell)).filter((text) => text !== '').slice(0, 200);
  const durations = texts.filter((text) => durationMinutes(text) !== null || text === '0');
  const dateTimes = texts.filter((text) => dateTimeMinutes(text, 'dmy') !== null || dateTimeMinutes(text, 'mdy') !== null);
  let dateOrder: DateOrder = 'dmy';
  let dateOrderKnown = false;
  for (const text of dateTimes) {
    const match = YEAR_LAST.exec(text);
    if (!match) {
      if (/^\d{4}/.test(text) || /^\d{1,2}\./.test(text)) dateOrderKnown = true;
      continue;
    }
    if (Number(match[1]) > 12) { dateOrder = 'dmy'; dateOrderKnown = true; break; }
    if (Number(match[2]) > 12) { dateOrder = 'mdy'; dateOrderKnown = true; break; }
  }
  if (texts.length > 0 && durations.length === texts.length && durations.some((text) => text !== '0')) {
    return { format: 'duration', example: durations.find((text) => text !== '0') ?? null, dateOrder, dateOrderKnown };
  }
  if (texts.length > 0 && dateTimes.length === texts.length) return { format: 'datetime', example: dateTimes[0] ?? null, dateOrder, dateOrderKnown };
  return { format: 'number', example: null, dateOrder, dateOrderKnown };
}

/**
 * Which way a column of readings moves over the rows read: the mean of its last three values
 * against its first three. 'flat' when they differ by less than a thousandth of the
 * values' spread or there are too few, so no direction is guessed from noise.
 */
export function trendOf(values: readonly number[]): 'rises' | 'falls' | 'flat' {
  if (values.length < 4) return 'flat';
  const mean = (part: readonly number[]) => part.reduce((sum, value) => sum + value, 0) / part.length;
  const change = mean(values.slice(-3)) - mean(values.slice(0, 3));
  const scale = Math.max(...values.map(Math.abs), 1e-12);
  if (Math.abs(change) < 1e-3 * scale) return 'flat';
  return change > 0 ? 'rises' : 'falls';
}

/** The numbers of the cells (either decimal mark as chosen), skipping what is not one. */
export function numbersOf(cells: readonly Cell[], decimalComma: boolean): number[] {
  const numbers: number[] = [];
  for (const cell of cells) {
    const value = numberIn(cell, decimalComma);
    if (typeof value === 'number') numbers.push(value);
  }
  return numbers;
}
