import { sql as drizzleSql } from 'drizzle-orm';
import type { Sql } from 'postgres';
import { z } from 'zod';
import { LIVE_EVENT_KINDS, type LiveEvent, type LiveEventKind } from '@keybed/shared';
import type { Tx } from '../modules/auth/auth.repo';
import type { Logger } from './logger';

/** The one PostgreSQL channel every API process listens on. */
export const LIVE_CHANNEL = 'keybed_events';
/** SSE comment sent to every open stream so proxies and browsers keep it open. */
export const HEARTBEAT_MS = 25_000;
/** How long a browser waits before reconnecting a dropped stream. */
export const RETRY_MS = 3_000;

/** What travels over NOTIFY between processes; only `kind`, `id` and `at` reach the browser. */
const Notice = z.object({ workshopId: z.string(), kind: z.enum(LIVE_EVENT_KINDS), id: z.string(), at: z.string() });

/**
 * Queues a live event inside the caller's transaction: PostgreSQL delivers it to every listening
 * process when the transaction commits, and drops it when it rolls back.
 */
export async function notifyLive(tx: Tx, workshopId: string, kind: LiveEventKind, id: string, at: Date) {
  const payload = JSON.stringify({ workshopId, kind, id, at: at.toISOString() });
  await tx.execute(drizzleSql`select pg_notify(${LIVE_CHANNEL}, ${payload})`);
}

/** Called with a workshop's id once a change to it has committed in this process. */
export type Changed = (workshopId: string) => void;

/** Awaits a write transaction, then reports the workshop as changed (only if it committed). */
export async function committed<T>(changed: Changed, workshopId: string, write: Promise<T>): Promise<T> {
  const result = await write;
  changed(workshopId);
  return result;
}

/** Where a subscriber's frames go: an SSE response in practice. */
export interface LiveSink {
  write(chunk: string): unknown;
  end(): unknown;
}

interface Options {
  sql: Sql;
  logger: Logger;
  heartbeatMs?: number;
  /** Told of every workshop that changed, in any process, before its streams hear of it. */
  onChange?: (workshopId: string) => void;
  /** Told each time the listener starts listening: at start and after every reconnect. */
  onListen?: () => void;
}

/**
 * One LISTEN connection per process (postgres.js keeps it apart from the pool and re-listens after
 * a reconnect) fanning events out to this process's SSE subscribers of the matching workshop.
 */
export function createLiveEvents({ sql, logger, heartbeatMs = HEARTBEAT_MS, onChange, onListen }: Options) {
  const byWorkshop = new Map<string, Set<LiveSink>>();
  const checks = new Map<LiveSink, () => Promise<boolean>>();
  let isClosed = false;

  function remove(workshopId: string, sink: LiveSink) {
    checks.delete(sink);
    const sinks = byWorkshop.get(workshopId);
    sinks?.delete(sink);
    if (sinks?.size === 0) byWorkshop.delete(workshopId);
  }

  /** Ends a stream whose caller may no longer listen (signed out, deactivated); a failed check keeps it. */
  async function recheck(workshopId: string, sink: LiveSink, isStillAllowed: () => Promise<boolean>) {
    const isAllowed = await isStillAllowed().catch(() => true);
    if (isAllowed || !byWorkshop.get(workshopId)?.has(sink)) return;
    remove(workshopId, sink);
    sink.end();
  }

  function deliver(raw: string) {
    const parsed = Notice.safeParse(safeJson(raw));
    if (!parsed.success) {
      logger.warn('ignored a malformed live event');
      return;
    }
    const { workshopId, ...event } = parsed.data;
    onChange?.(workshopId);
    const frame = `data: ${JSON.stringify(event satisfies LiveEvent)}\n\n`;
    for (const sink of byWorkshop.get(workshopId) ?? []) sink.write(frame);
  }

  const listening = sql.listen(LIVE_CHANNEL, deliver, onListen);
  listening.catch((err: unknown) => logger.error({ err }, 'could not listen for live events'));

  const heartbeat = setInterval(() => {
    for (const [workshopId, sinks] of byWorkshop) {
      for (const sink of sinks) {
        sink.write(': heartbeat\n\n');
        const check = checks.get(sink);
        if (check) void recheck(workshopId, sink, check);
      }
    }
  }, heartbeatMs);
  heartbeat.unref();

  return {
    /** Resolves once this process is listening, so a stream opened after it misses nothing. */
    ready: async () => {
      await listening;
    },

    /**
     * Starts a stream for one workshop; returns the function that ends it. `isStillAllowed`, when
     * given, is asked at each heartbeat and ends the stream once it answers false.
     */
    subscribe(workshopId: string, sink: LiveSink, options: { isStillAllowed?: () => Promise<boolean> } = {}) {
      if (isClosed) throw new Error('live events are closed');
      sink.write(`retry: ${RETRY_MS}\n\n`);
      let sinks = byWorkshop.get(workshopId);
      if (!sinks) byWorkshop.set(workshopId, (sinks = new Set()));
      sinks.add(sink);
      if (options.isStillAllowed) checks.set(sink, options.isStillAllowed);
      return () => remove(workshopId, sink);
    },

    subscriberCount: () => [...byWorkshop.values()].reduce((n, s) => n + s.size, 0),

    /** Ends every open stream and stops listening; the pool itself is closed by its owner. */
    async close() {
      if (isClosed) return;
      isClosed = true;
      clearInterval(heartbeat);
      for (const sinks of byWorkshop.values()) for (const sink of sinks) sink.end();
      byWorkshop.clear();
      checks.clear();
      const meta = await listening.catch(() => undefined);
      await meta?.unlisten().catch(() => undefined);
    },
  };
}

export type LiveEvents = ReturnType<typeof createLiveEvents>;

function safeJson(raw: string): unknown {
  try {
    return JSON.parse(raw);
  } catch {
    return undefined;
  }
}
