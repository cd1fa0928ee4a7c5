import type { Analysis } from '@porestack/types';
import { EngineeringCaution } from '../../../components/engineering-caution';
import { formatDateTime } from '../../../lib/format';
import { IncrementParametersTable, ParametersTable, WarningsList } from './parameters-table';

/** The reduced parameters of the stored analysis, with its warnings and where it came from. */
export function ResultsView({ analysis }: { analysis: Analysis }) {
  const result = analysis.result;
  return (
    <div className="space-y-5">
      <EngineeringCaution />
      <p className="text-xs text-slate-500">
        Analysed {formatDateTime(analysis.createdAt)} with geo-core {analysis.geoCoreVersion} · inputs hash <span className="font-mono">{analysis.inputsHash.slice(0, 12)}</span>
        {analysis.pickReason ? ` · picks: “${analysis.pickReason}”` : ' · no picks overridden'}
      </p>
      <section aria-label="Whole-test parameters" className="rounded-md border border-slate-200">
        <h3 className="border-b border-slate-200 px-4 py-2 text-sm font-semibold text-slate-900">Whole test</h3>
        <ParametersTable result={result} />
      </section>
      <section aria-label="Increment parameters" className="rounded-md border border-slate-200">
        <h3 className="border-b border-slate-200 px-4 py-2 text-sm font-semibold text-slate-900">Each increment</h3>
        <IncrementParametersTable result={result} />
      </section>
      <section aria-label="Warnings" className="space-y-2">
        <h3 className="text-sm font-semibold text-slate-900">Warnings ({result.warnings.length})</h3>
        <WarningsList warnings={result.warnings} />
      </section>
    </div>
  );
}
