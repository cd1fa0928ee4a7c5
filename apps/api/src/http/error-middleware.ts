import type { ApiError } from '@porestack/types';
import type { ErrorRequestHandler, RequestHandler } from 'express';
import { DomainError, type ErrorCode } from '../errors/domain-error.js';
import { logger } from './logger.js';

/** Exhaustive: adding a code without a status is a compile error. */
const STATUS_BY_CODE: Record<ErrorCode, number> = {
  invalid_json: 400,
  validation_failed: 400,
  payload_too_large: 413,
  csrf_invalid: 403,
  unauthenticated: 401,
  invalid_credentials: 401,
  forbidden: 403,
  not_found: 404,
  email_taken: 409,
  already_member: 409,
  last_admin: 409,
  invalid_transition: 409,
  own_test: 403,
  unsupported_file: 415,
  invalid_file: 422,
  profile_name_taken: 409,
  report_not_ready: 409,
  rate_limited: 429,
  token_invalid: 400,
  token_used: 410,
  token_expired: 410,
  service_unavailable: 503,
  confirmation_needed: 409,
  internal: 500,
};

export function statusFor(code: ErrorCode): number {
  return STATUS_BY_CODE[code];
}

/** body-parser errors carry a `type`; map the two a client can cause. */
function fromBodyParser(error: unknown): DomainError | null {
  if (typeof error !== 'object' || error === null || !('type' in error)) return null;
  if (error.type === 'entity.parse.failed') {
    return new DomainError('invalid_json', 'The request body is not valid JSON. Check the data sent and try again.');
  }
  if (error.type === 'entity.too.large') {
    return new DomainError('payload_too_large', 'The request is too large. Send less data at once.');
  }
  return null;
}

/** Codes of a connection that failed or was refused, and PostgreSQL's "connection" and "shutting down" states. */
const UNREACHABLE_CODES = new Set(['ECONNREFUSED', 'ECONNRESET', 'ETIMEDOUT', 'EHOSTUNREACH', 'ENETUNREACH', 'ENOTFOUND', 'EAI_AGAIN', 'EPIPE', '57P01', '57P02', '57P03', '53300']);

/**
 * The database or the file store not answering: 503 with what to do, not a 500 — the
 * request can be sent again once the service is back.
 */
function fromUnavailableService(error: unknown): DomainError | null {
  const candidates = [error, (error as { driverError?: unknown } | null)?.driverError, (error as { cause?: unknown } | null)?.cause];
  for (const candidate of candidates) {
    if (typeof candidate !== 'object' || candidate === null) continue;
    const code = (candidate as { code?: unknown }).code;
    const message = String((candidate as { message?: unknown }).message ?? '');
    if ((typeof code === 'string' && (UNREACHABLE_CODES.has(code) || code.startsWith('08'))) || /Connection terminated|connect ECONNREFUSED|timeout exceeded when trying to connect/i.test(message)) {
      return new DomainError(
        'service_unavailable',
        'A service Porestack needs (its database or its file storage) is not answering, so this could not be done. Try again in a minute; if it keeps happening, tell your administrator.',
      );
    }
  }
  return null;
}

export const errorMiddleware: ErrorRequestHandler = (error: unknown, req, res, _next) => {
  const known = error instanceof DomainError ? error : (fromBodyParser(error) ?? fromUnavailableService(error));
  if (known?.code === 'service_unavailable') logger.warn({ err: error, method: req.method, url: req.originalUrl }, 'a service is not answering');
  if (known) {
    const body: ApiError = { code: known.code, message: known.message };
    if (known.issues) body.issues = known.issues;
    res.status(statusFor(known.code)).json(body);
    return;
  }
  logger.error({ err: error, method: req.method, url: req.originalUrl }, 'unhandled error');
  const body: ApiError = {
    code: 'internal',
    message: 'Something went wrong on our side. Try again in a moment; if it keeps happening, tell your administrator.',
  };
  res.status(500).json(body);
};

/** Unknown /api paths answer JSON, not the SPA. */
export const apiNotFound: RequestHandler = (req, res) => {
  const body: ApiError = { code: 'not_found', message: `There is no API endpoint ${req.method} ${req.originalUrl}.` };
  res.status(404).json(body);
};
