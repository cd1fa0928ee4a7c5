import {
  PasswordResetConfirmSchema,
  PasswordResetRequestSchema,
  SignInSchema,
  SignUpSchema,
  type CsrfToken,
} from '@porestack/types';
import type { Router } from 'express';
import type { Csrf } from '../../http/csrf.js';
import { parse } from '../../http/parse.js';
import { currentUser } from '../../http/request-context.js';
import { defineRoutes } from '../../http/routes.js';
import { clearSessionCookie, readSessionClaims, setSessionCookie } from '../../http/session-cookie.js';
import { signInRateLimit } from '../../http/sign-in-rate-limit.js';
import { sessionFor } from '../users/sessions.service.js';
import { recordSignOut, signIn, signUp } from './auth.service.js';
import { confirmPasswordReset, requestPasswordReset } from './password-reset.service.js';

export function authRouter(csrf: Csrf): Router {
  return defineRoutes('/api/auth', [
    {
      method: 'get',
      path: '/csrf',
      access: 'public',
      handler: (req, res) => {
        const body: CsrfToken = { csrfToken: csrf.issueToken(req, res) };
        res.json(body);
      },
    },
    {
      method: 'post',
      path: '/sign-up',
      access: 'public',
      handler: async (req, res) => {
        const { user, session } = await signUp(parse(SignUpSchema, req.body));
        setSessionCookie(res, user);
        res.status(201).json(session);
      },
    },
    {
      method: 'post',
      path: '/sign-in',
      access: 'public',
      before: [signInRateLimit()],
      handler: async (req, res) => {
        const { user, session } = await signIn(parse(SignInSchema, req.body), req.ip);
        setSessionCookie(res, user);
        res.json(session);
      },
    },
    {
      // Public so an expired session can still clear its cookie.
      method: 'post',
      path: '/sign-out',
      access: 'public',
      handler: async (req, res) => {
        const claims = readSessionClaims(req);
        if (claims) await recordSignOut(claims.sub);
        clearSessionCookie(res);
        res.status(204).end();
      },
    },
    {
      method: 'get',
      path: '/session',
      access: 'signed-in',
      handler: async (req, res) => {
        res.json(await sessionFor(currentUser(req)));
      },
    },
    {
      method: 'post',
      path: '/password-reset/request',
      access: 'public',
      handler: async (req, res) => {
        await requestPasswordReset(parse(PasswordResetRequestSchema, req.body));
        res.status(202).json({ message: 'If an account uses this e-mail address, a reset link is on its way. It works for 60 minutes.' });
      },
    },
    {
      method: 'post',
      path: '/password-reset/confirm',
      access: 'public',
      handler: async (req, res) => {
        await confirmPasswordReset(parse(PasswordResetConfirmSchema, req.body));
        clearSessionCookie(res);
        res.status(204).end();
      },
    },
  ]);
}
