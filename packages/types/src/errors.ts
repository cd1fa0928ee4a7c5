import { z } from 'zod';

/**
 * Every `code` the API answers with. The web app may switch on them (e.g. `csrf_invalid`:
 * fetch a new token; `unauthenticated`: go to sign-in); the message is for the person.
 */
export const API_ERROR_CODES = [
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
  'invalid_transition',
  'own_test',
  'unsupported_file',
  'invalid_file',
  'profile_name_taken',
  'report_not_ready',
  'rate_limited',
  'token_invalid',
  'token_used',
  'token_expired',
  'service_unavailable',
  /** Saved only once the person has read the warnings listed in `issues` and sends the request again with acceptWarnings. */
  'confirmation_needed',
  'internal',
] as const;
export type ApiErrorCode = (typeof API_ERROR_CODES)[number];

/** Every error the API answers with has this body. */
export const ApiErrorSchema = z.object({
  code: z.string(),
  message: z.string(),
  /** Field-level problems of a rejected request body or query. */
  issues: z.array(z.object({ path: z.string(), message: z.string() })).optional(),
});
export type ApiError = z.infer<typeof ApiErrorSchema>;
