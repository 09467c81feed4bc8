import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { ClockResult, RunningList, Task, TimeEntryList } from '@keybed/shared';
import { createLogger } from '../src/lib/logger';
import { BENCH_DAY_CLOSE_CRON, BENCH_DAY_CLOSE_QUEUE, startScheduler } from '../src/lib/scheduler';
import { closeReason, createBenchDayClose } from '../src/modules/time/bench-day-close';
import { createTimeRepo } from '../src/modules/time/time.repo';
import { benchWorkshop, clockOn, insertEntry, integrityViolations, jobWithTasks, type BenchWorkshop } from './bench-fixtures';
import { createTestApp, signUpWorkshop, type TestApp } from './helpers';
import { ErrorBody } from './schemas';

/** The app's clock: set per test; `tickMs` > 0 makes every reading a little later than the last. */
const clock = { ms: Date.parse('2026-03-02T08:00:00Z'), tickMs: 0 };
const at = (iso: string) => {
  clock.ms = Date.parse(iso);
};

let t: TestApp;
let w: BenchWorkshop;
beforeAll(async () => {
  t = await createTestApp({
    now: () => {
      const d = new Date(clock.ms);
      clock.ms += clock.tickMs;
      return d;
    },
  });
  w = await benchWorkshop(t);
});
afterAll(() => t.close());

/** A technician's entries straight from the database, oldest first. */
const entriesOf = async (technicianId: string) =>
  (
    await t.sql<{ id: string; task_id: string; started_at: string; ended_at: string | null }[]>`
      select id, task_id, started_at, ended_at from time_entries where technician_id = ${technicianId} order by started_at`
  ).map((r) => ({ id: r.id, task_id: r.task_id, started_at: new Date(r.started_at), ended_at: r.ended_at === null ? null : new Date(r.ended_at) }));
const errorOf = (body: unknown) => ErrorBody.parse(body).error;

