import { LiveEvent } from '@keybed/shared';

/** When the server refuses the stream (signed out, unpaired, restarting), ask again after a while, growing. */
const RETRY_MIN_MS = 2_000;
const RETRY_MAX_MS = 30_000;

export function parseLiveEvent(data: unknown): LiveEvent | undefined {
  try {
    const parsed = LiveEvent.safeParse(JSON.parse(String(data)));
    return parsed.success ? parsed.data : undefined;
  } catch {
    return undefined;
  }
}

interface Handlers {
  /** The stream is open; `isReconnect` after an earlier open, when events may have been missed. */
  onOpen?: (isReconnect: boolean) => void;
  onEvent: (event: LiveEvent) => void;
  /** The stream dropped or was refused. */
  onDown?: () => void;
}

/**
 * A Server-Sent Events stream of Keybed's live events. The browser reconnects a dropped stream by
 * itself; a refused one (closed) is retried here with a growing wait. Returns the function that
 * closes it for good.
 */
export function openLiveStream(url: string, { onOpen, onEvent, onDown }: Handlers): () => void {
  let source: EventSource | undefined;
  let retryTimer: ReturnType<typeof setTimeout> | undefined;
  let retryMs = RETRY_MIN_MS;
  let hasOpened = false;

  function connect() {
    source = new EventSource(url);
    source.onopen = () => {
      retryMs = RETRY_MIN_MS;
      onOpen?.(hasOpened);
      hasOpened = true;
    };
    source.onmessage = (message) => {
      const event = parseLiveEvent(message.data);
      if (event) onEvent(event);
    };
    source.onerror = () => {
      onDown?.();
      if (source?.readyState !== EventSource.CLOSED) return;
      retryTimer = setTimeout(connect, retryMs);
      retryMs = Math.min(retryMs * 2, RETRY_MAX_MS);
    };
  }

  connect();
  return () => {
    source?.close();
    clearTimeout(retryTimer);
  };
}
