/**
 * Every code the API can answer with. Services throw DomainError with one of these;
 * only the error middleware knows which HTTP status each code becomes.
 */
export const ERROR_CODES = [
  'invalid_json',
  'validation_failed',
  'payload_too_large',
  'csrf_invalid',
  'unauthenticated',
  'invalid_credentials',
  'forbidden',
  'not_found',
  'email_taken',
  'already_member',
  'last_admin',
  'rate_limited',
  'token_invalid',
  'token_used',
  'token_expired',
  'service_unavailable',
  'internal',
] as const;
export type ErrorCode = (typeof ERROR_CODES)[number];

export interface FieldIssue {
  path: string;
  message: string;
}

/** A failure a person can act on: its message is shown to them as it is. */
export class DomainError extends Error {
  constructor(
    readonly code: ErrorCode,
    message: string,
    readonly issues?: FieldIssue[],
  ) {
    super(message);
    this.name = 'DomainError';
  }
}

/** The same answer for a missing object and for one of another tenant. */
export class NotFoundError extends DomainError {
  constructor(what: string) {
    super('not_found', `We could not find that ${what}. It may have been removed, or the link may be wrong.`);
    this.name = 'NotFoundError';
  }
}
