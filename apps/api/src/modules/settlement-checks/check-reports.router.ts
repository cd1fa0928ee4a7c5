import type { Request } from 'express';
import { NotFoundError } from '../../errors/domain-error.js';
import { uuidParam } from '../../http/params.js';
import { defineRoutes, type RouteGroup } from '../../http/routes.js';
import { designProject } from '../design-records/design-project.js';
import { DESIGN_WRITERS, ISSUED_CHECK_READERS } from '../projects/design-roles.js';
import { sendDownload } from '../reports/reports.router.js';
import { reportFile } from '../reports/reports.service.js';
import { findIssuedCheck, issueRevision, listIssuedChecks, retryIssuedCheckReport } from './check-issue.service.js';

function revisionParam(req: Request): number {
  const value = Number(req.params['revision']);
  if (!Number.isInteger(value) || value < 1) throw new NotFoundError('revision of this check');
  return value;
}

/**
 * Issuing a settlement check revision and its PDF summary. A designer of the project issues a
 * revision once; the design readers and the project's clients read what was issued. Every
 * route is scoped to the project (designProject: 404 outside the caller's projects).
 */
export function checkReportsRouter(): RouteGroup {
  const revision = '/projects/:projectId/settlement-checks/:checkId/revisions/:revision';
  return defineRoutes('/api/orgs/:orgId', [
    {
      method: 'get',
      path: '/projects/:projectId/issued-checks',
      access: ISSUED_CHECK_READERS,
      handler: async (req, res) => {
        const { orgId, projectId } = await designProject(req);
        res.json(await listIssuedChecks(orgId, projectId));
      },
    },
    {
      method: 'post',
      path: `${revision}/issue`,
      access: DESIGN_WRITERS,
      handler: async (req, res) => {
        const { orgId, projectId, actor } = await designProject(req);
        res.status(202).json(await issueRevision(orgId, projectId, uuidParam(req, 'checkId', 'settlement check'), revisionParam(req), actor));
      },
    },
    {
      method: 'get',
      path: `${revision}/report`,
      access: ISSUED_CHECK_READERS,
      handler: async (req, res) => {
        const { orgId, projectId } = await designProject(req);
        res.json(await findIssuedCheck(orgId, projectId, uuidParam(req, 'checkId', 'settlement check'), revisionParam(req)));
      },
    },
    {
      method: 'get',
      path: `${revision}/report/pdf`,
      access: ISSUED_CHECK_READERS,
      handler: async (req, res) => {
        const { orgId, projectId } = await designProject(req);
        const issued = await findIssuedCheck(orgId, projectId, uuidParam(req, 'checkId', 'settlement check'), revisionParam(req));
        sendDownload(res, { ...(await reportFile(orgId, 'settlement-check', issued.revisionId)), contentType: 'application/pdf' });
      },
    },
    {
      method: 'post',
      path: `${revision}/report/retry`,
      access: DESIGN_WRITERS,
      handler: async (req, res) => {
        const { orgId, projectId, actor } = await designProject(req);
        res.status(202).json(await retryIssuedCheckReport(orgId, projectId, uuidParam(req, 'checkId', 'settlement check'), revisionParam(req), actor));
      },
    },
  ]);
}
