import { and, count, eq, inArray, isNull } from 'drizzle-orm';
import { addDaysToDayKey, isoWeekday, localDayKey, localTimeToInstant } from '@keybed/shared';
import type { Database } from '../client';
import { jobs, memberships, stages, taskAssignees, taskTemplateItems, taskTemplates, tasks, timeEntries, users } from '../schema/index';
import { DEMO_ENTRIES, DEMO_PINS, DEMO_TASKS, DEMO_TEMPLATES } from './bench-demo';
import { DEMO_WORKSHOP } from './demo';

type Tx = Parameters<Parameters<Database['transaction']>[0]>[0];

/** The local day `n` working days (Monday–Friday) before `now`'s local day. */
function workdayBefore(now: Date, n: number, timeZone: string) {
  let day = localDayKey(now, timeZone);
  for (let left = n; left > 0; ) {
    day = addDaysToDayKey(day, -1);
    if (isoWeekday(day) <= 5) left -= 1;
  }
  return day;
}

/**
 * Adds what is missing of the demo bench work: stage templates (for stages without one), demo
 * PINs (for members without one), and, when the demo workshop has no tasks yet, the jobs' tasks
 * and a few past days of time entries. A second run changes nothing.
 */
export async function seedBench(tx: Tx, hashPin: (pin: string) => Promise<string>, now: Date) {
  const workshopId = DEMO_WORKSHOP.id;
  const stageRows = await tx.select({ id: stages.id, name: stages.name }).from(stages).where(and(eq(stages.workshopId, workshopId), isNull(stages.archivedAt)));
  const stageIdOf = (name: string | null) => (name ? (stageRows.find((s) => s.name === name)?.id ?? null) : null);

  for (const [stageName, template] of Object.entries(DEMO_TEMPLATES)) {
    const stageId = stageIdOf(stageName);
    if (!stageId) continue;
    const created = await tx.insert(taskTemplates).values({ id: template.id, workshopId, stageId, updatedAt: now }).onConflictDoNothing().returning({ id: taskTemplates.id });
    if (created.length === 0) continue;
    await tx.insert(taskTemplateItems).values(template.items.map((item, position) => ({ workshopId, templateId: template.id, title: item.title, estimatedMinutes: item.minutes, position })));
  }

  const people = await tx.select({ userId: users.id, email: users.email }).from(users).where(inArray(users.email, DEMO_PINS.map((p) => p.email)));
  for (const { email, pin } of DEMO_PINS) {
    const userId = people.find((p) => p.email === email)?.userId;
    if (!userId) continue;
    await tx
      .update(memberships)
      .set({ pinHash: await hashPin(pin), pinSetAt: now })
      .where(and(eq(memberships.workshopId, workshopId), eq(memberships.userId, userId), isNull(memberships.pinHash)));
  }

  const [existing] = await tx.select({ n: count() }).from(tasks).where(eq(tasks.workshopId, workshopId));
  if ((existing?.n ?? 0) > 0) return;
  const present = new Set((await tx.select({ id: jobs.id }).from(jobs).where(eq(jobs.workshopId, workshopId))).map((j) => j.id));
  const seeded = DEMO_TASKS.filter((t) => present.has(t.jobId));
  const positions = new Map<string, number>();
  await tx.insert(tasks).values(
    seeded.map((t) => {
      const position = positions.get(t.jobId) ?? 0;
      positions.set(t.jobId, position + 1);
      return { id: t.id, workshopId, jobId: t.jobId, stageId: stageIdOf(t.stage), title: t.title, status: t.status, estimatedMinutes: t.minutes, position, createdAt: now, updatedAt: now };
    }),
  );
  await tx.insert(taskAssignees).values(seeded.flatMap((t) => t.assignees.map((userId) => ({ workshopId, taskId: t.id, userId }))));

  const jobOf = new Map(seeded.map((t) => [t.id, t.jobId]));
  const entries = DEMO_ENTRIES.filter((e) => jobOf.has(e.taskId));
  if (entries.length === 0) return;
  await tx.insert(timeEntries).values(
    entries.map((e) => {
      const day = workdayBefore(now, e.workdaysAgo, DEMO_WORKSHOP.timeZone);
      return {
        id: e.id,
        workshopId,
        technicianId: e.technicianId,
        taskId: e.taskId,
        jobId: jobOf.get(e.taskId)!,
        startedAt: localTimeToInstant(day, e.from, DEMO_WORKSHOP.timeZone),
        endedAt: localTimeToInstant(day, e.to, DEMO_WORKSHOP.timeZone),
        source: 'wall' as const,
        createdBy: e.technicianId,
        needsReview: e.needsReview ?? false,
        reviewReason: e.needsReview ? `Still running at the bench-day close (${e.to}); stopped at that time. Check the real end time.` : null,
        createdAt: now,
        updatedAt: now,
      };
    }),
  );
}
