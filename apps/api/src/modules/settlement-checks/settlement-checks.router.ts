import { CompareQuerySchema, FootingPasteSchema, RunCheckSchema, SettlementCheckCreateSchema, SettlementCheckUpdateSchema, SizingApplySchema, SizingRequestSchema } from '@porestack/types';
import multer from 'multer';
import type { Request, RequestHandler } from 'express';
import { z } from 'zod';
import { DomainError, NotFoundError } from '../../errors/domain-error.js';
import { uuidParam } from '../../http/params.js';
import { parse } from '../../http/parse.js';
import { currentTenant, currentUser } from '../../http/request-context.js';
import { defineRoutes, type RouteGroup } from '../../http/routes.js';
import { designProject } from '../design-records/design-project.js';
import { DESIGN_READERS, DESIGN_WRITERS } from '../projects/design-roles.js';
import { projectScope } from '../projects/project-scope.js';
import { checkWorkbook } from './check-workbook.js';
import { getFootingResult, getRevision, runCheck } from './check-runs.service.js';
import { compareRevisions } from './compare-revisions.js';
import { FOOTING_FILE_MAX_BYTES, importFootingFile, tableFromText } from './footing-import.js';
import { footingRowsFromTable } from './footing-table.js';
import { parseCheckBody } from './parse-check-body.js';
import { rerunWithNewerParameters } from './rerun-newer.js';
import { applySizing, createCheck, getCheck, listProjectChecks, listScopedChecks, updateCheck } from './settlement-checks.service.js';
import { sizeFooting } from './sizing.service.js';

const ScopedListQuerySchema = z.object({ newerParametersApproved: z.enum(['true', 'false']).optional() });

function revisionParam(req: Request): number {
  const value = Number(req.params['revision']);
  if (!Number.isInteger(value) || value < 1) throw new NotFoundError('revision of this check');
  return value;
}

const receiveSchedule = multer({ storage: multer.memoryStorage(), limits: { fileSize: FOOTING_FILE_MAX_BYTES, files: 1, fields: 5 } }).single('file');

/** The schedule file in memory only; an oversized one is refused with a message, not a 500. */
const footingFile: RequestHandler = (req, res, next) => {
  receiveSchedule(req, res, (error: unknown) => {
    if (error instanceof multer.MulterError && error.code === 'LIMIT_FILE_SIZE') {
      next(new DomainError('payload_too_large', 'The file is larger than 5 MB, far more than a footing schedule. Choose the schedule itself.'));
      return;
    }
    next(error);
  });
};

