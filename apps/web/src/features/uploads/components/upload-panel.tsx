import type { Upload } from '@porestack/types';
import { useQueryClient } from '@tanstack/react-query';
import { useEffect, useState } from 'react';
import { Alert } from '../../../components/alert';
import { ErrorMessage } from '../../../components/error-message';
import { JobProgress } from '../../../components/job-progress';
import { ProgressBar } from '../../../components/progress-bar';
import { LoadingBlock } from '../../../components/spinner';
import { apiPaths } from '../../../config/paths';
import type { UploadProgress } from '../../../lib/api-client';
import { formatDateTime } from '../../../lib/format';
import { isJobRunning, useJob } from '../../../lib/jobs';
import { useUploadPreview } from '../api/get-upload-preview';
import { useUploads } from '../api/get-uploads';
import { useStartImport } from '../api/start-import';
import { useUploadReadingsFile } from '../api/upload-readings-file';
import { FileDropZone } from './file-drop-zone';
import { ImportIssuesTable } from './import-issues-table';
import { MappingForm } from './mapping-form';

const STATUS_WORDS: Record<Upload['status'], string> = {
  stored: 'Stored, waiting to be read',
  needs_mapping: 'Needs its columns mapped',
  importing: 'Importing',
  imported: 'Imported',
  failed: 'Rejected',
};

const megabytes = (bytes: number) => (bytes < 1_048_576 ? `${Math.max(1, Math.round(bytes / 1024))} kB` : `${(bytes / 1_048_576).toFixed(1)} MB`);

/**
 * Upload with a real progress bar, then follow the import job; a file in another layout gets the
 * mapping step, a rejected one its list of rows to fix. Nothing here blocks the rest of the page.
 */
export function UploadPanel({ orgId, testId, canUpload }: { orgId: string; testId: string; canUpload: boolean }) {
  const queryClient = useQueryClient();
  const uploads = useUploads(orgId, testId);
  const send = useUploadReadingsFile(orgId, testId);
  const startImport = useStartImport(orgId, testId);
  const [progress, setProgress] = useState<UploadProgress | null>(null);
  const [fileName, setFileName] = useState<string | null>(null);
  const [jobId, setJobId] = useState<string | null>(null);
  const job = useJob(orgId, jobId);
  // A successful import queues the analysis; follow that job too, so a failure there is seen here.
  const analysisJobId = typeof job.data?.result?.['analysisJobId'] === 'string' ? job.data.result['analysisJobId'] : null;
  const analysisJob = useJob(orgId, analysisJobId);

  useEffect(() => {
    // When a job finishes, the test's status, readings and analysis have all moved on.
    if (job.data && !isJobRunning(job.data)) void queryClient.invalidateQueries({ queryKey: ['orgs', orgId, 'tests', testId] });
  }, [job.data, orgId, testId, queryClient]);
  useEffect(() => {
    if (analysisJob.data && !isJobRunning(analysisJob.data)) void queryClient.invalidateQueries({ queryKey: ['orgs', orgId, 'tests', testId] });
  }, [analysisJob.data, orgId, testId, queryClient]);

  const onFile = (file: File) => {
    setFileName(file.name);
    setProgress({ loadedBytes: 0, totalBytes: file.size });
    setJobId(null);
    send.mutate(
      { file, onProgress: setProgress },
      { onSuccess: (created) => setJobId(created.job?.id ?? null), onSettled: () => setProgress(null) },
    );
  };

  const latest = uploads.data?.[0];
  return (
    <div className="space-y-4">
      <div className="flex flex-wrap gap-x-4 gap-y-1 text-sm">
        <span className="text-slate-600">Templates with demo numbers:</span>
        <a className="font-medium text-accent-700 hover:underline" href={apiPaths.readingsTemplateCsv(orgId)} download>readings.csv</a>
        <a className="font-medium text-accent-700 hover:underline" href={apiPaths.readingsTemplateXlsx(orgId)} download>readings.xlsx</a>
      </div>
      {canUpload ? <FileDropZone disabled={send.isPending} onFile={onFile} /> : null}
      {send.isPending && progress ? (
        <ProgressBar
          label={`Uploading ${fileName ?? 'file'}`}
          fraction={progress.totalBytes ? progress.loadedBytes / progress.totalBytes : null}
          detail={`${megabytes(progress.loadedBytes)}${progress.totalBytes ? ` of ${megabytes(progress.totalBytes)}` : ''}`}
        />
      ) : null}
      {send.error ? <ErrorMessage error={send.error} title={`${fileName ?? 'The file'} was not accepted`} /> : null}
      {job.data ? <JobProgress job={job.data} what="Reading the file" /> : null}
      {analysisJob.data ? <JobProgress job={analysisJob.data} what="Analysis" /> : null}
      {uploads.isPending ? (
        <LoadingBlock label="Loading uploads…" />
      ) : uploads.error ? (
        <ErrorMessage error={uploads.error} title="The uploads could not be loaded" onRetry={() => void uploads.refetch()} />
      ) : latest ? (
        <>
          <LatestUpload orgId={orgId} upload={latest} />
          {latest.status === 'needs_mapping' && canUpload ? (
            <MappingStep
              orgId={orgId}
              uploadId={latest.id}
              pending={startImport.isPending}
              error={startImport.error}
              onImport={(body) => startImport.mutate({ uploadId: latest.id, body }, { onSuccess: (started) => setJobId(started.id) })}
            />
          ) : null}
          {uploads.data.length > 1 ? <EarlierUploads orgId={orgId} uploads={uploads.data.slice(1)} /> : null}
        </>
      ) : (
        <p className="text-sm text-slate-600">No file uploaded yet.</p>
      )}
    </div>
  );
}

