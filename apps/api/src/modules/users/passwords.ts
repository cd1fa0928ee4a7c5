import { hash, verify } from '@node-rs/bcrypt';
import { PASSWORD_MAX_BYTES } from '@porestack/types';
import { env } from '../../config/env.js';

/**
 * bcrypt through a native binding: hashing runs on libuv's thread pool, not on the event
 * loop, so sign-ins in flight do not slow every other request (bcryptjs hashed in
 * JavaScript on the loop). Hashes are the usual $2b$ strings, so accounts made with
 * bcryptjs still sign in.
 */
export function hashPassword(password: string): Promise<string> {
  if (byteLength(password) > PASSWORD_MAX_BYTES) throw new RangeError(`hashPassword requires at most ${PASSWORD_MAX_BYTES} bytes`);
  return hash(password, env().BCRYPT_COST);
}

/**
 * bcrypt reads only the first 72 bytes, so a longer password could match a stored one by
 * its start: it never matches (after a comparison of the same cost, so the answer takes as long).
 */
export async function verifyPassword(password: string, passwordHash: string): Promise<boolean> {
  if (byteLength(password) > PASSWORD_MAX_BYTES) return verifyAgainstNothing(password.slice(0, PASSWORD_MAX_BYTES));
  return verify(password, passwordHash);
}

/** Compared against when the e-mail is unknown, so both failures take as long. */
let dummyHash: Promise<string> | undefined;
export async function verifyAgainstNothing(password: string): Promise<false> {
  dummyHash ??= hash('no account has this password', env().BCRYPT_COST);
  await verify(password.slice(0, PASSWORD_MAX_BYTES), await dummyHash);
  return false;
}

export function byteLength(password: string): number {
  return Buffer.byteLength(password, 'utf8');
}

export const MIN_PASSWORD_LENGTH = 10;
