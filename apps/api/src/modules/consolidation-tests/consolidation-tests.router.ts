import { PicksUpdateSchema, TestCreateSchema, TestListQuerySchema, TestUpdateSchema } from '@porestack/types';
import { sendJsonBody } from '../../http/json-body.js';
import { uuidParam } from '../../http/params.js';
import { parse } from '../../http/parse.js';
import { currentTenant, currentUser } from '../../http/request-context.js';
import { defineRoutes, type RouteGroup } from '../../http/routes.js';
import { currentAnalysis, toAnalysis } from '../analyses/analyses.service.js';
import { requestAnalysis, setPicks } from '../analyses/picks.service.js';
import { jobRuns } from '../job-runs/job-runs.service.js';
import { LAB_READERS, LAB_WORKERS } from '../projects/lab-roles.js';
import { viewerFor } from '../projects/project-scope.js';
import { createTest, updateTest } from './consolidation-tests.service.js';
import { getTestDetail, listTestsBody, readTestDetailBody } from './tests-query.service.js';

export function consolidationTestsRouter(): RouteGroup {
  return defineRoutes('/api/orgs/:orgId', [
    {
      method: 'post',
      path: '/samples/:sampleId/tests',
      access: LAB_WORKERS,
      handler: async (req, res) => {
        const { orgId } = currentTenant(req);
        const id = await createTest(orgId, uuidParam(req, 'sampleId', 'sample'), parse(TestCreateSchema, req.body), currentUser(req));
        res.status(201).json(await getTestDetail(orgId, id));
      },
    },
    {
      method: 'get',
      path: '/tests',
      access: LAB_READERS,
      handler: async (req, res) => sendJsonBody(res, await listTestsBody(await viewerFor(req), parse(TestListQuerySchema, req.query))),
    },
    {
      method: 'get',
      path: '/tests/:testId',
      access: LAB_READERS,
      handler: async (req, res) => sendJsonBody(res, await readTestDetailBody(await viewerFor(req), uuidParam(req, 'testId', 'test'))),
    },
    {
      method: 'patch',
      path: '/tests/:testId',
      access: LAB_WORKERS,
      handler: async (req, res) => {
        const { orgId } = currentTenant(req);
        const testId = uuidParam(req, 'testId', 'test');
        const { analysisJobId } = await updateTest(orgId, testId, parse(TestUpdateSchema, req.body), currentUser(req));
        res.json({ test: await getTestDetail(orgId, testId), job: analysisJobId ? await jobRuns.find(orgId, analysisJobId) : null });
      },
    },
    {
      method: 'get',
      path: '/tests/:testId/analysis',
      access: LAB_READERS,
      handler: async (req, res) => res.json(toAnalysis(await currentAnalysis(await viewerFor(req), uuidParam(req, 'testId', 'test')))),
    },
    {
      method: 'post',
      path: '/tests/:testId/analysis',
      access: LAB_WORKERS,
      handler: async (req, res) => {
        const { orgId } = currentTenant(req);
        const jobId = await requestAnalysis(orgId, uuidParam(req, 'testId', 'test'), currentUser(req));
        res.status(202).json({ job: await jobRuns.find(orgId, jobId) });
      },
    },
    {
      method: 'put',
      path: '/tests/:testId/picks',
      access: LAB_WORKERS,
      handler: async (req, res) => {
        const { orgId } = currentTenant(req);
        const jobId = await setPicks(orgId, uuidParam(req, 'testId', 'test'), parse(PicksUpdateSchema, req.body), currentUser(req));
        res.status(202).json({ job: await jobRuns.find(orgId, jobId) });
      },
    },
  ]);
}
