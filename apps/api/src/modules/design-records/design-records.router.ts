import { DesignRecordQuerySchema } from '@porestack/types';
import { uuidParam } from '../../http/params.js';
import { parse } from '../../http/parse.js';
import { defineRoutes, type RouteGroup } from '../../http/routes.js';
import { traceSetRevision } from '../characteristic-sets/characteristic-sets.service.js';
import { DESIGN_READERS } from '../projects/design-roles.js';
import { designProject } from './design-project.js';
import { listDesignRecords, traceRecordVersion } from './design-records.service.js';

/** Approved soil records as design reads them, and where a parameter came from. */
export function designRecordsRouter(): RouteGroup {
  return defineRoutes('/api/orgs/:orgId/projects/:projectId/design', [
    {
      method: 'get',
      path: '/records',
      access: DESIGN_READERS,
      handler: async (req, res) => {
        const { orgId, projectId } = await designProject(req);
        res.json(await listDesignRecords(orgId, projectId, parse(DesignRecordQuerySchema, req.query)));
      },
    },
    {
      method: 'get',
      path: '/record-versions/:versionId/trace',
      access: DESIGN_READERS,
      handler: async (req, res) => {
        const { orgId, projectId } = await designProject(req);
        res.json(await traceRecordVersion(orgId, projectId, uuidParam(req, 'versionId', 'soil record version')));
      },
    },
    {
      method: 'get',
      path: '/set-revisions/:revisionId/trace',
      access: DESIGN_READERS,
      handler: async (req, res) => {
        const { orgId, projectId } = await designProject(req);
        res.json(await traceSetRevision(orgId, projectId, uuidParam(req, 'revisionId', 'characteristic set revision')));
      },
    },
  ]);
}
