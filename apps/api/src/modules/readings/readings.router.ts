import { ReadingsPageQuerySchema } from '@porestack/types';
import type { Router } from 'express';
import { uuidParam } from '../../http/params.js';
import { parse } from '../../http/parse.js';
import { currentTenant } from '../../http/request-context.js';
import { defineRoutes } from '../../http/routes.js';
import { findTestOrThrow } from '../consolidation-tests/consolidation-tests.service.js';
import { LAB_READERS } from '../projects/lab-roles.js';
import { listReadings } from './readings.service.js';

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
        const page = parse(ReadingsPageQuerySchema, req.query);
        await findTestOrThrow(orgId, testId);
        res.json(await listReadings(orgId, testId, page));
      },
    },
  ]);
}
