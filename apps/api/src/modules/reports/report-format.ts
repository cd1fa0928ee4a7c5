/** Number formats shared by the printed report and the spreadsheets' "as printed" cells. */
export const NOT_DETERMINED = '–';

export function fixed(value: number | null | undefined, digits: number): string {
  return value === null || value === undefined || !Number.isFinite(value) ? NOT_DETERMINED : value.toFixed(digits);
}

const SUPERSCRIPT: Record<string, string> = { '-': '⁻', '0': '⁰', '1': '¹', '2': '²', '3': '³', '4': '⁴', '5': '⁵', '6': '⁶', '7': '⁷', '8': '⁸', '9': '⁹' };

/** 4.89e-10 → "4.89×10⁻¹⁰", as engineers write it. */
export function scientific(value: number | null | undefined, digits = 3): string {
  if (value === null || value === undefined || !Number.isFinite(value)) return NOT_DETERMINED;
  if (value === 0) return '0';
  const exponent = Math.floor(Math.log10(Math.abs(value)));
  const mantissa = (value / 10 ** exponent).toPrecision(digits);
  const power = String(exponent).split('').map((c) => SUPERSCRIPT[c] ?? c).join('');
  return `${mantissa}×10${power}`;
}

/** Significant figures for coefficients whose size varies by decades (cv, t50). */
export function significant(value: number | null | undefined, digits = 3): string {
  if (value === null || value === undefined || !Number.isFinite(value)) return NOT_DETERMINED;
  return Number(value.toPrecision(digits)).toString();
}

export function percent(fraction: number | null | undefined, digits = 1): string {
  return fraction === null || fraction === undefined || !Number.isFinite(fraction) ? NOT_DETERMINED : `${(fraction * 100).toFixed(digits)} %`;
}

/** 2026-03-02T10:15:00Z → "2 March 2026" (UTC, so the printed date does not depend on the server's zone). */
export function longDate(date: Date | string | null): string {
  if (date === null) return NOT_DETERMINED;
  const d = typeof date === 'string' ? new Date(`${date.length === 10 ? `${date}T00:00:00Z` : date}`) : date;
  return d.toLocaleDateString('en-GB', { day: 'numeric', month: 'long', year: 'numeric', timeZone: 'UTC' });
}

export function dateTime(date: Date): string {
  return `${longDate(date)}, ${date.toLocaleTimeString('en-GB', { hour: '2-digit', minute: '2-digit', timeZone: 'UTC' })} UTC`;
}
