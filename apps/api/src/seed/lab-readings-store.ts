import { createHash } from 'node:crypto';
import { READINGS_CSV_HEADER, type ConsolidationIncrementInput } from '@porestack/geo-core';
import type { EntityManager } from 'typeorm';
import { UploadEntity } from '../modules/uploads/upload.entity.js';
import { bucketName, storage } from '../storage/storage.js';

/** Deformation as a logger writes it, to 0.0001 mm: generated readings carry every digit of a double. */
const roundToTenthMicron = (mm: number): number => Math.round(mm * 10_000) / 10_000;

/** The increments as geo-core's canonical readings CSV (what a technician would upload). */
function incrementsToCsv(increments: readonly ConsolidationIncrementInput[]): string {
  const lines = [READINGS_CSV_HEADER.join(',')];
  for (const increment of increments) {
    for (const reading of increment.readings) lines.push(`${increment.index},${increment.stressKpa},${reading.elapsedMin},${reading.deformationMm}`);
  }
  return `${lines.join('\n')}\n`;
}

/**
 * Stores generated readings as if a technician had uploaded and imported the canonical CSV:
 * the file in object storage, its upload row with the SHA-256, and the readings rows, the
 * deformations rounded to 0.0001 mm in both. Used by the demo seed and by the API tests
 * (which need readings without the import UI).
 * @returns the upload id.
 */
export async function storeReadings(
  manager: EntityManager,
  target: { orgId: string; testId: string; uploadedById: string; fileName: string },
  generated: readonly ConsolidationIncrementInput[],
): Promise<string> {
  const increments = generated.map((increment) => ({
    ...increment,
    readings: increment.readings.map((reading) => ({ ...reading, deformationMm: roundToTenthMicron(reading.deformationMm) })),
  }));
  const csv = Buffer.from(incrementsToCsv(increments), 'utf8');
  const uploads = manager.getRepository(UploadEntity);
  const upload = await uploads.save(
    uploads.create({
      organisationId: target.orgId,
      testId: target.testId,
      objectKey: 'pending',
      originalName: target.fileName,
      sha256: createHash('sha256').update(csv).digest('hex'),
      sizeBytes: csv.length,
      detectedType: 'csv',
      status: 'imported',
      uploadedById: target.uploadedById,
      mapping: null,
      failure: null,
      readingCount: increments.reduce((sum, i) => sum + i.readings.length, 0),
      incrementCount: increments.length,
      specimenValues: {},
      importedAt: new Date(),
    }),
  );
  const objectKey = `orgs/${target.orgId}/tests/${target.testId}/uploads/${upload.id}/${target.fileName}`;
  await storage().putObject(bucketName(), objectKey, csv, csv.length, { 'Content-Type': 'text/csv' });
  await uploads.update({ id: upload.id }, { objectKey });
  await manager.query('DELETE FROM readings WHERE organisation_id = $1 AND test_id = $2', [target.orgId, target.testId]);
  const values: unknown[] = [];
  const rows: string[] = [];
  let rowNumber = 1;
  for (const increment of increments) {
    for (const reading of increment.readings) {
      rowNumber += 1; // row 1 of the file is the header
      const at = values.length;
      values.push(target.testId, rowNumber, target.orgId, upload.id, increment.index, increment.stressKpa, reading.elapsedMin, reading.deformationMm);
      rows.push(`($${at + 1}, $${at + 2}, $${at + 3}, $${at + 4}, $${at + 5}, $${at + 6}, $${at + 7}, $${at + 8})`);
    }
  }
  // One multi-row INSERT: a demo test has a few hundred readings.
  await manager.query(
    `INSERT INTO readings (test_id, row_number, organisation_id, upload_id, increment_index, stress_kpa, elapsed_min, deformation_mm) VALUES ${rows.join(', ')}`,
    values,
  );
  return upload.id;
}
