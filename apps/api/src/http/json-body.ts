import { createHash } from 'node:crypto';
import type { Response } from 'express';

/** An answer's JSON, encoded once, with the ETag Express would give it: for answers kept and sent many times. */
export interface JsonBody {
  readonly body: Buffer;
  readonly etag: string;
}

export function jsonBody(value: unknown): JsonBody {
  const body = Buffer.from(JSON.stringify(value), 'utf8');
  // The weak tag Express's default 'etag' setting makes: length and SHA-1 of the body.
  const etag = `W/"${body.length.toString(16)}-${createHash('sha1').update(body).digest('base64').slice(0, 27)}"`;
  return { body, etag };
}

/** Sends it as res.json would (Express answers 304 to a matching If-None-Match). */
export function sendJsonBody(res: Response, { body, etag }: JsonBody): void {
  res.set('ETag', etag).type('json').send(body);
}
