import { ImportProfileCreateSchema } from '@porestack/types';
import { parse } from '../../http/parse.js';
import { currentTenant, currentUser } from '../../http/request-context.js';
import { defineRoutes, type RouteGroup } from '../../http/routes.js';
import { PROFILE_EDITORS, UPLOAD_READERS } from '../uploads/upload-roles.js';
import { importProfiles } from './import-profiles.service.js';

export function importProfilesRouter(): RouteGroup {
  return defineRoutes('/api/orgs/:orgId/import-profiles', [
    {
      method: 'get',
      path: '/',
      access: UPLOAD_READERS,
      handler: async (req, res) => {
        res.json(await importProfiles.list(currentTenant(req).orgId));
      },
    },
    {
      method: 'post',
      path: '/',
      access: PROFILE_EDITORS,
      handler: async (req, res) => {
        const input = parse(ImportProfileCreateSchema, req.body);
        res.status(201).json(await importProfiles.create(currentTenant(req).orgId, currentUser(req).id, input));
      },
    },
  ]);
}
