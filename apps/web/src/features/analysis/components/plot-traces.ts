import type { PlotData } from '../../../components/plot/plotly-chart';
import type { ConsolidationIncrementResult, ConsolidationTestResult, StressVoidRatioLine, StressVoidRatioPoint, TimeCurvePoint } from '@porestack/types';

/** Colours used on every plot, so a construction looks the same wherever it appears. */
export const PLOT_COLOURS = {
  measured: '#0f172a',
  casagrande: '#1a6d63',
  pachecoSilva: '#b45309',
  adopted: '#7c3aed',
  pick: '#dc2626',
  secondary: '#64748b',
} as const;

export type CompressionAxis = 'voidRatio' | 'strain';

/** Strain (per cent) at a void ratio, exact for one-dimensional compression: ε = (e0 − e)/(1 + e0). */
export function strainPercentAt(voidRatio: number, initialVoidRatio: number): number {
  return ((initialVoidRatio - voidRatio) / (1 + initialVoidRatio)) * 100;
}

function line(name: string, points: readonly StressVoidRatioPoint[], toY: (e: number) => number, colour: string, dash: 'solid' | 'dash' | 'dot' = 'dash', showlegend = true, legendgroup?: string): PlotData {
  return {
    type: 'scatter',
    mode: 'lines',
    name,
    x: points.map((p) => p.stressKpa),
    y: points.map((p) => toY(p.voidRatio)),
    line: { color: colour, dash, width: 1.5 },
    hoverinfo: 'skip',
    showlegend,
    ...(legendgroup ? { legendgroup } : {}),
  };
}

const ends = (l: StressVoidRatioLine): StressVoidRatioPoint[] => [l.start, l.end];

/**
 * The e–log σ′ (or ε–log σ′) curve with both preconsolidation constructions drawn from the
 * geometry the analysis returned, never re-derived here, so the plot shows what was computed.
 * `summary`: for a reader of the issued result — the curve, where each method put σ′p, and the
 * adopted σ′p always drawn as a line, without the construction lines.
 */
export function compressionTraces(result: ConsolidationTestResult, axis: CompressionAxis, { summary = false }: { summary?: boolean } = {}): PlotData[] {
  const e0 = result.initialVoidRatio;
  const toY = axis === 'voidRatio' ? (e: number) => e : (e: number) => strainPercentAt(e, e0);
  const traces: PlotData[] = [];
  const increments = result.increments;
  traces.push({
    type: 'scatter',
    mode: 'lines+markers',
    name: 'Test (end of each increment)',
    x: increments.map((i) => i.stressKpa),
    y: increments.map((i) => (axis === 'voidRatio' ? i.voidRatioEnd : i.strainEnd * 100)),
    text: increments.map((i) => `Increment ${i.index} (${i.kind})`),
    line: { color: PLOT_COLOURS.measured, width: 1 },
    marker: { size: 7, color: PLOT_COLOURS.measured },
    hovertemplate: '%{text}<br>σ′ %{x:.1f} kPa<br>%{y:.4f}<extra></extra>',
  });

  const casagrande = result.preconsolidation.casagrande;
  if (casagrande && summary) {
    traces.push(methodMark(`σ′p Casagrande ${casagrande.preconsolidationStressKpa.toFixed(0)} kPa`, casagrande.intersection, toY, PLOT_COLOURS.casagrande, 'diamond'));
  } else if (casagrande) {
    const group = 'casagrande';
    traces.push(line('Casagrande construction', casagrande.interpolant, toY, PLOT_COLOURS.casagrande, 'dot', true, group));
    traces.push(line('Casagrande: horizontal', ends(casagrande.horizontalLine), toY, PLOT_COLOURS.casagrande, 'dash', false, group));
    traces.push(line('Casagrande: tangent', ends(casagrande.tangentLine), toY, PLOT_COLOURS.casagrande, 'dash', false, group));
    traces.push(line('Casagrande: bisector', ends(casagrande.bisectorLine), toY, PLOT_COLOURS.casagrande, 'dash', false, group));
    traces.push(line('Casagrande: virgin line', ends(casagrande.virginLine), toY, PLOT_COLOURS.casagrande, 'solid', false, group));
    traces.push({
      type: 'scatter',
      mode: 'markers',
      name: `σ′p Casagrande ${casagrande.preconsolidationStressKpa.toFixed(0)} kPa`,
      x: [casagrande.maximumCurvaturePoint.stressKpa, casagrande.intersection.stressKpa],
      y: [toY(casagrande.maximumCurvaturePoint.voidRatio), toY(casagrande.intersection.voidRatio)],
      marker: { size: [8, 11], symbol: ['circle-open', 'diamond'], color: PLOT_COLOURS.casagrande },
      legendgroup: group,
      hovertemplate: '%{x:.1f} kPa<extra>Casagrande</extra>',
    });
  }

  const pacheco = result.preconsolidation.pachecoSilva;
  if (pacheco && summary) {
    traces.push(methodMark(`σ′p Pacheco Silva ${pacheco.preconsolidationStressKpa.toFixed(0)} kPa`, pacheco.pointC, toY, PLOT_COLOURS.pachecoSilva, 'square'));
  } else if (pacheco) {
    const group = 'pacheco';
    traces.push(line('Pacheco Silva construction', ends(pacheco.initialVoidRatioLine), toY, PLOT_COLOURS.pachecoSilva, 'dash', true, group));
    traces.push(line('Pacheco Silva: virgin line', ends(pacheco.virginLine), toY, PLOT_COLOURS.pachecoSilva, 'solid', false, group));
    traces.push(line('Pacheco Silva: vertical', ends(pacheco.verticalLine), toY, PLOT_COLOURS.pachecoSilva, 'dash', false, group));
    traces.push(line('Pacheco Silva: horizontal', ends(pacheco.horizontalLine), toY, PLOT_COLOURS.pachecoSilva, 'dash', false, group));
    traces.push({
      type: 'scatter',
      mode: 'markers',
      name: `σ′p Pacheco Silva ${pacheco.preconsolidationStressKpa.toFixed(0)} kPa`,
      x: [pacheco.pointA.stressKpa, pacheco.pointB.stressKpa, pacheco.pointC.stressKpa],
      y: [toY(pacheco.pointA.voidRatio), toY(pacheco.pointB.voidRatio), toY(pacheco.pointC.voidRatio)],
      marker: { size: [7, 7, 11], symbol: ['circle-open', 'circle-open', 'square'], color: PLOT_COLOURS.pachecoSilva },
      legendgroup: group,
      hovertemplate: '%{x:.1f} kPa<extra>Pacheco Silva</extra>',
    });
  }

  const adopted = result.preconsolidation.adoptedKpa;
  if (adopted !== null && (summary || result.preconsolidation.adoptedFrom === 'pick')) {
    const ys = increments.map((i) => (axis === 'voidRatio' ? i.voidRatioEnd : i.strainEnd * 100));
    const low = Math.min(...ys);
    const high = Math.max(...ys);
    traces.push({
      type: 'scatter',
      mode: 'lines',
      name: result.preconsolidation.adoptedFrom === 'pick' ? `σ′p picked ${adopted.toFixed(0)} kPa` : `σ′p adopted ${adopted.toFixed(0)} kPa`,
      x: [adopted, adopted],
      y: [low, high],
      line: { color: result.preconsolidation.adoptedFrom === 'pick' ? PLOT_COLOURS.pick : PLOT_COLOURS.adopted, width: 2 },
      hoverinfo: 'skip',
    });
  }
  return traces;
}