describe('POST /api/time/clock-on', () => {
  it('when a technician clocks on, then an entry runs from now on that task, the task is in progress, and the workshop sees who is on what', async () => {
    at('2026-03-02T08:00:00Z');
    const { job, tasks } = await jobWithTasks(w.owner.agent, 1, [w.priya.userId]);
    const res = await w.priya.agent.post('/api/time/clock-on').send({ taskId: tasks[0]!.id }).expect(201);
    const { entry, stopped } = ClockResult.parse(res.body);
    expect(stopped).toBeNull();
    expect(entry).toMatchObject({
      technician: { id: w.priya.userId },
      task: { id: tasks[0]!.id, title: 'Task 0' },
      job: { id: job.id },
      startedAt: '2026-03-02T08:00:00.000Z',
      endedAt: null,
      source: 'web',
      createdBy: { id: w.priya.userId },
      needsReview: false,
      corrections: [],
    });
    const task = Task.parse((await w.owner.agent.get(`/api/jobs/${job.id}/tasks`).expect(200)).body.tasks[0]);
    expect(task.status).toBe('in_progress');
    const running = RunningList.parse((await w.foreman.agent.get('/api/time/running').expect(200)).body).running;
    expect(running.find((r) => r.technician.id === w.priya.userId)).toMatchObject({ entryId: entry.id, task: { id: tasks[0]!.id } });
    at('2026-03-02T09:00:00Z');
    await w.priya.agent.post('/api/time/clock-off').send({}).expect(200);
  });

  it('when a technician clocks on to another task, then the running entry stops at the same instant the new one starts', async () => {
    at('2026-03-02T10:00:00Z');
    const { tasks } = await jobWithTasks(w.owner.agent, 2, [w.declan.userId]);
    await clockOn(w.declan.agent, tasks[0]!.id);
    at('2026-03-02T11:15:00Z');
    const { entry, stopped } = await clockOn(w.declan.agent, tasks[1]!.id);
    expect(stopped).toMatchObject({ task: { id: tasks[0]!.id }, startedAt: '2026-03-02T10:00:00.000Z', endedAt: '2026-03-02T11:15:00.000Z', minutes: 75 });
    expect(entry).toMatchObject({ task: { id: tasks[1]!.id }, startedAt: '2026-03-02T11:15:00.000Z', endedAt: null });
    const rows = await entriesOf(w.declan.userId);
    expect(rows.filter((r) => r.ended_at === null).map((r) => r.task_id)).toEqual([tasks[1]!.id]);
    at('2026-03-02T12:00:00Z');
    await w.declan.agent.post('/api/time/clock-off').send({}).expect(200);
  });

  it('when the same task is already running, then 200 with the running entry and nothing changes', async () => {
    at('2026-03-02T13:00:00Z');
    const { tasks } = await jobWithTasks(w.owner.agent, 1);
    const first = await clockOn(w.declan.agent, tasks[0]!.id);
    at('2026-03-02T13:10:00Z');
    const res = await w.declan.agent.post('/api/time/clock-on').send({ taskId: tasks[0]!.id }).expect(200);
    expect(ClockResult.parse(res.body).entry.id).toBe(first.entry.id);
    expect((await entriesOf(w.declan.userId)).filter((r) => r.ended_at === null)).toHaveLength(1);
    await w.declan.agent.post('/api/time/clock-off').send({}).expect(200);
  });

  it('when 50 clock-ons for one technician arrive at once across tasks, then exactly one entry runs and none overlap', async () => {
    const own = await benchWorkshop(t);
    at('2026-03-03T08:00:00Z');
    const { tasks } = await jobWithTasks(own.owner.agent, 5, [own.priya.userId]);
    clock.tickMs = 1000;
    try {
      const responses = await Promise.all(Array.from({ length: 50 }, (_, i) => own.priya.agent.post('/api/time/clock-on').send({ taskId: tasks[i % 5]!.id })));
      const statuses = responses.map((r) => r.status);
      expect(statuses.every((s) => s === 201 || s === 200 || s === 409)).toBe(true);
      const rows = await entriesOf(own.priya.userId);
      expect(rows.filter((r) => r.ended_at === null)).toHaveLength(1);
      expect(rows).toHaveLength(statuses.filter((s) => s === 201).length);
      for (let i = 1; i < rows.length; i++) expect(rows[i - 1]!.ended_at!.getTime()).toBe(rows[i]!.started_at.getTime());
      expect(await integrityViolations(t)).toEqual({ doubles: 0, overlaps: 0 });
    } finally {
      clock.tickMs = 0;
    }
  });

  it('when the task is done, the job is on hold, or the task is another workshop’s, then a clear 4xx and the running entry is untouched', async () => {
    at('2026-03-02T14:00:00Z');
    const { job, tasks } = await jobWithTasks(w.owner.agent, 3, [w.priya.userId]);
    const running = await clockOn(w.priya.agent, tasks[0]!.id);
    await w.owner.agent.patch(`/api/tasks/${tasks[1]!.id}`).send({ version: 1, status: 'done' }).expect(200);
    at('2026-03-02T14:30:00Z');
    const done = await w.priya.agent.post('/api/time/clock-on').send({ taskId: tasks[1]!.id }).expect(409);
    expect(errorOf(done.body)).toMatchObject({ code: 'task_not_open', message: '“Task 1” is done. Choose an open task.' });

    const held = await jobWithTasks(w.owner.agent, 1);
    await w.owner.agent.patch(`/api/jobs/${held.job.id}`).send({ version: 1, status: 'on_hold' }).expect(200);
    const onHold = await w.priya.agent.post('/api/time/clock-on').send({ taskId: held.tasks[0]!.id }).expect(409);
    expect(errorOf(onHold.body).message).toContain('is on hold');

    const other = await signUpWorkshop(t, 'other');
    const theirs = await jobWithTasks(other.agent, 1);
    expect(errorOf((await w.priya.agent.post('/api/time/clock-on').send({ taskId: theirs.tasks[0]!.id }).expect(404)).body).code).toBe('not_found');
    expect(errorOf((await w.priya.agent.post('/api/time/clock-on').send({ taskId: 'not-an-id' }).expect(400)).body).fields).toHaveProperty('taskId');

    const rows = await entriesOf(w.priya.userId);
    expect(rows.filter((r) => r.ended_at === null).map((r) => r.id)).toEqual([running.entry.id]);
    expect(job.id).toBe(running.entry.job.id);
    await w.priya.agent.post('/api/time/clock-off').send({}).expect(200);
  });
});

