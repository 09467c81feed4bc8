import { useEffect } from 'react';
import { useQueryClient, type QueryKey } from '@tanstack/react-query';
import { LiveEvent } from '@keybed/shared';
import { boardMoveKey, isBoardKey, keysAfterReconnect, keysFor } from './live-invalidations';

/** Events arriving together are applied together, so a burst of moves refetches the board once. */
const BATCH_MS = 50;
/** When the server refuses the stream (signed out, restarting), ask again after a while, growing. */
const RETRY_MIN_MS = 2_000;
const RETRY_MAX_MS = 30_000;

function parse(data: unknown): LiveEvent | undefined {
  try {
    const parsed = LiveEvent.safeParse(JSON.parse(String(data)));
    return parsed.success ? parsed.data : undefined;
  } catch {
    return undefined;
  }
}

/**
 * One stream of live events for the signed-in app. The browser reconnects a dropped stream by
 * itself; a refused one is retried here. Each event invalidates the reads it may have changed.
 */
export function useLiveUpdates() {
  const queryClient = useQueryClient();

  useEffect(() => {
    let source: EventSource | undefined;
    let retryTimer: ReturnType<typeof setTimeout> | undefined;
    let batchTimer: ReturnType<typeof setTimeout> | undefined;
    let retryMs = RETRY_MIN_MS;
    let hasOpened = false;
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

    function connect() {
      source = new EventSource('/api/events');
      source.onopen = () => {
        retryMs = RETRY_MIN_MS;
        if (hasOpened) queue(keysAfterReconnect);
        hasOpened = true;
      };
      source.onmessage = (message) => {
        const event = parse(message.data);
        if (event) queue(keysFor(event));
      };
      source.onerror = () => {
        if (source?.readyState !== EventSource.CLOSED) return;
        retryTimer = setTimeout(connect, retryMs);
        retryMs = Math.min(retryMs * 2, RETRY_MAX_MS);
      };
    }

    connect();
    return () => {
      source?.close();
      clearTimeout(retryTimer);
      clearTimeout(batchTimer);
    };
  }, [queryClient]);
}
