import type { Request } from 'express';
import { NotFoundError } from '../errors/domain-error.js';

export const UUID_PATTERN = /^[0-9a-f]{8}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{12}$/i;

/** A uuid path parameter; anything else answers 404 like a missing object (never a database error). */
export function uuidParam(req: Request, name: string, what: string): string {
  const value = req.params[name];
  if (typeof value !== 'string' || !UUID_PATTERN.test(value)) throw new NotFoundError(what);
  return value;
}

/** A soil record version number path parameter (1, 2, …); anything else answers 404 like a missing version. */
export function versionParam(req: Request): number {
  const version = Number(req.params['version']);
  if (!Number.isInteger(version) || version < 1) throw new NotFoundError('soil record version');
  return version;
}
