import { ROLE_ACCESS } from '@porestack/types';
import { currentTenant } from '../../http/request-context.js';
import { defineRoutes, type RouteGroup } from '../../http/routes.js';
import { audit } from './audit.service.js';

export function auditRouter(): RouteGroup {
  return defineRoutes('/api/orgs/:orgId/audit', [
    {
      method: 'get',
      path: '/',
      access: ROLE_ACCESS.admins,
      handler: async (req, res) => {
        res.json(await audit.list(currentTenant(req).orgId));
      },
    },
  ]);
}
