import { describe, expect, it } from 'vitest';
import { analyzeConsolidationTest } from '../analyze-consolidation-test.js';
import { firstLoadingVoidRatio } from './first-loading-void-ratio.js';
import { generateSyntheticConsolidationTest } from './generate-synthetic-consolidation-test.js';
import { logSpacedReadingTimesMin, STANDARD_READING_TIMES_MIN } from './log-spaced-reading-times.js';
import { seededUniform } from './seeded-uniform.js';
import { DEFAULT_SYNTHETIC_CONSOLIDATION_PARAMETERS } from './synthetic-consolidation-parameters.js';

describe('generateSyntheticConsolidationTest(overrides?)', () => {
  it('draws the same readings for the same seed and different ones for another', () => {
    const a = generateSyntheticConsolidationTest({ seed: 3 });
    expect(generateSyntheticConsolidationTest({ seed: 3 })).toEqual(a);
    expect(generateSyntheticConsolidationTest({ seed: 4 }).input.increments[0]?.readings).not.toEqual(a.input.increments[0]?.readings);
  });

  it('gives one increment per stress, each read on the schedule, and e0 from the dry mass', () => {
    const test = generateSyntheticConsolidationTest();
    expect(test.input.increments.map((increment) => increment.stressKpa)).toEqual(DEFAULT_SYNTHETIC_CONSOLIDATION_PARAMETERS.stressesKpa);
    expect(test.input.increments[0]?.readings.map((reading) => reading.elapsedMin)).toEqual(STANDARD_READING_TIMES_MIN);
    expect(analyzeConsolidationTest(test.input).initialVoidRatio).toBeCloseTo(1.1, 12);
  });

  it('gives the dry mass beside the input: Hs·Gs·ρw·A = (20/2.1) × 2.7 × 0.001 × π·63.5²/4 = 81.435 g (hand calculation)', () => {
    const test = generateSyntheticConsolidationTest();
    expect(test.dryMassG).toBeCloseTo(81.4351, 4);
    expect(test.input.specimen.dryMassG).toBe(test.dryMassG);
  });

  it('ends every first-loading increment on the chosen curve (less the seating, 0.02 mm over Hs = 20/2.1 mm)', () => {
    const test = generateSyntheticConsolidationTest({ noiseMm: 0 });
    const seatingVoidRatio = 0.02 / test.heightOfSolidsMm;
    for (const position of [0, 2, 4, 5, 6]) {
      const truth = test.increments[position];
      expect(truth?.voidRatioEnd).toBeCloseTo(firstLoadingVoidRatio(test.parameters, truth?.stressKpa ?? 1) - seatingVoidRatio, 12);
    }
  });
});

describe('logSpacedReadingTimesMin(count, lastMin?) and seededUniform(seed)', () => {
  it('spaces a logger record evenly in log t from 0.01 min to the last time, after a reading at t = 0', () => {
    expect(logSpacedReadingTimesMin(3, 1)).toEqual([0, 0.01, 1]);
    const times = logSpacedReadingTimesMin(2000);
    expect(times).toHaveLength(2000);
    expect(times[times.length - 1]).toBeCloseTo(1440, 9);
  });

  it('throws a RangeError for fewer than three readings', () => {
    expect(() => logSpacedReadingTimesMin(2)).toThrow('logSpacedReadingTimesMin requires');
  });

  it('draws uniform numbers in [0, 1) with a mean near 1/2 (10,000 draws: within 0.01)', () => {
    const uniform = seededUniform(42);
    let sum = 0;
    for (let draw = 0; draw < 10000; draw += 1) {
      const value = uniform();
      expect(value).toBeGreaterThanOrEqual(0);
      expect(value).toBeLessThan(1);
      sum += value;
    }
    expect(Math.abs(sum / 10000 - 0.5)).toBeLessThan(0.01);
  });
});
