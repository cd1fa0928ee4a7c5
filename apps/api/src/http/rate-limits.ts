import type { Request } from 'express';
import { RateLimiterPostgres, RateLimiterRes } from 'rate-limiter-flexible';
import { dataSource } from '../data-source.js';
import { DomainError } from '../errors/domain-error.js';

/**
 * Rate limits whose counts live in PostgreSQL (the rate_limits table), so every API
 * process sees the same counts: rate-limiter-flexible's PostgreSQL store on TypeORM's pool.
 */
export interface Limit {
  /** Distinguishes this limit's keys in the shared table. */
  readonly name: string;
  readonly points: number;
  readonly windowMinutes: number;
}

const limiters = new Map<string, RateLimiterPostgres>();

function limiterFor(limit: Limit): RateLimiterPostgres {
  const id = `${limit.name}:${limit.points}:${limit.windowMinutes}`;
  let limiter = limiters.get(id);
  if (!limiter) {
    limiter = new RateLimiterPostgres({
      // The pg Pool under TypeORM's connection: one pool for the whole process.
      storeClient: (dataSource.driver as unknown as { master: unknown }).master,
      tableName: 'rate_limits',
      // Created by a migration; expired rows are deleted by the housekeeping job.
      tableCreated: true,
      clearExpiredByTimeout: false,
      keyPrefix: limit.name,
      points: limit.points,
      duration: limit.windowMinutes * 60,
    });
    limiters.set(id, limiter);
  }
  return limiter;
}

/** Whole minutes until the limit on `key` lets requests through again; 0 when it does now. */
export async function minutesBlocked(limit: Limit, key: string): Promise<number> {
  const state = await limiterFor(limit).get(key);
  if (!state || state.consumedPoints < limit.points) return 0;
  return Math.max(1, Math.ceil(state.msBeforeNext / 60_000));
}

/** Counts one hit on `key` (a failed sign-in, a reset request). Never throws for being over the limit. */
export async function countHit(limit: Limit, key: string): Promise<void> {
  await limiterFor(limit)
    .consume(key)
    .catch((reason: unknown) => {
      if (!(reason instanceof RateLimiterRes)) throw reason;
    });
}

export async function forgetHits(limit: Limit, key: string): Promise<void> {
  await limiterFor(limit).delete(key);
}

export function rateLimited(message: string): DomainError {
  return new DomainError('rate_limited', message);
}

/**
 * The client a request comes from: its address as the socket sees it, or as X-Forwarded-For
 * says only when the request came through a configured proxy (TRUST_PROXY, Express's
 * `trust proxy`). Never a header a client can set on its own.
 */
export function clientKey(req: Request): string {
  return req.ip ?? req.socket.remoteAddress ?? 'unknown';
}

export const minutesWord = (minutes: number) => `${minutes} minute${minutes === 1 ? '' : 's'}`;
