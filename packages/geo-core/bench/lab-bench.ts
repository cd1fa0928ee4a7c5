// Times analyzeConsolidationTest on logger-sized tests built by the synthetic
// generator: 20 increments × 2,000 readings, and 20 × 50,000 = 1,000,000 readings.
// Run: npx tsx bench/lab-bench.ts (or pnpm bench:lab). Targets: < 20 ms and < 1 s.
import { analyzeConsolidationTest } from '../src/lab/analyze-consolidation-test.js';
import { denseReadingTimesMin, syntheticConsolidationTest } from '../src/lab/__fixtures__/synthetic-consolidation-test.js';

const STRESSES_KPA = [12.5, 25, 50, 100, 200, 400, 800, 1600, 800, 400, 200, 400, 800, 1600, 3200, 1600, 800, 400, 200, 100];

function median(values: number[]): number {
  const sorted = [...values].sort((a, b) => a - b);
  return sorted[Math.floor(sorted.length / 2)] as number;
}

function time(label: string, readingsPerIncrement: number, repeats: number): void {
  const { input } = syntheticConsolidationTest({ stressesKpa: STRESSES_KPA, readingTimesMin: denseReadingTimesMin(readingsPerIncrement), noiseMm: 0.001 });
  analyzeConsolidationTest(input); // warm-up so the JIT has compiled the hot loops
  const samples: number[] = [];
  for (let run = 0; run < repeats; run += 1) {
    const start = performance.now();
    analyzeConsolidationTest(input);
    samples.push(performance.now() - start);
  }
  const readings = input.increments.reduce((sum, increment) => sum + increment.readings.length, 0);
  console.log(`${label}: ${readings.toLocaleString('en')} readings — median ${median(samples).toFixed(2)} ms, best ${Math.min(...samples).toFixed(2)} ms over ${repeats} runs`);
}

time('20 increments × 2,000 readings', 2000, 50);
time('20 increments × 50,000 readings', 50000, 10);
