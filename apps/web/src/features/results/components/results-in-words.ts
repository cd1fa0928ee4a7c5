import type { ProjectResults } from '@porestack/types';

/** "from 0.38 to 0.45", or "of 2.4" when every value rounds the same; null without values. */
const spread = (values: number[], digits: number, unit = '') => {
  if (values.length === 0) return null;
  const low = Math.min(...values).toFixed(digits);
  const high = Math.max(...values).toFixed(digits);
  return low === high ? `of ${low}${unit}` : `from ${low} to ${high}${unit}`;
};
const count = (n: number, one: string, many: string) => `${n} ${n === 1 ? one : many}`;
const present = (values: Array<number | null>) => values.filter((v): v is number => v !== null && Number.isFinite(v));

/**
 * A few sentences on what was tested and what came out, for someone who commissioned the work
 * rather than ran it: how many tests from how many samples, over which depths, and the spread
 * of the main parameters.
 */
export function resultsInWords(data: ProjectResults): string[] {
  const { results, boreholes } = data;
  const sampleCount = boreholes.reduce((n, b) => n + b.samples.length, 0);
  if (results.length === 0) {
    return [
      `${count(boreholes.length, 'borehole', 'boreholes')} and ${count(sampleCount, 'sample', 'samples')} are recorded for this project. No test result has been approved yet: results appear here as soon as the laboratory approves them.`,
    ];
  }
  const sampled = new Set(results.map((r) => `${r.boreholeName}/${r.sampleReference}`)).size;
  const fromBoreholes = new Set(results.map((r) => r.boreholeName)).size;
  const depths = spread(results.flatMap((r) => [r.topDepthM, r.bottomDepthM]), 1, ' m')?.replace(/^(from|of) /, '');
  const sentences = [
    `The laboratory has approved ${count(results.length, 'one-dimensional consolidation (oedometer) test', 'one-dimensional consolidation (oedometer) tests')} on ${count(sampled, 'undisturbed sample', 'undisturbed samples')} from ${count(fromBoreholes, 'borehole', 'boreholes')}, taken ${depths} below ground level.`,
    'Each test loads a small disc of the soil in steps and measures how much and how fast it compresses; the parameters below describe that behaviour.',
  ];
  const cc = spread(present(results.map((r) => r.current.compressionIndex)), 2);
  const sp = spread(present(results.map((r) => r.current.preconsolidationAdoptedKpa)), 0, ' kPa');
  const ocr = spread(present(results.map((r) => r.current.overconsolidationRatio)), 1);
  const found = [cc ? `Cc ${cc}` : null, sp ? `σ′p ${sp}` : null, ocr ? `OCR ${ocr}` : null].filter(Boolean);
  if (found.length > 0) sentences.push(`Across these tests: ${found.join('; ')}.`);
  return sentences;
}

/** What each parameter in the table means, in plain words. */
export const PARAMETER_MEANINGS: ReadonlyArray<{ symbol: string; meaning: string }> = [
  { symbol: 'e0', meaning: 'Initial void ratio: the volume of pores to the volume of solid grains before loading. Higher means a looser, more compressible soil.' },
  { symbol: 'Cc', meaning: 'Compression index: how much the soil compresses once loaded beyond anything it has carried before. The main figure for settlement of soft clay.' },
  { symbol: 'Cr / Cs', meaning: 'Recompression (or swelling) index: the much smaller compression while the load stays below what the soil has carried before.' },
  { symbol: 'σ′p', meaning: 'Preconsolidation stress: the largest effective stress the soil appears to have carried. Loads that stay below it cause little settlement.' },
  { symbol: 'OCR', meaning: 'Overconsolidation ratio: σ′p divided by the present stress in the ground. 1 means the soil is carrying the most it ever has; higher means it has spare capacity before large settlement starts.' },
  { symbol: 'cv', meaning: 'Coefficient of consolidation: how fast the settlement happens as water drains out. Higher means faster; it varies with the stress level.' },
  { symbol: 'Cα', meaning: 'Secondary compression index: slow creep that continues after the water has drained, over years.' },
  { symbol: 'Sample quality', meaning: 'How little the sample was disturbed between the ground and the test, judged from how much it compressed when reloaded to its in-situ stress.' },
];
