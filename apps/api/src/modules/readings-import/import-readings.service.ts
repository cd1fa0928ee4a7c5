import { dataSource } from '../../data-source.js';
import type { ImportReadingsJobData } from '../../jobs/import-readings-queue.js';
import { markReadingsUploaded } from '../consolidation-tests/consolidation-tests.service.js';
import { replaceReadings } from '../readings/readings-writer.js';
import { getUploadObject } from '../uploads/upload-object.js';
import { UploadEntity } from '../uploads/upload.entity.js';
import { CANONICAL_MAPPING } from './detect-layout.js';
import { ImportProblem } from './import-problem.js';
import { importLimits, parseDeadlineMs } from './import-limits.js';
import { parseOffThread } from './parse-pool.js';

export type ImportOutcome =
  | { kind: 'imported'; readingCount: number; incrementCount: number; analysisJobId: string }
  | { kind: 'needs_mapping' }
  | { kind: 'rejected'; problem: ImportProblem };

/**
 * Reads a stored upload, checks every row, and — only if all are good — replaces the test's
 * readings, marks the upload imported and moves the test on (R's markReadingsUploaded, which
 * queues the analysis), all in one transaction. Bad content is an outcome (recorded on the
 * upload), not an error; an error (storage, database) leaves the old readings in place.
 */
export async function importUpload(data: ImportReadingsJobData, onProgress: (fraction: number, message: string) => Promise<void>): Promise<ImportOutcome> {
  const uploads = dataSource.getRepository(UploadEntity);
  const upload = await uploads.findOneByOrFail({ organisationId: data.orgId, id: data.uploadId });
  await onProgress(0.05, 'Reading the file from storage.');
  const bytes = await getUploadObject(upload.objectKey);
  await onProgress(0.1, `Reading and checking the ${upload.detectedType === 'xlsx' ? 'workbook' : 'CSV file'}.`);
  let outcome;
  try {
    outcome = await parseOffThread({ kind: 'import', bytes, type: upload.detectedType, limits: importLimits(), mapping: data.mapping }, parseDeadlineMs(upload.sizeBytes, 'import'));
  } catch (error) {
    if (!(error instanceof ImportProblem)) throw error;
    await uploads.update(
      { id: upload.id },
      { status: 'failed', failure: { message: error.message, issues: [...error.issues], issueCount: error.issueCount }, mapping: data.mapping ?? CANONICAL_MAPPING },
    );
    return { kind: 'rejected', problem: error };
  }
  if (outcome.kind === 'needs_mapping') {
    await uploads.update({ id: upload.id }, { status: 'needs_mapping', failure: null, specimenValues: outcome.specimen });
    return { kind: 'needs_mapping' };
  }
  const { readings, specimen } = outcome;
  await onProgress(0.45, `Writing ${readings.count.toLocaleString('en-GB')} readings.`);
  const analysisJobId = await dataSource.transaction(async (manager) => {
    // One import per test at a time: a second waits here, then replaces the first's readings.
    await manager.query('SELECT id FROM consolidation_tests WHERE organisation_id = $1 AND id = $2 FOR UPDATE', [data.orgId, data.testId]);
    let lastReported = 0;
    await replaceReadings(manager, { orgId: data.orgId, testId: data.testId, uploadId: upload.id }, readings, (fraction) => {
      if (fraction - lastReported < 0.2 && fraction < 1) return;
      lastReported = fraction;
      // A lost progress write must not stop the import.
      onProgress(0.45 + 0.45 * fraction, fraction < 1 ? `Writing readings: ${Math.round(fraction * 100)} % sent.` : 'Readings written; finishing.').catch(() => undefined);
    });
    await manager.getRepository(UploadEntity).update(
      { id: upload.id },
      {
        status: 'imported',
        failure: null,
        mapping: data.mapping ?? CANONICAL_MAPPING,
        readingCount: readings.count,
        incrementCount: readings.incrementCount,
        specimenValues: specimen,
        importedAt: new Date(),
      },
    );
    const marked = await markReadingsUploaded(data.orgId, data.testId, { id: data.actorId }, { uploadId: upload.id, manager });
    return marked.analysisJobId;
  });
  return { kind: 'imported', readingCount: readings.count, incrementCount: readings.incrementCount, analysisJobId };
}

