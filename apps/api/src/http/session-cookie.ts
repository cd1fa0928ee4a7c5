import type { Request, Response } from 'express';
import { createSecretKey, type KeyObject } from 'node:crypto';
import jwt from 'jsonwebtoken';
import { env } from '../config/env.js';
import { startSession } from '../modules/sessions/sessions.service.js';
import { UUID_PATTERN } from './params.js';

let signingKey: { secret: string; key: KeyObject } | undefined;
/** JWT_SECRET as a key object, made once (jsonwebtoken otherwise makes one from the string on every verify). */
function sessionKey(): KeyObject {
  const secret = env().JWT_SECRET;
  if (signingKey?.secret !== secret) signingKey = { secret, key: createSecretKey(Buffer.from(secret, 'utf8')) };
  return signingKey.key;
}

export const SESSION_COOKIE = 'porestack_session';

export interface SessionClaims {
  /** user id */
  sub: string;
  /** the server-side session (sessions table) */
  sid: string;
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

function setSessionCookie(res: Response, user: { id: string; sessionVersion: number }, sessionId: string): void {
  const config = env();
  const claims: SessionClaims = { sub: user.id, sid: sessionId, ver: user.sessionVersion };
  const token = jwt.sign(claims, sessionKey(), { algorithm: 'HS256', expiresIn: `${config.SESSION_DAYS}d` });
  res.cookie(SESSION_COOKIE, token, { ...cookieOptions(), maxAge: config.SESSION_DAYS * 24 * 3600 * 1000 });
}

/** Starts a server-side session for the user and sets its cookie (sign-up, sign-in, accepting an invitation). */
export async function openSession(res: Response, user: { id: string; sessionVersion: number }): Promise<void> {
  const session = await startSession(user.id);
  setSessionCookie(res, user, session.id);
}

export function clearSessionCookie(res: Response): void {
  res.clearCookie(SESSION_COOKIE, cookieOptions());
}

/**
 * Tokens already verified, with their claims and expiry (ms): a token is checked against the key
 * once, not on every request — its expiry still is, and the server-side session (sessions table)
 * is still read every time. The oldest go first past the bound.
 */
const verified = new Map<string, { claims: SessionClaims; expiresAt: number }>();
const VERIFIED_KEPT = 20_000;

/**
 * The claims of a valid, unexpired session cookie, or null. A token must carry an expiry,
 * and user and session ids that are uuids: anything else is no session (never a 500).
 */
export function readSessionClaims(req: Request): SessionClaims | null {
  const token: unknown = req.cookies?.[SESSION_COOKIE];
  if (typeof token !== 'string' || token === '') return null;
  const known = verified.get(token);
  if (known) return known.expiresAt > Date.now() ? known.claims : null;
  const checked = verifySessionToken(token);
  if (!checked) return null;
  verified.set(token, checked);
  if (verified.size > VERIFIED_KEPT) verified.delete(verified.keys().next().value as string);
  return checked.claims;
}

/** A users.session_version (an int4): anything else is no session, not a failed query for a whole batch. */
function isSessionVersion(value: unknown): value is number {
  return Number.isSafeInteger(value) && (value as number) >= 0 && (value as number) <= 2_147_483_647;
}

function verifySessionToken(token: string): { claims: SessionClaims; expiresAt: number } | null {
  try {
    const payload = jwt.verify(token, sessionKey(), { algorithms: ['HS256'] });
    if (typeof payload !== 'object' || typeof payload.exp !== 'number') return null;
    const { sub, sid, ver } = payload as { sub?: unknown; sid?: unknown; ver?: unknown };
    if (typeof sub !== 'string' || !UUID_PATTERN.test(sub) || typeof sid !== 'string' || !UUID_PATTERN.test(sid) || !isSessionVersion(ver)) return null;
    return { claims: { sub, sid, ver: ver as number }, expiresAt: payload.exp * 1000 };
  } catch {
    return null;
  }
}
