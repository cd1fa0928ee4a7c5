import { GroundModelContentInputSchema, GroundModelCreateSchema, GroundModelReviseSchema } from '@porestack/types';
import { z } from 'zod';
import { uuidParam } from '../../http/params.js';
import { parse } from '../../http/parse.js';
import { defineRoutes, type RouteGroup } from '../../http/routes.js';
import { designProject } from '../design-records/design-project.js';
import { DESIGN_READERS, DESIGN_WRITERS } from '../projects/design-roles.js';
import { createGroundModel, getGroundModel, listGroundModels, previewGroundModel, reviseGroundModel } from './ground-models.service.js';

const RevisionQuerySchema = z.object({ revision: z.coerce.number().int().min(1).optional() });

/** A project's ground models (designers build them; the lab's managers read them). */
export function groundModelsRouter(): RouteGroup {
  return defineRoutes('/api/orgs/:orgId/projects/:projectId/ground-models', [
    {
      method: 'get',
      path: '/',
      access: DESIGN_READERS,
      handler: async (req, res) => {
        const { orgId, projectId } = await designProject(req);
        res.json(await listGroundModels(orgId, projectId));
      },
    },
    {
      method: 'post',
      path: '/',
      access: DESIGN_WRITERS,
      handler: async (req, res) => {
        const { orgId, projectId, actor } = await designProject(req);
        res.status(201).json(await createGroundModel(orgId, projectId, parse(GroundModelCreateSchema, req.body), actor));
      },
    },
    {
      method: 'post',
      path: '/preview',
      access: DESIGN_WRITERS,
      handler: async (req, res) => {
        const { orgId, projectId } = await designProject(req);
        res.json(await previewGroundModel(orgId, projectId, parse(GroundModelContentInputSchema, req.body)));
      },
    },
    {
      method: 'get',
      path: '/:modelId',
      access: DESIGN_READERS,
      handler: async (req, res) => {
        const { orgId, projectId } = await designProject(req);
        res.json(await getGroundModel(orgId, projectId, uuidParam(req, 'modelId', 'ground model'), parse(RevisionQuerySchema, req.query).revision));
      },
    },
    {
      method: 'post',
      path: '/:modelId/revisions',
      access: DESIGN_WRITERS,
      handler: async (req, res) => {
        const { orgId, projectId, actor } = await designProject(req);
        const modelId = uuidParam(req, 'modelId', 'ground model');
        await reviseGroundModel(orgId, projectId, modelId, parse(GroundModelReviseSchema, req.body), actor);
        res.status(201).json(await getGroundModel(orgId, projectId, modelId));
      },
    },
  ]);
}