describe('POST /api/time/clock-off', () => {
  it('when something runs, then it stops now; when nothing runs, then 409 not_running and nothing changes', async () => {
    at('2026-03-04T08:00:00Z');
    const { tasks } = await jobWithTasks(w.owner.agent, 1);
    await clockOn(w.declan.agent, tasks[0]!.id);
    at('2026-03-04T10:05:00Z');
    const res = await w.declan.agent.post('/api/time/clock-off').send({}).expect(200);
    expect(ClockResult.parse(res.body).entry).toMatchObject({ endedAt: '2026-03-04T10:05:00.000Z', minutes: 125 });
    const before = await entriesOf(w.declan.userId);
    const again = await w.declan.agent.post('/api/time/clock-off').send({}).expect(409);
    expect(errorOf(again.body)).toMatchObject({ code: 'not_running', message: 'Test technician is not clocked on to anything.' });
    expect(await entriesOf(w.declan.userId)).toEqual(before);
  });
});

describe('offline replay (at and idempotencyKey)', () => {
  it('when a clock-on and a clock-off are replayed twice with their keys, then each counts once with its original times', async () => {
    const own = await benchWorkshop(t);
    const { tasks } = await jobWithTasks(own.owner.agent, 1);
    at('2026-03-05T12:00:00Z');
    const on = { taskId: tasks[0]!.id, at: '2026-03-05T09:30:00+00:00', idempotencyKey: 'wall-on-0001' };
    const off = { at: '2026-03-05T11:00:00Z', idempotencyKey: 'wall-off-0001' };
    const first = ClockResult.parse((await own.priya.agent.post('/api/time/clock-on').send(on).expect(201)).body);
    await own.priya.agent.post('/api/time/clock-off').send(off).expect(200);
    const replayOn = ClockResult.parse((await own.priya.agent.post('/api/time/clock-on').send(on).expect(200)).body);
    const replayOff = ClockResult.parse((await own.priya.agent.post('/api/time/clock-off').send(off).expect(200)).body);
    expect(replayOn.entry.id).toBe(first.entry.id);
    expect(replayOff.entry).toMatchObject({ id: first.entry.id, startedAt: '2026-03-05T09:30:00.000Z', endedAt: '2026-03-05T11:00:00.000Z', minutes: 90 });
    expect(await entriesOf(own.priya.userId)).toHaveLength(1);
  });

  it('when a key is reused for a different task, then 409 and nothing changes', async () => {
    const own = await benchWorkshop(t);
    const { tasks } = await jobWithTasks(own.owner.agent, 2);
    at('2026-03-06T08:00:00Z');
    await own.priya.agent.post('/api/time/clock-on').send({ taskId: tasks[0]!.id, idempotencyKey: 'key-reused-1' }).expect(201);
    const res = await own.priya.agent.post('/api/time/clock-on').send({ taskId: tasks[1]!.id, idempotencyKey: 'key-reused-1' }).expect(409);
    expect(errorOf(res.body).fields).toHaveProperty('idempotencyKey');
    expect(await entriesOf(own.priya.userId)).toHaveLength(1);
  });

  it('when the replayed time is in the future, older than 24 hours, or before the last entry, then it is refused', async () => {
    const own = await benchWorkshop(t);
    const { tasks } = await jobWithTasks(own.owner.agent, 2);
    at('2026-03-07T12:00:00Z');
    const future = await own.priya.agent.post('/api/time/clock-on').send({ taskId: tasks[0]!.id, at: '2026-03-07T12:05:00Z' }).expect(400);
    expect(errorOf(future.body).fields).toHaveProperty('at');
    const stale = await own.priya.agent.post('/api/time/clock-on').send({ taskId: tasks[0]!.id, at: '2026-03-06T11:59:00Z' }).expect(400);
    expect(errorOf(stale.body).message).toContain('older than 24 hours');
    await own.priya.agent.post('/api/time/clock-on').send({ taskId: tasks[0]!.id, at: '2026-03-07T10:00:00Z' }).expect(201);
    const before = await own.priya.agent.post('/api/time/clock-on').send({ taskId: tasks[1]!.id, at: '2026-03-07T09:00:00Z' }).expect(409);
    expect(errorOf(before.body).message).toContain('not after');
    await own.priya.agent.post('/api/time/clock-off').send({ at: '2026-03-07T09:59:00Z' }).expect(409);
    expect((await entriesOf(own.priya.userId)).map((r) => [r.started_at.toISOString(), r.ended_at])).toEqual([['2026-03-07T10:00:00.000Z', null]]);
  });
});

