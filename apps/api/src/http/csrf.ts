import { createHmac, randomUUID } from 'node:crypto';
import type { Request, RequestHandler, Response } from 'express';
import { doubleCsrf } from 'csrf-csrf';
import { env } from '../config/env.js';
import { DomainError } from '../errors/domain-error.js';
import { isSecureOrigin } from './session-cookie.js';

const CSRF_COOKIE = 'porestack_csrf';
/**
 * A random per-browser id the CSRF token is bound to. Not the session cookie: the token
 * then survives sign-in and sign-out, so the web app fetches it once per page load.
 */
const BROWSER_COOKIE = 'porestack_browser';

export interface Csrf {
  /** App-level middleware: every POST/PUT/PATCH/DELETE needs a valid `x-csrf-token` header. */
  protect: RequestHandler;
  /** Issues (or re-issues) the token for GET /api/auth/csrf. */
  issueToken: (req: Request, res: Response) => string;
}

export function createCsrf(): Csrf {
  const secret = createHmac('sha256', env().JWT_SECRET).update('porestack csrf').digest('hex');
  const cookieOptions = { httpOnly: true, sameSite: 'lax' as const, secure: isSecureOrigin(), path: '/' };
  const { generateCsrfToken, validateRequest } = doubleCsrf({
    getSecret: () => secret,
    getSessionIdentifier: (req) => String(req.cookies?.[BROWSER_COOKIE] ?? ''),
    cookieName: CSRF_COOKIE,
    cookieOptions,
    getCsrfTokenFromRequest: (req) => req.get('x-csrf-token'),
  });

  const protect: RequestHandler = (req, _res, next) => {
    if (['GET', 'HEAD', 'OPTIONS'].includes(req.method) || validateRequest(req)) return next();
    next(
      new DomainError(
        'csrf_invalid',
        'This page’s security token is missing or out of date. Reload the page and try again.',
      ),
    );
  };

  const issueToken = (req: Request, res: Response): string => {
    if (!req.cookies?.[BROWSER_COOKIE]) {
      const id = randomUUID();
      res.cookie(BROWSER_COOKIE, id, { ...cookieOptions, maxAge: 365 * 24 * 3600 * 1000 });
      req.cookies = { ...req.cookies, [BROWSER_COOKIE]: id };
    }
    return generateCsrfToken(req, res);
  };

  return { protect, issueToken };
}
