import {
  PasswordResetConfirmSchema,
  PasswordResetRequestSchema,
  SignInSchema,
  SignUpConfirmSchema,
  SignUpSchema,
  type CsrfToken,
  type SignUpSent,
} from '@porestack/types';
import type { Csrf } from '../../http/csrf.js';
import { parse } from '../../http/parse.js';
import { currentUser } from '../../http/request-context.js';
import { defineRoutes, type RouteGroup } from '../../http/routes.js';
import { clearSessionCookie, openSession, readSessionClaims } from '../../http/session-cookie.js';
import { endSession } from '../sessions/sessions.service.js';
import { clientKey } from '../../http/rate-limits.js';
import { sessionFor } from '../users/sessions.service.js';
import { recordSignOut, signIn } from './auth.service.js';
import { confirmSignUp, requestSignUp, SIGN_UP_LINK_HOURS } from './sign-up.service.js';
import { confirmPasswordReset, requestPasswordReset } from './password-reset.service.js';

/** The same words whether or not the address has an account. */
const signUpSentMessage = (email: string) =>
  `We sent a link to ${email}. Open it within ${SIGN_UP_LINK_HOURS} hours to finish creating your account (check the spam folder if it does not arrive).`;

export function authRouter(csrf: Csrf): RouteGroup {
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
        const input = parse(SignUpSchema, req.body);
        await requestSignUp(input, clientKey(req));
        const body: SignUpSent = { message: signUpSentMessage(input.email) };
        res.status(202).json(body);
      },
    },
    {
      method: 'post',
      path: '/sign-up/confirm',
      access: 'public',
      handler: async (req, res) => {
        const { user, session } = await confirmSignUp(parse(SignUpConfirmSchema, req.body));
        await openSession(res, user);
        res.status(201).json(session);
      },
    },
    {
      method: 'post',
      path: '/sign-in',
      access: 'public',
      handler: async (req, res) => {
        const { user, session } = await signIn(parse(SignInSchema, req.body), clientKey(req));
        await openSession(res, user);
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
        if (claims) {
          await endSession(claims.sid);
          await recordSignOut(claims.sub);
        }
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
        await requestPasswordReset(parse(PasswordResetRequestSchema, req.body), clientKey(req));
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