describe('time entry rules in the database', () => {
  it('when a second running entry or an overlapping entry is written directly, then PostgreSQL refuses it', async () => {
    const own = await benchWorkshop(t);
    const { job, tasks } = await jobWithTasks(own.owner.agent, 1);
    const base = { workshopId: own.workshopId, technicianId: own.priya.userId, taskId: tasks[0]!.id, jobId: job.id };
    await insertEntry(t, { ...base, startedAt: '2026-02-02T08:00:00Z', endedAt: '2026-02-02T12:00:00Z' });
    await insertEntry(t, { ...base, startedAt: '2026-02-03T08:00:00Z', endedAt: null });
    await expect(insertEntry(t, { ...base, startedAt: '2026-02-04T08:00:00Z', endedAt: null })).rejects.toMatchObject({ constraint_name: 'time_entries_one_running_per_technician' });
    await expect(insertEntry(t, { ...base, startedAt: '2026-02-02T11:00:00Z', endedAt: '2026-02-02T13:00:00Z' })).rejects.toMatchObject({ code: '23P01', constraint_name: 'time_entries_no_overlap' });
    await expect(insertEntry(t, { ...base, startedAt: '2026-02-01T10:00:00Z', endedAt: '2026-02-01T10:00:00Z' })).rejects.toMatchObject({ constraint_name: 'time_entries_ends_after_start' });
    // Touching ends do not overlap: [08:00, 12:00) then [12:00, 13:00).
    await insertEntry(t, { ...base, startedAt: '2026-02-02T12:00:00Z', endedAt: '2026-02-02T13:00:00Z' });
  });

  it('when an entry names a task of another workshop, then the composite keys refuse it', async () => {
    const own = await benchWorkshop(t);
    const other = await signUpWorkshop(t, 'other');
    const theirs = await jobWithTasks(other.agent, 1);
    await expect(
      insertEntry(t, { workshopId: own.workshopId, technicianId: own.priya.userId, taskId: theirs.tasks[0]!.id, jobId: theirs.job.id, startedAt: '2026-02-02T08:00:00Z', endedAt: null }),
    ).rejects.toMatchObject({ constraint_name: 'time_entries_task_same_job_and_workshop' });
  });
});

