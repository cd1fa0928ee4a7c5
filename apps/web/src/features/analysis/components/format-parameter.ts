import type { ConsolidationWarning } from '@porestack/types';

export type FormattedParameter = {
  /** What the cell shows: the number, or an em dash when there is none. */
  text: string;
  /** Why there is no number, in the analysis' own words (or ours when it gave none). */
  reason: string | null;
};

export const MISSING_VALUE = '—';
const FALLBACK_REASON = 'Not available from these readings.';

/**
 * Formats a parameter for a table. A missing, NaN or infinite value is never printed as a number:
 * it shows '—' and the warning that explains it, so a report never carries a silent NaN.
 */
export function formatParameter(
  value: number | null | undefined,
  style: { digits?: number; scientific?: boolean } = {},
  warning?: ConsolidationWarning | null,
): FormattedParameter {
  if (value === null || value === undefined || !Number.isFinite(value)) {
    return { text: MISSING_VALUE, reason: warning?.message ?? FALLBACK_REASON };
  }
  const digits = style.digits ?? 3;
  if (style.scientific) {
    const [mantissa, exponent = '0'] = value.toExponential(Math.max(digits - 1, 0)).split('e');
    return { text: `${mantissa}×10${superscript(Number(exponent))}`, reason: null };
  }
  return { text: value.toFixed(digits), reason: null };
}

/** The first warning with one of these codes, for the test or for one increment. */
export function warningFor(
  warnings: readonly ConsolidationWarning[],
  codes: readonly string[],
  incrementIndex: number | null = null,
): ConsolidationWarning | null {
  return (
    warnings.find((w) => codes.includes(w.code) && (incrementIndex === null || w.incrementIndex === incrementIndex)) ??
    (incrementIndex === null ? null : (warnings.find((w) => w.incrementIndex === incrementIndex) ?? null))
  );
}

const SUPERSCRIPT_DIGITS = '⁰¹²³⁴⁵⁶⁷⁸⁹';
/** −10 → ⁻¹⁰, as a parameter table prints a power of ten. */
function superscript(exponent: number): string {
  const digits = String(Math.abs(exponent)).replace(/\d/g, (d) => SUPERSCRIPT_DIGITS[Number(d)] ?? d);
  return exponent < 0 ? `⁻${digits}` : digits;
}
