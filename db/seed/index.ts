import { and, asc, count, eq, inArray, isNotNull, isNull } from 'drizzle-orm';
import type { Database } from '../client';
import { DEFAULT_STAGE_NAMES } from '@keybed/shared';
import { clients, jobs, jobStageEvents, memberships, pianos, stages, users, workshops } from '../schema/index';
import { seedAssessments } from './assessments';
import { seedBench } from './bench';
import { seedMoney } from './money';
import { DEMO_CLIENTS, DEMO_JOBS, DEMO_MEMBERS, DEMO_PASSWORD, DEMO_PIANOS, DEMO_WORKSHOP, demoDate, demoInstant } from './demo';

export { DEMO_MEMBERS, DEMO_PASSWORD, DEMO_WORKSHOP };
export { DEMO_PINS } from './bench-demo';

type Tx = Parameters<Parameters<Database['transaction']>[0]>[0];

/** Inserts what is missing of the demo scenario; rows already there are left as they are. */
export async function seedDemo(db: Database, hashPassword: (password: string) => Promise<string>, now = new Date()) {
  let jobCount = 0;
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
    await tx.insert(clients).values(DEMO_CLIENTS.map((c) => ({ ...c, workshopId: DEMO_WORKSHOP.id }))).onConflictDoNothing();
    await tx.insert(pianos).values(DEMO_PIANOS.map((p) => ({ ...p, workshopId: DEMO_WORKSHOP.id }))).onConflictDoNothing();
    jobCount = await seedJobs(tx, idByEmail.get('tom@fennick.example') ?? null, now);
    await seedBench(tx, hashPassword, now);
    await seedMoney(tx, now);
    await seedAssessments(tx, now);
  });
  const [workshop] = await db.select({ name: workshops.name }).from(workshops).where(eq(workshops.id, DEMO_WORKSHOP.id));
  return { workshop: workshop?.name ?? DEMO_WORKSHOP.name, members: DEMO_MEMBERS.length, jobs: jobCount };
}

/**
 * The demo jobs that are missing, each at the end of its stage, with its stage history moved by
 * the foreman. Stages are found by name; one renamed or archived since falls back to the first active stage.
 */
async function seedJobs(tx: Tx, foremanId: string | null, now: Date) {
  const workshopId = DEMO_WORKSHOP.id;
  const stageRows = await tx
    .select({ id: stages.id, name: stages.name })
    .from(stages)
    .where(and(eq(stages.workshopId, workshopId), isNull(stages.archivedAt)))
    .orderBy(asc(stages.position))
    .for('update');
  const stageIdOf = (name: string) => (stageRows.find((s) => s.name === name) ?? stageRows[0])?.id;
  const present = await tx.select({ id: jobs.id }).from(jobs).where(inArray(jobs.id, DEMO_JOBS.map((j) => j.id)));
  const isPresent = new Set(present.map((j) => j.id));

  for (const job of DEMO_JOBS.filter((j) => !isPresent.has(j.id))) {
    const steps = job.path.map((p) => ({ ...p, stageId: stageIdOf(p.stage) })).filter((p, i, all) => p.stageId && p.stageId !== all[i - 1]?.stageId);
    const last = steps.at(-1);
    if (!last?.stageId) continue;
    const isOnBoard = job.status === 'active' || job.status === 'on_hold';
    const [onBoard] = await tx.select({ n: count() }).from(jobs).where(and(eq(jobs.stageId, last.stageId), isNotNull(jobs.position)));
    const piano = DEMO_PIANOS.find((p) => p.id === job.pianoId)!;
    await tx.insert(jobs).values({
      id: job.id,
      workshopId,
      clientId: piano.clientId,
      pianoId: job.pianoId,
      stageId: last.stageId,
      position: isOnBoard ? (onBoard?.n ?? 0) : null,
      title: job.title,
      status: job.status,
      priority: job.priority,
      promisedOn: job.promisedInDays === null ? null : demoDate(now, job.promisedInDays),
      isBlocked: job.blockedReason !== null,
      blockedReason: job.blockedReason,
      notes: job.notes,
      version: steps.length,
      createdAt: demoInstant(now, job.path[0]!.daysAgo),
      updatedAt: demoInstant(now, last.daysAgo),
    });
    await tx.insert(jobStageEvents).values(
      steps.map((step, i) => ({
        id: step.eventId,
        workshopId,
        jobId: job.id,
        fromStageId: i === 0 ? null : steps[i - 1]!.stageId!,
        toStageId: step.stageId!,
        byUserId: foremanId,
        at: demoInstant(now, step.daysAgo),
      })),
    );
  }
  return DEMO_JOBS.length;
}
