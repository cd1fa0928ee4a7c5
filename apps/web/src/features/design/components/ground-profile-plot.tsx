import type { GroundModelContent, StressProfile } from '@porestack/types';
import { useMemo } from 'react';
import { PlotlyChart, type PlotData, type PlotLayout } from '../../../components/plot/plotly-chart';

const LAYER_FILL = { granular: '#f2e3bf', compressible: '#c9d6e3' } as const;

/**
 * The ground model drawn to scale: the layers as bands with the water table (left), and σv, u,
 * σ′v0 and the σ′p the check uses against depth, with the samples behind the layers (right).
 */
export function GroundProfilePlot({ content, profile }: { content: GroundModelContent; profile: StressProfile }) {
  const { data, layout } = useMemo(() => build(content, profile), [content, profile]);
  return <PlotlyChart data={data} layout={layout} heightPx={520} label="Ground model to scale with the water table, and total, pore and effective stress and σ′p against depth, with the samples marked" />;
}

function build(content: GroundModelContent, profile: StressProfile): { data: PlotData[]; layout: Partial<PlotLayout> } {
  const bottomM = content.layers.at(-1)?.bottomDepthM ?? 1;
  const line = (name: string, key: 'totalStressKpa' | 'porePressureKpa' | 'effectiveStressKpa' | 'preconsolidationKpa', color: string, dash?: string): PlotData =>
    ({
      type: 'scatter',
      mode: 'lines',
      name,
      x: profile.points.map((p) => p[key]),
      y: profile.points.map((p) => p.depthM),
      xaxis: 'x2',
      yaxis: 'y',
      line: { color, width: 2, ...(dash ? { dash } : {}) },
      connectgaps: false,
    }) as PlotData;
  const data: PlotData[] = [
    line('σv (total)', 'totalStressKpa', '#475569'),
    line('u (pore water)', 'porePressureKpa', '#2563eb', 'dot'),
    line('σ′v0 (effective)', 'effectiveStressKpa', '#0f766e'),
    line('σ′p used', 'preconsolidationKpa', '#b45309', 'dash'),
    {
      type: 'scatter',
      mode: 'markers',
      name: 'samples (σ′p at their depth)',
      x: profile.samples.map((s) => s.preconsolidationKpa ?? 0),
      y: profile.samples.map((s) => s.depthM),
      text: profile.samples.map((s) => s.label),
      hovertemplate: '%{text}<br>%{y:.2f} m, σ′p %{x:.0f} kPa<extra></extra>',
      xaxis: 'x2',
      yaxis: 'y',
      marker: { color: '#b45309', size: 9, symbol: 'diamond' },
    } as PlotData,
    {
      type: 'scatter',
      mode: 'markers',
      name: 'sample depths',
      showlegend: false,
      x: profile.samples.map(() => 0.5),
      y: profile.samples.map((s) => s.depthM),
      text: profile.samples.map((s) => s.label),
      hovertemplate: '%{text}<br>%{y:.2f} m<extra></extra>',
      xaxis: 'x',
      yaxis: 'y',
      marker: { color: '#1e293b', size: 8, symbol: 'triangle-right' },
    } as PlotData,
  ];
  const shapes: NonNullable<PlotLayout['shapes']> = content.layers.map((layer) => ({
    type: 'rect',
    xref: 'x',
    yref: 'y',
    x0: 0,
    x1: 1,
    y0: layer.topDepthM,
    y1: layer.bottomDepthM,
    fillcolor: LAYER_FILL[layer.kind],
    line: { color: '#64748b', width: 1 },
    layer: 'below',
  }));
  shapes.push({ type: 'line', xref: 'x', yref: 'y', x0: 0, x1: 1, y0: content.waterTableDepthM, y1: content.waterTableDepthM, line: { color: '#2563eb', width: 2, dash: 'dash' } });
  const annotations: NonNullable<PlotLayout['annotations']> = content.layers.map((layer) => ({
    xref: 'x',
    yref: 'y',
    x: 0.5,
    y: (layer.topDepthM + layer.bottomDepthM) / 2,
    text: layer.name,
    showarrow: false,
    font: { size: 10, color: '#1e293b' },
  }));
  annotations.push({ xref: 'x', yref: 'y', x: 0, y: content.waterTableDepthM, xanchor: 'right', yanchor: 'middle', text: '▽ WT', showarrow: false, font: { size: 10, color: '#1d4ed8' } });
  return {
    data,
    layout: {
      showlegend: true,
      xaxis: { domain: [0, 0.22], range: [0, 1], showticklabels: false, showgrid: false, zeroline: false, fixedrange: true },
      xaxis2: { domain: [0.3, 1], title: { text: 'stress (kPa)' }, rangemode: 'tozero', side: 'top' },
      yaxis: { title: { text: 'depth below ground (m)' }, range: [bottomM, 0], zeroline: false },
      margin: { l: 64, r: 16, t: 48, b: 24 },
      legend: { orientation: 'h', y: -0.06 },
      shapes,
      annotations,
    },
  };
}
