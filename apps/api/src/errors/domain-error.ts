import type { ApiErrorCode } from '@porestack/types';

/**
 * Services throw DomainError with one of the shared API_ERROR_CODES (@porestack/types);
 * only the error middleware knows which HTTP status each code becomes.
 */
export type ErrorCode = ApiErrorCode;

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
