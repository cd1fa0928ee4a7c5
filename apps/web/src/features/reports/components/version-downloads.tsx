import { Alert } from '../../../components/alert';
import { Button } from '../../../components/button';
import { ErrorMessage } from '../../../components/error-message';
import { Spinner } from '../../../components/spinner';
import { apiPaths } from '../../../config/paths';
import { ApiError } from '../../../lib/api-error';
import { formatDateTime } from '../../../lib/format';
import { useVersionReport } from '../api/get-version-report';
import { useRetryReport } from '../api/retry-report';
import { DownloadLink } from './download-link';

function RetryButton({ label, retry }: { label: string; retry: ReturnType<typeof useRetryReport> }) {
  return (
    <>
      <Button className="mt-2" size="sm" pending={retry.isPending} onClick={() => retry.mutate()}>{label}</Button>
      {retry.error ? <p className="mt-2">{retry.error.message}</p> : null}
    </>
  );
}

type Props = { orgId: string; recordId: string; version: number; canRetry: boolean };

/** The issued PDF report of one version and its reduced data as a spreadsheet. */
export function VersionDownloads({ orgId, recordId, version, canRetry }: Props) {
  const report = useVersionReport(orgId, recordId, version);
  const retry = useRetryReport(orgId, recordId, version);
  const data = report.data;
  return (
    <section aria-label={`Report and data of version ${version}`} className="space-y-3">
      {report.isPending ? (
        <p className="flex items-center gap-2 text-sm text-slate-600"><Spinner size="sm" /> Looking up the report…</p>
      ) : report.error instanceof ApiError && report.error.status === 404 ? (
        <Alert tone="info" title="No test report for this version yet">
          <p>{report.error.message}</p>
          {canRetry ? <RetryButton label="Print the test report" retry={retry} /> : null}
        </Alert>
      ) : report.error ? (
        <ErrorMessage error={report.error} title="The report’s state could not be loaded" onRetry={() => void report.refetch()} />
      ) : data?.state === 'ready' ? (
        <div className="space-y-1">
          <DownloadLink href={apiPaths.versionReportPdf(orgId, recordId, version)} variant="primary">Download the test report (PDF)</DownloadLink>
          <p className="text-xs text-slate-500">
            Issued {data.generatedAt ? formatDateTime(data.generatedAt) : ''} · {data.byteSize ? `${Math.round(data.byteSize / 1024)} kB` : ''} · SHA-256{' '}
            <span className="break-all font-mono" title="Every download of this version is this same file.">{data.sha256}</span>
          </p>
        </div>
      ) : data?.state === 'failed' ? (
        <Alert tone="error" title="The test report could not be printed">
          <p>{data.message}</p>
          {canRetry ? <RetryButton label="Try printing the report again" retry={retry} /> : null}
        </Alert>
      ) : (
        <p className="flex items-center gap-2 text-sm text-slate-600" role="status"><Spinner size="sm" /> The test report is being printed; it appears here when it is ready.</p>
      )}
      <DownloadLink href={apiPaths.versionDataXlsx(orgId, recordId, version)}>Reduced data (XLSX)</DownloadLink>
    </section>
  );
}
