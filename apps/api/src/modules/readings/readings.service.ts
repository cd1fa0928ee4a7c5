import type { ConsolidationIncrementInput } from '@porestack/geo-core';
import type { ReadingsPage, ReadingsPageQuery } from '@porestack/types';
import { dataSource } from '../../data-source.js';
import { UploadEntity } from '../uploads/upload.entity.js';
import { ReadingEntity } from './reading.entity.js';

/**
 * The test's stored readings as geo-core increments, in test order (the file's row order),
 * each increment's readings in time order. Empty when nothing has been imported.
 * Part of the contract with the analysis job.
 */
export async function loadIncrements(orgId: string, testId: string): Promise<ConsolidationIncrementInput[]> {
  const rows = (await dataSource.query(
    `SELECT increment_index, stress_kpa, elapsed_min, deformation_mm FROM readings
      WHERE organisation_id = $1 AND test_id = $2 ORDER BY row_number`,
    [orgId, testId],
  )) as Array<{ increment_index: number; stress_kpa: number; elapsed_min: number; deformation_mm: number }>;
  const increments: Array<{ index: number; stressKpa: number; readings: Array<{ elapsedMin: number; deformationMm: number }> }> = [];
  let current: (typeof increments)[number] | undefined;
  for (const row of rows) {
    if (current === undefined || current.index !== row.increment_index) {
      current = { index: row.increment_index, stressKpa: row.stress_kpa, readings: [] };
      increments.push(current);
    }
    current.readings.push({ elapsedMin: row.elapsed_min, deformationMm: row.deformation_mm });
  }
  return increments;
}

/**
 * Key/values of the "specimen" sheet of the workbook the test's readings came from
 * (e.g. { initial_height_mm: 20, diameter_mm: 50 }); empty for a CSV or without readings.
 */
export async function loadSpecimenValues(orgId: string, testId: string): Promise<Record<string, string | number>> {
  const reading = await dataSource.getRepository(ReadingEntity).findOne({ where: { organisationId: orgId, testId }, select: { uploadId: true, rowNumber: true, testId: true } });
  if (!reading) return {};
  const upload = await dataSource.getRepository(UploadEntity).findOneBy({ organisationId: orgId, id: reading.uploadId });
  return upload?.specimenValues ?? {};
}

/** One page of the test's readings for the readings table, in file order. */
export async function listReadings(orgId: string, testId: string, page: ReadingsPageQuery): Promise<ReadingsPage> {
  const repo = dataSource.getRepository(ReadingEntity);
  const [rows, total] = await Promise.all([
    repo.find({ where: { organisationId: orgId, testId }, order: { rowNumber: 'ASC' }, skip: page.offset, take: page.limit }),
    repo.countBy({ organisationId: orgId, testId }),
  ]);
  return {
    total,
    offset: page.offset,
    limit: page.limit,
    readings: rows.map((row) => ({
      rowNumber: row.rowNumber,
      incrementIndex: row.incrementIndex,
      stressKpa: row.stressKpa,
      elapsedMin: row.elapsedMin,
      deformationMm: row.deformationMm,
    })),
  };
}
