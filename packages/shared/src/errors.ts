/**
 * Every error code the API can return. The web app branches on these, never on message text.
 */
export const ERROR_CODES = [
  'validation_failed',
  'unauthenticated',
  'invalid_credentials',
  'forbidden',
  'forbidden_origin',
  'not_found',
  'conflict',
  'version_conflict',
  'email_taken',
  'last_owner',
  'stage_not_empty',
  'token_invalid',
  'rate_limited',
  'payload_too_large',
  'service_unavailable',
  'internal',
] as const;

export type ErrorCode = (typeof ERROR_CODES)[number];

/** Field name → human-readable problems with that field. */
export type FieldErrors = Record<string, string[]>;

export interface ErrorBody {
  error: {
    code: ErrorCode;
    message: string;
    fields?: FieldErrors;
    requestId?: string;
  };
}
