// Test support: the suite's names for the public synthetic-test generator
// (src/lab/synthetic), so every test and the benchmark build tests the same way.
// Excluded from the build (tsconfig), as every __fixtures__ folder is.
export { generateSyntheticConsolidationTest as syntheticConsolidationTest } from '../synthetic/generate-synthetic-consolidation-test.js';
export { logSpacedReadingTimesMin as denseReadingTimesMin, STANDARD_READING_TIMES_MIN } from '../synthetic/log-spaced-reading-times.js';
