import { uuidParam, versionParam } from '../../http/params.js';
import { defineRoutes, type RouteGroup } from '../../http/routes.js';
import { RECORD_READERS } from '../projects/lab-roles.js';
import { viewerFor } from '../projects/project-scope.js';
import { issuedTestSummary, projectResults } from './issued-results.service.js';

/** What a project has issued — approved versions only — for everyone who may read the project, clients included. */
export function issuedResultsRouter(): RouteGroup {
  return defineRoutes('/api/orgs/:orgId', [
    {
      method: 'get',
      path: '/projects/:projectId/results',
      access: RECORD_READERS,
      handler: async (req, res) => res.json(await projectResults(await viewerFor(req), uuidParam(req, 'projectId', 'project'))),
    },
    {
      method: 'get',
      path: '/soil-records/:recordId/versions/:version/summary',
      access: RECORD_READERS,
      handler: async (req, res) => {
        const version = versionParam(req);
        res.json(await issuedTestSummary(await viewerFor(req), uuidParam(req, 'recordId', 'soil record'), version));
      },
    },
  ]);
}