/** Where one method put σ′p, as a single marker (the summary plot's stand-in for its construction). */
function methodMark(name: string, point: StressVoidRatioPoint, toY: (e: number) => number, colour: string, symbol: 'diamond' | 'square'): PlotData {
  return {
    type: 'scatter',
    mode: 'markers',
    name,
    x: [point.stressKpa],
    y: [toY(point.voidRatio)],
    marker: { size: 11, symbol, color: colour },
    hovertemplate: '%{x:.1f} kPa<extra></extra>',
  };
}

/** Readings of one increment at t > 0 (t = 0 cannot sit on a log axis; √0 is fine). */
function positiveTimes(readings: readonly TimeCurvePoint[]): TimeCurvePoint[] {
  return readings.filter((r) => r.timeMin > 0);
}

/** Taylor's √t plot: readings, the early straight line, the 1.15× line, t90 (marked red when picked). */
export function taylorTraces(increment: ConsolidationIncrementResult, readings: readonly TimeCurvePoint[]): PlotData[] {
  const traces: PlotData[] = [
    {
      type: 'scatter',
      mode: 'markers',
      name: 'Readings',
      x: readings.map((r) => Math.sqrt(r.timeMin)),
      y: readings.map((r) => r.deformationMm),
      marker: { size: 5, color: PLOT_COLOURS.measured },
      hovertemplate: '√t %{x:.2f} (t %{customdata:.2f} min)<br>%{y:.4f} mm<extra></extra>',
      customdata: readings.map((r) => r.timeMin),
    },
  ];
  const taylor = increment.taylor;
  if (!taylor) return traces;
  const sqrt = (l: { start: TimeCurvePoint; end: TimeCurvePoint }) => ({ x: [Math.sqrt(l.start.timeMin), Math.sqrt(l.end.timeMin)], y: [l.start.deformationMm, l.end.deformationMm] });
  traces.push({ type: 'scatter', mode: 'lines', name: 'Early straight line', ...sqrt(taylor.initialLine), line: { color: PLOT_COLOURS.casagrande, dash: 'dash' }, hoverinfo: 'skip' });
  traces.push({ type: 'scatter', mode: 'lines', name: '1.15 × abscissae', ...sqrt(taylor.offsetLine), line: { color: PLOT_COLOURS.pachecoSilva, dash: 'dash' }, hoverinfo: 'skip' });
  const picked = taylor.t90Source === 'pick';
  traces.push({
    type: 'scatter',
    mode: 'markers',
    name: `t90 ${taylor.t90Min.toFixed(2)} min${picked ? ' (picked)' : ''}`,
    x: [Math.sqrt(taylor.t90Min)],
    y: [taylor.d90Mm],
    marker: { size: 12, symbol: 'diamond', color: picked ? PLOT_COLOURS.pick : PLOT_COLOURS.casagrande },
    hovertemplate: 't90 %{customdata:.2f} min<extra></extra>',
    customdata: [taylor.t90Min],
  });
  return traces;
}

