import { ROLES } from '@porestack/types';
import { currentTenant, currentUser } from '../../http/request-context.js';
import { defineRoutes, type RouteGroup } from '../../http/routes.js';
import { homeOverview } from './home.service.js';

/** The home page of every member: sections for the roles they hold. */
export function homeRouter(): RouteGroup {
  return defineRoutes('/api/orgs/:orgId/home', [
    { method: 'get', path: '/', access: ROLES, handler: async (req, res) => res.json(await homeOverview(currentTenant(req), currentUser(req).id)) },
  ]);
}
