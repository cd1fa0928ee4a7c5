import type { TimeDeformationReading } from '@porestack/geo-core';
import type { ConsolidationIncrementResult, ConsolidationTestResult, StressVoidRatioLine } from '@porestack/types';
import { renderChart, type ChartPoint, type ChartSeries } from '../charts/svg-chart.js';

/**
 * The plots of a test report, drawn from the geometry the analysis stored (never re-derived),
 * so the report shows exactly what was approved. Colours are dark enough to print as distinct
 * greys, and dash patterns and marker shapes carry the difference on a black-and-white copy.
 */
const INK = {
  measured: '#111827',
  casagrande: '#0f5f56',
  pachecoSilva: '#8a4a06',
  adopted: '#9b1c1c',
  secondary: '#4b5563',
} as const;

const STRESS_AXIS = { title: 'Effective vertical stress σ′ (kPa), log scale', scale: 'log' as const };
const lineOf = (l: StressVoidRatioLine, toY: (e: number) => number): ChartPoint[] => [
  { x: l.start.stressKpa, y: toY(l.start.voidRatio) },
  { x: l.end.stressKpa, y: toY(l.end.voidRatio) },
];

/** e–log σ′ (or ε–log σ′) with the Casagrande and Pacheco Silva constructions and the adopted σ′p. */
export function compressionChart(result: ConsolidationTestResult, axis: 'voidRatio' | 'strain'): string {
  const e0 = result.initialVoidRatio;
  const toY = axis === 'voidRatio' ? (e: number) => e : (e: number) => ((e0 - e) / (1 + e0)) * 100;
  const series: ChartSeries[] = [
    {
      name: 'Test: end of each increment',
      points: result.increments.map((i) => ({ x: i.stressKpa, y: axis === 'voidRatio' ? i.voidRatioEnd : i.strainEnd * 100 })),
      colour: INK.measured,
      line: { dash: 'solid', widthPx: 1.3 },
      marker: { shape: 'circle', sizePx: 5 },
    },
  ];
  const labels = [];
  const casagrande = result.preconsolidation.casagrande;
  if (casagrande) {
    series.push({ name: 'Casagrande: smoothed curve', points: casagrande.interpolant.map((p) => ({ x: p.stressKpa, y: toY(p.voidRatio) })), colour: INK.casagrande, line: { dash: 'dot' } });
    series.push({ name: 'Casagrande: horizontal, tangent, bisector', points: lineOf(casagrande.horizontalLine, toY), colour: INK.casagrande, line: { dash: 'dash', widthPx: 0.9 } });
    series.push({ name: '', points: lineOf(casagrande.tangentLine, toY), colour: INK.casagrande, line: { dash: 'dash', widthPx: 0.9 }, hideInLegend: true });
    series.push({ name: '', points: lineOf(casagrande.bisectorLine, toY), colour: INK.casagrande, line: { dash: 'dash-dot', widthPx: 0.9 }, hideInLegend: true });
    series.push({ name: 'Virgin compression line', points: lineOf(casagrande.virginLine, toY), colour: INK.casagrande, line: { dash: 'long-dash', widthPx: 1 } });
    series.push({
      name: `σ′p Casagrande ${casagrande.preconsolidationStressKpa.toFixed(0)} kPa`,
      points: [{ x: casagrande.intersection.stressKpa, y: toY(casagrande.intersection.voidRatio) }],
      colour: INK.casagrande,
      marker: { shape: 'diamond', sizePx: 7 },
    });
    series.push({ name: 'Point of maximum curvature', points: [{ x: casagrande.maximumCurvaturePoint.stressKpa, y: toY(casagrande.maximumCurvaturePoint.voidRatio) }], colour: INK.casagrande, marker: { shape: 'circle-open', sizePx: 7 } });
  }
  const pacheco = result.preconsolidation.pachecoSilva;
  if (pacheco) {
    const dashes = { dash: 'dash-dot-dot', widthPx: 0.9 } as const;
    series.push({ name: 'Pacheco Silva: e0 line, vertical, horizontal', points: lineOf(pacheco.initialVoidRatioLine, toY), colour: INK.pachecoSilva, line: dashes });
    series.push({ name: '', points: lineOf(pacheco.verticalLine, toY), colour: INK.pachecoSilva, line: dashes, hideInLegend: true });
    series.push({ name: '', points: lineOf(pacheco.horizontalLine, toY), colour: INK.pachecoSilva, line: dashes, hideInLegend: true });
    if (!casagrande) series.push({ name: 'Virgin compression line', points: lineOf(pacheco.virginLine, toY), colour: INK.pachecoSilva, line: { dash: 'long-dash', widthPx: 1 } });
    series.push({
      name: `σ′p Pacheco Silva ${pacheco.preconsolidationStressKpa.toFixed(0)} kPa`,
      points: [{ x: pacheco.pointC.stressKpa, y: toY(pacheco.pointC.voidRatio) }],
      colour: INK.pachecoSilva,
      marker: { shape: 'square-open', sizePx: 7 },
    });
  }
  const adopted = result.preconsolidation.adoptedKpa;
  if (adopted !== null) {
    const ys = result.increments.map((i) => (axis === 'voidRatio' ? i.voidRatioEnd : i.strainEnd * 100));
    const [low, high] = [Math.min(...ys), Math.max(...ys)];
    series.push({ name: `Adopted σ′p ${adopted.toFixed(0)} kPa`, points: [{ x: adopted, y: low }, { x: adopted, y: high }], colour: INK.adopted, line: { dash: 'solid', widthPx: 1.6 } });
    labels.push({ x: adopted, y: high, text: `adopted σ′p ${adopted.toFixed(0)} kPa` });
  }
  return renderChart({
    description:
      axis === 'voidRatio'
        ? 'Void ratio against effective stress on a log scale, with the Casagrande and Pacheco Silva constructions and the adopted preconsolidation stress'
        : 'Vertical strain against effective stress on a log scale, with the same constructions',
    widthPx: 680,
    heightPx: axis === 'voidRatio' ? 450 : 330,
    x: STRESS_AXIS,
    y: axis === 'voidRatio' ? { title: 'Void ratio e', scale: 'linear' } : { title: 'Vertical strain ε (%)', scale: 'linear', reversed: true },
    series,
    labels,
    legendColumns: 2,
  });
}

