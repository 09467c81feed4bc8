import { useEffect } from 'react';
import { useQueryClient, type QueryKey } from '@tanstack/react-query';
import { openLiveStream } from '@/lib/live-stream';
import { boardMoveKey, isBoardKey, keysAfterReconnect, keysFor } from './live-invalidations';

/** Events arriving together are applied together, so a burst of moves refetches the board once. */
const BATCH_MS = 50;

/**
 * One stream of live events for the signed-in app (see lib/live-stream.ts for reconnecting).
 * Each event invalidates the reads it may have changed.
 */
export function useLiveUpdates() {
  const queryClient = useQueryClient();

  useEffect(() => {
    let batchTimer: ReturnType<typeof setTimeout> | undefined;
    const pending = new Map<string, QueryKey>();

    function flush() {
      batchTimer = undefined;
      // A move in flight settles with its own refetch; refetching now could show the card jump back.
      const isMoving = queryClient.isMutating({ mutationKey: boardMoveKey }) > 0;
      for (const key of pending.values()) {
        if (isMoving && isBoardKey(key)) continue;
        void queryClient.invalidateQueries({ queryKey: key });
      }
      pending.clear();
    }

    function queue(keys: QueryKey[]) {
      for (const key of keys) pending.set(JSON.stringify(key), key);
      batchTimer ??= setTimeout(flush, BATCH_MS);
    }

    const close = openLiveStream('/api/events', {
      onOpen: (isReconnect) => {
        if (isReconnect) queue(keysAfterReconnect);
      },
      onEvent: (event) => queue(keysFor(event)),
    });
    return () => {
      close();
      clearTimeout(batchTimer);
    };
  }, [queryClient]);
}
