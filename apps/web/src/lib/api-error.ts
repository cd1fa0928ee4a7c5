import { ApiErrorSchema } from '@porestack/types';

export type FieldIssue = { path: string; message: string };

/** A failed request, carrying the server's `{ code, message, issues }` (or our own words when there was none). */
export class ApiError extends Error {
  override readonly name = 'ApiError';
  readonly status: number;
  readonly code: string;
  readonly issues: readonly FieldIssue[];

  constructor(status: number, code: string, message: string, issues: readonly FieldIssue[] = []) {
    super(message);
    this.status = status;
    this.code = code;
    this.issues = issues;
  }

  /** The message of the issue for one form field, if the server named that field. */
  issueFor(field: string): string | undefined {
    return this.issues.find((issue) => issue.path === field || issue.path.split('.')[0] === field)?.message;
  }
}

const FALLBACK_MESSAGES: Record<number, string> = {
  401: 'You are not signed in, or your session has ended. Sign in again to continue.',
  403: 'Your role in this organisation does not allow this. Ask an administrator if you need it.',
  404: 'We could not find what you asked for. It may have been removed, or the link is wrong.',
  429: 'Too many attempts in a short time. Wait a minute, then try again.',
};

/** Builds an ApiError from a failed response, keeping the server's words when its body has them. */
export async function apiErrorFromResponse(response: Response): Promise<ApiError> {
  const body: unknown = await response.json().catch(() => undefined);
  const parsed = ApiErrorSchema.safeParse(body);
  if (parsed.success) {
    return new ApiError(response.status, parsed.data.code, parsed.data.message, parsed.data.issues ?? []);
  }
  const message =
    FALLBACK_MESSAGES[response.status] ??
    `The server could not complete the request (HTTP ${response.status}). Try again in a moment; if it keeps happening, tell your administrator.`;
  return new ApiError(response.status, `http_${response.status}`, message);
}

/** For a fetch that never reached the server. */
export function networkError(): ApiError {
  return new ApiError(
    0,
    'network_error',
    'We could not reach the Porestack server. Check your connection, then try again.',
  );
}

/** Any thrown value as words a person can read. */
export function messageOf(error: unknown): string {
  if (error instanceof ApiError) return error.message;
  return 'Something went wrong in the page itself. Reload it and try again.';
}
