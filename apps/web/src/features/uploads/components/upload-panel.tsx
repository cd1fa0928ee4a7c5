import type { ImportRequest, Upload } from '@porestack/types';
import { useQueryClient } from '@tanstack/react-query';
import { useEffect, useState } from 'react';
import { Alert } from '../../../components/alert';
import { ErrorMessage } from '../../../components/error-message';
import { JobProgress } from '../../../components/job-progress';
import { ProgressBar } from '../../../components/progress-bar';
import { LoadingBlock } from '../../../components/spinner';
import { Link } from 'react-router-dom';
import { apiPaths, paths } from '../../../config/paths';
import type { UploadProgress } from '../../../lib/api-client';
import { formatDateTime } from '../../../lib/format';
import { isJobRunning, useJob } from '../../../lib/jobs';
import { useUploads } from '../api/get-uploads';
import { useStartImport } from '../api/start-import';
import { useUploadReadingsFile } from '../api/upload-readings-file';
import { FileDropZone } from './file-drop-zone';
import { ImportIssuesTable } from './import-issues-table';
import { MappingStep } from './mapping-step';
import { UploadNotes } from './upload-notes';

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
 * mapping step (guessed, to confirm), a rejected or imported one can be mapped again from storage,
 * and what an import dropped, replaced or doubts is listed. Nothing here blocks the rest of the page.
 */
export function UploadPanel({ orgId, testId, canUpload, specimenHeightMm }: { orgId: string; testId: string; canUpload: boolean; specimenHeightMm: number | null }) {
  const queryClient = useQueryClient();
  const uploads = useUploads(orgId, testId);
  const send = useUploadReadingsFile(orgId, testId);
  const startImport = useStartImport(orgId, testId);
  const [progress, setProgress] = useState<UploadProgress | null>(null);
  const [fileName, setFileName] = useState<string | null>(null);
  const [jobId, setJobId] = useState<string | null>(null);
  const [remapId, setRemapId] = useState<string | null>(null);
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
    setRemapId(null);
    send.mutate(
      { file, onProgress: setProgress },
      { onSuccess: (created) => setJobId(created.job?.id ?? null), onSettled: () => setProgress(null) },
    );
  };
  const importUpload = (uploadId: string, body: ImportRequest) =>
    startImport.mutate({ uploadId, body }, { onSuccess: (started) => { setJobId(started.id); setRemapId(null); } });

  const latest = uploads.data?.[0];
  const mapping = latest && latest.status === 'needs_mapping' ? latest : (uploads.data?.find((u) => u.id === remapId) ?? null);
  const running = job.data !== undefined && isJobRunning(job.data);
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
          <LatestUpload orgId={orgId} upload={latest} canRemap={canUpload && !running && mapping === null} onRemap={() => setRemapId(latest.id)} />
          {mapping && canUpload ? (
            <MappingStep
              key={mapping.id}
              orgId={orgId}
              uploadId={mapping.id}
              fileName={mapping.originalName}
              again={mapping.status !== 'needs_mapping'}
              specimenHeightMm={specimenHeightMm}
              pending={startImport.isPending}
              error={startImport.error}
              onImport={(body) => importUpload(mapping.id, body)}
              onCancel={mapping.status !== 'needs_mapping' ? () => setRemapId(null) : undefined}
            />
          ) : null}
          {uploads.data.length > 1 ? <EarlierUploads orgId={orgId} uploads={uploads.data.slice(1)} canRemap={canUpload && !running} onRemap={setRemapId} /> : null}
        </>
      ) : (
        <p className="text-sm text-slate-600">No file uploaded yet.</p>
      )}
    </div>
  );
}

function LatestUpload({ orgId, upload, canRemap, onRemap }: { orgId: string; upload: Upload; canRemap: boolean; onRemap: () => void }) {
  return (
    <div className="space-y-3 rounded-md border border-slate-200 p-4" aria-label="Latest upload">
      <div className="flex flex-wrap items-baseline justify-between gap-2">
        <p className="text-sm text-slate-800">
          <span className="font-medium">{upload.originalName}</span>
          <span className="ml-2 text-slate-500">
            {upload.detectedType.toUpperCase()} · {megabytes(upload.sizeBytes)} · by {upload.uploadedBy.name}, {formatDateTime(upload.createdAt)}
          </span>
        </p>
        <span className="flex flex-wrap gap-4 text-sm">
          {canRemap && (upload.status === 'imported' || upload.status === 'failed') ? (
            <button type="button" className="font-medium text-accent-700 hover:underline" onClick={onRemap}>Change the mapping</button>
          ) : null}
          <a href={apiPaths.uploadDownload(orgId, upload.id)} className="font-medium text-accent-700 hover:underline" download>Download the original</a>
        </span>
      </div>
      <p className="text-sm">
        <span className="font-medium text-slate-800">{STATUS_WORDS[upload.status]}</span>
        {upload.status === 'imported' && upload.readingCount !== null ? (
          <span className="text-slate-600"> — {upload.readingCount.toLocaleString('en-GB')} readings in {upload.incrementCount ?? '?'} increments</span>
        ) : null}
      </p>
      <p className="break-all font-mono text-xs text-slate-500" title="SHA-256 of the file as received">SHA-256 {upload.sha256}</p>
      {upload.sameFileIn.length > 0 ? (
        <Alert tone="warning" title="The same file is in another test">
          {upload.sameFileIn.map((same) => (
            <span key={same.uploadId} className="block">
              Test <Link className="font-medium underline" to={paths.org.test.to(orgId, same.testId)}>{same.testReference}</Link> holds “{same.originalName}”, uploaded {formatDateTime(same.uploadedAt)}, byte for byte the same. One of the two is likely the wrong file.
            </span>
          ))}
        </Alert>
      ) : null}
      {upload.status === 'failed' && upload.failure ? (
        <>
          <Alert tone="error" title="The file was not imported; no readings were kept from it">
            {upload.failure.message}
          </Alert>
          {upload.failure.issues.length > 0 ? <ImportIssuesTable issues={upload.failure.issues} total={upload.failure.issueCount} /> : null}
        </>
      ) : null}
      {upload.status === 'imported' ? <UploadNotes upload={upload} /> : null}
    </div>
  );
}

function EarlierUploads({ orgId, uploads, canRemap, onRemap }: { orgId: string; uploads: readonly Upload[]; canRemap: boolean; onRemap: (uploadId: string) => void }) {
  return (
    <details className="text-sm">
      <summary className="cursor-pointer text-slate-700">Earlier uploads ({uploads.length})</summary>
      <ul className="mt-2 space-y-1">
        {uploads.map((u) => (
          <li key={u.id} className="text-slate-600">
            <a href={apiPaths.uploadDownload(orgId, u.id)} className="text-accent-700 hover:underline" download>{u.originalName}</a> · {STATUS_WORDS[u.status]} · {formatDateTime(u.createdAt)}
            {canRemap ? (
              <>
                {' · '}
                <button type="button" className="text-accent-700 hover:underline" onClick={() => onRemap(u.id)} aria-label={`Map ${u.originalName} again`}>map again</button>
              </>
            ) : null}
          </li>
        ))}
      </ul>
    </details>
  );
}
