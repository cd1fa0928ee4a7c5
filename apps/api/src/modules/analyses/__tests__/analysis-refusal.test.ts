import { analyzeConsolidationTest, type ConsolidationTestInput } from '@porestack/geo-core';
import { describe, expect, it } from 'vitest';
import { explainRefusal } from '../analysis-refusal.js';

/** geo-core's own refusal of the input (the test fails if it accepts it). */
function refusalOf(input: ConsolidationTestInput) {
  try {
    analyzeConsolidationTest(input);
  } catch (error) {
    if (error instanceof RangeError) return explainRefusal(input, error);
    throw error;
  }
  throw new Error('expected geo-core to refuse the input');
}

// Hand calculation: ring 50 mm → A = π·50²/4 = 1963.495 mm²; Gs 2.7 and a dry mass of
// 53.0144 g give Hs = 53.0144/(2.7 × 0.001 × 1963.495) = 10.000 mm of the 20 mm specimen.
const specimen = { initialHeightMm: 20, diameterMm: 50, specificGravity: 2.7, dryMassG: 53.0144, drainage: 'double' } as const;
const readings = (end: number) => [{ elapsedMin: 0, deformationMm: 0 }, { elapsedMin: 1440, deformationMm: end }];

describe('explainRefusal(input, error)', () => {
  it('names the increment that compresses the specimen past its solids, by how much, and what to check', () => {
    const refusal = refusalOf({ specimen, increments: [{ index: 1, stressKpa: 25, readings: readings(0.4) }, { index: 2, stressKpa: 50, readings: readings(10.5) }] });
    expect(refusal.message).toBe(
      "Increment 2 (50 kPa) compresses the specimen by 10.5 mm, which would leave it thinner than its solids alone (10 mm of its 20 mm). The deformations are likely read too large: check the gauge's division size and unit in the import mapping (change the mapping of the stored file — no new upload needed), then the specimen's dry mass, specific gravity and ring diameter.",
    );
    expect(refusal.issue).toEqual({ path: 'increments.2', message: 'Increment 2 compresses the specimen past its solids.' });
  });

  it('says the solids would not fit the specimen, with their height, and which specimen values to check', () => {
    const refusal = refusalOf({ specimen: { ...specimen, dryMassG: 110 }, increments: [{ index: 1, stressKpa: 25, readings: readings(0.1) }] });
    // 110/(2.7 × 0.001 × 1963.495) = 20.749 mm.
    expect(refusal.message).toBe("The specimen's solids alone would be 20.749 mm tall, not less than its initial height of 20 mm, so there would be no voids. Check the dry mass (g), the specific gravity and the ring's diameter and initial height in the specimen form.");
    expect(refusal.issue.path).toBe('specimen.dryMassG');
  });

  it('puts a condition it does not know in words without the function’s name', () => {
    const refusal = explainRefusal({ specimen, increments: [] }, new RangeError('someFunction requires something odd'));
    expect(refusal.message).toBe('The data break a condition of the analysis (it needs something odd). Check the specimen data and the readings of the stored file, then run it again.');
    expect(refusal.message).not.toContain('someFunction');
  });
});
