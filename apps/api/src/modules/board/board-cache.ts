import crypto from 'node:crypto';

/** A board as sent: the JSON bytes and a strong validator for conditional requests. */
export interface BoardBody {
  bytes: Buffer;
  etag: string;
}

interface Entry extends BoardBody {
  stamp: string;
  storedAt: number;
}

export const BOARD_CACHE_TTL_MS = 2000;

export function toBoardBody(value: unknown): BoardBody {
  const bytes = Buffer.from(JSON.stringify(value));
  return { bytes, etag: `"${crypto.createHash('sha1').update(bytes).digest('base64url')}"` };
}

/**
 * The last unfiltered board of each workshop, ready to send. Every committed change to a
 * workshop's jobs, stages, clients, pianos, tasks or time entries drops its board: this process's
 * own writes right after they commit, every process's writes through the live-event listener. A
 * board built while a change lands is not kept, so a stale board never outlives that change's
 * notification. Caching is on only while the listener listens (`reset` turns it on after each
 * (re)connect), and an entry expires after `ttlMs` in case notifications were lost while it
 * reconnected; that also bounds how far a running time entry's minutes on a kept board lag.
 */
export function createBoardCache({ ttlMs = BOARD_CACHE_TTL_MS, clock = () => performance.now() } = {}) {
  // A board may be kept only if neither its workshop's generation nor the epoch moved while it was built.
  const generations = new Map<string, number>();
  const entries = new Map<string, Entry>();
  let epoch = 0;
  let isOn = false;
  const stampOf = (workshopId: string) => `${epoch}:${generations.get(workshopId) ?? 0}`;

  return {
    async get(workshopId: string, build: () => Promise<BoardBody>): Promise<BoardBody> {
      const hit = entries.get(workshopId);
      if (isOn && hit && hit.stamp === stampOf(workshopId) && clock() - hit.storedAt < ttlMs) return hit;
      const stamp = stampOf(workshopId);
      const body = await build();
      if (isOn && stamp === stampOf(workshopId)) entries.set(workshopId, { ...body, stamp, storedAt: clock() });
      return body;
    },

    /** The workshop's board changed (or may have). */
    invalidate(workshopId: string) {
      generations.set(workshopId, (generations.get(workshopId) ?? 0) + 1);
      entries.delete(workshopId);
    },

    /** Forgets every board and starts caching: called each time the listener (re)connects. */
    reset() {
      epoch++;
      entries.clear();
      isOn = true;
    },

    /** Stops caching (the listener is gone, so changes from other processes would be missed). */
    stop() {
      epoch++;
      isOn = false;
      entries.clear();
    },
  };
}

export type BoardCache = ReturnType<typeof createBoardCache>;
