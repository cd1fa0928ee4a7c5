import { ReportSettingsSchema } from '@porestack/types';
import { parse } from '../../http/parse.js';
import { currentTenant, currentUser } from '../../http/request-context.js';
import { defineRoutes, type RouteGroup } from '../../http/routes.js';
import { getReportSettings, updateReportSettings } from './report-settings.service.js';

/** What the laboratory prints about itself on its reports: read by who issues them, set by admins. */
export function reportSettingsRouter(): RouteGroup {
  return defineRoutes('/api/orgs/:orgId/report-settings', [
    { method: 'get', path: '/', access: ['admin', 'lab_manager'], handler: async (req, res) => res.json(await getReportSettings(currentTenant(req).orgId)) },
    {
      method: 'put',
      path: '/',
      access: ['admin'],
      handler: async (req, res) => res.json(await updateReportSettings(currentTenant(req).orgId, parse(ReportSettingsSchema, req.body), currentUser(req))),
    },
  ]);
}
