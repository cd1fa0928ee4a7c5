import type { Request, RequestHandler } from 'express';
import { ipKeyGenerator, rateLimit, type RateLimitInfo } from 'express-rate-limit';
import { env } from '../config/env.js';
import { DomainError } from '../errors/domain-error.js';

/**
 * Failed sign-ins per IP address and e-mail within a window (SIGN_IN_RATE_LIMIT per
 * SIGN_IN_RATE_WINDOW_MINUTES). Successful sign-ins do not count. One store per app, so
 * each test's app starts with a clean count.
 */
export function signInRateLimit(): RequestHandler {
  const config = env();
  return rateLimit({
    windowMs: config.SIGN_IN_RATE_WINDOW_MINUTES * 60_000,
    limit: config.SIGN_IN_RATE_LIMIT,
    skipSuccessfulRequests: true,
    standardHeaders: 'draft-8',
    legacyHeaders: false,
    keyGenerator: (req) => {
      const email: unknown = (req.body as { email?: unknown } | undefined)?.email;
      return `${ipKeyGenerator(req.ip ?? '')}|${typeof email === 'string' ? email.trim().toLowerCase() : ''}`;
    },
    handler: (req, _res, next) => {
      const resetTime = (req as Request & { rateLimit?: RateLimitInfo }).rateLimit?.resetTime;
      const minutes = resetTime ? Math.max(1, Math.ceil((resetTime.getTime() - Date.now()) / 60_000)) : config.SIGN_IN_RATE_WINDOW_MINUTES;
      next(
        new DomainError(
          'rate_limited',
          `Too many failed sign-in attempts for this e-mail address. Try again in ${minutes} minute${minutes === 1 ? '' : 's'}, or reset your password.`,
        ),
      );
    },
  });
}
