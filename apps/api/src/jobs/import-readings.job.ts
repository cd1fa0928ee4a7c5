import { DomainError } from '../errors/domain-error.js';
import { logger } from '../http/logger.js';
import { jobRuns } from '../modules/job-runs/job-runs.service.js';
import { importUpload } from '../modules/readings-import/import-readings.service.js';
import { UploadEntity } from '../modules/uploads/upload.entity.js';
import { dataSource } from '../data-source.js';
import { claimImportSlot, IMPORT_CONCURRENCY, IMPORT_READINGS_QUEUE, requeueImport, type ImportReadingsJobData } from './import-readings-queue.js';
import type { JobDefinition } from './job-definition.js';

/**
 * Parses and imports one upload, mirroring its state and progress in job_runs. A file that
 * needs a mapping ends the job as succeeded with `{ needsMapping: true }`; a file with bad
 * rows ends it as failed with the reason (the rows are on the upload) and is not retried;
 * anything else is marked failed and rethrown so pg-boss retries — safely, since the
 * readings are replaced in one transaction.
 */
export async function importReadings(data: ImportReadingsJobData): Promise<void> {
  if (!(await claimImportSlot(data.orgId, data.jobRunId))) {
    await requeueImport(data);
    return;
  }
  try {
    const outcome = await importUpload(data, (progress, message) => jobRuns.update(data.jobRunId, { progress, message }));
    if (outcome.kind === 'needs_mapping') {
      await jobRuns.update(data.jobRunId, {
        state: 'succeeded',
        progress: 1,
        message: 'The file is stored. Its columns are not the standard ones: choose which column holds what, then import.',
        result: { uploadId: data.uploadId, needsMapping: true },
      });
    } else if (outcome.kind === 'rejected') {
      await jobRuns.update(data.jobRunId, {
        state: 'failed',
        message: outcome.problem.message,
        result: { uploadId: data.uploadId, issueCount: outcome.problem.issueCount, issues: outcome.problem.issues.slice(0, 20) },
      });
    } else {
      await jobRuns.update(data.jobRunId, {
        state: 'succeeded',
        progress: 1,
        message: `Imported ${outcome.readingCount.toLocaleString('en-GB')} readings in ${outcome.incrementCount} increments; the analysis is queued.`,
        result: { uploadId: data.uploadId, importedReadings: outcome.readingCount, increments: outcome.incrementCount, analysisJobId: outcome.analysisJobId },
      });
    }
  } catch (error) {
    if (error instanceof DomainError) {
      // e.g. the test went to review while the file was being read.
      await dataSource.getRepository(UploadEntity).update({ id: data.uploadId }, { status: 'failed', failure: { message: error.message, issues: [], issueCount: 0 } });
      await jobRuns.update(data.jobRunId, { state: 'failed', message: error.message, result: { uploadId: data.uploadId } });
      return;
    }
    logger.error({ err: error, job: IMPORT_READINGS_QUEUE, uploadId: data.uploadId }, 'import failed');
    const message = 'The import stopped because of a problem on our side; no readings were changed. It is tried again; if it keeps failing, tell your administrator.';
    await jobRuns.update(data.jobRunId, { state: 'failed', message });
    // The page stops waiting; a successful retry marks the upload imported.
    await dataSource.getRepository(UploadEntity).update({ id: data.uploadId }, { status: 'failed', failure: { message, issues: [], issueCount: 0 } }).catch(() => undefined);
    throw error;
  }
}

export const importReadingsJob: JobDefinition = {
  name: IMPORT_READINGS_QUEUE,
  // The upload page shows this job's progress: pick it up quickly.
  pollingIntervalSeconds: 0.5,
  // Several at once, so a slow or damaged file never holds up the others (see import-readings-queue.ts).
  concurrency: IMPORT_CONCURRENCY,
  handler: (data) => importReadings(data as ImportReadingsJobData),
};
