import type { ConsolidationIncrementInput } from '@porestack/geo-core';
import type { ReadingsPage, ReadingsPageQuery } from '@porestack/types';
import { dataSource } from '../../data-source.js';
import { assertTestOpenable, type Viewer } from '../projects/project-scope.js';
import { UploadEntity } from '../uploads/upload.entity.js';
import { ReadingEntity } from './reading.entity.js';

/**
 * The test's stored readings as geo-core increments, in test order (the file's row order),
 * each increment's readings in time order. Empty when nothing has been imported.
 * Part of the contract with the analysis job.
 */
export async function loadIncrements(orgId: string, testId: string): Promise<ConsolidationIncrementInput[]> {
  // One row per increment with its readings as arrays: 200,000 readings arrive as 10 rows
  // of float8[] instead of 200,000 row objects (measured 1.0 s → see the import benchmark).
  const rows = (await dataSource.query(
    `SELECT increment_index, min(stress_kpa) AS stress_kpa,
            array_agg(elapsed_min ORDER BY row_number) AS elapsed_min,
            array_agg(deformation_mm ORDER BY row_number) AS deformation_mm
       FROM readings WHERE organisation_id = $1 AND test_id = $2
      GROUP BY increment_index ORDER BY min(row_number)`,
    [orgId, testId],
  )) as Array<{ increment_index: number; stress_kpa: number; elapsed_min: number[]; deformation_mm: number[] }>;
  return rows.map((row) => ({
    index: row.increment_index,
    stressKpa: row.stress_kpa,
    readings: row.elapsed_min.map((elapsedMin, i) => ({ elapsedMin, deformationMm: row.deformation_mm[i] as number })),
  }));
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

async function listIncrementReadings(orgId: string, testId: string, incrementIndex: number, offset: number, limit: number): Promise<ReadingsPage> {
  const repo = dataSource.getRepository(ReadingEntity);
  const where = { organisationId: orgId, testId, incrementIndex };
  const [rows, total] = await Promise.all([repo.find({ where, order: { rowNumber: 'ASC' }, skip: offset, take: limit }), repo.countBy(where)]);
  return {
    total,
    offset,
    limit,
    readings: rows.map((r) => ({ rowNumber: r.rowNumber, incrementIndex: r.incrementIndex, stressKpa: r.stressKpa, elapsedMin: r.elapsedMin, deformationMm: r.deformationMm })),
  };
}

/**
 * A page of the test's readings for whoever may open the test (project-scope.ts), all of them or
 * one increment's (for its time plots); 404 like a missing test otherwise.
 */
export async function readReadings(viewer: Viewer, testId: string, query: ReadingsPageQuery & { increment?: number | undefined }): Promise<ReadingsPage> {
  await assertTestOpenable(viewer, testId);
  const { increment, ...page } = query;
  return increment === undefined ? listReadings(viewer.orgId, testId, page) : listIncrementReadings(viewer.orgId, testId, increment, page.offset, page.limit);
}
