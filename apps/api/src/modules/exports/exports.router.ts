import type { Router } from 'express';
import { dataSource } from '../../data-source.js';
import { NotFoundError } from '../../errors/domain-error.js';
import { uuidParam } from '../../http/params.js';
import { currentTenant, currentUser } from '../../http/request-context.js';
import { defineRoutes } from '../../http/routes.js';
import { LAB_READERS, RECORD_READERS } from '../projects/lab-roles.js';
import { assertProjectInScope } from '../projects/project-scope.js';
import { sendDownload } from '../reports/reports.router.js';
import { loadCurrentAnalysisRecord, loadVersionRecord } from '../reports/test-report/test-record.js';
import { versionInScope } from '../reports/version-subject.js';
import { projectParametersWorkbook } from './project-parameters.workbook.js';
import { reducedDataWorkbook } from './reduced-data.workbook.js';

const XLSX = 'application/vnd.openxmlformats-officedocument.spreadsheetml.sheet';

export function exportsRouter(): Router {
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
      // The working export of a test's newest analysis, approved or not: lab staff and the project's designers.
      method: 'get',
      path: '/tests/:testId/data.xlsx',
      access: LAB_READERS,
      handler: async (req, res) => {
        const tenant = currentTenant(req);
        const testId = uuidParam(req, 'testId', 'test');
        const [test] = (await dataSource.query(
          'SELECT b.project_id FROM consolidation_tests t JOIN samples s ON s.id = t.sample_id JOIN boreholes b ON b.id = s.borehole_id WHERE t.organisation_id = $1 AND t.id = $2',
          [tenant.orgId, testId],
        )) as Array<{ project_id: string }>;
        if (!test) throw new NotFoundError('test');
        await assertProjectInScope(tenant, currentUser(req).id, test.project_id);
        sendDownload(res, { ...(await reducedDataWorkbook(await loadCurrentAnalysisRecord(tenant.orgId, testId))), contentType: XLSX });
      },
    },
  ]);
}
