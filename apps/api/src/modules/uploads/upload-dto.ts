import type { SameFile, Upload } from '@porestack/types';
import type { UploadEntity } from './upload.entity.js';

export function toUpload(row: UploadEntity, uploaderName: string, sameFileIn: SameFile[]): Upload {
  return {
    id: row.id,
    testId: row.testId,
    originalName: row.originalName,
    sizeBytes: row.sizeBytes,
    sha256: row.sha256,
    detectedType: row.detectedType,
    status: row.status,
    uploadedBy: { id: row.uploadedById, name: uploaderName },
    createdAt: row.createdAt.toISOString(),
    readingCount: row.readingCount,
    incrementCount: row.incrementCount,
    failure: row.failure,
    mapping: row.mapping,
    notes: row.notes,
    noteCount: row.noteCount,
    sameFileIn,
  };
}
