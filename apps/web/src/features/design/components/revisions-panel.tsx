import type { SettlementCheckDetail } from '@porestack/types';
import { useState } from 'react';
import { ErrorMessage } from '../../../components/error-message';
import { Select } from '../../../components/select';
import { LoadingBlock } from '../../../components/spinner';
import { formatDateTime } from '../../../lib/format';
import { useRevisionComparison } from '../api/settlement-checks';
import { formatMm } from './design-format';
import { TableHead } from './table-head';

type RevisionsPanelProps = { orgId: string; projectId: string; check: SettlementCheckDetail; onOpen: (revision: number) => void };

/** Every run of the check (none ever changes), and two of them side by side. */
export function RevisionsPanel({ orgId, projectId, check, onOpen }: RevisionsPanelProps) {
  const numbers = check.revisions.map((r) => r.revision);
  const [a, setA] = useState<number | null>(numbers[1] ?? null);
  const [b, setB] = useState<number | null>(numbers[0] ?? null);
  const comparison = useRevisionComparison(orgId, projectId, check.id, a, b);
  const options = check.revisions.map((r) => ({ value: String(r.revision), label: `Revision ${r.revision} — ${r.reason}` }));
  return (
    <div className="space-y-6">
      <div className="overflow-x-auto rounded-md border border-slate-200">
        <table className="w-full text-left text-sm">
          <caption className="sr-only">Revisions of the check</caption>
          <TableHead cellClassName="px-3 py-2" headings={['Revision', 'Why it was run', 'Run', 'Footings', 'Largest total (mm)', 'Over the total limit', 'Pairs over the limit']} />
          <tbody>
            {check.revisions.map((r) => (
              <tr key={r.id} className="border-t border-slate-100">
                <td className="px-3 py-2">
                  <button type="button" className="font-medium text-accent-700 hover:underline" onClick={() => onOpen(r.revision)}>
                    Revision {r.revision}
                  </button>
                </td>
                <td className="px-3 py-2">{r.reason}</td>
                <td className="whitespace-nowrap px-3 py-2">
                  {formatDateTime(r.createdAt)}, {r.createdBy.name}
                </td>
                <td className="px-3 py-2">{r.footingCount}</td>
                <td className="px-3 py-2">{formatMm(r.maxTotalM)}</td>
                <td className="px-3 py-2">{r.footingsOverLimit}</td>
                <td className="px-3 py-2">{r.pairsOverLimit}</td>
              </tr>
            ))}
          </tbody>
        </table>
      </div>
      {check.revisions.length < 2 ? (
        <p className="text-sm text-slate-600">Two revisions can be compared once the check has been run twice.</p>
      ) : (
        <section aria-label="Compare two revisions" className="space-y-3">
          <h3 className="text-sm font-semibold text-slate-900">Compare two revisions</h3>
          <div className="grid gap-3 sm:grid-cols-2">
            <Select label="Earlier (A)" value={String(a ?? '')} onChange={(e) => setA(Number(e.target.value))} options={options} />
            <Select label="Later (B)" value={String(b ?? '')} onChange={(e) => setB(Number(e.target.value))} options={options} />
          </div>
          {a === b ? (
            <p className="text-sm text-slate-600">Choose two different revisions.</p>
          ) : comparison.isPending ? (
            <LoadingBlock label="Comparing…" />
          ) : comparison.error ? (
            <ErrorMessage error={comparison.error} title="The revisions could not be compared" />
          ) : (
            <div className="grid gap-4 xl:grid-cols-2">
              <div className="overflow-x-auto rounded-md border border-slate-200">
                <table className="w-full text-left text-sm" aria-label="Inputs that differ">
                  <thead className="bg-slate-50 text-xs text-slate-600">
                    <tr>
                      <th scope="col" className="px-3 py-2 font-medium">Input that differs</th>
                      <th scope="col" className="px-3 py-2 font-medium">Revision {comparison.data.a.revision}</th>
                      <th scope="col" className="px-3 py-2 font-medium">Revision {comparison.data.b.revision}</th>
                    </tr>
                  </thead>
                  <tbody>
                    {comparison.data.inputs.length === 0 ? (
                      <tr>
                        <td colSpan={3} className="px-3 py-2 text-slate-600">
                          Same inputs.
                        </td>
                      </tr>
                    ) : (
                      comparison.data.inputs.map((line) => (
                        <tr key={line.what} className="border-t border-slate-100 align-top">
                          <th scope="row" className="px-3 py-1.5 text-left font-medium text-slate-800">
                            {line.what}
                          </th>
                          <td className="px-3 py-1.5">{line.a}</td>
                          <td className="px-3 py-1.5">{line.b}</td>
                        </tr>
                      ))
                    )}
                  </tbody>
                </table>
              </div>
              <div className="overflow-x-auto rounded-md border border-slate-200">
                <table className="w-full text-left text-sm" aria-label="Settlement of each footing before and after">
                  <thead className="bg-slate-50 text-xs text-slate-600">
                    <tr>
                      <th scope="col" className="px-3 py-2 font-medium">Footing</th>
                      <th scope="col" className="px-3 py-2 font-medium">Total, rev. {comparison.data.a.revision} (mm)</th>
                      <th scope="col" className="px-3 py-2 font-medium">Total, rev. {comparison.data.b.revision} (mm)</th>
                      <th scope="col" className="px-3 py-2 font-medium">Change (mm)</th>
                    </tr>
                  </thead>
                  <tbody>
                    {comparison.data.footings.map((f) => (
                      <tr key={f.id} className="border-t border-slate-100">
                        <td className="px-3 py-1.5 font-medium">{f.id}</td>
                        <td className="px-3 py-1.5">{formatMm(f.aTotalM)}</td>
                        <td className="px-3 py-1.5">{formatMm(f.bTotalM)}</td>
                        <td className={`px-3 py-1.5 ${f.changeM !== null && f.changeM > 0 ? 'text-red-800' : 'text-slate-700'}`}>{f.changeM === null ? '—' : `${f.changeM > 0 ? '+' : ''}${formatMm(f.changeM)}`}</td>
                      </tr>
                    ))}
                  </tbody>
                </table>
              </div>
            </div>
          )}
        </section>
      )}
    </div>
  );
}
