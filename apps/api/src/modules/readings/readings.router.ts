import { ReadingsPageQuerySchema, type ReadingsPage } from '@porestack/types';
import { z } from 'zod';
import { dataSource } from '../../data-source.js';
import type { Router } from 'express';
import { uuidParam } from '../../http/params.js';
import { parse } from '../../http/parse.js';
import { currentTenant } from '../../http/request-context.js';
import { defineRoutes } from '../../http/routes.js';
import { findTestOrThrow } from '../consolidation-tests/consolidation-tests.service.js';
import { LAB_READERS } from '../projects/lab-roles.js';
import { ReadingEntity } from './reading.entity.js';
import { listReadings } from './readings.service.js';

/** `?increment=N` narrows the page to one increment (for its time plots); offset and limit count within it. */
const ReadingsQuerySchema = ReadingsPageQuerySchema.extend({
  increment: z.coerce.number({ error: 'increment must be a whole number (the increment index).' }).int('increment must be a whole number (the increment index).').min(0, 'increment cannot be negative.').optional(),
});

async function listIncrementReadings(orgId: string, testId: string, incrementIndex: number, offset: number, limit: number): Promise<ReadingsPage> {
  const repo = dataSource.getRepository(ReadingEntity);
  const where = { organisationId: orgId, testId, incrementIndex };
  const [rows, total] = await Promise.all([repo.find({ where, order: { sheetIndex: 'ASC', rowNumber: 'ASC' }, skip: offset, take: limit }), repo.countBy(where)]);
  return {
    total,
    offset,
    limit,
    readings: rows.map((r) => ({ sheetIndex: r.sheetIndex, rowNumber: r.rowNumber, incrementIndex: r.incrementIndex, stressKpa: r.stressKpa, elapsedMin: r.elapsedMin, deformationMm: r.deformationMm })),
  };
}

/**
 * The imported readings, page by page, for the test page's table. Whoever may read the test
 * (LAB_READERS, designers included) may read its readings: they are what its plots show.
 */
export function readingsRouter(): Router {
  return defineRoutes('/api/orgs/:orgId/tests/:testId/readings', [
    {
      method: 'get',
      path: '/',
      access: LAB_READERS,
      handler: async (req, res) => {
        const orgId = currentTenant(req).orgId;
        const testId = uuidParam(req, 'testId', 'test');
        const { increment, ...page } = parse(ReadingsQuerySchema, req.query);
        await findTestOrThrow(orgId, testId);
        res.json(increment === undefined ? await listReadings(orgId, testId, page) : await listIncrementReadings(orgId, testId, increment, page.offset, page.limit));
      },
    },
  ]);
}