function LatestUpload({ orgId, upload }: { orgId: string; upload: Upload }) {
  return (
    <div className="space-y-3 rounded-md border border-slate-200 p-4" aria-label="Latest upload">
      <div className="flex flex-wrap items-baseline justify-between gap-2">
        <p className="text-sm text-slate-800">
          <span className="font-medium">{upload.originalName}</span>
          <span className="ml-2 text-slate-500">
            {upload.detectedType.toUpperCase()} · {megabytes(upload.sizeBytes)} · by {upload.uploadedBy.name}, {formatDateTime(upload.createdAt)}
          </span>
        </p>
        <a href={apiPaths.uploadDownload(orgId, upload.id)} className="text-sm font-medium text-accent-700 hover:underline" download>
          Download the original
        </a>
      </div>
      <p className="text-sm">
        <span className="font-medium text-slate-800">{STATUS_WORDS[upload.status]}</span>
        {upload.status === 'imported' && upload.readingCount !== null ? (
          <span className="text-slate-600"> — {upload.readingCount.toLocaleString('en-GB')} readings in {upload.incrementCount ?? '?'} increments</span>
        ) : null}
      </p>
      <p className="break-all font-mono text-xs text-slate-500" title="SHA-256 of the file as received">SHA-256 {upload.sha256}</p>
      {upload.status === 'failed' && upload.failure ? (
        <>
          <Alert tone="error" title="The file was not imported; no readings were kept from it">
            {upload.failure.message}
          </Alert>
          {upload.failure.issues.length > 0 ? <ImportIssuesTable issues={upload.failure.issues} total={upload.failure.issueCount} /> : null}
        </>
      ) : null}
    </div>
  );
}

function MappingStep({ orgId, uploadId, pending, error, onImport }: { orgId: string; uploadId: string; pending: boolean; error: unknown; onImport: Parameters<typeof MappingForm>[0]['onImport'] }) {
  const preview = useUploadPreview(orgId, uploadId);
  if (preview.isPending) return <LoadingBlock label="Reading the first rows…" />;
  if (preview.error) return <ErrorMessage error={preview.error} title="The file's first rows could not be read" onRetry={() => void preview.refetch()} />;
  return (
    <section aria-label="Map the columns" className="space-y-3">
      <h3 className="text-sm font-semibold text-slate-900">This file is not in the standard layout: say which column holds what</h3>
      <MappingForm orgId={orgId} preview={preview.data} pending={pending} error={error} onImport={onImport} />
    </section>
  );
}

function EarlierUploads({ orgId, uploads }: { orgId: string; uploads: readonly Upload[] }) {
  return (
    <details className="text-sm">
      <summary className="cursor-pointer text-slate-700">Earlier uploads ({uploads.length})</summary>
      <ul className="mt-2 space-y-1">
        {uploads.map((u) => (
          <li key={u.id} className="text-slate-600">
            <a href={apiPaths.uploadDownload(orgId, u.id)} className="text-accent-700 hover:underline" download>{u.originalName}</a> · {STATUS_WORDS[u.status]} · {formatDateTime(u.createdAt)}
          </li>
        ))}
      </ul>
    </details>
  );
}
