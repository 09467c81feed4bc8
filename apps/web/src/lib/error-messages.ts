import type { ErrorCode } from '@keybed/shared';
import { isApiError, type ClientErrorCode } from './api-client';

export interface ErrorDescription {
  /** What happened, in one short sentence. */
  title: string;
  /** What to do about it. */
  action: string;
}

/**
 * Partial on purpose: a code added to the API before it has wording here still gets the generic
 * message rather than breaking the build; add its own words when the feature that raises it lands.
 */
const BY_CODE: Partial<Record<ErrorCode | ClientErrorCode, ErrorDescription>> = {
  validation_failed: { title: 'Some details need fixing.', action: 'Check the highlighted fields and try again.' },
  unauthenticated: { title: 'You are signed out.', action: 'Sign in again to carry on.' },
  invalid_credentials: { title: 'That e-mail and password do not match an account.', action: 'Check them and try again, or reset your password.' },
  forbidden: { title: 'Your role does not allow this.', action: 'Ask the workshop owner if you need access.' },
  forbidden_origin: { title: 'This request came from an unexpected page.', action: 'Reload Keybed and try again.' },
  not_found: { title: 'This could not be found.', action: 'It may have been removed. Go back and reload the list.' },
  conflict: { title: 'This clashes with something that already exists.', action: 'Reload to see the latest and try again.' },
  version_conflict: { title: 'Someone else changed this while you were editing.', action: 'Reload to see their change, then make yours again.' },
  email_taken: { title: 'An account with this e-mail already exists.', action: 'Sign in instead, or use another e-mail.' },
  last_owner: { title: 'The workshop needs at least one active owner.', action: 'Make someone else an owner first.' },
  stage_not_empty: { title: 'This stage still has jobs in it.', action: 'Move its jobs to another stage first.' },
  token_invalid: { title: 'This link has expired or has already been used.', action: 'Ask for a new link.' },
  rate_limited: { title: 'Too many attempts in a short time.', action: 'Wait a minute, then try again.' },
  payload_too_large: { title: 'That is too large to send.', action: 'Use a smaller file or shorter text.' },
  service_unavailable: { title: 'Keybed is briefly unavailable.', action: 'Try again in a minute.' },
  pin_incorrect: { title: 'That PIN is not right.', action: 'Try again. Five wrong PINs in a row lock the PIN for a few minutes.' },
  pin_locked: { title: 'This PIN is locked after too many wrong tries.', action: 'Wait a few minutes, or ask the foreman to unlock it.' },
  pin_not_set: { title: 'No PIN has been set yet.', action: 'Set a 6-digit PIN on your profile, or ask the owner to set one.' },
  wall_not_paired: { title: 'This browser is not paired as the wall screen.', action: 'An owner or foreman can pair it from Wall screen settings.' },
  wall_pin_limit: { title: 'Too many wrong PINs on this screen in the last hour.', action: 'Wait a while, or ask an owner or foreman.' },
  grant_refused: { title: 'This screen could not send that clock action by itself.', action: 'Enter your PIN here to send it.' },
  task_not_open: { title: 'That task cannot be clocked on to.', action: 'It is done, or its job is not active. Choose an open task.' },
  not_running: { title: 'Nothing is running to clock off.', action: 'Reload to see who is on what now.' },
  week_approved: { title: 'That week is approved and locked.', action: 'Only the owner can change it now.' },
  unsupported_file: { title: 'That file is not a photo Keybed can read.', action: 'Use a JPEG, PNG or WebP photo.' },
  link_expired: { title: 'This link has expired.', action: 'Ask the workshop to send the estimate again.' },
  link_revoked: { title: 'This link has been withdrawn.', action: 'Ask the workshop for the current estimate.' },
  link_superseded: { title: 'A newer estimate has been sent.', action: 'Use the link in the latest e-mail.' },
  insufficient_stock: { title: 'There is not enough of that part in stock.', action: 'Receive the delivery first, or log a smaller quantity.' },
  estimate_status: { title: 'The estimate cannot do that as it stands.', action: 'Reload to see where it stands: only a draft with lines can be issued, and only an issued estimate accepted or declined.' },
  internal: { title: 'Something went wrong on our side.', action: 'Try again. If it keeps happening, tell us the reference below.' },
  network_error: { title: 'Keybed could not be reached.', action: 'Check your connection, then try again.' },
  bad_response: { title: 'Keybed sent a reply this page does not understand.', action: 'Reload the page. If it keeps happening, tell us the reference below.' },
};

const UNKNOWN: ErrorDescription = { title: 'Something went wrong.', action: 'Reload the page and try again.' };

export function describeError(error: unknown): ErrorDescription {
  return (isApiError(error) && BY_CODE[error.code]) || UNKNOWN;
}

/** A reference to quote when reporting a fault on our side; expected refusals (4xx) need none. */
export function errorReference(error: unknown): string | undefined {
  if (!isApiError(error) || !error.requestId) return undefined;
  const isOurFault = error.status >= 500 || error.code === 'bad_response';
  return isOurFault ? `Reference: ${error.requestId}` : undefined;
}
