import { BoreholeCreateSchema, ProjectCreateSchema, ProjectUpdateSchema, SampleCreateSchema } from '@porestack/types';
import type { Router } from 'express';
import { uuidParam } from '../../http/params.js';
import { parse } from '../../http/parse.js';
import { currentTenant, currentUser } from '../../http/request-context.js';
import { defineRoutes } from '../../http/routes.js';
import { createBorehole, listBoreholes } from '../boreholes/boreholes.service.js';
import { createSample, listSamples } from '../samples/samples.service.js';
import { LAB_READERS, LAB_WORKERS, PROJECT_EDITORS } from './lab-roles.js';
import { assertProjectInScope, projectScope } from './project-scope.js';
import { createProject, getProject, listDesignerCandidates, listProjects, updateProject } from './projects.service.js';

/** Projects, their boreholes and the boreholes' samples. */
export function projectsRouter(): Router {
  return defineRoutes('/api/orgs/:orgId', [
    {
      method: 'get',
      path: '/designers',
      access: PROJECT_EDITORS,
      handler: async (req, res) => res.json(await listDesignerCandidates(currentTenant(req).orgId)),
    },
    {
      method: 'get',
      path: '/projects',
      access: LAB_READERS,
      handler: async (req, res) => {
        const tenant = currentTenant(req);
        res.json(await listProjects(tenant.orgId, await projectScope(tenant, currentUser(req).id)));
      },
    },
    {
      method: 'post',
      path: '/projects',
      access: PROJECT_EDITORS,
      handler: async (req, res) => {
        res.status(201).json(await createProject(currentTenant(req).orgId, parse(ProjectCreateSchema, req.body), currentUser(req)));
      },
    },
    {
      method: 'get',
      path: '/projects/:projectId',
      access: LAB_READERS,
      handler: async (req, res) => {
        const tenant = currentTenant(req);
        const projectId = uuidParam(req, 'projectId', 'project');
        await assertProjectInScope(tenant, currentUser(req).id, projectId);
        res.json(await getProject(tenant.orgId, projectId));
      },
    },
    {
      method: 'patch',
      path: '/projects/:projectId',
      access: PROJECT_EDITORS,
      handler: async (req, res) => {
        const projectId = uuidParam(req, 'projectId', 'project');
        res.json(await updateProject(currentTenant(req).orgId, projectId, parse(ProjectUpdateSchema, req.body), currentUser(req)));
      },
    },
    {
      method: 'get',
      path: '/projects/:projectId/boreholes',
      access: LAB_READERS,
      handler: async (req, res) => {
        const tenant = currentTenant(req);
        const projectId = uuidParam(req, 'projectId', 'project');
        await assertProjectInScope(tenant, currentUser(req).id, projectId);
        res.json(await listBoreholes(tenant.orgId, projectId));
      },
    },
    {
      method: 'post',
      path: '/projects/:projectId/boreholes',
      access: LAB_WORKERS,
      handler: async (req, res) => {
        const projectId = uuidParam(req, 'projectId', 'project');
        res.status(201).json(await createBorehole(currentTenant(req).orgId, projectId, parse(BoreholeCreateSchema, req.body), currentUser(req)));
      },
    },
    {
      method: 'get',
      path: '/boreholes/:boreholeId/samples',
      access: LAB_READERS,
      handler: async (req, res) => res.json(await listSamples(currentTenant(req).orgId, uuidParam(req, 'boreholeId', 'borehole'))),
    },
    {
      method: 'post',
      path: '/boreholes/:boreholeId/samples',
      access: LAB_WORKERS,
      handler: async (req, res) => {
        const boreholeId = uuidParam(req, 'boreholeId', 'borehole');
        res.status(201).json(await createSample(currentTenant(req).orgId, boreholeId, parse(SampleCreateSchema, req.body), currentUser(req)));
      },
    },
  ]);
}