/** Casagrande's log-t plot: readings, the tangent and secondary lines, d0, d50 and d100 with t50. */
export function logTimeTraces(increment: ConsolidationIncrementResult, readings: readonly TimeCurvePoint[]): PlotData[] {
  const shown = positiveTimes(readings);
  const traces: PlotData[] = [
    {
      type: 'scatter',
      mode: 'markers',
      name: 'Readings',
      x: shown.map((r) => r.timeMin),
      y: shown.map((r) => r.deformationMm),
      marker: { size: 5, color: PLOT_COLOURS.measured },
      hovertemplate: 't %{x:.2f} min<br>%{y:.4f} mm<extra></extra>',
    },
  ];
  const construction = increment.casagrande;
  if (!construction) return traces;
  const xy = (l: { start: TimeCurvePoint; end: TimeCurvePoint }) => ({ x: [l.start.timeMin, l.end.timeMin], y: [l.start.deformationMm, l.end.deformationMm] });
  if (construction.tangentLine) {
    traces.push({ type: 'scatter', mode: 'lines', name: 'Tangent at inflection', ...xy(construction.tangentLine), line: { color: PLOT_COLOURS.casagrande, dash: 'dash' }, hoverinfo: 'skip' });
  }
  if (construction.secondaryLine) {
    traces.push({ type: 'scatter', mode: 'lines', name: 'Secondary line', ...xy(construction.secondaryLine), line: { color: PLOT_COLOURS.secondary, dash: 'dash' }, hoverinfo: 'skip' });
  }
  const times = shown.map((r) => r.timeMin);
  const span = times.length > 0 ? [Math.min(...times), Math.max(...times)] : [construction.t50Min / 10, construction.t50Min * 10];
  const level = (name: string, value: number | null, colour: string) =>
    value === null
      ? []
      : [{ type: 'scatter', mode: 'lines', name, x: span, y: [value, value], line: { color: colour, dash: 'dot', width: 1 }, hoverinfo: 'skip' } satisfies PlotData];
  traces.push(...level(`d0 ${construction.d0Mm.toFixed(3)} mm`, construction.d0Mm, PLOT_COLOURS.secondary));
  traces.push(...level(`d100 ${construction.d100Mm?.toFixed(3) ?? ''} mm`, construction.d100Mm, PLOT_COLOURS.secondary));
  const picked = construction.t50Source === 'pick';
  traces.push({
    type: 'scatter',
    mode: 'markers',
    name: `t50 ${construction.t50Min.toFixed(2)} min${picked ? ' (picked)' : ''}`,
    x: [construction.t50Min],
    y: [construction.d50Mm],
    marker: { size: 12, symbol: 'diamond', color: picked ? PLOT_COLOURS.pick : PLOT_COLOURS.pachecoSilva },
    hovertemplate: 't50 %{x:.2f} min<extra></extra>',
  });
  return traces;
}

type CoefficientSeries = { name: string; value: (i: ConsolidationIncrementResult) => number | null; colour: string };

/** One parameter per increment against the increment's stress, leaving out increments without a value. */
export function coefficientTraces(increments: readonly ConsolidationIncrementResult[], series: readonly CoefficientSeries[]): PlotData[] {
  return series.map((s) => {
    const points = increments.flatMap((i) => {
      const value = s.value(i);
      return value === null || !Number.isFinite(value) ? [] : [{ x: i.stressKpa, y: value, index: i.index }];
    });
    return {
      type: 'scatter',
      mode: 'lines+markers',
      name: s.name,
      x: points.map((p) => p.x),
      y: points.map((p) => p.y),
      text: points.map((p) => `Increment ${p.index}`),
      marker: { size: 7, color: s.colour },
      line: { color: s.colour, width: 1 },
      hovertemplate: '%{text}<br>σ′ %{x:.1f} kPa<br>%{y:.3e}<extra></extra>',
    } satisfies PlotData;
  });
}
