import { SoilRecordListQuerySchema } from '@porestack/types';
import type { Router } from 'express';
import { NotFoundError } from '../../errors/domain-error.js';
import { uuidParam } from '../../http/params.js';
import { parse } from '../../http/parse.js';
import { currentTenant } from '../../http/request-context.js';
import { defineRoutes } from '../../http/routes.js';
import { RECORD_READERS } from '../projects/lab-roles.js';
import { getSoilRecord, getSoilRecordVersion, listSoilRecords } from './soil-records.service.js';

export function soilRecordsRouter(): Router {
  return defineRoutes('/api/orgs/:orgId/soil-records', [
    {
      method: 'get',
      path: '/',
      access: RECORD_READERS,
      handler: async (req, res) => res.json(await listSoilRecords(currentTenant(req).orgId, parse(SoilRecordListQuerySchema, req.query).projectId)),
    },
    {
      method: 'get',
      path: '/:recordId',
      access: RECORD_READERS,
      handler: async (req, res) => res.json(await getSoilRecord(currentTenant(req).orgId, uuidParam(req, 'recordId', 'soil record'))),
    },
    {
      method: 'get',
      path: '/:recordId/versions/:version',
      access: RECORD_READERS,
      handler: async (req, res) => {
        const version = Number(req.params['version']);
        if (!Number.isInteger(version) || version < 1) throw new NotFoundError('soil record version');
        res.json(await getSoilRecordVersion(currentTenant(req).orgId, uuidParam(req, 'recordId', 'soil record'), version));
      },
    },
  ]);
}
