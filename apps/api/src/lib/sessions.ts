import { DrizzlePostgreSQLAdapter } from '@lucia-auth/adapter-drizzle';
import { and, eq, sql } from 'drizzle-orm';
import { Lucia, TimeSpan } from 'lucia';
import type { Database } from '@keybed/db/client';
import { memberships, sessions, users } from '@keybed/db/schema';
import type { Role } from '@keybed/shared';

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

/** A valid session together with the membership it acts for (active or not). */
export interface SessionWithMember extends ActiveSession {
  membership: { id: string; role: Role; isActive: boolean };
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
  const idleMs = opts.idleHours * 3600_000;
  const lookup = db
    .select({
      userId: sessions.userId,
      workshopId: sessions.workshopId,
      expiresAt: sessions.expiresAt,
      createdAt: sessions.createdAt,
      membershipId: memberships.id,
      role: memberships.role,
      isActive: memberships.isActive,
    })
    .from(sessions)
    .innerJoin(memberships, and(eq(memberships.userId, sessions.userId), eq(memberships.workshopId, sessions.workshopId)))
    .where(eq(sessions.id, sql.placeholder('id')))
    .limit(1)
    .prepare('keybed_session_lookup');

  return {
    readCookie: (header: string | undefined) => lucia.readSessionCookie(header ?? ''),

    async start(userId: string, workshopId: string): Promise<ActiveSession> {
      const s = await lucia.createSession(userId, { workshopId, createdAt: new Date() });
      return { id: s.id, userId, workshopId, expiresAt: s.expiresAt, isRenewed: true };
    },

    /**
     * Reads the session and its membership in one prepared query (this runs on every request),
     * then applies lucia's rules: expired → gone; past half its idle span → extended; and ours:
     * past the absolute lifetime → gone.
     */
    async validate(sessionId: string, now = new Date()): Promise<SessionWithMember | null> {
      const [row] = await lookup.execute({ id: sessionId });
      if (!row) return null;
      const isExpired = now.getTime() >= row.expiresAt.getTime();
      if (isExpired || now.getTime() - row.createdAt.getTime() > absoluteMs) {
        await lucia.invalidateSession(sessionId);
        return null;
      }
      let expiresAt = row.expiresAt;
      const isRenewed = expiresAt.getTime() - now.getTime() < idleMs / 2;
      if (isRenewed) {
        expiresAt = new Date(now.getTime() + idleMs);
        await db.update(sessions).set({ expiresAt }).where(eq(sessions.id, sessionId));
      }
      return {
        id: sessionId,
        userId: row.userId,
        workshopId: row.workshopId,
        expiresAt,
        isRenewed,
        membership: { id: row.membershipId, role: row.role, isActive: row.isActive },
      };
    },

    end: (sessionId: string) => lucia.invalidateSession(sessionId),
    endAllForUser: (userId: string) => lucia.invalidateUserSessions(userId),
    async endAllForMember(userId: string, workshopId: string) {
      await db.delete(sessions).where(and(eq(sessions.userId, userId), eq(sessions.workshopId, workshopId)));
    },
  };
}

export type SessionStore = ReturnType<typeof createSessionStore>;
