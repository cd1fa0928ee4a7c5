import { describe, expect, it } from 'vitest';
import { convertUnit } from '../units/convert-unit.js';
import { casagrandePreconsolidation } from './casagrande-preconsolidation.js';
import type { StressVoidRatioPoint } from './compression-curve-types.js';
import { fitCompressionLine } from './fit-compression-line.js';
import { heightOfSolidsMm } from './height-of-solids.js';
import { pachecoSilvaPreconsolidation } from './pacheco-silva-preconsolidation.js';
import { selectVirginLine } from './select-virgin-line.js';
import { voidRatioFromHeight } from './void-ratio-from-height.js';

// Published worked examples of the e–log σ′ curve, each test named by its source line.

describe('A chapter-11 problem of the Das Principles of Geotechnical Engineering type, as solved in two independent published student solutions (Kathmandu University CIEG 303 assignment, 2020; a homework solution sheet) — a weaker source: the book’s own answer was not seen', () => {
  // σ′ = 0.25 … 8 ton/ft², printed in kPa; e at the end of each increment.
  const points: StressVoidRatioPoint[] = [
    [23.94, 1.112],
    [47.88, 1.105],
    [95.76, 1.08],
    [191.52, 0.985],
    [383.04, 0.85],
    [766.08, 0.731],
  ].map(([stressKpa, voidRatio]) => ({ stressKpa: stressKpa as number, voidRatio: voidRatio as number }));

  it('P1: Casagrande’s σ′p ≈ 115 kPa (graphical) within 15 %, on the automatic virgin line; Pacheco Silva reported beside it', () => {
    // Convention: the virgin line is chosen by selectVirginLine — here the three highest points, 191.52–766.08 kPa,
    // fitted by least squares (Cc 0.422). The source draws its line through the steepest part instead (0.448 between
    // 191.5 and 383 kPa); a numerical construction gives 101–121 kPa depending on the points chosen.
    const virgin = selectVirginLine(points);
    expect(virgin).toEqual([3, 4, 5]);
    const line = fitCompressionLine(virgin.map((index) => points[index] as StressVoidRatioPoint)).line;
    const casagrande = casagrandePreconsolidation(points, line, 191.52).construction?.preconsolidationStressKpa ?? Number.NaN;
    // Measured: 119.7 kPa, +4.1 % of the printed 115 kPa.
    expect(Math.abs(casagrande / 115 - 1)).toBeLessThan(0.15);
    // Pacheco Silva on the same line, e0 taken as the first tabulated void ratio (1.112; the specimen's e0 is not given):
    // measured 111.7 kPa, −2.9 % of the printed Casagrande value — no printed Pacheco Silva answer exists (a cross-check only).
    const pachecoSilva = pachecoSilvaPreconsolidation(points, line, 1.112).construction?.preconsolidationStressKpa ?? Number.NaN;
    expect(Math.abs(pachecoSilva / 115 - 1)).toBeLessThan(0.15);
    expect(Math.abs(pachecoSilva / casagrande - 1)).toBeLessThan(0.1);
  });

  it('P1: Cc ≈ 0.45 when the virgin line runs through 191.52 and 383.04 kPa, as the printed reading does; 0.422 on the automatic three-point line', () => {
    // Printed: Cc ≈ 0.45, the slope read between about 300 and 500 kPa; two points: (0.985 − 0.850)/log10(2) = 0.4485.
    const steepest = fitCompressionLine([points[3] as StressVoidRatioPoint, points[4] as StressVoidRatioPoint]).line.voidRatioPerLogCycle;
    expect(Math.abs(-steepest - 0.45)).toBeLessThanOrEqual(0.005);
    // The automatic line (191.52–766.08 kPa) by least squares: the curve flattens to 0.395 above 383 kPa, so 0.422 —
    // 6 % below the printed reading; a convention (which points define the virgin line), not an error.
    const automatic = fitCompressionLine([3, 4, 5].map((index) => points[index] as StressVoidRatioPoint)).line.voidRatioPerLogCycle;
    expect(-automatic).toBeCloseTo(0.4219, 4);
    // With the printed virgin line Casagrande's σ′p moves to 126.3 kPa (+9.8 %), still within the fair 15 %.
    const onPrintedLine = casagrandePreconsolidation(points, fitCompressionLine([points[3] as StressVoidRatioPoint, points[4] as StressVoidRatioPoint]).line, 191.52);
    expect(Math.abs((onPrintedLine.construction?.preconsolidationStressKpa ?? Number.NaN) / 115 - 1)).toBeLessThan(0.15);
  });
});

describe('Homework solution sheet of the same Das-type problem (SI statement: H0 19 mm, Gs 2.68, dry mass 95.2 g, area 31.68 cm²), solved in US units', () => {
  it('P2: specimen heights → e0 = 0.694, void ratios 0.573 … 0.416 (±0.002) and Cc (2000–8000 psf) = 0.131 (within 2 %)', () => {
    // Converted at the edge: in → mm; the ring's diameter from its area, D = √(4A/π).
    const inch = (value: number) => convertUnit(value, 'in', 'mm');
    const areaMm2 = 4.91 * inch(1) ** 2;
    const diameterMm = Math.sqrt((4 * areaMm2) / Math.PI);
    const solidsMm = heightOfSolidsMm(95.2, 2.68, diameterMm);
    // Hs = 95.2/(2.68 × 0.001 × 3167.7) = 11.214 mm = 0.4415 in, as the sheet prints.
    expect(convertUnit(solidsMm, 'mm', 'in')).toBeCloseTo(0.4415, 4);
    expect(Math.abs(voidRatioFromHeight(inch(0.748), solidsMm) - 0.694)).toBeLessThanOrEqual(0.002);
    const stressesPsf = [500, 1000, 2000, 4000, 8000, 16000];
    const heightsIn = [0.6947, 0.685, 0.6705, 0.652, 0.6358, 0.6252];
    const printedVoidRatios = [0.573, 0.551, 0.518, 0.477, 0.44, 0.416];
    const curve = stressesPsf.map((stressPsf, index) => ({ stressKpa: convertUnit(stressPsf, 'psf', 'kPa'), voidRatio: voidRatioFromHeight(inch(heightsIn[index] as number), solidsMm) }));
    curve.forEach((point, index) => expect(Math.abs(point.voidRatio - (printedVoidRatios[index] as number))).toBeLessThanOrEqual(0.002));
    // Cc through 2000, 4000 and 8000 psf (equally spaced on log σ′, so the least-squares slope is the end points' chord):
    // (0.51870 − 0.44011)/log10(4) = 0.1305, −0.4 % of the printed 0.131 (the sheet's rounded e give 0.1296).
    const cc = -fitCompressionLine(curve.slice(2, 5)).line.voidRatioPerLogCycle;
    expect(Math.abs(cc / 0.131 - 1)).toBeLessThan(0.02);
  });
});
