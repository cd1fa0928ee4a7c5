import { createHash, randomBytes } from 'node:crypto';

/** A random link token and the sha256 stored in its place (a leaked table grants nothing). */
export function createOneTimeToken(): { token: string; tokenHash: string } {
  const token = randomBytes(32).toString('base64url');
  return { token, tokenHash: hashToken(token) };
}

export function hashToken(token: string): string {
  return createHash('sha256').update(token).digest('hex');
}
