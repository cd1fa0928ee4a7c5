import { useMemo } from 'react';
import { ErrorMessage } from '../../../components/error-message';
import { PlotlyChart, type PlotLayout } from '../../../components/plot/plotly-chart';
import { Select } from '../../../components/select';
import { LoadingBlock } from '../../../components/spinner';
import { useIncrementReadings } from '../api/get-increment-readings';
import type { ConsolidationTestResult } from '@porestack/types';
import { coefficientTraces, compressionTraces, logTimeTraces, PLOT_COLOURS, taylorTraces } from './plot-traces';

const LOG_STRESS = { title: { text: 'Effective vertical stress σ′ (kPa)' }, type: 'log' as const };

type Proposal = { preconsolidationStressKpa?: number; t90Min?: number; t50Min?: number };

/** e–log σ′ and ε–log σ′ with both σ′p constructions; a click on a point proposes σ′p there. */
export function CompressionPlots({ result, onPropose }: { result: ConsolidationTestResult; onPropose: (p: Proposal) => void }) {
  const voidRatio = useMemo(() => compressionTraces(result, 'voidRatio'), [result]);
  const strain = useMemo(() => compressionTraces(result, 'strain'), [result]);
  const eLayout = useMemo<Partial<PlotLayout>>(() => ({ xaxis: LOG_STRESS, yaxis: { title: { text: 'Void ratio e' } }, hovermode: 'closest' }), []);
  const sLayout = useMemo<Partial<PlotLayout>>(() => ({ xaxis: LOG_STRESS, yaxis: { title: { text: 'Strain ε (%)' }, autorange: 'reversed' }, hovermode: 'closest' }), []);
  return (
    <div className="grid gap-4 xl:grid-cols-2">
      <div>
        <PlotlyChart label="Void ratio against log stress, with the Casagrande and Pacheco Silva constructions" data={voidRatio} layout={eLayout} onPointClick={(p) => onPropose({ preconsolidationStressKpa: Math.round(p.x * 10) / 10 })} heightPx={420} />
        <p className="mt-1 text-xs text-slate-500">Click a point on the curve to propose σ′p there.</p>
      </div>
      <PlotlyChart label="Strain against log stress, with both constructions" data={strain} layout={sLayout} heightPx={420} />
    </div>
  );
}

/** Offsets of each increment's first reading in test order, from the analysis' reading counts. */
function readingOffsets(result: ConsolidationTestResult): Map<number, { offset: number; count: number }> {
  const offsets = new Map<number, { offset: number; count: number }>();
  let offset = 0;
  for (const increment of result.increments) {
    offsets.set(increment.index, { offset, count: increment.readingCount });
    offset += increment.readingCount;
  }
  return offsets;
}

const DEFORMATION_AXIS = { title: { text: 'Deformation (mm)' }, autorange: 'reversed' as const };
const TAYLOR_LAYOUT: Partial<PlotLayout> = { xaxis: { title: { text: '√time (√min)' } }, yaxis: DEFORMATION_AXIS, hovermode: 'closest' };
const LOG_TIME_LAYOUT: Partial<PlotLayout> = { xaxis: { title: { text: 'Time (min)' }, type: 'log' }, yaxis: DEFORMATION_AXIS, hovermode: 'closest' };

type TimePlotsProps = {
  orgId: string;
  testId: string;
  result: ConsolidationTestResult;
  incrementIndex: number;
  onIncrementChange: (index: number) => void;
  onPropose: (p: Proposal) => void;
};

