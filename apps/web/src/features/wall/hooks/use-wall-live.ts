import { useEffect, useState } from 'react';
import { useQueryClient } from '@tanstack/react-query';
import { LiveEvent } from '@keybed/shared';
import { wallKeys } from '../api/keys';

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
 * The screen's own live event stream (its device session may not use the members' one). Clock
 * changes anywhere refresh who is on what, stock changes the parts to log; answers whether the
 * stream is open, so the screen can poll more often while it is not.
 */
export function useWallLive(isEnabled: boolean): boolean {
  const queryClient = useQueryClient();
  const [isLive, setIsLive] = useState(false);

  useEffect(() => {
    if (!isEnabled) return;
    let source: EventSource | undefined;
    let retryTimer: ReturnType<typeof setTimeout> | undefined;
    let retryMs = RETRY_MIN_MS;
    const refresh = () => void queryClient.invalidateQueries({ queryKey: wallKeys.technicians() });

    function connect() {
      source = new EventSource('/api/wall/events');
      source.onopen = () => {
        retryMs = RETRY_MIN_MS;
        setIsLive(true);
        refresh();
      };
      source.onmessage = (message) => {
        const event = parse(message.data);
        if (event?.kind === 'time.changed' || event?.kind === 'task.changed') refresh();
        if (event?.kind === 'part.changed') void queryClient.invalidateQueries({ queryKey: wallKeys.parts() });
      };
      source.onerror = () => {
        setIsLive(false);
        if (source?.readyState !== EventSource.CLOSED) return;
        retryTimer = setTimeout(connect, retryMs);
        retryMs = Math.min(retryMs * 2, RETRY_MAX_MS);
      };
    }

    connect();
    return () => {
      source?.close();
      clearTimeout(retryTimer);
      setIsLive(false);
    };
  }, [isEnabled, queryClient]);

  return isLive;
}
