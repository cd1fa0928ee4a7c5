/** Excel's day zero (1900 date system, as exceljs reads it): 1899-12-30, in UTC milliseconds. */
const EXCEL_EPOCH_MS = Date.UTC(1899, 11, 30);
/** Serial days below this are durations (a time cell, [h]:mm:ss), not dates: before 1901-01-01. */
const DURATION_BELOW_MS = Date.UTC(1901, 0, 1);

const two = (n: number): string => String(n).padStart(2, '0');

/**
 * A workbook's time or date cell as text a person reads the same way: a cell before 1901
 * (serial days below 367, what a time or [h]:mm:ss format holds) as a duration `h:mm:ss`
 * counting whole hours past 24; any later one as the date-time `YYYY-MM-DD hh:mm:ss`.
 * exceljs hands such cells over as Dates in UTC carrying the sheet's wall-clock time.
 * Fractions of a second are kept (`.250`) so loggers writing tenths lose nothing.
 * @example spreadsheetDateText(new Date(Date.UTC(1899, 11, 31, 12))) // '36:00:00'
 */
export function spreadsheetDateText(date: Date): string {
  const ms = date.getTime();
  if (!Number.isFinite(ms)) return '';
  if (ms < DURATION_BELOW_MS) {
    const total = Math.round(ms - EXCEL_EPOCH_MS);
    const sign = total < 0 ? '-' : '';
    const whole = Math.abs(total);
    const hours = Math.floor(whole / 3_600_000);
    const minutes = Math.floor((whole % 3_600_000) / 60_000);
    const seconds = Math.floor((whole % 60_000) / 1000);
    return `${sign}${hours}:${two(minutes)}:${two(seconds)}${fraction(whole % 1000)}`;
  }
  return `${date.getUTCFullYear()}-${two(date.getUTCMonth() + 1)}-${two(date.getUTCDate())} ${two(date.getUTCHours())}:${two(date.getUTCMinutes())}:${two(date.getUTCSeconds())}${fraction(date.getUTCMilliseconds())}`;
}

function fraction(ms: number): string {
  return ms === 0 ? '' : `.${String(ms).padStart(3, '0').replace(/0+$/, '')}`;
}
