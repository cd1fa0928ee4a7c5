import type { DateOrder, TimeFormat } from '@porestack/types';
import type { Cell } from './raw-table.js';

/** A time cell read as minutes, or why it could not be. */
export type TimeCellValue = number | 'empty' | 'not-a-number' | 'decimal-comma' | 'not-a-duration' | 'not-a-date-time';

const NUMBER_PATTERN = /^[+-]?(\d+\.?\d*|\.\d+)([eE][+-]?\d+)?$/;
const DURATION = /^(\d+):(\d{1,2}):(\d{1,2}(?:[.,]\d+)?)$/;
// 2024-03-05 14:30:00, 2024/03/05T14:30, 05.03.2024 14:30:00.5, 05/03/2024 14:30
const YEAR_FIRST = /^(\d{4})[-/.](\d{1,2})[-/.](\d{1,2})[ T]+(\d{1,2}):(\d{2})(?::(\d{2}(?:[.,]\d+)?))?$/;
const YEAR_LAST = /^(\d{1,2})([./-])(\d{1,2})\2(\d{4})[ T,]+(\d{1,2}):(\d{2})(?::(\d{2}(?:[.,]\d+)?))?$/;

/**
 * A number as written: digits with an optional sign, decimal part and exponent; with a
 * decimal comma, `0,25` (one comma). 'decimal-comma' when the text would be a number with a
 * decimal comma but a point was chosen, so the message can say which setting to change.
 */
export function numberIn(cell: Cell | undefined, decimalComma: boolean): number | 'empty' | 'not-a-number' | 'decimal-comma' {
  if (cell === null || cell === undefined) return 'empty';
  if (typeof cell === 'number') return Number.isFinite(cell) ? cell : 'not-a-number';
  let text = cell.trim();
  if (text === '') return 'empty';
  if (decimalComma) text = text.replace(',', '.');
  if (NUMBER_PATTERN.test(text)) {
    const value = Number(text);
    return Number.isFinite(value) ? value : 'not-a-number';
  }
  return !decimalComma && /^[+-]?\d+,\d+$/.test(text) ? 'decimal-comma' : 'not-a-number';
}

/** `h:mm:ss` (hours may pass 24, seconds may have a fraction) as minutes. */
export function durationMinutes(text: string): number | null {
  const match = DURATION.exec(text);
  if (!match) return null;
  const minutes = Number(match[2]);
  const seconds = Number((match[3] as string).replace(',', '.'));
  if (minutes >= 60 || seconds >= 60) return null;
  return Number(match[1]) * 60 + minutes + seconds / 60;
}

/** A written date and time of day as minutes since 1970 (the zone does not matter: only differences are used). */
export function dateTimeMinutes(text: string, order: DateOrder): number | null {
  let parts: [string, string, string, string, string, string | undefined] | null = null;
  const yearFirst = YEAR_FIRST.exec(text);
  if (yearFirst) parts = [yearFirst[1] as string, yearFirst[2] as string, yearFirst[3] as string, yearFirst[4] as string, yearFirst[5] as string, yearFirst[6]];
  const yearLast = yearFirst ? null : YEAR_LAST.exec(text);
  if (yearLast) {
    const [first, second] = [yearLast[1] as string, yearLast[3] as string];
    // Dotted dates are day first wherever they are written.
    const dayFirst = yearLast[2] === '.' || order === 'dmy';
    parts = [yearLast[4] as string, dayFirst ? second : first, dayFirst ? first : second, yearLast[5] as string, yearLast[6] as string, yearLast[7]];
  }
  if (!parts) return null;
  const [year, month, day, hour, minute, second] = parts.map((part) => (part === undefined ? 0 : Number(part.replace(',', '.')))) as [number, number, number, number, number, number];
  if (!(month >= 1 && month <= 12 && day >= 1 && day <= 31 && hour < 24 && minute < 60 && second < 60)) return null;
  const ms = Date.UTC(year, month - 1, day, hour, minute) + second * 1000;
  // Date.UTC rolls 31 April over into May: refuse what is not a calendar date.
  if (new Date(ms).getUTCDate() !== day) return null;
  return ms / 60_000;
}

/**
 * A time cell in minutes, as the mapping says it is written: a number in its unit, a
 * duration, or a date-time. A duration may be the number 0 (an empty time cell formatted
 * as a number in a logger's first row).
 */
export function timeCellMinutes(cell: Cell | undefined, format: TimeFormat, minutesPerUnit: number, decimalComma: boolean, order: DateOrder): TimeCellValue {
  if (format === 'number') {
    const value = numberIn(cell, decimalComma);
    return typeof value === 'number' ? value * minutesPerUnit : value;
  }
  if (cell === null || cell === undefined || (typeof cell === 'string' && cell.trim() === '')) return 'empty';
  if (typeof cell === 'number') return format === 'duration' && cell === 0 ? 0 : format === 'duration' ? 'not-a-duration' : 'not-a-date-time';
  const text = cell.trim();
  const minutes = format === 'duration' ? durationMinutes(text) : dateTimeMinutes(text, order);
  return minutes ?? (format === 'duration' ? 'not-a-duration' : 'not-a-date-time');
}
