import { BoreholeCreateSchema, ProjectCreateSchema, ProjectUpdateSchema, SampleCreateSchema } from '@porestack/types';
import { uuidParam } from '../../http/params.js';
import { parse } from '../../http/parse.js';
import { currentTenant, currentUser } from '../../http/request-context.js';
import { defineRoutes, type RouteGroup } from '../../http/routes.js';
import { createBorehole, listBoreholes } from '../boreholes/boreholes.service.js';
import { createSample, listSamples } from '../samples/samples.service.js';
import { LAB_WORKERS, PROJECT_EDITORS, PROJECT_READERS } from './lab-roles.js';
import { viewerFor } from './project-scope.js';
import { createProject, getProject, listDesignerCandidates, listProjects, updateProject } from './projects.service.js';

/** Projects, their boreholes and the boreholes' samples; reads are limited to the caller's project scope by the services. */
export function projectsRouter(): RouteGroup {
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
      access: PROJECT_READERS,
      handler: async (req, res) => res.json(await listProjects(await viewerFor(req))),
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
      access: PROJECT_READERS,
      handler: async (req, res) => res.json(await getProject(await viewerFor(req), uuidParam(req, 'projectId', 'project'))),
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
      access: PROJECT_READERS,
      handler: async (req, res) => res.json(await listBoreholes(await viewerFor(req), uuidParam(req, 'projectId', 'project'))),
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
      access: PROJECT_READERS,
      handler: async (req, res) => res.json(await listSamples(await viewerFor(req), uuidParam(req, 'boreholeId', 'borehole'))),
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
