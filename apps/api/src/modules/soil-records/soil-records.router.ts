import { SoilRecordListQuerySchema } from '@porestack/types';
import { uuidParam, versionParam } from '../../http/params.js';
import { parse } from '../../http/parse.js';
import { defineRoutes, type RouteGroup } from '../../http/routes.js';
import { RECORD_READERS } from '../projects/lab-roles.js';
import { viewerFor } from '../projects/project-scope.js';
import { getSoilRecord, getSoilRecordVersion, listSoilRecords } from './soil-records.service.js';

export function soilRecordsRouter(): RouteGroup {
  return defineRoutes('/api/orgs/:orgId/soil-records', [
    {
      method: 'get',
      path: '/',
      access: RECORD_READERS,
      handler: async (req, res) => res.json(await listSoilRecords(await viewerFor(req), parse(SoilRecordListQuerySchema, req.query).projectId)),
    },
    {
      method: 'get',
      path: '/:recordId',
      access: RECORD_READERS,
      handler: async (req, res) => res.json(await getSoilRecord(await viewerFor(req), uuidParam(req, 'recordId', 'soil record'))),
    },
    {
      method: 'get',
      path: '/:recordId/versions/:version',
      access: RECORD_READERS,
      handler: async (req, res) => {
        const version = versionParam(req);
        res.json(await getSoilRecordVersion(await viewerFor(req), uuidParam(req, 'recordId', 'soil record'), version));
      },
    },
  ]);
}