/** Settlement checks of a project: the draft, its runs (revisions), sizing, comparison and the workbook. */
export function settlementChecksRouter(): RouteGroup {
  return defineRoutes('/api/orgs/:orgId', [
    {
      method: 'get',
      path: '/settlement-checks',
      access: DESIGN_READERS,
      handler: async (req, res) => {
        // Across the caller's projects; ?newerParametersApproved=true lists only checks to re-run (the designer's home).
        const tenant = currentTenant(req);
        const query = parse(ScopedListQuerySchema, req.query);
        res.json(await listScopedChecks(tenant.orgId, await projectScope(tenant, currentUser(req).id), query.newerParametersApproved === 'true'));
      },
    },
    {
      method: 'get',
      path: '/projects/:projectId/settlement-checks',
      access: DESIGN_READERS,
      handler: async (req, res) => {
        const { orgId, projectId } = await designProject(req);
        res.json(await listProjectChecks(orgId, projectId));
      },
    },
    {
      method: 'post',
      path: '/projects/:projectId/settlement-checks',
      access: DESIGN_WRITERS,
      handler: async (req, res) => {
        const { orgId, projectId, actor } = await designProject(req);
        res.status(201).json(await createCheck(orgId, projectId, parseCheckBody(SettlementCheckCreateSchema, req.body), actor));
      },
    },
    {
      method: 'post',
      path: '/projects/:projectId/settlement-checks/footings/import',
      access: DESIGN_WRITERS,
      before: [footingFile],
      handler: async (req, res) => {
        await designProject(req);
        res.json(await importFootingFile(req.file?.buffer));
      },
    },
    {
      method: 'post',
      path: '/projects/:projectId/settlement-checks/footings/paste',
      access: DESIGN_WRITERS,
      handler: async (req, res) => {
        await designProject(req);
        res.json(footingRowsFromTable(tableFromText(parse(FootingPasteSchema, req.body).text)));
      },
    },
    {
      method: 'get',
      path: '/projects/:projectId/settlement-checks/:checkId',
      access: DESIGN_READERS,
      handler: async (req, res) => {
        const { orgId, projectId } = await designProject(req);
        res.json(await getCheck(orgId, projectId, uuidParam(req, 'checkId', 'settlement check')));
      },
    },
    {
      method: 'patch',
      path: '/projects/:projectId/settlement-checks/:checkId',
      access: DESIGN_WRITERS,
      handler: async (req, res) => {
        const { orgId, projectId, actor } = await designProject(req);
        res.json(await updateCheck(orgId, projectId, uuidParam(req, 'checkId', 'settlement check'), parseCheckBody(SettlementCheckUpdateSchema, req.body), actor));
      },
    },
    {
      method: 'post',
      path: '/projects/:projectId/settlement-checks/:checkId/runs',
      access: DESIGN_WRITERS,
      handler: async (req, res) => {
        const { orgId, projectId, actor } = await designProject(req);
        const answer = await runCheck(orgId, projectId, uuidParam(req, 'checkId', 'settlement check'), parse(RunCheckSchema, req.body).reason, actor.id);
        res.status(answer.kind === 'done' ? 201 : 202).json(answer);
      },
    },
    {
      method: 'post',
      path: '/projects/:projectId/settlement-checks/:checkId/rerun-with-newer-parameters',
      access: DESIGN_WRITERS,
      handler: async (req, res) => {
        const { orgId, projectId, actor } = await designProject(req);
        const answer = await rerunWithNewerParameters(orgId, projectId, uuidParam(req, 'checkId', 'settlement check'), actor);
        res.status(answer.kind === 'done' ? 201 : 202).json(answer);
      },
    },
    {
      method: 'get',
      path: '/projects/:projectId/settlement-checks/:checkId/revisions/:revision',
      access: DESIGN_READERS,
      handler: async (req, res) => {
        const { orgId, projectId } = await designProject(req);
        res.json(await getRevision(orgId, projectId, uuidParam(req, 'checkId', 'settlement check'), revisionParam(req), 'summary'));
      },
    },
    {
      method: 'get',
      path: '/projects/:projectId/settlement-checks/:checkId/revisions/:revision/result',
      access: DESIGN_READERS,
      handler: async (req, res) => {
        const { orgId, projectId } = await designProject(req);
        res.json(await getRevision(orgId, projectId, uuidParam(req, 'checkId', 'settlement check'), revisionParam(req), 'full'));
      },
    },
    {
      method: 'get',
      path: '/projects/:projectId/settlement-checks/:checkId/revisions/:revision/footings/:footingId',
      access: DESIGN_READERS,
      handler: async (req, res) => {
        const { orgId, projectId } = await designProject(req);
        res.json(await getFootingResult(orgId, projectId, uuidParam(req, 'checkId', 'settlement check'), revisionParam(req), String(req.params['footingId'])));
      },
    },
    {
      method: 'get',
      path: '/projects/:projectId/settlement-checks/:checkId/revisions/:revision/workbook.xlsx',
      access: DESIGN_READERS,
      handler: async (req, res) => {
        const { orgId, projectId } = await designProject(req);
        const { bytes, fileName } = await checkWorkbook(orgId, projectId, uuidParam(req, 'checkId', 'settlement check'), revisionParam(req));
        res.setHeader('content-type', 'application/vnd.openxmlformats-officedocument.spreadsheetml.sheet');
        res.setHeader('content-disposition', `attachment; filename="${fileName}"`);
        res.send(bytes);
      },
    },
    {
      method: 'get',
      path: '/projects/:projectId/settlement-checks/:checkId/compare',
      access: DESIGN_READERS,
      handler: async (req, res) => {
        const { orgId, projectId } = await designProject(req);
        const { a, b } = parse(CompareQuerySchema, req.query);
        res.json(await compareRevisions(orgId, projectId, uuidParam(req, 'checkId', 'settlement check'), a, b));
      },
    },
    {
      method: 'post',
      path: '/projects/:projectId/settlement-checks/:checkId/sizing',
      access: DESIGN_WRITERS,
      handler: async (req, res) => {
        const { orgId, projectId } = await designProject(req);
        res.json(await sizeFooting(orgId, projectId, uuidParam(req, 'checkId', 'settlement check'), parse(SizingRequestSchema, req.body)));
      },
    },
    {
      method: 'post',
      path: '/projects/:projectId/settlement-checks/:checkId/sizing/apply',
      access: DESIGN_WRITERS,
      handler: async (req, res) => {
        const { orgId, projectId, actor } = await designProject(req);
        const answer = await applySizing(orgId, projectId, uuidParam(req, 'checkId', 'settlement check'), parse(SizingApplySchema, req.body), actor);
        res.status(answer.kind === 'done' ? 201 : 202).json(answer);
      },
    },
  ]);
}
