import { ReadingsPageQuerySchema } from '@porestack/types';
import { z } from 'zod';
import { uuidParam } from '../../http/params.js';
import { parse } from '../../http/parse.js';
import { defineRoutes, type RouteGroup } from '../../http/routes.js';
import { LAB_READERS } from '../projects/lab-roles.js';
import { viewerFor } from '../projects/project-scope.js';
import { readReadings } from './readings.service.js';

/** `?increment=N` narrows the page to one increment (for its time plots); offset and limit count within it. */
const ReadingsQuerySchema = ReadingsPageQuerySchema.extend({
  increment: z.coerce.number({ error: 'increment must be a whole number (the increment index).' }).int('increment must be a whole number (the increment index).').min(0, 'increment cannot be negative.').optional(),
});

/**
 * The imported readings, page by page, for the test page's table and time plots. Whoever may open
 * the test (project-scope.ts: the lab; a project's designer while it stands approved) may read its
 * readings: they are what its plots show.
 */
export function readingsRouter(): RouteGroup {
  return defineRoutes('/api/orgs/:orgId/tests/:testId/readings', [
    {
      method: 'get',
      path: '/',
      access: LAB_READERS,
      handler: async (req, res) => res.json(await readReadings(await viewerFor(req), uuidParam(req, 'testId', 'test'), parse(ReadingsQuerySchema, req.query))),
    },
  ]);
}
