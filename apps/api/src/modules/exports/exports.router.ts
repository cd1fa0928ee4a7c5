import { uuidParam } from '../../http/params.js';
import { currentTenant, currentUser } from '../../http/request-context.js';
import { defineRoutes, type RouteGroup } from '../../http/routes.js';
import { LAB_READERS, RECORD_READERS } from '../projects/lab-roles.js';
import { assertProjectInScope, assertTestOpenable, viewerFor } from '../projects/project-scope.js';
import { sendDownload } from '../reports/reports.router.js';
import { loadCurrentAnalysisRecord, loadVersionRecord } from '../reports/test-report/test-record.js';
import { versionInScope } from '../reports/version-subject.js';
import { projectParametersWorkbook } from './project-parameters.workbook.js';
import { reducedDataWorkbook } from './reduced-data.workbook.js';

const XLSX = 'application/vnd.openxmlformats-officedocument.spreadsheetml.sheet';

export function exportsRouter(): RouteGroup {
  return defineRoutes('/api/orgs/:orgId', [
    {
      method: 'get',
      path: '/projects/:projectId/parameters.xlsx',
      access: RECORD_READERS,
      handler: async (req, res) => {
        const tenant = currentTenant(req);
        const projectId = uuidParam(req, 'projectId', 'project');
        await assertProjectInScope(tenant, currentUser(req).id, projectId);
        sendDownload(res, { ...(await projectParametersWorkbook(tenant.orgId, projectId)), contentType: XLSX });
      },
    },
    {
      method: 'get',
      path: '/soil-records/:recordId/versions/:version/data.xlsx',
      access: RECORD_READERS,
      handler: async (req, res) => {
        const { orgId, versionId } = await versionInScope(req);
        sendDownload(res, { ...(await reducedDataWorkbook(await loadVersionRecord(orgId, versionId))), contentType: XLSX });
      },
    },
    {
      // The working export of a test's newest analysis: lab staff whatever its state; a project's
      // designer only while the test stands approved (then it is the approved analysis), as for the test itself.
      method: 'get',
      path: '/tests/:testId/data.xlsx',
      access: LAB_READERS,
      handler: async (req, res) => {
        const viewer = await viewerFor(req);
        const testId = uuidParam(req, 'testId', 'test');
        await assertTestOpenable(viewer, testId);
        sendDownload(res, { ...(await reducedDataWorkbook(await loadCurrentAnalysisRecord(viewer.orgId, testId))), contentType: XLSX });
      },
    },
  ]);
}
