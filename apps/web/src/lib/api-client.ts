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

export type UploadProgress = { loadedBytes: number; totalBytes: number | null };
export type UploadOptions = { onProgress?: (progress: UploadProgress) => void; signal?: AbortSignal };

/**
 * fetch reports no upload progress, so files go up through XMLHttpRequest, whose `upload`
 * object fires progress events as the body leaves the browser. Same cookie, same CSRF header.
 */
function uploadWithProgress(path: string, form: FormData, token: string, { onProgress, signal }: UploadOptions): Promise<unknown> {
  return new Promise((resolve, reject) => {
    const request = new XMLHttpRequest();
    request.open('POST', path);
    request.withCredentials = true;
    request.setRequestHeader('accept', 'application/json');
    request.setRequestHeader('x-csrf-token', token);
    request.upload.addEventListener('progress', (event) => {
      onProgress?.({ loadedBytes: event.loaded, totalBytes: event.lengthComputable ? event.total : null });
    });
    request.addEventListener('load', () => {
      const response = new Response(request.status === 204 ? null : request.responseText, {
        status: request.status,
        headers: { 'content-type': request.getResponseHeader('content-type') ?? 'application/json' },
      });
      if (!response.ok) {
        void apiErrorFromResponse(response).then(reject, reject);
        return;
      }
      resolve(request.responseText === '' ? undefined : (JSON.parse(request.responseText) as unknown));
    });
    request.addEventListener('error', () => reject(networkError()));
    request.addEventListener('abort', () => reject(new ApiError(0, 'upload_cancelled', 'The upload was cancelled. Choose the file again to send it.')));
    signal?.addEventListener('abort', () => request.abort());
    request.send(form);
  });
}

async function uploadWithCsrf(path: string, form: FormData, options: UploadOptions): Promise<unknown> {
  csrfToken ??= fetchCsrfToken().catch((error: unknown) => {
    csrfToken = undefined;
    throw error;
  });
  try {
    return await uploadWithProgress(path, form, await csrfToken, options);
  } catch (error) {
    if (error instanceof ApiError && error.status === 403 && error.code === 'csrf_invalid') {
      forgetCsrfToken();
      csrfToken = fetchCsrfToken();
      return uploadWithProgress(path, form, await csrfToken, options);
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
  put: async <T = void>(path: string, body: unknown, schema?: Parser<T>): Promise<T> =>
    parseWith(schema, await sendWithCsrf('PUT', path, body)),
  /** A multipart upload with real progress (see uploadWithProgress). */
  upload: async <T>(path: string, form: FormData, schema: Parser<T>, options: UploadOptions = {}): Promise<T> =>
    parseWith(schema, await uploadWithCsrf(path, form, options)),
  delete: async (path: string): Promise<void> => {
    await sendWithCsrf('DELETE', path, undefined);
  },
};
