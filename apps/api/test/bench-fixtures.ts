import type supertest from 'supertest';
import { BenchTechnicianList, ClockResult, Task, WallPairing, type CreateTaskInput } from '@keybed/shared';
import { createJob } from './board-fixtures';
import { addMember, signUpWorkshop, type TestApp } from './helpers';

/** A workshop with its owner, a foreman and two technicians, each with an agent; the workshop's time zone set. */
export async function benchWorkshop(t: TestApp, options: { timeZone?: string } = {}) {
  const owner = await signUpWorkshop(t);
  const foreman = await addMember(t, owner.agent, 'foreman');
  const priya = await addMember(t, owner.agent, 'technician');
  const declan = await addMember(t, owner.agent, 'technician');
  const workshopId = owner.me.workshop.id;
  if (options.timeZone) await t.sql`update workshops set time_zone = ${options.timeZone} where id = ${workshopId}`;
  return { owner, foreman, priya, declan, workshopId };
}

export type BenchWorkshop = Awaited<ReturnType<typeof benchWorkshop>>;

/** A task on the job, made by the given writer. */
export async function createTask(agent: supertest.Agent, jobId: string, input: Partial<CreateTaskInput> = {}) {
  const res = await agent
    .post(`/api/jobs/${jobId}/tasks`)
    .send({ title: 'Hang new hammers', estimatedMinutes: 360, ...input })
    .expect(201);
  return Task.parse(res.body);
}

/** An active job with `count` tasks (titles "Task 0"…), assigned to the given user ids. */
export async function jobWithTasks(agent: supertest.Agent, count: number, assigneeIds: string[] = []) {
  const job = await createJob(agent);
  const tasks: Task[] = [];
  for (let i = 0; i < count; i++) tasks.push(await createTask(agent, job.id, { title: `Task ${i}`, assigneeIds }));
  return { job, tasks };
}

export async function clockOn(agent: supertest.Agent, taskId: string, extra: Record<string, unknown> = {}) {
  const res = await agent.post('/api/time/clock-on').send({ taskId, ...extra });
  if (res.status !== 201 && res.status !== 200) throw new Error(`clock-on answered ${res.status}: ${JSON.stringify(res.body)}`);
  return ClockResult.parse(res.body);
}

/** The membership id of a user, from the bench technician list. */
export async function membershipOf(agent: supertest.Agent, userId: string) {
  const list = BenchTechnicianList.parse((await agent.get('/api/technicians').expect(200)).body);
  return list.technicians.find((m) => m.id === userId)!.membershipId;
}

/** The owner sets a member's PIN. */
export async function setPin(owner: supertest.Agent, userId: string, pin: string) {
  await owner.put(`/api/team/members/${await membershipOf(owner, userId)}/pin`).send({ pin }).expect(204);
}

/** A fresh browser where the owner signs in and pairs it as a wall screen; answers its agent. */
export async function pairWall(t: TestApp, owner: { input: { email: string; password: string } }, name = 'Bench room screen') {
  const agent = t.agent();
  await agent.post('/api/auth/sign-in').send({ email: owner.input.email, password: owner.input.password }).expect(200);
  const res = await agent.post('/api/wall/pair').send({ name }).expect(201);
  return { agent, pairing: WallPairing.parse(res.body), setCookie: res.headers['set-cookie'] as unknown as string[] };
}

/** Inserts a finished entry straight into the database (for reports and corrections). */
export async function insertEntry(t: TestApp, values: { workshopId: string; technicianId: string; taskId: string; jobId: string; startedAt: string; endedAt: string | null }) {
  const [row] = await t.sql<{ id: string }[]>`
    insert into time_entries (workshop_id, technician_id, task_id, job_id, started_at, ended_at, source, created_by)
    values (${values.workshopId}, ${values.technicianId}, ${values.taskId}, ${values.jobId}, ${values.startedAt}, ${values.endedAt}, 'web', ${values.technicianId})
    returning id`;
  return row!.id;
}

/** Technicians with more than one running entry, and pairs of overlapping entries, straight from the database. */
export async function integrityViolations(t: TestApp) {
  const [row] = await t.sql<{ doubles: number; overlaps: number }[]>`
    select
      (select count(*)::int from (select technician_id from time_entries where ended_at is null group by workshop_id, technician_id having count(*) > 1) d) as doubles,
      (select count(*)::int from time_entries a join time_entries b
         on a.workshop_id = b.workshop_id and a.technician_id = b.technician_id and a.id < b.id
        and tstzrange(a.started_at, coalesce(a.ended_at, 'infinity')) && tstzrange(b.started_at, coalesce(b.ended_at, 'infinity'))) as overlaps`;
  return row!;
}
