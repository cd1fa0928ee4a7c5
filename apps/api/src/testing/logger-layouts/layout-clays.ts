import { generateSyntheticConsolidationTest, logSpacedReadingTimesMin, type SyntheticConsolidationParameters } from '@porestack/geo-core';
import type { LayoutSpecimen, LayoutTruth } from './layout-types.js';

const DOUBLING = [12.5, 25, 50, 100, 200, 400, 800, 1600, 400, 100] as const;

/**
 * Nine invented clays, one a layout, chosen so that each file is a different test: e0 0.85–1.6,
 * Cc 0.25–0.75, σ′p 55–110 kPa (placed so that geo-core's automatic virgin line recovers the
 * chosen Cc within 0.2 % from the readings as generated), ring sizes of the
 * usual oedometers. Readings on a logger's schedule (60 a day, log-spaced) or a hand schedule.
 * Nothing here is a measurement or a real site.
 */
export const LAYOUT_CLAYS = {
  titleRows: { seed: 101, initialVoidRatio: 1.05, compressionIndex: 0.38, recompressionIndex: 0.04, preconsolidationStressKpa: 65, initialHeightMm: 20, diameterMm: 50, specificGravity: 2.7, stressesKpa: DOUBLING },
  germanCsv: { seed: 102, initialVoidRatio: 1.3, compressionIndex: 0.55, recompressionIndex: 0.06, preconsolidationStressKpa: 70, initialHeightMm: 20, diameterMm: 70, specificGravity: 2.68, stressesKpa: DOUBLING },
  inchDial: { seed: 103, initialVoidRatio: 0.95, compressionIndex: 0.31, recompressionIndex: 0.04, preconsolidationStressKpa: 65, initialHeightMm: 25.4, diameterMm: 63.5, specificGravity: 2.72, stressesKpa: [...DOUBLING.slice(0, 8), 3200, 800, 200] },
  sheetPerIncrement: { seed: 104, initialVoidRatio: 1.15, compressionIndex: 0.42, recompressionIndex: 0.05, preconsolidationStressKpa: 65, initialHeightMm: 20, diameterMm: 50, specificGravity: 2.7, stressesKpa: DOUBLING },
  frenchClock: { seed: 105, initialVoidRatio: 1.6, compressionIndex: 0.75, recompressionIndex: 0.08, preconsolidationStressKpa: 60, initialHeightMm: 24, diameterMm: 70, specificGravity: 2.65, stressesKpa: DOUBLING },
  spanishTimeCells: { seed: 106, initialVoidRatio: 0.85, compressionIndex: 0.25, recompressionIndex: 0.03, preconsolidationStressKpa: 110, initialHeightMm: 19, diameterMm: 50, specificGravity: 2.74, stressesKpa: [...DOUBLING.slice(0, 8), 3200, 800, 200] },
  portugueseDates: { seed: 107, initialVoidRatio: 1.4, compressionIndex: 0.62, recompressionIndex: 0.07, preconsolidationStressKpa: 55, initialHeightMm: 20, diameterMm: 50, specificGravity: 2.66, stressesKpa: DOUBLING },
  italianRepeats: { seed: 108, initialVoidRatio: 1.2, compressionIndex: 0.48, recompressionIndex: 0.05, preconsolidationStressKpa: 65, initialHeightMm: 20, diameterMm: 60, specificGravity: 2.69, stressesKpa: DOUBLING },
  runningClock: { seed: 109, initialVoidRatio: 1.0, compressionIndex: 0.35, recompressionIndex: 0.04, preconsolidationStressKpa: 60, initialHeightMm: 19.05, diameterMm: 63.5, specificGravity: 2.71, stressesKpa: DOUBLING },
  swellingFirst: { seed: 110, initialVoidRatio: 1.1, compressionIndex: 0.44, recompressionIndex: 0.05, preconsolidationStressKpa: 75, initialHeightMm: 20, diameterMm: 50, specificGravity: 2.7, stressesKpa: DOUBLING },
} satisfies Record<string, Partial<SyntheticConsolidationParameters>>;

/** A logger's day: 60 readings log-spaced from 0.01 min to 1440 min, and t = 0. */
export const LOGGER_DAY_MIN = logSpacedReadingTimesMin(60, 1440);

/** The synthetic test of a clay, its truth and the specimen values a technician types in. */
export function layoutTest(clay: Partial<SyntheticConsolidationParameters>, readingTimesMin?: readonly number[]): { truth: LayoutTruth; specimen: LayoutSpecimen } {
  const test = generateSyntheticConsolidationTest({ ...clay, ...(readingTimesMin ? { readingTimesMin } : {}) });
  const p = test.parameters;
  return {
    truth: { initialVoidRatio: p.initialVoidRatio, compressionIndex: p.compressionIndex, parameters: p, increments: test.input.increments },
    specimen: { initialHeightMm: p.initialHeightMm, diameterMm: p.diameterMm, specificGravity: p.specificGravity, dryMassG: Math.round(test.dryMassG * 100) / 100, drainage: p.drainage },
  };
}
