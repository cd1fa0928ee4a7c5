import { defineRoutes, type RouteGroup } from '../../http/routes.js';
import { UPLOAD_READERS } from '../uploads/upload-roles.js';
import { canonicalCsvTemplate, canonicalXlsxTemplate } from './demo-files.js';

let xlsxTemplate: Promise<Buffer> | undefined;

/** Templates of the canonical layout filled with the invented demo test's readings. */
export function templatesRouter(): RouteGroup {
  return defineRoutes('/api/orgs/:orgId/templates', [
    {
      method: 'get',
      path: '/readings.csv',
      access: UPLOAD_READERS,
      handler: (_req, res) => {
        res.setHeader('content-type', 'text/csv; charset=utf-8');
        res.setHeader('content-disposition', 'attachment; filename="porestack-readings-template.csv"');
        res.send(canonicalCsvTemplate());
      },
    },
    {
      method: 'get',
      path: '/readings.xlsx',
      access: UPLOAD_READERS,
      handler: async (_req, res) => {
        xlsxTemplate ??= canonicalXlsxTemplate();
        res.setHeader('content-type', 'application/vnd.openxmlformats-officedocument.spreadsheetml.sheet');
        res.setHeader('content-disposition', 'attachment; filename="porestack-readings-template.xlsx"');
        res.send(await xlsxTemplate);
      },
    },
  ]);
}
