import type { SublayerSettlementRow } from '@porestack/types';
import { useMemo } from 'react';
import { PlotlyChart, type PlotData, type PlotLayout } from '../../../components/plot/plotly-chart';
import { formatMm, formatNumber, formatYears } from './design-format';
import { TableHead } from './table-head';

/** What a footing (or a uniform load) reports below its centre. */
export interface SettlementBelowPoint {
  label: string;
  immediateM: number;
  primaryM: number;
  secondaryM: number;
  totalM: number;
  timeTo50PercentYears: number | null;
  timeTo90PercentYears: number | null;
  sublayers: readonly SublayerSettlementRow[];
  timeCurve: ReadonlyArray<{ timeYears: number; settlementM: number }>;
  primaryByLayer: ReadonlyArray<{ layerIndex: number; primarySettlementM: number }>;
}

const CASE_WORDS: Record<SublayerSettlementRow['consolidationCase'], string> = {
  'normally-consolidated': 'NC',
  'overconsolidated-below': 'OC, stays below σ′p',
  'overconsolidated-crossing': 'OC, passes σ′p',
  'volume-compressibility': 'mv',
};

/** Settlement against time, stress increase and σ′ against depth, and every sublayer of one point. */
export function SettlementDetail({ point, layerNames }: { point: SettlementBelowPoint; layerNames: ReadonlyMap<number, string> }) {
  const time = useMemo(() => timePlot(point), [point]);
  const depth = useMemo(() => depthPlot(point), [point]);
  return (
    <div className="space-y-4">
      <dl className="grid grid-cols-2 gap-3 text-sm sm:grid-cols-4 lg:grid-cols-7" aria-label={`Settlement of ${point.label}`}>
        {(
          [
            ['Immediate', `${formatMm(point.immediateM)} mm`],
            ['Primary', `${formatMm(point.primaryM)} mm`],
            ['Secondary', `${formatMm(point.secondaryM)} mm`],
            ['Total', `${formatMm(point.totalM)} mm`],
            ['50 % of primary', formatYears(point.timeTo50PercentYears)],
            ['90 % of primary', formatYears(point.timeTo90PercentYears)],
          ] as const
        ).map(([term, value]) => (
          <div key={term} className="rounded-md border border-slate-200 px-3 py-2">
            <dt className="text-xs text-slate-500">{term}</dt>
            <dd className="font-semibold text-slate-900" data-testid={`detail-${term.toLowerCase().replace(/[^a-z0-9]+/g, '-')}`}>
              {value}
            </dd>
          </div>
        ))}
        <div className="rounded-md border border-slate-200 px-3 py-2">
          <dt className="text-xs text-slate-500">Primary by layer</dt>
          <dd className="text-xs text-slate-800">{point.primaryByLayer.map((l) => `${layerNames.get(l.layerIndex) ?? l.layerIndex}: ${formatMm(l.primarySettlementM)} mm`).join('; ') || '—'}</dd>
        </div>
      </dl>
      <div className="grid gap-4 lg:grid-cols-2">
        <PlotlyChart data={time.data} layout={time.layout} heightPx={320} label={`Settlement of ${point.label} against time`} />
        <PlotlyChart data={depth.data} layout={depth.layout} heightPx={320} label={`Stress increase and effective stress against depth below ${point.label}`} />
      </div>
      <div className="overflow-x-auto">
        <table className="w-full text-left text-sm">
          <caption className="sr-only">Sublayers below {point.label}</caption>
          <TableHead cellClassName="px-2 py-2" headings={['Layer', 'Mid-depth (m)', 'Thickness (m)', 'σ′v0 (kPa)', 'σ′p (kPa)', 'Δσ own (kPa)', 'Δσ neighbours (kPa)', 'Case', 'Primary (mm)', 'Secondary (mm)']} />
          <tbody>
            {point.sublayers.map((row) => (
              <tr key={`${row.layerIndex}-${row.midDepthM}`} className="border-t border-slate-100">
                <td className="whitespace-nowrap px-2 py-1">{row.layerName}</td>
                <td className="px-2 py-1">{row.midDepthM.toFixed(2)}</td>
                <td className="px-2 py-1">{row.thicknessM.toFixed(2)}</td>
                <td className="px-2 py-1">{formatNumber(row.initialEffectiveStressKpa)}</td>
                <td className="px-2 py-1">{formatNumber(row.preconsolidationKpa)}</td>
                <td className="px-2 py-1">{formatNumber(row.ownStressIncreaseKpa)}</td>
                <td className="px-2 py-1">{formatNumber(row.neighboursStressIncreaseKpa)}</td>
                <td className="whitespace-nowrap px-2 py-1">{CASE_WORDS[row.consolidationCase]}</td>
                <td className="px-2 py-1">{formatMm(row.primarySettlementM, 2)}</td>
                <td className="px-2 py-1">{row.secondarySettlementM === null ? 'not dated' : formatMm(row.secondarySettlementM, 2)}</td>
              </tr>
            ))}
          </tbody>
        </table>
      </div>
    </div>
  );
}

function timePlot(point: SettlementBelowPoint): { data: PlotData[]; layout: Partial<PlotLayout> } {
  const curve = point.timeCurve.filter((p) => p.timeYears > 0);
  return {
    data: [
      { type: 'scatter', mode: 'lines', name: 'immediate + primary', x: curve.map((p) => p.timeYears), y: curve.map((p) => p.settlementM * 1000), line: { color: '#0f766e', width: 2 } } as PlotData,
      {
        type: 'scatter',
        mode: 'markers',
        name: 'total with secondary at the design life',
        x: [curve.at(-1)?.timeYears ?? 100],
        y: [point.totalM * 1000],
        marker: { color: '#b45309', size: 9, symbol: 'diamond' },
      } as PlotData,
    ],
    layout: {
      xaxis: { type: 'log', title: { text: 'time after loading (years)' } },
      yaxis: { title: { text: 'settlement (mm)' }, autorange: 'reversed' },
    },
  };
}

function depthPlot(point: SettlementBelowPoint): { data: PlotData[]; layout: Partial<PlotLayout> } {
  const rows = point.sublayers;
  const depth = rows.map((r) => r.midDepthM);
  const line = (name: string, values: number[], color: string, dash?: string) =>
    ({ type: 'scatter', mode: 'lines+markers', name, x: values, y: depth, line: { color, width: 2, ...(dash ? { dash } : {}) }, marker: { size: 4 } }) as PlotData;
  return {
    data: [
      line('Δσ', rows.map((r) => r.stressIncreaseKpa), '#2563eb'),
      line('σ′v0', rows.map((r) => r.initialEffectiveStressKpa), '#0f766e'),
      line('σ′v0 + Δσ', rows.map((r) => r.initialEffectiveStressKpa + r.stressIncreaseKpa), '#0f766e', 'dot'),
      line('σ′p', rows.map((r) => r.preconsolidationKpa), '#b45309', 'dash'),
    ],
    layout: { xaxis: { title: { text: 'stress (kPa)' }, rangemode: 'tozero' }, yaxis: { title: { text: 'depth (m)' }, autorange: 'reversed' } },
  };
}
