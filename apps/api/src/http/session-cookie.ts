import type { Request, Response } from 'express';
import jwt from 'jsonwebtoken';
import { env } from '../config/env.js';

export const SESSION_COOKIE = 'porestack_session';

interface SessionClaims {
  /** user id */
  sub: string;
  /** the user's session_version when the token was issued */
  ver: number;
}

export function isSecureOrigin(): boolean {
  return env().PUBLIC_URL.startsWith('https:');
}

/** httpOnly so scripts cannot read it; Lax so links from e-mails still arrive signed in. */
function cookieOptions() {
  return { httpOnly: true, sameSite: 'lax' as const, secure: isSecureOrigin(), path: '/' };
}

export function setSessionCookie(res: Response, user: { id: string; sessionVersion: number }): void {
  const config = env();
  const claims: SessionClaims = { sub: user.id, ver: user.sessionVersion };
  const token = jwt.sign(claims, config.JWT_SECRET, { algorithm: 'HS256', expiresIn: `${config.SESSION_DAYS}d` });
  res.cookie(SESSION_COOKIE, token, { ...cookieOptions(), maxAge: config.SESSION_DAYS * 24 * 3600 * 1000 });
}

export function clearSessionCookie(res: Response): void {
  res.clearCookie(SESSION_COOKIE, cookieOptions());
}

/** The claims of a valid, unexpired session cookie, or null. */
export function readSessionClaims(req: Request): SessionClaims | null {
  const token: unknown = req.cookies?.[SESSION_COOKIE];
  if (typeof token !== 'string' || token === '') return null;
  try {
    const payload = jwt.verify(token, env().JWT_SECRET, { algorithms: ['HS256'] });
    if (typeof payload === 'object' && typeof payload.sub === 'string' && typeof payload['ver'] === 'number') {
      return { sub: payload.sub, ver: payload['ver'] };
    }
    return null;
  } catch {
    return null;
  }
}
