import { CsrfTokenSchema } from '@porestack/types';
import { apiPaths } from '../config/paths';
import { ApiError, apiErrorFromResponse, networkError } from './api-error';

/** Anything with zod's `parse`: the shared schemas from @porestack/types. */
type Parser<T> = { parse: (value: unknown) => T };

type Method = 'GET' | 'POST' | 'PUT' | 'PATCH' | 'DELETE';

let csrfToken: Promise<string> | undefined;

async function fetchCsrfToken(): Promise<string> {
  const body = await send('GET', apiPaths.csrf, undefined, undefined);
  return CsrfTokenSchema.parse(body).csrfToken;
}

/** The token is tied to the session: forget it whenever the session changes (sign-in, sign-out). */
export function forgetCsrfToken(): void {
  csrfToken = undefined;
}

async function send(method: Method, path: string, body: unknown, token: string | undefined): Promise<unknown> {
  const headers: Record<string, string> = { accept: 'application/json' };
  if (body !== undefined) headers['content-type'] = 'application/json';
  if (token !== undefined) headers['x-csrf-token'] = token;
  let response: Response;
  try {
    response = await fetch(path, {
      method,
      headers,
      credentials: 'same-origin',
      ...(body === undefined ? {} : { body: JSON.stringify(body) }),
    });
  } catch {
    throw networkError();
  }
  if (!response.ok) throw await apiErrorFromResponse(response);
  if (response.status === 204) return undefined;
  const text = await response.text();
  return text === '' ? undefined : (JSON.parse(text) as unknown);
}

async function sendWithCsrf(method: Method, path: string, body: unknown): Promise<unknown> {
  csrfToken ??= fetchCsrfToken().catch((error: unknown) => {
    csrfToken = undefined;
    throw error;
  });
  try {
    return await send(method, path, body, await csrfToken);
  } catch (error) {
    // A token can go stale (session rotated, server restarted): fetch a fresh one and retry once.
    if (error instanceof ApiError && error.status === 403 && error.code === 'csrf_invalid') {
      forgetCsrfToken();
      csrfToken = fetchCsrfToken();
      return send(method, path, body, await csrfToken);
    }
    throw error;
  }
}

function parseWith<T>(schema: Parser<T> | undefined, value: unknown): T {
  return schema ? schema.parse(value) : (value as T);
}

/**
 * The one way the app talks to the API: same-origin cookies, JSON in and out, the CSRF header on
 * every state-changing call, and an ApiError (with the server's message) for every failure.
 * Responses are checked against the shared schema when one is given.
 */
export const api = {
  get: async <T>(path: string, schema: Parser<T>): Promise<T> => parseWith(schema, await send('GET', path, undefined, undefined)),
  post: async <T = void>(path: string, body?: unknown, schema?: Parser<T>): Promise<T> =>
    parseWith(schema, await sendWithCsrf('POST', path, body ?? {})),
  patch: async <T = void>(path: string, body: unknown, schema?: Parser<T>): Promise<T> =>
    parseWith(schema, await sendWithCsrf('PATCH', path, body)),
  delete: async (path: string): Promise<void> => {
    await sendWithCsrf('DELETE', path, undefined);
  },
};
