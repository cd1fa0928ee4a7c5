import { SET_PARAMETER_LABELS, type AdoptedValue, type SetMember, type SetParameter } from '@porestack/types';
import { useMemo } from 'react';
import { PlotlyChart, type PlotData, type PlotLayout } from '../../../components/plot/plotly-chart';

const PANELS: Array<{ key: SetParameter | 'preconsolidationKpa'; label: string; log?: boolean }> = [
  { key: 'e0', label: SET_PARAMETER_LABELS.e0 },
  { key: 'cc', label: SET_PARAMETER_LABELS.cc },
  { key: 'cr', label: SET_PARAMETER_LABELS.cr },
  { key: 'cs', label: SET_PARAMETER_LABELS.cs },
  { key: 'preconsolidationKpa', label: 'σ′p (kPa)' },
  { key: 'ocr', label: SET_PARAMETER_LABELS.ocr },
  { key: 'cvM2PerYr', label: SET_PARAMETER_LABELS.cvM2PerYr, log: true },
  { key: 'cAlpha', label: SET_PARAMETER_LABELS.cAlpha },
];

/** Each parameter (and σ′p, OCR) of the set's members against depth, with the adopted value as a line. */
export function SetDepthPlots({ members, adopted }: { members: readonly SetMember[]; adopted: Partial<Record<SetParameter, AdoptedValue>> }) {
  const { data, layout } = useMemo(() => {
    const depths = members.map((m) => m.depthM);
    const maxDepth = Math.max(1, ...depths) * 1.1;
    const columns = 4;
    const width = 1 / columns;
    const data: PlotData[] = [];
    const layout: Partial<PlotLayout> = { showlegend: false, margin: { l: 56, r: 12, t: 28, b: 40 }, annotations: [] };
    PANELS.forEach((panel, index) => {
      const row = Math.floor(index / columns);
      const column = index % columns;
      const axis = index === 0 ? '' : String(index + 1);
      const x0 = column * width + 0.04;
      const y1 = 1 - row * 0.52;
      data.push({
        type: 'scatter',
        mode: 'markers',
        x: members.map((m) => m.values[panel.key]),
        y: depths,
        text: members.map((m) => `${m.boreholeName} ${m.sampleReference} v${m.version}`),
        hovertemplate: `%{text}<br>%{y:.2f} m: ${panel.label} %{x:.3g}<extra></extra>`,
        xaxis: `x${axis}`,
        yaxis: `y${axis}`,
        marker: { color: '#0f766e', size: 8 },
      } as PlotData);
      const value = panel.key === 'preconsolidationKpa' ? null : (adopted[panel.key]?.value ?? null);
      if (value !== null) {
        data.push({ type: 'scatter', mode: 'lines', x: [value, value], y: [0, maxDepth], xaxis: `x${axis}`, yaxis: `y${axis}`, line: { color: '#b45309', dash: 'dash' }, hoverinfo: 'skip' } as PlotData);
      }
      const layoutRecord = layout as Record<string, unknown>;
      // The range holds the points and the adopted value, with a margin, so the dashed line never sits on the frame.
      const shown = [...members.map((m) => m.values[panel.key]), value].filter((v): v is number => v !== null && (!panel.log || v > 0));
      const low = Math.min(...shown);
      const high = Math.max(...shown);
      const pad = (high - low || Math.abs(high) || 1) * 0.15;
      const range = shown.length === 0 ? undefined : panel.log ? [Math.log10(low) - 0.1, Math.log10(high) + 0.1] : [low - pad, high + pad];
      layoutRecord[`xaxis${axis}`] = { domain: [x0, x0 + width - 0.07], type: panel.log ? 'log' : 'linear', anchor: `y${axis}`, tickfont: { size: 10 }, nticks: 4, ...(range ? { range } : {}) };
      layoutRecord[`yaxis${axis}`] = { domain: [y1 - 0.4, y1], range: [maxDepth, 0], anchor: `x${axis}`, title: column === 0 ? { text: 'depth (m)' } : undefined, tickfont: { size: 10 } };
      (layout.annotations as NonNullable<PlotLayout['annotations']>).push({ text: panel.label, xref: 'paper', yref: 'paper', x: x0 + (width - 0.07) / 2, y: y1 + 0.04, showarrow: false, font: { size: 12 } });
    });
    return { data, layout };
  }, [members, adopted]);
  return <PlotlyChart data={data} layout={layout} heightPx={520} label="Each parameter of the set's records against depth, with the adopted value dashed" />;
}
