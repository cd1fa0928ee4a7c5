import bcrypt from 'bcryptjs';
import { env } from '../../config/env.js';

export function hashPassword(password: string): Promise<string> {
  return bcrypt.hash(password, env().BCRYPT_COST);
}

export function verifyPassword(password: string, hash: string): Promise<boolean> {
  return bcrypt.compare(password, hash);
}

/** Compared against when the e-mail is unknown, so both failures take as long. */
let dummyHash: Promise<string> | undefined;
export async function verifyAgainstNothing(password: string): Promise<false> {
  dummyHash ??= bcrypt.hash('no account has this password', env().BCRYPT_COST);
  await bcrypt.compare(password, await dummyHash);
  return false;
}

export const MIN_PASSWORD_LENGTH = 10;