/** One increment's deformation against √t (Taylor) and log t (Casagrande); clicks propose t90 or t50. */
export function TimePlots({ orgId, testId, result, incrementIndex, onIncrementChange, onPropose }: TimePlotsProps) {
  const increment = result.increments.find((i) => i.index === incrementIndex) ?? result.increments[0];
  const where = increment ? readingOffsets(result).get(increment.index) : undefined;
  const readings = useIncrementReadings(orgId, testId, increment?.index ?? -1, where?.offset ?? 0, where?.count ?? 0);
  const taylor = useMemo(() => (increment && readings.data ? taylorTraces(increment, readings.data) : []), [increment, readings.data]);
  const logTime = useMemo(() => (increment && readings.data ? logTimeTraces(increment, readings.data) : []), [increment, readings.data]);
  if (!increment) return <p className="text-sm text-slate-600">The analysis has no increments to draw.</p>;
  return (
    <div className="space-y-3">
      <Select
        label="Increment"
        className="w-72"
        options={result.increments.map((i) => ({ value: String(i.index), label: `${i.index}: ${i.stressKpa.toFixed(0)} kPa (${i.kind}, ${i.readingCount} readings)` }))}
        value={String(increment.index)}
        onChange={(e) => onIncrementChange(Number(e.target.value))}
      />
      {readings.isPending ? (
        <LoadingBlock label="Loading the increment's readings…" />
      ) : readings.error ? (
        <ErrorMessage error={readings.error} title="The readings for this increment could not be loaded" onRetry={() => void readings.refetch()} />
      ) : (
        <div className="grid gap-4 xl:grid-cols-2">
          <div>
            <PlotlyChart label={`Increment ${increment.index}: deformation against square root of time, Taylor construction`} data={taylor} layout={TAYLOR_LAYOUT} onPointClick={(p) => onPropose({ t90Min: Math.round(p.x * p.x * 1000) / 1000 })} />
            <p className="mt-1 text-xs text-slate-500">Click a reading to propose t90 at its time.</p>
          </div>
          <div>
            <PlotlyChart label={`Increment ${increment.index}: deformation against log time, Casagrande construction`} data={logTime} layout={LOG_TIME_LAYOUT} onPointClick={(p) => onPropose({ t50Min: Math.round(p.x * 1000) / 1000 })} />
            <p className="mt-1 text-xs text-slate-500">Click a reading to propose t50 at its time.</p>
          </div>
        </div>
      )}
    </div>
  );
}

/** cv, mv, k and Cα against stress, on the axes the trade reads them on. */
export function CoefficientPlots({ result }: { result: ConsolidationTestResult }) {
  const loading = useMemo(() => result.increments.filter((i) => i.kind !== 'unloading'), [result]);
  const cv = useMemo(
    () =>
      coefficientTraces(loading, [
        { name: 'cv Taylor', value: (i) => i.cvTaylorM2PerYr, colour: PLOT_COLOURS.casagrande },
        { name: 'cv Casagrande', value: (i) => i.cvCasagrandeM2PerYr, colour: PLOT_COLOURS.pachecoSilva },
      ]),
    [loading],
  );
  const mv = useMemo(() => coefficientTraces(loading, [{ name: 'mv', value: (i) => i.mvPerMPa, colour: PLOT_COLOURS.measured }]), [loading]);
  const k = useMemo(() => coefficientTraces(loading, [{ name: 'k', value: (i) => i.hydraulicConductivityMPerS, colour: PLOT_COLOURS.adopted }]), [loading]);
  const ca = useMemo(() => coefficientTraces(loading, [{ name: 'Cα', value: (i) => i.secondaryCompressionIndex, colour: PLOT_COLOURS.secondary }]), [loading]);
  const layout = (title: string, logY: boolean): Partial<PlotLayout> => ({ xaxis: LOG_STRESS, yaxis: { title: { text: title }, ...(logY ? { type: 'log' as const, exponentformat: 'power' as const } : {}) }, showlegend: !logY || title.startsWith('cv'), legend: { orientation: 'h', y: -0.38 }, margin: { l: 64, r: 16, t: 24, b: 76 }, height: 320 });
  const layouts = useMemo(
    () => ({ cv: layout('cv (m²/yr)', true), mv: layout('mv (1/MPa)', false), k: layout('k (m/s)', true), ca: layout('Cα (–)', false) }),
    [],
  );
  return (
    <div className="grid gap-4 lg:grid-cols-2">
      <PlotlyChart label="Coefficient of consolidation against stress" data={cv} layout={layouts.cv} heightPx={300} />
      <PlotlyChart label="Coefficient of volume compressibility against stress" data={mv} layout={layouts.mv} heightPx={300} />
      <PlotlyChart label="Hydraulic conductivity against stress" data={k} layout={layouts.k} heightPx={300} />
      <PlotlyChart label="Secondary compression index against stress" data={ca} layout={layouts.ca} heightPx={300} />
    </div>
  );
}

export type { Proposal };