describe('GET /api/time/entries', () => {
  it('when a technician lists entries, then only their own come back; asking for another’s is 403; the foreman sees everyone’s', async () => {
    const own = await benchWorkshop(t);
    const { job, tasks } = await jobWithTasks(own.owner.agent, 1);
    const base = { workshopId: own.workshopId, taskId: tasks[0]!.id, jobId: job.id };
    await insertEntry(t, { ...base, technicianId: own.priya.userId, startedAt: '2026-02-02T08:00:00Z', endedAt: '2026-02-02T09:00:00Z' });
    await insertEntry(t, { ...base, technicianId: own.declan.userId, startedAt: '2026-02-02T08:00:00Z', endedAt: '2026-02-02T10:00:00Z' });
    const mine = TimeEntryList.parse((await own.priya.agent.get('/api/time/entries').expect(200)).body).entries;
    expect(mine.map((e) => [e.technician.id, e.minutes])).toEqual([[own.priya.userId, 60]]);
    expect(errorOf((await own.priya.agent.get(`/api/time/entries?technicianId=${own.declan.userId}`).expect(403)).body).code).toBe('forbidden');
    const all = TimeEntryList.parse((await own.foreman.agent.get('/api/time/entries').expect(200)).body).entries;
    expect(all.map((e) => e.technician.id).sort()).toEqual([own.priya.userId, own.declan.userId].sort());
    const declans = TimeEntryList.parse((await own.foreman.agent.get(`/api/time/entries?technicianId=${own.declan.userId}`).expect(200)).body).entries;
    expect(declans.map((e) => e.minutes)).toEqual([120]);
  });

  it('when from and to are local days, then they mean whole days in the workshop’s time zone', async () => {
    const own = await benchWorkshop(t, { timeZone: 'America/New_York' });
    const { job, tasks } = await jobWithTasks(own.owner.agent, 1);
    const base = { workshopId: own.workshopId, technicianId: own.priya.userId, taskId: tasks[0]!.id, jobId: job.id };
    // 2026-01-14 in New York (UTC−5, IANA tz database) runs from 05:00Z that day to 05:00Z the next.
    await insertEntry(t, { ...base, startedAt: '2026-01-14T04:00:00Z', endedAt: '2026-01-14T04:30:00Z' });
    await insertEntry(t, { ...base, startedAt: '2026-01-15T03:00:00Z', endedAt: '2026-01-15T04:00:00Z' });
    await insertEntry(t, { ...base, startedAt: '2026-01-15T05:00:00Z', endedAt: '2026-01-15T06:00:00Z' });
    const res = await own.foreman.agent.get('/api/time/entries?from=2026-01-14&to=2026-01-14').expect(200);
    expect(TimeEntryList.parse(res.body).entries.map((e) => e.startedAt)).toEqual(['2026-01-15T03:00:00.000Z']);
    await own.foreman.agent.get('/api/time/entries?from=2026-01-15&to=2026-01-14').expect(400);
  });

  it('when another workshop’s foreman lists entries, then ours are not among them', async () => {
    const own = await benchWorkshop(t);
    const { job, tasks } = await jobWithTasks(own.owner.agent, 1);
    await insertEntry(t, { workshopId: own.workshopId, technicianId: own.priya.userId, taskId: tasks[0]!.id, jobId: job.id, startedAt: '2026-02-02T08:00:00Z', endedAt: '2026-02-02T09:00:00Z' });
    const other = await signUpWorkshop(t, 'other');
    expect(TimeEntryList.parse((await other.agent.get(`/api/time/entries?technicianId=${own.priya.userId}`).expect(200)).body).entries).toEqual([]);
    expect(RunningList.parse((await other.agent.get('/api/time/running').expect(200)).body).running).toEqual([]);
  });
});

