import { createHash, randomUUID } from 'node:crypto';
import type { Readable } from 'node:stream';
import { isFrozenTestStatus, type CsvDelimiter, type ImportMapping, type ImportRequest, type JobRun, type Upload, type UploadPreview } from '@porestack/types';
import { dataSource } from '../../data-source.js';
import { NotFoundError } from '../../errors/domain-error.js';
import { logger } from '../../http/logger.js';
import { enqueueImport } from '../../jobs/import-readings-queue.js';
import { audit } from '../audit/audit.service.js';
import { findTestOrThrow } from '../consolidation-tests/consolidation-tests.service.js';
import { importProfiles } from '../import-profiles/import-profiles.service.js';
import { jobRuns } from '../job-runs/job-runs.service.js';
import { detectLayout, headerOf, suggestMapping } from '../readings-import/detect-layout.js';
import { ImportProblem } from '../readings-import/import-problem.js';
import { importLimits, parseDeadlineMs } from '../readings-import/import-limits.js';
import { parseOffThread } from '../readings-import/parse-pool.js';
import { sniffFileType } from '../readings-import/sniff-file-type.js';
import { UserEntity } from '../users/user.entity.js';
import { toUpload } from './upload-dto.js';
import { UploadEntity } from './upload.entity.js';
import { fileRefused, readingsLocked } from './upload.exception.js';
import { getUploadObject, getUploadObjectStart, putUploadObject, removeUploadObject, streamUploadObject, uploadObjectKey } from './upload-object.js';

const CONTENT_TYPES = { csv: 'text/csv; charset=utf-8', xlsx: 'application/vnd.openxmlformats-officedocument.spreadsheetml.sheet' } as const;
const PREVIEW_ROWS = 20;
/** A CSV preview reads at most this much of the file. */
const CSV_PREVIEW_BYTES = 256 * 1024;

export interface Actor {
  id: string;
  name: string;
}

export interface ReceivedFile {
  originalName: string;
  bytes: Buffer;
}

async function assertReadingsMayChange(orgId: string, testId: string): Promise<void> {
  const test = await findTestOrThrow(orgId, testId);
  if (isFrozenTestStatus(test.status)) throw readingsLocked(test.status);
}

/**
 * Stores an uploaded readings file unchanged and queues its import. The type is decided by
 * content; a file that is neither CSV nor XLSX, or empty, is refused before anything is
 * stored. The object goes to storage first, then the row and the job commit together; if
 * that fails, the object is removed again, so a refused upload leaves nothing behind.
 */
export async function createUpload(orgId: string, testId: string, actor: Actor, file: ReceivedFile): Promise<{ upload: Upload; job: JobRun }> {
  await assertReadingsMayChange(orgId, testId);
  let detectedType;
  try {
    detectedType = sniffFileType(file.bytes);
  } catch (error) {
    if (error instanceof ImportProblem) throw fileRefused(error);
    throw error;
  }
  const uploadId = randomUUID();
  const sha256 = createHash('sha256').update(file.bytes).digest('hex');
  const objectKey = uploadObjectKey(orgId, testId, uploadId, file.originalName);
  await putUploadObject(objectKey, file.bytes, CONTENT_TYPES[detectedType], sha256);
  try {
    const { upload, jobRunId } = await dataSource.transaction(async (manager) => {
      const uploads = manager.getRepository(UploadEntity);
      const upload = await uploads.save(
        uploads.create({
          id: uploadId,
          organisationId: orgId,
          testId,
          objectKey,
          originalName: file.originalName,
          sha256,
          sizeBytes: file.bytes.length,
          detectedType,
          status: 'stored',
          uploadedById: actor.id,
          mapping: null,
          failure: null,
          readingCount: null,
          incrementCount: null,
          specimenValues: {},
          importedAt: null,
        }),
      );
      await audit.record(
        { organisationId: orgId, actorUserId: actor.id, action: 'upload.stored', objectType: 'upload', objectId: uploadId, details: { testId, originalName: file.originalName, sha256, sizeBytes: file.bytes.length } },
        manager,
      );
      const jobRunId = await enqueueImport({ orgId, testId, uploadId, actorId: actor.id, sizeBytes: file.bytes.length, mapping: null }, manager);
      return { upload, jobRunId };
    });
    return { upload: toUpload(upload, actor.name), job: await jobRuns.find(orgId, jobRunId) };
  } catch (error) {
    await removeUploadObject(objectKey).catch((removeError: unknown) => logger.error({ err: removeError, objectKey }, 'could not remove the object of a failed upload'));
    throw error;
  }
}

