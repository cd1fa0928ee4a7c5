import { buttonClasses } from '../../../components/button';
import { ErrorMessage } from '../../../components/error-message';
import { LoadingBlock } from '../../../components/spinner';
import { apiPaths } from '../../../config/paths';
import { formatDateTime } from '../../../lib/format';
import { useIssuedChecks } from '../api/get-issued-checks';

/** The settlement checks the project's designers have issued, each with its PDF summary. */
export function IssuedChecksList({ orgId, projectId }: { orgId: string; projectId: string }) {
  const issued = useIssuedChecks(orgId, projectId);
  if (issued.isPending) return <LoadingBlock label="Loading the issued settlement checks…" />;
  if (issued.error) return <ErrorMessage error={issued.error} title="The issued settlement checks could not be loaded" onRetry={() => void issued.refetch()} />;
  if (issued.data.length === 0) return <p className="text-sm text-slate-600">No settlement check has been issued for this project yet.</p>;
  return (
    <ul className="divide-y divide-slate-200 text-sm">
      {issued.data.map((c) => (
        <li key={c.revisionId} className="flex flex-wrap items-center justify-between gap-3 py-2">
          <div className="min-w-0">
            <p className="font-medium text-slate-900">{c.checkName} — revision {c.revision}</p>
            <p className="text-slate-600">Issued by {c.issuedBy.name}, {formatDateTime(c.issuedAt)}</p>
          </div>
          {c.report.state === 'ready' ? (
            <a href={apiPaths.checkReportPdf(orgId, projectId, c.checkId, c.revision)} download className={buttonClasses('secondary', 'sm')}>
              Download the summary (PDF)
            </a>
          ) : (
            <span className="text-slate-600">{c.report.state === 'failed' ? 'The summary could not be printed; the designer has been told.' : 'The summary is being printed.'}</span>
          )}
        </li>
      ))}
    </ul>
  );
}
