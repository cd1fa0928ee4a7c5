import type { ConsolidationTestResult } from '@porestack/types';
import { useMemo } from 'react';
import { PlotlyChart, type PlotLayout } from '../../../components/plot/plotly-chart';
import { coefficientTraces, compressionTraces, PLOT_COLOURS } from './plot-traces';

const LOG_STRESS = { title: { text: 'Effective vertical stress σ′ (kPa)' }, type: 'log' as const };

/**
 * The two plots of an issued result, read-only: e–log σ′ with where each method put σ′p and the
 * adopted σ′p drawn, and cv against stress by both time-curve methods (loading increments).
 */
export function IssuedCurves({ result }: { result: ConsolidationTestResult }) {
  const compression = useMemo(() => compressionTraces(result, 'voidRatio', { summary: true }), [result]);
  const cv = useMemo(
    () =>
      coefficientTraces(
        result.increments.filter((i) => i.kind !== 'unloading'),
        [
          { name: 'cv, Taylor (√t)', value: (i) => i.cvTaylorM2PerYr, colour: PLOT_COLOURS.casagrande },
          { name: 'cv, Casagrande (log t)', value: (i) => i.cvCasagrandeM2PerYr, colour: PLOT_COLOURS.pachecoSilva },
        ],
      ),
    [result],
  );
  const layouts = useMemo(
    () => ({
      compression: {
        xaxis: LOG_STRESS,
        yaxis: { title: { text: 'Void ratio e' } },
        hovermode: 'closest',
        legend: { orientation: 'h', y: -0.25 },
        margin: { l: 60, r: 16, t: 16, b: 90 },
      } satisfies Partial<PlotLayout>,
      cv: {
        xaxis: LOG_STRESS,
        yaxis: { title: { text: 'cv (m²/yr)' }, type: 'log', exponentformat: 'power' },
        hovermode: 'closest',
        legend: { orientation: 'h', y: -0.25 },
        margin: { l: 60, r: 16, t: 16, b: 90 },
      } satisfies Partial<PlotLayout>,
    }),
    [],
  );
  return (
    <div className="grid grid-cols-1 gap-6 xl:grid-cols-2">
      <figure>
        <PlotlyChart label="Void ratio against effective stress on a log scale, with the adopted preconsolidation stress" data={compression} layout={layouts.compression} heightPx={400} />
        <figcaption className="mt-1 text-xs text-slate-600">
          e–log σ′: the void ratio at the end of each load step. The soil is stiff until σ′p, then compresses along the steeper virgin line.
        </figcaption>
      </figure>
      <figure>
        <PlotlyChart label="Coefficient of consolidation against effective stress" data={cv} layout={layouts.cv} heightPx={400} />
        <figcaption className="mt-1 text-xs text-slate-600">cv against stress, from each load step’s time curve by both methods. Higher cv means faster settlement.</figcaption>
      </figure>
    </div>
  );
}
