import { ApprovalSchema, ChangeRequestSchema } from '@porestack/types';
import { uuidParam } from '../../http/params.js';
import { parse } from '../../http/parse.js';
import { currentTenant, currentUser } from '../../http/request-context.js';
import { defineRoutes, type RouteGroup } from '../../http/routes.js';
import { getTestDetail } from '../consolidation-tests/tests-query.service.js';
import { LAB_READERS, LAB_WORKERS, REVIEWERS } from '../projects/lab-roles.js';
import { viewerFor } from '../projects/project-scope.js';
import { approveTest, listReviewEvents, requestChanges, reviewQueue, submitTest } from './reviews.service.js';

export function reviewsRouter(): RouteGroup {
  return defineRoutes('/api/orgs/:orgId', [
    {
      method: 'post',
      path: '/tests/:testId/submit',
      access: LAB_WORKERS,
      handler: async (req, res) => {
        const { orgId } = currentTenant(req);
        const testId = uuidParam(req, 'testId', 'test');
        await submitTest(orgId, testId, currentUser(req));
        res.json(await getTestDetail(orgId, testId));
      },
    },
    { method: 'get', path: '/review-queue', access: REVIEWERS, handler: async (req, res) => res.json(await reviewQueue(currentTenant(req).orgId)) },
    {
      method: 'post',
      path: '/tests/:testId/approve',
      access: REVIEWERS,
      handler: async (req, res) => {
        const { orgId } = currentTenant(req);
        const testId = uuidParam(req, 'testId', 'test');
        const { comment } = parse(ApprovalSchema, req.body);
        const version = await approveTest(orgId, testId, currentUser(req), comment ?? null);
        res.json({ test: await getTestDetail(orgId, testId), soilRecord: version });
      },
    },
    {
      method: 'post',
      path: '/tests/:testId/request-changes',
      access: REVIEWERS,
      handler: async (req, res) => {
        const { orgId } = currentTenant(req);
        const testId = uuidParam(req, 'testId', 'test');
        await requestChanges(orgId, testId, currentUser(req), parse(ChangeRequestSchema, req.body).comment);
        res.json(await getTestDetail(orgId, testId));
      },
    },
    {
      method: 'get',
      path: '/tests/:testId/reviews',
      access: LAB_READERS,
      handler: async (req, res) => res.json(await listReviewEvents(await viewerFor(req), uuidParam(req, 'testId', 'test'))),
    },
  ]);
}
