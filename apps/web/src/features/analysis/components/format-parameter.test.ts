import type { ConsolidationWarning } from '@porestack/types';
import { describe, expect, it } from 'vitest';
import { formatParameter, MISSING_VALUE, warningFor } from './format-parameter';

const warnings: ConsolidationWarning[] = [
  { code: 'no-unload-branch', message: 'The test has no unloading, so Cs cannot be fitted.', incrementIndex: null },
  { code: 'primary-not-reached', message: 'Increment 3 stopped before primary consolidation ended.', incrementIndex: 3 },
];

describe('formatParameter(value, style, warning)', () => {
  it('prints a number with the requested digits', () => {
    expect(formatParameter(0.31234, { digits: 3 })).toEqual({ text: '0.312', reason: null });
  });

  it('prints small coefficients in scientific form', () => {
    expect(formatParameter(2.34e-10, { digits: 3, scientific: true }).text).toBe('2.34×10⁻¹⁰');
  });

  it.each([null, undefined, Number.NaN, Number.POSITIVE_INFINITY])('shows an em dash and the warning for %s, never NaN', (value) => {
    const formatted = formatParameter(value, { digits: 3 }, warnings[0]);
    expect(formatted.text).toBe(MISSING_VALUE);
    expect(formatted.text).not.toContain('NaN');
    expect(formatted.reason).toBe('The test has no unloading, so Cs cannot be fitted.');
  });

  it('says in plain words that a value is missing when no warning explains it', () => {
    expect(formatParameter(null).reason).toBe('Not available from these readings.');
  });
});

describe('warningFor(warnings, codes, incrementIndex)', () => {
  it('finds a test-level warning by code', () => {
    expect(warningFor(warnings, ['no-unload-branch'])?.message).toMatch(/no unloading/);
  });

  it('falls back to any warning about the same increment', () => {
    expect(warningFor(warnings, ['time-curve-not-drawn'], 3)?.code).toBe('primary-not-reached');
  });

  it('returns null when nothing matches', () => {
    expect(warningFor(warnings, ['mass-inconsistent'])).toBeNull();
  });
});
