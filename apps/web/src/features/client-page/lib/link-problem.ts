import { isApiError } from '@/lib/api-client';

/** Why a client's link cannot show the estimate, from the API's error code. */
export type LinkProblem = 'invalid' | 'expired' | 'revoked' | 'superseded' | 'unreachable' | 'other';

export function linkProblemOf(error: unknown): LinkProblem {
  if (!isApiError(error)) return 'other';
  switch (error.code) {
    case 'token_invalid':
    case 'not_found':
    case 'validation_failed':
      return 'invalid';
    case 'link_expired':
      return 'expired';
    case 'link_revoked':
      return 'revoked';
    case 'link_superseded':
      return 'superseded';
    case 'network_error':
    case 'service_unavailable':
      return 'unreachable';
    default:
      return 'other';
  }
}

/** What the client is told for each problem: a heading and what to do next. */
export const LINK_PROBLEM_TEXT: Record<LinkProblem, { title: string; action: string }> = {
  invalid: { title: 'This link does not work', action: 'Check that the whole link was copied from the e-mail, or ask the workshop to send it again.' },
  expired: { title: 'This link has expired', action: 'Links to an estimate last a limited time. Ask the workshop to send the estimate again.' },
  revoked: { title: 'This link has been withdrawn', action: 'The workshop has withdrawn this link. Please contact them for the current estimate.' },
  superseded: { title: 'A newer estimate was sent to you', action: 'The workshop has revised this estimate. Please use the link in their latest e-mail.' },
  unreachable: { title: 'The estimate could not be loaded', action: 'Check your connection and try again in a moment.' },
  other: { title: 'Something went wrong', action: 'Please try again in a moment. If it keeps happening, contact the workshop.' },
};
