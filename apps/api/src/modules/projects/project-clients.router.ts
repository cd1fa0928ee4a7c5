import { ProjectShareCreateSchema } from '@porestack/types';
import { uuidParam } from '../../http/params.js';
import { parse } from '../../http/parse.js';
import { currentTenant, currentUser } from '../../http/request-context.js';
import { defineRoutes, type RouteGroup } from '../../http/routes.js';
import { PROJECT_EDITORS } from './lab-roles.js';
import { listProjectClients, shareProject, withdrawClient, withdrawClientInvitation } from './project-clients.service.js';

/** Sharing a project with clients: kept by the lab managers and admins, like the project itself. */
export function projectClientsRouter(): RouteGroup {
  return defineRoutes('/api/orgs/:orgId/projects/:projectId', [
    {
      method: 'get',
      path: '/clients',
      access: PROJECT_EDITORS,
      handler: async (req, res) => res.json(await listProjectClients(currentTenant(req).orgId, uuidParam(req, 'projectId', 'project'))),
    },
    {
      method: 'post',
      path: '/clients',
      access: PROJECT_EDITORS,
      handler: async (req, res) => {
        const { email } = parse(ProjectShareCreateSchema, req.body);
        res.status(201).json(await shareProject(currentTenant(req).orgId, uuidParam(req, 'projectId', 'project'), email, currentUser(req)));
      },
    },
    {
      method: 'delete',
      path: '/clients/:userId',
      access: PROJECT_EDITORS,
      handler: async (req, res) => {
        await withdrawClient(currentTenant(req).orgId, uuidParam(req, 'projectId', 'project'), uuidParam(req, 'userId', 'client of this project'), currentUser(req));
        res.status(204).end();
      },
    },
    {
      method: 'delete',
      path: '/client-invitations/:invitationId',
      access: PROJECT_EDITORS,
      handler: async (req, res) => {
        const invitationId = uuidParam(req, 'invitationId', 'invitation for this project');
        await withdrawClientInvitation(currentTenant(req).orgId, uuidParam(req, 'projectId', 'project'), invitationId, currentUser(req));
        res.status(204).end();
      },
    },
  ]);
}