type Coefficient = { name: string; value: (i: ConsolidationIncrementResult) => number | null; shape: 'circle' | 'square-open' | 'diamond-open' | 'triangle-open'; dash: 'solid' | 'dash'; colour: string };

function coefficientChart(result: ConsolidationTestResult, title: string, log: boolean, description: string, coefficients: Coefficient[]): string {
  const loading = result.increments.filter((i) => i.kind !== 'unloading');
  return renderChart({
    description,
    widthPx: 330,
    heightPx: 250,
    x: { title: 'σ′ (kPa), log scale', scale: 'log' },
    y: { title, scale: log ? 'log' : 'linear' },
    series: coefficients.map((c) => ({
      name: c.name,
      points: loading.flatMap((i) => {
        const v = c.value(i);
        return v === null || !Number.isFinite(v) ? [] : [{ x: i.stressKpa, y: v }];
      }),
      colour: c.colour,
      line: { dash: c.dash, widthPx: 1 },
      marker: { shape: c.shape, sizePx: 5 },
    })),
    legendColumns: 2,
  });
}

/** cv by both methods, mv, k and Cα against stress (loading increments). */
export function coefficientCharts(result: ConsolidationTestResult): string[] {
  return [
    coefficientChart(result, 'cv (m²/yr)', true, 'Coefficient of consolidation against stress, by Taylor’s and Casagrande’s methods', [
      { name: 'cv Taylor (√t)', value: (i) => i.cvTaylorM2PerYr, shape: 'circle', dash: 'solid', colour: INK.casagrande },
      { name: 'cv Casagrande (log t)', value: (i) => i.cvCasagrandeM2PerYr, shape: 'square-open', dash: 'dash', colour: INK.pachecoSilva },
    ]),
    coefficientChart(result, 'mv (1/MPa)', true, 'Coefficient of volume compressibility against stress', [
      { name: 'mv', value: (i) => i.mvPerMPa, shape: 'circle', dash: 'solid', colour: INK.measured },
    ]),
    coefficientChart(result, 'k (m/s)', true, 'Hydraulic conductivity from cv·mv·γw against stress', [
      { name: 'k', value: (i) => i.hydraulicConductivityMPerS, shape: 'diamond-open', dash: 'solid', colour: INK.measured },
    ]),
    coefficientChart(result, 'Cα (–)', false, 'Secondary compression index against stress', [
      { name: 'Cα', value: (i) => i.secondaryCompressionIndex, shape: 'triangle-open', dash: 'solid', colour: INK.secondary },
    ]),
  ];
}

