import { InvitationAcceptSchema, InvitationCreateSchema, ROLE_ACCESS } from '@porestack/types';
import { uuidParam } from '../../http/params.js';
import { parse } from '../../http/parse.js';
import { currentTenant, currentUser } from '../../http/request-context.js';
import { defineRoutes, type RouteGroup } from '../../http/routes.js';
import { openSession } from '../../http/session-cookie.js';
import { sessionFor } from '../users/sessions.service.js';
import {
  acceptInvitation,
  createInvitation,
  listPendingInvitations,
  previewInvitation,
  revokeInvitation,
} from './invitations.service.js';

/** What an invitee opens from the e-mail: the token is the credential. */
export function invitationsRouter(): RouteGroup {
  return defineRoutes('/api/invitations', [
    {
      method: 'get',
      path: '/:token',
      access: 'public',
      handler: async (req, res) => {
        res.json(await previewInvitation(String(req.params['token'])));
      },
    },
    {
      method: 'post',
      path: '/:token/accept',
      access: 'public',
      handler: async (req, res) => {
        const user = await acceptInvitation(String(req.params['token']), parse(InvitationAcceptSchema, req.body));
        await openSession(res, user);
        res.json(await sessionFor(user));
      },
    },
  ]);
}

/** An organisation's invitations, managed by its admins. */
export function orgInvitationsRouter(): RouteGroup {
  return defineRoutes('/api/orgs/:orgId/invitations', [
    {
      method: 'get',
      path: '/',
      access: ROLE_ACCESS.admins,
      handler: async (req, res) => {
        res.json(await listPendingInvitations(currentTenant(req).orgId));
      },
    },
    {
      method: 'post',
      path: '/',
      access: ROLE_ACCESS.admins,
      handler: async (req, res) => {
        const input = parse(InvitationCreateSchema, req.body);
        res.status(201).json(await createInvitation(currentTenant(req).orgId, currentUser(req), input));
      },
    },
    {
      method: 'delete',
      path: '/:invitationId',
      access: ROLE_ACCESS.admins,
      handler: async (req, res) => {
        await revokeInvitation(currentTenant(req).orgId, uuidParam(req, 'invitationId', 'invitation'), currentUser(req));
        res.status(204).end();
      },
    },
  ]);
}
