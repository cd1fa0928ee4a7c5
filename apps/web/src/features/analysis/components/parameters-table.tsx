import type { ReactNode } from 'react';
import type { ConsolidationTestResult, ConsolidationWarning } from '@porestack/types';
import { formatParameter, warningFor } from './format-parameter';

type Row = {
  label: ReactNode;
  symbol: string;
  value: number | null;
  unit: string;
  digits?: number;
  picked?: boolean;
  codes: readonly string[];
  note?: string;
};

function PickedMark() {
  return (
    <span className="ml-2 rounded bg-red-50 px-1.5 py-0.5 text-[11px] font-medium text-red-700" title="Set by a person, not found by the method">
      picked
    </span>
  );
}

/** One parameter: its number with unit, or '—' and why there is none. */
export function ParameterCell({ value, digits, scientific, warning, picked, compact = false }: { value: number | null; digits?: number; scientific?: boolean; warning?: ConsolidationWarning | null; picked?: boolean; compact?: boolean }) {
  const formatted = formatParameter(value, { ...(digits === undefined ? {} : { digits }), ...(scientific ? { scientific } : {}) }, warning);
  if (compact && formatted.reason) {
    // In a dense table the reason goes in a tooltip and for screen readers; the warnings list says it in full.
    return (
      <span className="text-slate-400" title={formatted.reason}>
        {formatted.text}
        <span className="sr-only"> ({formatted.reason})</span>
      </span>
    );
  }
  return (
    <span className="tabular-nums">
      {formatted.text}
      {picked ? <PickedMark /> : null}
      {formatted.reason ? <span className="ml-2 text-xs text-amber-800">{formatted.reason}</span> : null}
    </span>
  );
}

/** The test's whole-curve parameters, each with symbol, unit and a "picked" mark when overridden. */
export function ParametersTable({ result }: { result: ConsolidationTestResult }) {
  const p = result.preconsolidation;
  const fitPicked = result.compressionFit?.source === 'pick';
  const rows: Row[] = [
    { label: 'Initial void ratio', symbol: 'e0', value: result.initialVoidRatio, unit: '–', codes: ['mass-inconsistent'] },
    { label: 'Compression index', symbol: 'Cc', value: result.compressionIndex, unit: '–', picked: fitPicked, codes: ['no-virgin-line', 'few-virgin-points'] },
    { label: 'Recompression index', symbol: 'Cr', value: result.recompressionIndex, unit: '–', codes: ['no-recompression-branch'] },
    { label: 'Swelling index', symbol: 'Cs', value: result.swellIndex, unit: '–', codes: ['no-unload-branch'] },
    { label: 'Compression ratio', symbol: 'CR', value: result.compressionRatio, unit: '–', codes: ['no-virgin-line', 'few-virgin-points'] },
    { label: 'Recompression ratio', symbol: 'RR', value: result.recompressionRatio, unit: '–', codes: ['no-recompression-branch'] },
    { label: 'Preconsolidation stress, Casagrande', symbol: 'σ′p', value: p.casagrandeKpa, unit: 'kPa', digits: 0, codes: ['preconsolidation-not-found'] },
    { label: 'Preconsolidation stress, Pacheco Silva', symbol: 'σ′p', value: p.pachecoSilvaKpa, unit: 'kPa', digits: 0, codes: ['preconsolidation-not-found'] },
    {
      label: 'Preconsolidation stress, adopted',
      symbol: 'σ′p',
      value: p.adoptedKpa,
      unit: 'kPa',
      digits: 0,
      picked: p.adoptedFrom === 'pick',
      codes: ['preconsolidation-not-found', 'pick-not-applied'],
      note: p.adoptedFrom === 'casagrande' ? 'from Casagrande' : p.adoptedFrom === 'pacheco-silva' ? 'from Pacheco Silva' : '',
    },
    { label: 'In-situ vertical effective stress', symbol: 'σ′v0', value: result.inSituVerticalEffectiveStressKpa, unit: 'kPa', digits: 0, codes: ['sample-quality-not-assessed'] },
    { label: 'Overconsolidation ratio', symbol: 'OCR', value: result.overconsolidationRatio, unit: '–', digits: 2, codes: ['preconsolidation-not-found', 'sample-quality-not-assessed'] },
    {
      label: 'Sample quality, Δe/e0',
      symbol: 'Δe/e0',
      value: result.sampleQuality?.voidRatioChangeRatio ?? null,
      unit: '–',
      codes: ['sample-quality-not-assessed'],
      note: result.sampleQuality?.category ? `${result.sampleQuality.category} (Lunne et al.)` : '',
    },
  ];
  return (
    <div className="overflow-x-auto">
      <table className="w-full border-collapse text-left text-sm">
        <caption className="sr-only">Parameters of the whole test</caption>
        <thead className="bg-slate-50 text-xs uppercase tracking-wide text-slate-500">
          <tr>
            <th scope="col" className="border-b border-slate-200 px-4 py-2 font-medium">Parameter</th>
            <th scope="col" className="border-b border-slate-200 px-4 py-2 font-medium">Symbol</th>
            <th scope="col" className="border-b border-slate-200 px-4 py-2 font-medium">Value</th>
            <th scope="col" className="border-b border-slate-200 px-4 py-2 font-medium">Unit</th>
          </tr>
        </thead>
        <tbody>
          {rows.map((row) => (
            <tr key={`${row.symbol}-${String(row.label)}`} className="border-b border-slate-100 last:border-b-0">
              <th scope="row" className="px-4 py-2 font-normal text-slate-800">{row.label}</th>
              <td className="px-4 py-2 font-medium text-slate-700">{row.symbol}</td>
              <td className="px-4 py-2 text-slate-900">
                <ParameterCell value={row.value} {...(row.digits === undefined ? {} : { digits: row.digits })} warning={warningFor(result.warnings, row.codes)} {...(row.picked ? { picked: true } : {})} />
                {row.note && row.value !== null ? <span className="ml-2 text-xs text-slate-500">{row.note}</span> : null}
              </td>
              <td className="px-4 py-2 text-slate-600">{row.unit}</td>
            </tr>
          ))}
        </tbody>
      </table>
    </div>
  );
}

