import { useSuspenseQuery } from '@tanstack/react-query';
import { meQueryOptions } from '../api/get-me';

/**
 * The signed-in member, for pages inside the signed-in layout. The layout renders its pages only
 * once `/api/me` has answered, so this never waits.
 */
export function useSignedInMember() {
  return useSuspenseQuery(meQueryOptions()).data;
}
