import type { AnalysisWarning } from './analysis-result';

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
  warning?: AnalysisWarning | null,
): FormattedParameter {
  if (value === null || value === undefined || !Number.isFinite(value)) {
    return { text: MISSING_VALUE, reason: warning?.message ?? FALLBACK_REASON };
  }
  const digits = style.digits ?? 3;
  if (style.scientific) return { text: value.toExponential(Math.max(digits - 1, 0)).replace('e', '×10^').replace('^+', '^'), reason: null };
  return { text: value.toFixed(digits), reason: null };
}

/** The first warning with one of these codes, for the test or for one increment. */
export function warningFor(
  warnings: readonly AnalysisWarning[],
  codes: readonly string[],
  incrementIndex: number | null = null,
): AnalysisWarning | null {
  return (
    warnings.find((w) => codes.includes(w.code) && (incrementIndex === null || w.incrementIndex === incrementIndex)) ??
    (incrementIndex === null ? null : (warnings.find((w) => w.incrementIndex === incrementIndex) ?? null))
  );
}
