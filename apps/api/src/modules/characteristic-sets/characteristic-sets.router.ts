import { CharacteristicSetInputSchema, SetStatisticsQuerySchema } from '@porestack/types';
import { z } from 'zod';
import { uuidParam } from '../../http/params.js';
import { parse } from '../../http/parse.js';
import { defineRoutes, type RouteGroup } from '../../http/routes.js';
import { designProject } from '../design-records/design-project.js';
import { DESIGN_READERS, DESIGN_WRITERS } from '../projects/design-roles.js';
import { createCharacteristicSet, getCharacteristicSet, listCharacteristicSets, previewSetStatistics, reviseCharacteristicSet } from './characteristic-sets.service.js';

const RevisionQuerySchema = z.object({ revision: z.coerce.number().int().min(1).optional() });

/** Characteristic sets: approved versions of one stratum, their statistics and the adopted values. */
export function characteristicSetsRouter(): RouteGroup {
  return defineRoutes('/api/orgs/:orgId/projects/:projectId/characteristic-sets', [
    {
      method: 'get',
      path: '/',
      access: DESIGN_READERS,
      handler: async (req, res) => {
        const { orgId, projectId } = await designProject(req);
        res.json(await listCharacteristicSets(orgId, projectId));
      },
    },
    {
      method: 'post',
      path: '/',
      access: DESIGN_WRITERS,
      handler: async (req, res) => {
        const { orgId, projectId, actor } = await designProject(req);
        res.status(201).json(await createCharacteristicSet(orgId, projectId, parse(CharacteristicSetInputSchema, req.body), actor));
      },
    },
    {
      method: 'post',
      path: '/statistics',
      access: DESIGN_READERS,
      handler: async (req, res) => {
        const { orgId, projectId } = await designProject(req);
        res.json(await previewSetStatistics(orgId, projectId, parse(SetStatisticsQuerySchema, req.body).versionIds));
      },
    },
    {
      method: 'get',
      path: '/:setId',
      access: DESIGN_READERS,
      handler: async (req, res) => {
        const { orgId, projectId } = await designProject(req);
        res.json(await getCharacteristicSet(orgId, projectId, uuidParam(req, 'setId', 'characteristic set'), parse(RevisionQuerySchema, req.query).revision));
      },
    },
    {
      method: 'post',
      path: '/:setId/revisions',
      access: DESIGN_WRITERS,
      handler: async (req, res) => {
        const { orgId, projectId, actor } = await designProject(req);
        res.status(201).json(await reviseCharacteristicSet(orgId, projectId, uuidParam(req, 'setId', 'characteristic set'), parse(CharacteristicSetInputSchema, req.body), actor));
      },
    },
  ]);
}
