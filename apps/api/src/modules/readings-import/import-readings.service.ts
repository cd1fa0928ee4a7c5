import type { ImportNote } from '@porestack/types';
import { dataSource } from '../../data-source.js';
import type { ImportReadingsJobData } from '../../jobs/import-readings-queue.js';
import { ConsolidationTestEntity } from '../consolidation-tests/consolidation-test.entity.js';
import { markReadingsUploaded } from '../consolidation-tests/consolidation-tests.service.js';
import { replaceReadings } from '../readings/readings-writer.js';
import { getUploadObject } from '../uploads/upload-object.js';
import { UploadEntity } from '../uploads/upload.entity.js';
import { deformationCheck } from './deformation-check.js';
import { CANONICAL_MAPPING } from './detect-layout.js';
import { ImportProblem } from './import-problem.js';
import { importLimits, parseDeadlineMs } from './import-limits.js';
import { parseOffThread } from './parse-pool.js';

export type ImportOutcome =
  | { kind: 'imported'; readingCount: number; incrementCount: number; analysisJobId: string; notes: string | null }
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
      { status: 'failed', failure: { message: error.message, issues: [...error.issues], issueCount: error.issueCount }, notes: [], noteCount: 0, mapping: data.mapping ?? CANONICAL_MAPPING },
    );
    return { kind: 'rejected', problem: error };
  }
  if (outcome.kind === 'needs_mapping') {
    await uploads.update({ id: upload.id }, { status: 'needs_mapping', failure: null, specimenValues: outcome.specimen });
    return { kind: 'needs_mapping' };
  }
  const { readings, specimen } = outcome;
  const test = await dataSource.getRepository(ConsolidationTestEntity).findOneByOrFail({ organisationId: data.orgId, id: data.testId });
  const sheetHeight = specimen['initial_height_mm'];
  const check = deformationCheck(readings, test.initialHeightMm ?? (typeof sheetHeight === 'number' ? sheetHeight : null));
  const notes = check ? [check, ...outcome.notes] : [...outcome.notes];
  const noteCount = outcome.noteCount + (check ? 1 : 0);
  await onProgress(0.45, `Writing ${readings.count.toLocaleString('en-GB')} readings.`);
  // Progress writes are not awaited while the readings stream, but they all land before the
  // import returns: a late one would overwrite the job's final message.
  let progressWritten: Promise<unknown> = Promise.resolve();
  const analysisJobId = await dataSource.transaction(async (manager) => {
    // One import per test at a time: a second waits here, then replaces the first's readings.
    await manager.query('SELECT id FROM consolidation_tests WHERE organisation_id = $1 AND id = $2 FOR UPDATE', [data.orgId, data.testId]);
    let lastReported = 0;
    await replaceReadings(manager, { orgId: data.orgId, testId: data.testId, uploadId: upload.id }, readings, (fraction) => {
      if (fraction - lastReported < 0.2 && fraction < 1) return;
      lastReported = fraction;
      // A lost progress write must not stop the import.
      const message = fraction < 1 ? `Writing readings: ${Math.round(fraction * 100)} % sent.` : 'Readings written; finishing.';
      progressWritten = progressWritten.then(() => onProgress(0.45 + 0.45 * fraction, message)).catch(() => undefined);
    });
    await manager.getRepository(UploadEntity).update(
      { id: upload.id },
      {
        status: 'imported',
        failure: null,
        mapping: data.mapping ?? CANONICAL_MAPPING,
        readingCount: readings.count,
        incrementCount: readings.incrementCount,
        notes,
        noteCount,
        specimenValues: specimen,
        importedAt: new Date(),
      },
    );
    const marked = await markReadingsUploaded(data.orgId, data.testId, { id: data.actorId }, { uploadId: upload.id, manager });
    return marked.analysisJobId;
  });
  await progressWritten;
  return { kind: 'imported', readingCount: readings.count, incrementCount: readings.incrementCount, analysisJobId, notes: summariseNotes(notes, noteCount) };
}


/** One sentence on what the import dropped, replaced or questions, for the job's message (null: nothing). */
function summariseNotes(notes: readonly ImportNote[], noteCount: number): string | null {
  if (noteCount === 0) return null;
  const count = (kind: ImportNote['kind']) => notes.filter((note) => note.kind === kind).length;
  const parts = [
    count('dropped') > 0 ? `${count('dropped')} repeated row${count('dropped') === 1 ? '' : 's'} dropped` : null,
    count('replaced') > 0 ? `${count('replaced')} reading${count('replaced') === 1 ? '' : 's'} at a repeated time replaced by the later one` : null,
    count('check') > 0 ? 'the deformations look implausible' : null,
  ].filter((part): part is string => part !== null);
  const more = noteCount > notes.length ? ` (${noteCount.toLocaleString('en-GB')} notes in all)` : '';
  const sentence = parts.join('; ');
  return `${sentence.charAt(0).toUpperCase()}${sentence.slice(1)}${more}: see the notes on the upload.`;
}
