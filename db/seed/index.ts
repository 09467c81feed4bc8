import { eq, inArray } from 'drizzle-orm';
import type { Database } from '../client';
import { DEFAULT_STAGE_NAMES } from '@keybed/shared';
import { memberships, stages, users, workshops } from '../schema/index';
import { DEMO_MEMBERS, DEMO_PASSWORD, DEMO_WORKSHOP } from './demo';

export { DEMO_MEMBERS, DEMO_PASSWORD, DEMO_WORKSHOP };

/** Inserts what is missing of the demo scenario; rows already there are left as they are. */
export async function seedDemo(db: Database, hashPassword: (password: string) => Promise<string>) {
  await db.transaction(async (tx) => {
    const created = await tx.insert(workshops).values(DEMO_WORKSHOP).onConflictDoNothing().returning({ id: workshops.id });
    if (created.length > 0) {
      await tx.insert(stages).values(DEFAULT_STAGE_NAMES.map((name, position) => ({ workshopId: DEMO_WORKSHOP.id, name, position })));
    }
    const existing = await tx
      .select({ email: users.email })
      .from(users)
      .where(inArray(users.email, DEMO_MEMBERS.map((m) => m.email)));
    const known = new Set(existing.map((u) => u.email));
    const missing = DEMO_MEMBERS.filter((m) => !known.has(m.email));
    if (missing.length > 0) {
      const passwordHash = await hashPassword(DEMO_PASSWORD);
      await tx.insert(users).values(missing.map((m) => ({ id: m.id, email: m.email, name: m.name, passwordHash })));
    }
    const ids = await tx.select({ id: users.id, email: users.email }).from(users).where(inArray(users.email, DEMO_MEMBERS.map((m) => m.email)));
    const idByEmail = new Map(ids.map((u) => [u.email, u.id]));
    await tx
      .insert(memberships)
      .values(DEMO_MEMBERS.map((m) => ({ workshopId: DEMO_WORKSHOP.id, userId: idByEmail.get(m.email)!, role: m.role })))
      .onConflictDoNothing();
  });
  const [workshop] = await db.select({ name: workshops.name }).from(workshops).where(eq(workshops.id, DEMO_WORKSHOP.id));
  return { workshop: workshop?.name ?? DEMO_WORKSHOP.name, members: DEMO_MEMBERS.length };
}