describe('bench-day close', () => {
  it('when entries still run past their workshop’s local close, then each stops at that close time and is flagged; earlier ones run on', async () => {
    const london = await benchWorkshop(t, { timeZone: 'Europe/London' });
    const newYork = await benchWorkshop(t, { timeZone: 'America/New_York' });
    const jobL = await jobWithTasks(london.owner.agent, 1);
    const jobN = await jobWithTasks(newYork.owner.agent, 1);
    const start = '2026-01-14T14:00:00Z';
    const idL = await insertEntry(t, { workshopId: london.workshopId, technicianId: london.priya.userId, taskId: jobL.tasks[0]!.id, jobId: jobL.job.id, startedAt: start, endedAt: null });
    const idN = await insertEntry(t, { workshopId: newYork.workshopId, technicianId: newYork.priya.userId, taskId: jobN.tasks[0]!.id, jobId: jobN.job.id, startedAt: start, endedAt: null });
    const sweep = createBenchDayClose({ repo: createTimeRepo(t.db), logger: createLogger('silent') });
    const entry = async (id: string) => {
      const [row] = await t.sql<{ ended_at: string | null; needs_review: boolean; review_reason: string | null }[]>`select ended_at, needs_review, review_reason from time_entries where id = ${id}`;
      return { ...row!, ended_at: row!.ended_at === null ? null : new Date(row!.ended_at) };
    };

    // 19:00 in London in January is 19:00Z; in New York (UTC−5) it is 00:00Z the next day (IANA tz database via @date-fns/tz).
    await sweep.closeOverdueEntries(new Date('2026-01-14T18:59:00Z'));
    expect((await entry(idL)).ended_at).toBeNull();
    await sweep.closeOverdueEntries(new Date('2026-01-14T19:05:00Z'));
    expect(await entry(idL)).toEqual({ ended_at: new Date('2026-01-14T19:00:00Z'), needs_review: true, review_reason: closeReason('19:00') });
    expect((await entry(idN)).ended_at).toBeNull();
    await sweep.closeOverdueEntries(new Date('2026-01-15T00:05:00Z'));
    expect(await entry(idN)).toMatchObject({ ended_at: new Date('2026-01-15T00:00:00Z'), needs_review: true });
    const review = TimeEntryList.parse((await newYork.foreman.agent.get('/api/time/entries?needsReview=true').expect(200)).body).entries;
    expect(review.map((e) => [e.id, e.reviewReason])).toEqual([[idN, closeReason('19:00')]]);
  });

  it('when a workshop closes earlier, then its own close time applies', async () => {
    const own = await benchWorkshop(t, { timeZone: 'Europe/London' });
    await t.sql`update workshops set bench_day_close = '17:30' where id = ${own.workshopId}`;
    const { job, tasks } = await jobWithTasks(own.owner.agent, 1);
    // 2026-06-10 is British Summer Time (UTC+1): 17:30 local is 16:30Z.
    const id = await insertEntry(t, { workshopId: own.workshopId, technicianId: own.declan.userId, taskId: tasks[0]!.id, jobId: job.id, startedAt: '2026-06-10T07:00:00Z', endedAt: null });
    const sweep = createBenchDayClose({ repo: createTimeRepo(t.db), logger: createLogger('silent') });
    await sweep.closeOverdueEntries(new Date('2026-06-10T16:29:00Z'));
    expect((await t.sql`select ended_at from time_entries where id = ${id}`)[0]).toEqual({ ended_at: null });
    expect((await sweep.closeOverdueEntries(new Date('2026-06-10T16:35:00Z'))).closed).toBeGreaterThanOrEqual(1);
    const [row] = await t.sql<{ ended_at: string; needs_review: boolean }[]>`select ended_at, needs_review from time_entries where id = ${id}`;
    expect([new Date(row!.ended_at), row!.needs_review]).toEqual([new Date('2026-06-10T16:30:00Z'), true]);
    await expect(t.sql`update workshops set bench_day_close = '7pm' where id = ${own.workshopId}`).rejects.toMatchObject({ constraint_name: 'workshops_bench_day_close_hhmm' });
  });

  it('when two API processes run the scheduler and one sweep is due, then the sweep runs once', async () => {
    let runs = 0;
    const closeOverdueEntries = async () => {
      runs += 1;
      return { closed: 0 };
    };
    const logger = createLogger('silent');
    const [a, b] = await Promise.all([startScheduler({ databaseUrl: t.databaseUrl, logger, closeOverdueEntries }), startScheduler({ databaseUrl: t.databaseUrl, logger, closeOverdueEntries })]);
    try {
      const schedules = await a.boss.getSchedules();
      expect(schedules.map((s) => [s.name, s.cron])).toEqual([[BENCH_DAY_CLOSE_QUEUE, BENCH_DAY_CLOSE_CRON]]);
      const id = await a.boss.send(BENCH_DAY_CLOSE_QUEUE, {});
      const until = Date.now() + 15_000;
      while (Date.now() < until && (await a.boss.getJobById(BENCH_DAY_CLOSE_QUEUE, id!))?.state !== 'completed') await new Promise((r) => setTimeout(r, 200));
      await new Promise((r) => setTimeout(r, 2500));
      expect(runs).toBe(1);
    } finally {
      await Promise.all([a.stop(), b.stop()]);
    }
  });
});

describe('clocking in an approved week', () => {
  it('when the week of the clock action was approved, then clock-on is refused with week_approved', async () => {
    const own = await benchWorkshop(t);
    const { tasks } = await jobWithTasks(own.owner.agent, 1);
    at('2026-03-11T09:00:00Z');
    await own.foreman.agent.post('/api/time/weeks/approve').send({ technicianId: own.priya.userId, weekStart: '2026-03-09' }).expect(200);
    const res = await own.priya.agent.post('/api/time/clock-on').send({ taskId: tasks[0]!.id }).expect(409);
    expect(errorOf(res.body).code).toBe('week_approved');
    expect(await entriesOf(own.priya.userId)).toEqual([]);
  });
});
