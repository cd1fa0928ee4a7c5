import { uuidParam } from '../../http/params.js';
import { defineRoutes, type RouteGroup } from '../../http/routes.js';
import { LAB_READERS } from '../projects/lab-roles.js';
import { viewerFor } from '../projects/project-scope.js';
import { jobRuns } from './job-runs.service.js';

export function jobRunsRouter(): RouteGroup {
  return defineRoutes('/api/orgs/:orgId/jobs', [
    {
      method: 'get',
      path: '/:jobId',
      access: LAB_READERS,
      handler: async (req, res) => {
        res.json(await jobRuns.findFor(await viewerFor(req), uuidParam(req, 'jobId', 'job')));
      },
    },
  ]);
}
