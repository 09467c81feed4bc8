import { and, eq, gt } from 'drizzle-orm';
import type { Database } from '@keybed/db/client';
import { sessions } from '@keybed/db/schema';

export function createEventsRepo(db: Database) {
  return {
    /** True while the session exists and has not expired (sign-out and deactivation delete it). */
    async isSessionLive(sessionId: string, now: Date) {
      const [row] = await db
        .select({ id: sessions.id })
        .from(sessions)
        .where(and(eq(sessions.id, sessionId), gt(sessions.expiresAt, now)));
      return Boolean(row);
    },
  };
}

export type EventsRepo = ReturnType<typeof createEventsRepo>;
