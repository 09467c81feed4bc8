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
  /** Bench time: the technician's PIN was wrong, they are locked out, or they have none yet. */
  'pin_incorrect',
  'pin_locked',
  'pin_not_set',
  /** The wall screen's device session is missing, revoked, or refused after too many wrong PINs. */
  'wall_not_paired',
  'wall_pin_limit',
  /** A clock grant that is unknown, for another screen or technician, expired, ended by a PIN change or lock, or for a time it does not cover. */
  'grant_refused',
  /** Clocking on to a task that is done or on a job that is not active. */
  'task_not_open',
  /** Clocking off when nothing runs. */
  'not_running',
  /** The entry lies in an approved week: only the owner may change it. */
  'week_approved',
  /** Parts: not enough on hand for that use, and the workshop does not allow negative stock. */
  'insufficient_stock',
  /** Estimates: the estimate's status does not allow that (editing an issued one, accepting a draft). */
  'estimate_status',
  /** Uploads: the content is not a photo Keybed can read (JPEG, PNG, WebP), whatever its name says. */
  'unsupported_file',
  /** The client's link: past its expiry, withdrawn by the workshop, or for a revision replaced by a newer one. */
  'link_expired',
  'link_revoked',
  'link_superseded',
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
