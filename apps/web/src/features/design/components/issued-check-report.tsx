import { Alert } from '../../../components/alert';
import { Button, buttonClasses } from '../../../components/button';
import { ErrorMessage } from '../../../components/error-message';
import { Spinner } from '../../../components/spinner';
import { apiPaths } from '../../../config/paths';
import { ApiError } from '../../../lib/api-error';
import { formatDateTime } from '../../../lib/format';
import { useIssuedCheck, useIssueRevision, useRetryIssuedReport } from '../api/issued-checks';

type Props = { orgId: string; projectId: string; checkId: string; revision: number; canIssue: boolean };

/**
 * Issuing a revision and its PDF summary. A designer issues the revision they stand behind,
 * once; the project's clients then see it. Every later download is the same stored file.
 */
export function IssuedCheckReport({ orgId, projectId, checkId, revision, canIssue }: Props) {
  const issued = useIssuedCheck(orgId, projectId, checkId, revision);
  const issue = useIssueRevision(orgId, projectId, checkId, revision);
  const retry = useRetryIssuedReport(orgId, projectId, checkId, revision);
  const data = issued.data;
  return (
    <section aria-label={`Issue of revision ${revision}`} className="rounded-md border border-slate-200 bg-white px-4 py-3 text-sm">
      {issued.isPending ? (
        <p className="flex items-center gap-2 text-slate-600"><Spinner size="sm" /> Looking up whether this revision was issued…</p>
      ) : issued.error instanceof ApiError && issued.error.status === 404 ? (
        <div className="flex flex-wrap items-center justify-between gap-3">
          <p className="max-w-prose text-slate-700">
            <strong className="text-slate-900">Revision {revision} has not been issued.</strong>{' '}
            {canIssue
              ? 'Issuing it prints a PDF summary (inputs, results, plan, caution) and shares it with the project’s clients. A revision is issued once.'
              : 'A designer of the project issues the revision they stand behind; its PDF summary then appears here.'}
          </p>
          {canIssue ? (
            <Button size="sm" pending={issue.isPending} onClick={() => issue.mutate()}>
              Issue revision {revision}
            </Button>
          ) : null}
          {issue.error ? <p role="alert" className="w-full text-red-800">{issue.error.message}</p> : null}
        </div>
      ) : issued.error ? (
        <ErrorMessage error={issued.error} title="Whether this revision was issued could not be loaded" onRetry={() => void issued.refetch()} />
      ) : data?.report.state === 'ready' ? (
        <div className="flex flex-wrap items-center justify-between gap-3">
          <p className="min-w-0 text-slate-700">
            <strong className="text-slate-900">Issued</strong> by {data.issuedBy.name}, {formatDateTime(data.issuedAt)}
            <span className="block text-xs text-slate-500">
              SHA-256 <span className="break-all font-mono" title="Every download of this revision is this same file.">{data.report.sha256}</span>
            </span>
          </p>
          <a href={apiPaths.checkReportPdf(orgId, projectId, checkId, revision)} download className={buttonClasses('primary', 'sm')}>
            Download the summary (PDF)
          </a>
        </div>
      ) : data?.report.state === 'failed' ? (
        <Alert tone="error" title="The summary could not be printed">
          <p>{data.report.message}</p>
          {canIssue ? (
            <Button className="mt-2" size="sm" pending={retry.isPending} onClick={() => retry.mutate()}>
              Try printing it again
            </Button>
          ) : null}
          {retry.error ? <p className="mt-2">{retry.error.message}</p> : null}
        </Alert>
      ) : (
        <p className="flex items-center gap-2 text-slate-600" role="status"><Spinner size="sm" /> Revision {revision} is issued; its PDF summary is being printed and appears here when it is ready.</p>
      )}
    </section>
  );
}
