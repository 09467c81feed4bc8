import { DrizzlePostgreSQLAdapter } from '@lucia-auth/adapter-drizzle';
import { and, eq } from 'drizzle-orm';
import { Lucia, TimeSpan } from 'lucia';
import type { Database } from '@keybed/db/client';
import { sessions, users } from '@keybed/db/schema';

interface SessionRow {
  workshopId: string;
  createdAt: Date;
}

type KeybedLucia = Lucia<SessionRow, Record<never, never>>;

declare module 'lucia' {
  interface Register {
    Lucia: KeybedLucia;
    DatabaseSessionAttributes: SessionRow;
  }
}

export interface ActiveSession {
  id: string;
  userId: string;
  workshopId: string;
  expiresAt: Date;
  /** True when the idle expiry was just extended and the cookie must be sent again. */
  isRenewed: boolean;
}

export const SESSION_COOKIE = 'keybed_session';

/**
 * The only module that knows about lucia. Sessions slide on an idle expiry (lucia) and also end
 * at an absolute lifetime counted from sign-in (OWASP ASVS 3.3), which lucia does not do itself.
 */
export function createSessionStore(db: Database, opts: { idleHours: number; absoluteHours: number }) {
  const adapter = new DrizzlePostgreSQLAdapter(db, sessions, users);
  const lucia: KeybedLucia = new Lucia(adapter, {
    sessionExpiresIn: new TimeSpan(opts.idleHours * 60, 'm'),
    sessionCookie: { name: SESSION_COOKIE },
    getSessionAttributes: (row) => ({ workshopId: row.workshopId, createdAt: new Date(row.createdAt) }),
  });
  const absoluteMs = opts.absoluteHours * 3600_000;

  return {
    readCookie: (header: string | undefined) => lucia.readSessionCookie(header ?? ''),

    async start(userId: string, workshopId: string): Promise<ActiveSession> {
      const s = await lucia.createSession(userId, { workshopId, createdAt: new Date() });
      return { id: s.id, userId, workshopId, expiresAt: s.expiresAt, isRenewed: true };
    },

    async validate(sessionId: string, now = new Date()): Promise<ActiveSession | null> {
      const { session } = await lucia.validateSession(sessionId);
      if (!session) return null;
      if (now.getTime() - session.createdAt.getTime() > absoluteMs) {
        await lucia.invalidateSession(session.id);
        return null;
      }
      return { id: session.id, userId: session.userId, workshopId: session.workshopId, expiresAt: session.expiresAt, isRenewed: session.fresh };
    },

    end: (sessionId: string) => lucia.invalidateSession(sessionId),
    endAllForUser: (userId: string) => lucia.invalidateUserSessions(userId),
    async endAllForMember(userId: string, workshopId: string) {
      await db.delete(sessions).where(and(eq(sessions.userId, userId), eq(sessions.workshopId, workshopId)));
    },
  };
}

export type SessionStore = ReturnType<typeof createSessionStore>;
