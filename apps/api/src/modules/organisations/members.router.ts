import { MemberRolesUpdateSchema, ROLE_ACCESS } from '@porestack/types';
import { uuidParam } from '../../http/params.js';
import { parse } from '../../http/parse.js';
import { currentTenant, currentUser } from '../../http/request-context.js';
import { defineRoutes, type RouteGroup } from '../../http/routes.js';
import { changeMemberRoles, listMembers, removeMember } from './members.service.js';

export function membersRouter(): RouteGroup {
  return defineRoutes('/api/orgs/:orgId/members', [
    {
      method: 'get',
      path: '/',
      access: ROLE_ACCESS.admins,
      handler: async (req, res) => {
        res.json(await listMembers(currentTenant(req).orgId));
      },
    },
    {
      method: 'patch',
      path: '/:userId',
      access: ROLE_ACCESS.admins,
      handler: async (req, res) => {
        const userId = uuidParam(req, 'userId', 'member');
        const { roles } = parse(MemberRolesUpdateSchema, req.body);
        res.json(await changeMemberRoles(currentTenant(req).orgId, userId, roles, currentUser(req)));
      },
    },
    {
      method: 'delete',
      path: '/:userId',
      access: ROLE_ACCESS.admins,
      handler: async (req, res) => {
        await removeMember(currentTenant(req).orgId, uuidParam(req, 'userId', 'member'), currentUser(req));
        res.status(204).end();
      },
    },
  ]);
}
