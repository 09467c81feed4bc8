import { isApiError } from '@/lib/api-client';
import type { SendOutcome } from './clock-queue';

/**
 * Refusals about who is asking (the PIN, the grant, the screen), not about the action: the action
 * waits. A refused grant is dropped from the action, which then waits for the PIN.
 */
const WAIT_CODES = new Set(['pin_incorrect', 'pin_locked', 'pin_not_set', 'wall_pin_limit', 'wall_not_paired', 'grant_refused', 'rate_limited', 'unauthenticated', 'forbidden_origin']);

/** The API would not take the action's grant (expired, ended by a PIN change, outside its window…): only the PIN can send it now. */
export const isGrantRefusal = (error: unknown) => isApiError(error) && error.code === 'grant_refused';

/** The request never reached the API: no network, or the browser says it is offline. */
export function isNetworkFailure(error: unknown, isOnline = typeof navigator === 'undefined' || navigator.onLine): boolean {
  return !isOnline || (isApiError(error) ? error.code === 'network_error' : error instanceof TypeError);
}

/** How a failed send of a queued action counts: set aside for good, or kept waiting. */
export function outcomeOfError(error: unknown, isOnline?: boolean): SendOutcome {
  if (isNetworkFailure(error, isOnline) || !isApiError(error)) return { kind: 'stopped', error };
  if (error.status >= 500 || error.code === 'bad_response' || WAIT_CODES.has(error.code)) return { kind: 'stopped', error };
  return { kind: 'refused', code: error.code, message: error.message };
}
