import type { ImportIssue } from '@porestack/types';

/** Every rejected row with where it is and why, so the file can be fixed in one pass. */
export function ImportIssuesTable({ issues, total }: { issues: readonly ImportIssue[]; total: number }) {
  return (
    <div className="overflow-x-auto rounded-md border border-red-200">
      <table className="w-full border-collapse text-left text-sm">
        <caption className="bg-red-50 px-3 py-2 text-left text-sm font-medium text-red-900">
          {total === issues.length ? `${total} rejected ${total === 1 ? 'row' : 'rows'}` : `First ${issues.length} of ${total} rejected rows`}
        </caption>
        <thead className="bg-red-50/60 text-xs uppercase tracking-wide text-red-900/70">
          <tr>
            <th scope="col" className="px-3 py-1.5 font-medium">Row</th>
            <th scope="col" className="px-3 py-1.5 font-medium">Column</th>
            <th scope="col" className="px-3 py-1.5 font-medium">Reason</th>
          </tr>
        </thead>
        <tbody>
          {issues.map((issue, n) => (
            <tr key={`${issue.row}-${issue.column ?? ''}-${n}`} className="border-t border-red-100">
              <td className="px-3 py-1.5 tabular-nums">{issue.row}</td>
              <td className="px-3 py-1.5">{issue.column ?? 'whole row'}</td>
              <td className="px-3 py-1.5 text-slate-800">{issue.message}</td>
            </tr>
          ))}
        </tbody>
      </table>
    </div>
  );
}