/** One increment's readings with Taylor's √t construction and Casagrande's log-t construction. */
export function timeCurveCharts(increment: ConsolidationIncrementResult, readings: readonly TimeDeformationReading[]): [string, string] {
  const deformation = { title: 'Deformation (mm)', scale: 'linear' as const, reversed: true };
  const taylor = increment.taylor;
  // Taylor's construction is read on the early part: show √t up to three times √t90.
  const rootLimit = taylor ? 3 * Math.sqrt(taylor.t90Min) : Infinity;
  const taylorSeries: ChartSeries[] = [
    { name: 'Readings', points: readings.filter((r) => Math.sqrt(r.elapsedMin) <= rootLimit).map((r) => ({ x: Math.sqrt(r.elapsedMin), y: r.deformationMm })), colour: INK.measured, marker: { shape: 'circle', sizePx: 2.4 } },
  ];
  if (taylor) {
    const root = (p: { timeMin: number; deformationMm: number }) => ({ x: Math.sqrt(p.timeMin), y: p.deformationMm });
    taylorSeries.push({ name: 'Early straight line', points: [root(taylor.initialLine.start), root(taylor.initialLine.end)], colour: INK.casagrande, line: { dash: 'dash' } });
    taylorSeries.push({ name: '1.15 × abscissae', points: [root(taylor.offsetLine.start), root(taylor.offsetLine.end)], colour: INK.pachecoSilva, line: { dash: 'dash-dot' } });
    taylorSeries.push({ name: `t90 ${taylor.t90Min.toPrecision(3)} min${taylor.t90Source === 'pick' ? ' (override)' : ''}`, points: [{ x: Math.sqrt(taylor.t90Min), y: taylor.d90Mm }], colour: INK.adopted, marker: { shape: 'diamond', sizePx: 7 } });
  }
  const casagrande = increment.casagrande;
  const positive = readings.filter((r) => r.elapsedMin > 0);
  const logSeries: ChartSeries[] = [
    { name: 'Readings', points: positive.map((r) => ({ x: r.elapsedMin, y: r.deformationMm })), colour: INK.measured, marker: { shape: 'circle', sizePx: 2.4 } },
  ];
  if (casagrande) {
    const at = (p: { timeMin: number; deformationMm: number }) => ({ x: p.timeMin, y: p.deformationMm });
    if (casagrande.tangentLine) logSeries.push({ name: 'Tangent at inflection', points: [at(casagrande.tangentLine.start), at(casagrande.tangentLine.end)], colour: INK.casagrande, line: { dash: 'dash' } });
    if (casagrande.secondaryLine) logSeries.push({ name: 'Secondary line', points: [at(casagrande.secondaryLine.start), at(casagrande.secondaryLine.end)], colour: INK.secondary, line: { dash: 'dash-dot' } });
    const times = positive.map((r) => r.elapsedMin);
    const span = times.length ? [Math.min(...times), Math.max(...times)] : [casagrande.t50Min / 10, casagrande.t50Min * 10];
    logSeries.push({ name: 'd0 and d100', points: span.map((x) => ({ x, y: casagrande.d0Mm })), colour: INK.secondary, line: { dash: 'dot' } });
    if (casagrande.d100Mm !== null) {
      const d100 = casagrande.d100Mm;
      logSeries.push({ name: '', points: span.map((x) => ({ x, y: d100 })), colour: INK.secondary, line: { dash: 'dot' }, hideInLegend: true });
    }
    logSeries.push({ name: `t50 ${casagrande.t50Min.toPrecision(3)} min${casagrande.t50Source === 'pick' ? ' (override)' : ''}`, points: [{ x: casagrande.t50Min, y: casagrande.d50Mm }], colour: INK.adopted, marker: { shape: 'diamond', sizePx: 7 } });
  }
  const label = `Increment ${increment.index} (${increment.stressKpa.toFixed(0)} kPa)`;
  return [
    renderChart({ description: `${label}: deformation against square root of time, Taylor’s construction`, widthPx: 330, heightPx: 240, x: { title: '√time (√min)', scale: 'linear' }, y: deformation, series: taylorSeries }),
    renderChart({ description: `${label}: deformation against log time, Casagrande’s construction`, widthPx: 330, heightPx: 240, x: { title: 'Time (min), log scale', scale: 'log' }, y: deformation, series: logSeries }),
  ];
}
