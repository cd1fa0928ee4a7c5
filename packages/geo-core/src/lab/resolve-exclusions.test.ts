import { describe, expect, it } from 'vitest';
import { analyzeConsolidationTest } from './analyze-consolidation-test.js';
import type { ConsolidationTestInput } from './consolidation-test-input.js';
import { syntheticConsolidationTest } from './__fixtures__/synthetic-consolidation-test.js';

const relativeError = (got: number | null, expected: number): number => Math.abs((got ?? Number.POSITIVE_INFINITY) / expected - 1);

// The generator's default clay (Cc 0.45); increment 6 (400 kPa, on the virgin line) has its
// last reading 0.2 mm short, as a gauge stuck at the end of the day would read: only that
// increment's end point moves. Measured: Cc 0.4852 with it (+7.8 %), 0.4491 without (−0.2 %).
const test = syntheticConsolidationTest({ seed: 4 });
const SPOILED = 6;
const spoiled: ConsolidationTestInput = {
  ...test.input,
  increments: test.input.increments.map((increment) =>
    increment.index !== SPOILED
      ? increment
      : { ...increment, readings: increment.readings.map((reading, i) => (i === increment.readings.length - 1 ? { ...reading, deformationMm: reading.deformationMm - 0.2 } : reading)) },
  ),
};
const reason = 'gauge stuck before the last reading';

describe('analyzeConsolidationTest({ picks: { excludedIncrements } })', () => {
  const kept = analyzeConsolidationTest(spoiled);
  const left = analyzeConsolidationTest({ ...spoiled, picks: { excludedIncrements: [{ index: SPOILED, reason }] } });

  it('the spoiled point pulls Cc off the chosen 0.45; left out, Cc is recovered within 0.5 % again', () => {
    expect(kept.compressionFit?.incrementIndices).toContain(SPOILED);
    expect(relativeError(kept.compressionIndex, 0.45)).toBeGreaterThan(0.05);
    expect(left.compressionFit?.incrementIndices).not.toContain(SPOILED);
    expect(relativeError(left.compressionIndex, 0.45)).toBeLessThan(0.005);
  });

  it('keeps the increment in the result with its measured void ratio and the reason, but no time curves, cv, Cα, av or mv', () => {
    const before = kept.increments.find((increment) => increment.index === SPOILED);
    const after = left.increments.find((increment) => increment.index === SPOILED);
    expect(after).toMatchObject({ excludedReason: reason, taylor: null, casagrande: null, cvTaylorM2PerYr: null, cvCasagrandeM2PerYr: null, secondaryCompressionIndex: null, avPerMPa: null, mvPerMPa: null });
    expect(after?.voidRatioEnd).toBe(before?.voidRatioEnd);
    expect(after?.readingCount).toBe(before?.readingCount);
    expect(left.increments.filter((increment) => increment.excludedReason !== null).map((increment) => increment.index)).toEqual([SPOILED]);
  });

  it('lists the exclusion for reports and warns in plain words', () => {
    expect(left.excludedIncrements).toEqual([{ index: SPOILED, stressKpa: 400, reason }]);
    expect(kept.excludedIncrements).toEqual([]);
    expect(left.warnings).toContainEqual({
      code: 'increment-excluded',
      incrementIndex: SPOILED,
      message: `Increment ${SPOILED} (400 kPa) is left out of the analysis: ${reason}. Its readings are kept and shown, but it gives no cv or Cα and is not on the compression curve.`,
    });
  });

  it('bases the next increment’s mv on the last increment still in the analysis: mv = (H₅ − H₇)/H₅/Δσ′', () => {
    const five = left.increments.find((increment) => increment.index === SPOILED - 1);
    const seven = left.increments.find((increment) => increment.index === SPOILED + 1);
    if (!five || !seven) throw new Error('increments 5 and 7 expected');
    // Increment 5 is 200 kPa, increment 7 is 800 kPa: Δσ′ = 0.6 MPa.
    expect(seven.stressKpa - five.stressKpa).toBe(600);
    const expected = (five.heightEndMm - seven.heightEndMm) / five.heightEndMm / 0.6;
    expect(seven.mvPerMPa).toBeCloseTo(expected, 12);
  });

  it('does not apply a time pick on a left-out increment, and warns of an exclusion naming no increment of the test', () => {
    const result = analyzeConsolidationTest({
      ...spoiled,
      picks: { excludedIncrements: [{ index: SPOILED, reason }, { index: 99, reason: 'typo' }], increments: [{ index: SPOILED, taylor: { t90Min: 30 } }] },
    });
    const messages = result.warnings.filter((warning) => warning.code === 'pick-not-applied').map((warning) => warning.message);
    expect(messages).toEqual([
      'Increment 99 was to be left out of the analysis, but the test has no increment 99; nothing was left out for it.',
      `A pick was given for increment ${SPOILED}, which is left out of the analysis; it was not applied.`,
    ]);
    expect(result.excludedIncrements.map((excluded) => excluded.index)).toEqual([SPOILED]);
  });

  it('throws when a reason is blank or when every increment would be left out', () => {
    expect(() => analyzeConsolidationTest({ ...spoiled, picks: { excludedIncrements: [{ index: 2, reason: '  ' }] } })).toThrow(
      new RangeError('analyzeConsolidationTest requires a reason for leaving out increment 2'),
    );
    const everyOne = spoiled.increments.map((increment) => ({ index: increment.index, reason: 'all of them' }));
    expect(() => analyzeConsolidationTest({ ...spoiled, picks: { excludedIncrements: everyOne } })).toThrow(
      new RangeError('analyzeConsolidationTest requires at least one increment left in the analysis'),
    );
  });
});
