import { LiveEvent } from '@keybed/shared';

export interface SseFrame {
  data?: string;
  retry?: number;
  comment?: string;
}

/**
 * A real HTTP Server-Sent Events client (fetch and a stream reader) that parses frames as a
 * browser's EventSource does and hands them over one at a time.
 */
export async function openEventStream(url: string, cookie?: string) {
  const controller = new AbortController();
  const res = await fetch(url, { headers: { accept: 'text/event-stream', ...(cookie ? { cookie } : {}) }, signal: controller.signal });
  const frames: SseFrame[] = [];
  const waiters: Array<() => void> = [];
  let isEnded = false;
  let buffer = '';

  const wake = () => waiters.splice(0).forEach((w) => w());
  const pump = async () => {
    if (!res.body) return;
    const reader = res.body.pipeThrough(new TextDecoderStream()).getReader();
    try {
      for (;;) {
        const { value, done } = await reader.read();
        if (done) break;
        buffer += value;
        let end: number;
        while ((end = buffer.indexOf('\n\n')) >= 0) {
          frames.push(parseFrame(buffer.slice(0, end)));
          buffer = buffer.slice(end + 2);
        }
        wake();
      }
    } catch {
      // Aborted by close(): the stream simply ends.
    }
    isEnded = true;
    wake();
  };
  void pump();

  /** Waits until more arrives, the stream ends, or `ms` pass. */
  const change = (ms: number) =>
    new Promise<void>((resolve) => {
      const timer = setTimeout(resolve, ms);
      waiters.push(() => {
        clearTimeout(timer);
        resolve();
      });
    });

  async function nextFrame(timeoutMs: number, accept: (f: SseFrame) => boolean): Promise<SseFrame> {
    const until = Date.now() + timeoutMs;
    for (;;) {
      const index = frames.findIndex(accept);
      if (index >= 0) return frames.splice(0, index + 1).at(-1)!;
      if (isEnded) throw new Error('The event stream ended');
      const left = until - Date.now();
      if (left <= 0) throw new Error(`No matching event within ${timeoutMs} ms`);
      await change(left);
    }
  }

  return {
    res,
    /** The next data event, parsed against the shared contract; frames before it are dropped. */
    nextEvent: async (timeoutMs = 1000) => LiveEvent.strict().parse(JSON.parse((await nextFrame(timeoutMs, (f) => f.data !== undefined)).data!)),
    nextFrame,
    /** Resolves when the server ends the stream. */
    ended: async (timeoutMs = 1000) => {
      const until = Date.now() + timeoutMs;
      while (!isEnded && Date.now() < until) await change(until - Date.now());
      return isEnded;
    },
    close: () => controller.abort(),
  };
}

function parseFrame(block: string): SseFrame {
  const frame: SseFrame = {};
  for (const line of block.split('\n')) {
    if (line.startsWith(':')) frame.comment = line.slice(1).trim();
    else if (line.startsWith('data:')) frame.data = (frame.data === undefined ? '' : `${frame.data}\n`) + line.slice(5).trimStart();
    else if (line.startsWith('retry:')) frame.retry = Number(line.slice(6));
  }
  return frame;
}