/** Per-increment time-curve results: t50, t90, cv by both methods, Cα, mv and k. */
export function IncrementParametersTable({ result }: { result: ConsolidationTestResult }) {
  const head = ['Increment', 'σ′ (kPa)', 'Stage', 't50 (min)', 't90 (min)', 'cv Taylor (m²/yr)', 'cv Casagrande (m²/yr)', 'Cα (–)', 'mv (1/MPa)', 'k (m/s)'];
  return (
    <div className="overflow-x-auto">
      <table className="w-full border-collapse text-left text-sm">
        <caption className="sr-only">Parameters of each increment</caption>
        <thead className="bg-slate-50 text-xs tracking-wide text-slate-500">
          <tr>
            {head.map((h) => (
              <th key={h} scope="col" className="whitespace-nowrap border-b border-slate-200 px-3 py-2 font-medium">{h}</th>
            ))}
          </tr>
        </thead>
        <tbody>
          {result.increments.map((i) => {
            const warning = warningFor(result.warnings, ['primary-not-reached', 'time-curve-not-drawn', 'time-curves-not-applied'], i.index);
            return (
              <tr key={i.index} className="border-b border-slate-100 last:border-b-0">
                <th scope="row" className="px-3 py-1.5 font-medium text-slate-800">{i.index}</th>
                <td className="px-3 py-1.5 tabular-nums">{i.stressKpa.toFixed(1)}</td>
                <td className="px-3 py-1.5 text-slate-600">{i.kind}</td>
                <td className="px-3 py-1.5"><ParameterCell compact value={i.casagrande?.t50Min ?? null} digits={2} warning={warning} picked={i.casagrande?.t50Source === 'pick'} /></td>
                <td className="px-3 py-1.5"><ParameterCell compact value={i.taylor?.t90Min ?? null} digits={2} warning={warning} picked={i.taylor?.t90Source === 'pick'} /></td>
                <td className="px-3 py-1.5"><ParameterCell compact value={i.cvTaylorM2PerYr} digits={2} warning={warning} /></td>
                <td className="px-3 py-1.5"><ParameterCell compact value={i.cvCasagrandeM2PerYr} digits={2} warning={warning} /></td>
                <td className="px-3 py-1.5"><ParameterCell compact value={i.secondaryCompressionIndex} digits={4} warning={warning} /></td>
                <td className="px-3 py-1.5"><ParameterCell compact value={i.mvPerMPa} digits={3} warning={warning} /></td>
                <td className="px-3 py-1.5"><ParameterCell compact value={i.hydraulicConductivityMPerS} digits={3} scientific warning={warning} /></td>
              </tr>
            );
          })}
        </tbody>
      </table>
    </div>
  );
}

/** The analysis' warnings in its own words, grouped test-first. */
export function WarningsList({ warnings }: { warnings: readonly ConsolidationWarning[] }) {
  if (warnings.length === 0) return <p className="text-sm text-slate-600">The analysis raised no warnings.</p>;
  return (
    <ul className="space-y-1.5 text-sm" aria-label="Analysis warnings">
      {warnings.map((w, n) => (
        <li key={`${w.code}-${w.incrementIndex ?? 't'}-${n}`} className="flex gap-2 text-amber-900">
          <span aria-hidden="true">⚠</span>
          <span>
            {w.incrementIndex === null ? null : <span className="font-medium">Increment {w.incrementIndex}: </span>}
            {w.message}
          </span>
        </li>
      ))}
    </ul>
  );
}