async function findUploadRow(orgId: string, uploadId: string): Promise<UploadEntity> {
  const row = await dataSource.getRepository(UploadEntity).findOneBy({ organisationId: orgId, id: uploadId });
  if (!row) throw new NotFoundError('upload');
  return row;
}

async function uploaderNames(ids: string[]): Promise<Map<string, string>> {
  if (ids.length === 0) return new Map();
  const users = await dataSource.getRepository(UserEntity).find({ where: ids.map((id) => ({ id })), select: { id: true, name: true } });
  return new Map(users.map((user) => [user.id, user.name]));
}

export async function findUpload(orgId: string, uploadId: string): Promise<Upload> {
  const row = await findUploadRow(orgId, uploadId);
  return toUpload(row, (await uploaderNames([row.uploadedById])).get(row.uploadedById) ?? '');
}

/** The test's uploads, newest first. */
export async function listUploads(orgId: string, testId: string): Promise<Upload[]> {
  await findTestOrThrow(orgId, testId);
  const rows = await dataSource.getRepository(UploadEntity).find({ where: { organisationId: orgId, testId }, order: { createdAt: 'DESC' } });
  const names = await uploaderNames([...new Set(rows.map((row) => row.uploadedById))]);
  return rows.map((row) => toUpload(row, names.get(row.uploadedById) ?? ''));
}

/** The original bytes, as uploaded, with the name they had. */
export async function openDownload(orgId: string, uploadId: string): Promise<{ upload: Upload; contentType: string; stream: Readable }> {
  const row = await findUploadRow(orgId, uploadId);
  return { upload: toUpload(row, ''), contentType: CONTENT_TYPES[row.detectedType], stream: await streamUploadObject(row.objectKey) };
}

/**
 * What a preview needs of the stored file: a workbook whole (its index is at the end), a CSV
 * only its start, cut after the last whole line, so a preview costs the same for any size.
 */
async function previewBytes(row: UploadEntity): Promise<Buffer> {
  if (row.detectedType === 'xlsx' || row.sizeBytes <= CSV_PREVIEW_BYTES) return getUploadObject(row.objectKey);
  const start = await getUploadObjectStart(row.objectKey, CSV_PREVIEW_BYTES);
  const lastLineEnd = start.lastIndexOf(0x0a);
  return lastLineEnd > 0 ? start.subarray(0, lastLineEnd + 1) : start;
}

/** The first rows, the detected layout and a suggested mapping, for the mapping step. */
export async function previewUpload(orgId: string, uploadId: string, delimiter?: CsvDelimiter): Promise<UploadPreview> {
  const row = await findUploadRow(orgId, uploadId);
  const bytes = await previewBytes(row);
  try {
    const { table } = await parseOffThread(
      { kind: 'preview', bytes, type: row.detectedType, limits: importLimits(), delimiter, previewRows: PREVIEW_ROWS + 1 },
      parseDeadlineMs(bytes.length, 'preview'),
    );
    const layout = detectLayout(table);
    const columns = headerOf(table);
    return {
      uploadId,
      detectedType: row.detectedType,
      layout,
      delimiter: table.delimiter,
      columns,
      rows: table.rows.slice(1, PREVIEW_ROWS + 1).map((r) => [...r.cells]),
      suggestedMapping: layout === 'canonical' ? null : suggestMapping(columns),
      specimen: table.specimen,
    };
  } catch (error) {
    if (error instanceof ImportProblem) throw fileRefused(error);
    throw error;
  }
}

/**
 * Queues the import of a stored upload with a mapping — given, or a saved profile's —
 * optionally saving the given mapping as a named profile first.
 */
export async function requestImport(orgId: string, uploadId: string, actor: Actor, request: ImportRequest): Promise<JobRun> {
  const row = await findUploadRow(orgId, uploadId);
  await assertReadingsMayChange(orgId, row.testId);
  const jobRunId = await dataSource.transaction(async (manager) => {
    let mapping: ImportMapping;
    if ('profileId' in request) {
      mapping = (await importProfiles.find(orgId, request.profileId, manager)).mapping;
    } else {
      mapping = request.mapping;
      if (request.saveAsProfile) await importProfiles.create(orgId, actor.id, { name: request.saveAsProfile, mapping }, manager);
    }
    await manager.getRepository(UploadEntity).update({ organisationId: orgId, id: uploadId }, { status: 'importing', mapping, failure: null });
    return enqueueImport({ orgId, testId: row.testId, uploadId, actorId: actor.id, sizeBytes: row.sizeBytes, mapping }, manager);
  });
  return jobRuns.find(orgId, jobRunId);
}
