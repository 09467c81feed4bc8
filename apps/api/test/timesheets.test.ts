import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { TimeEntry, TimeEntryList, TimesheetWeek, WeekApproval } from '@keybed/shared';
import { benchWorkshop, createTask, insertEntry, jobWithTasks, type BenchWorkshop } from './bench-fixtures';
import { createTestApp, signUpWorkshop, type TestApp } from './helpers';
import { ErrorBody } from './schemas';

let t: TestApp;
let w: BenchWorkshop;
beforeAll(async () => {
  t = await createTestApp({ now: () => new Date('2026-04-01T12:00:00Z') });
  w = await benchWorkshop(t);
});
afterAll(() => t.close());

const errorOf = (body: unknown) => ErrorBody.parse(body).error;

/** A job with one task and a finished entry of the technician on it. */
async function entryFor(own: BenchWorkshop, technicianId: string, startedAt: string, endedAt: string | null, title = 'Regulate the action') {
  const { job, tasks } = await jobWithTasks(own.owner.agent, 1);
  await own.owner.agent.patch(`/api/tasks/${tasks[0]!.id}`).send({ version: 1, title }).expect(200);
  const id = await insertEntry(t, { workshopId: own.workshopId, technicianId, taskId: tasks[0]!.id, jobId: job.id, startedAt, endedAt });
  return { id, job, task: tasks[0]! };
}

describe('PATCH /api/time/entries/:id', () => {
  it('when the foreman corrects an entry twice, then each correction keeps the old and new values, the reason, who and when', async () => {
    const { id, job } = await entryFor(w, w.priya.userId, '2026-03-16T08:00:00Z', '2026-03-16T12:00:00Z');
    const other = await createTask(w.owner.agent, job.id, { title: 'Key dip' });
    const first = TimeEntry.parse(
      (await w.foreman.agent.patch(`/api/time/entries/${id}`).send({ endedAt: '2026-03-16T11:30:00Z', reason: 'Left early for the dentist' }).expect(200)).body,
    );
    expect(first).toMatchObject({ endedAt: '2026-03-16T11:30:00.000Z', minutes: 210 });
    const second = TimeEntry.parse((await w.owner.agent.patch(`/api/time/entries/${id}`).send({ taskId: other.id, reason: 'Was setting key dip, not regulating' }).expect(200)).body);
    expect(second.task).toEqual({ id: other.id, title: 'Key dip' });
    expect(second.corrections.map((c) => [c.reason, c.by?.name, c.before.endedAt, c.after.endedAt, c.before.task.title, c.after.task.title])).toEqual([
      ['Left early for the dentist', 'Test foreman', '2026-03-16T12:00:00.000Z', '2026-03-16T11:30:00.000Z', 'Regulate the action', 'Regulate the action'],
      ['Was setting key dip, not regulating', 'Margaret Oyelaran', '2026-03-16T11:30:00.000Z', '2026-03-16T11:30:00.000Z', 'Regulate the action', 'Key dip'],
    ]);
    expect(Date.parse(second.corrections[0]!.at)).toBeLessThan(Date.parse(second.corrections[1]!.at));
    const listed = TimeEntryList.parse((await w.priya.agent.get('/api/time/entries?from=2026-03-16&to=2026-03-16').expect(200)).body).entries;
    expect(listed.find((e) => e.id === id)!.corrections).toHaveLength(2);
  });

  it('when the reason is missing, the end is before the start, or nothing changes, then 400 and the entry is untouched', async () => {
    const { id } = await entryFor(w, w.declan.userId, '2026-03-17T08:00:00Z', '2026-03-17T09:00:00Z');
    expect(errorOf((await w.foreman.agent.patch(`/api/time/entries/${id}`).send({ endedAt: '2026-03-17T10:00:00Z' }).expect(400)).body).fields).toHaveProperty('reason');
    expect(errorOf((await w.foreman.agent.patch(`/api/time/entries/${id}`).send({ endedAt: '2026-03-17T07:00:00Z', reason: 'typo fix' }).expect(400)).body).fields).toHaveProperty('endedAt');
    await w.foreman.agent.patch(`/api/time/entries/${id}`).send({ startedAt: '2026-03-17T08:00:00Z', reason: 'no change' }).expect(400);
    await w.foreman.agent.patch(`/api/time/entries/${id}`).send({ endedAt: '2026-05-01T09:00:00Z', reason: 'the future' }).expect(400);
    expect(await t.sql`select count(*)::int as n from time_entry_corrections where entry_id = ${id}`).toEqual([{ n: 0 }]);
  });

  it('when a correction would overlap another entry of the technician, then the database refuses it with 409 and nothing changes', async () => {
    const own = await benchWorkshop(t);
    const a = await entryFor(own, own.priya.userId, '2026-03-18T08:00:00Z', '2026-03-18T10:00:00Z');
    await entryFor(own, own.priya.userId, '2026-03-18T10:30:00Z', '2026-03-18T12:00:00Z');
    const res = await own.foreman.agent.patch(`/api/time/entries/${a.id}`).send({ endedAt: '2026-03-18T11:00:00Z', reason: 'Stayed on longer' }).expect(409);
    expect(errorOf(res.body)).toMatchObject({ code: 'conflict', message: expect.stringContaining('overlap') });
    const [row] = await t.sql<{ ended_at: string }[]>`select ended_at from time_entries where id = ${a.id}`;
    expect(new Date(row!.ended_at).toISOString()).toBe('2026-03-18T10:00:00.000Z');
    expect(await t.sql`select count(*)::int as n from time_entry_corrections where entry_id = ${a.id}`).toEqual([{ n: 0 }]);
  });

  it('when an entry flagged at bench-day close is corrected, then it no longer needs review', async () => {
    const { id } = await entryFor(w, w.declan.userId, '2026-03-19T08:00:00Z', '2026-03-19T19:00:00Z');
    await t.sql`update time_entries set needs_review = true, review_reason = 'Still running at the bench-day close (19:00)' where id = ${id}`;
    const res = await w.foreman.agent.patch(`/api/time/entries/${id}`).send({ endedAt: '2026-03-19T16:45:00Z', reason: 'Went home at quarter to five' }).expect(200);
    expect(TimeEntry.parse(res.body)).toMatchObject({ needsReview: false, reviewReason: null, minutes: 525 });
  });

  it('when a technician corrects, or the entry is another workshop’s, then 403 or 404', async () => {
    const { id } = await entryFor(w, w.priya.userId, '2026-03-20T08:00:00Z', '2026-03-20T09:00:00Z');
    await w.priya.agent.patch(`/api/time/entries/${id}`).send({ endedAt: '2026-03-20T10:00:00Z', reason: 'I stayed' }).expect(403);
    const other = await signUpWorkshop(t, 'other');
    await other.agent.patch(`/api/time/entries/${id}`).send({ endedAt: '2026-03-20T10:00:00Z', reason: 'Not ours' }).expect(404);
  });
});

describe('POST /api/time/weeks/approve', () => {
  it('when the foreman approves a week, then its entries are locked: the foreman is refused, the owner may still correct', async () => {
    const own = await benchWorkshop(t);
    const { id } = await entryFor(own, own.priya.userId, '2026-03-10T08:00:00Z', '2026-03-10T12:00:00Z');
    const approval = WeekApproval.parse((await own.foreman.agent.post('/api/time/weeks/approve').send({ technicianId: own.priya.userId, weekStart: '2026-03-09' }).expect(200)).body);
    expect(approval).toMatchObject({ technicianId: own.priya.userId, weekStart: '2026-03-09', by: { name: 'Test foreman' } });
    const refused = await own.foreman.agent.patch(`/api/time/entries/${id}`).send({ endedAt: '2026-03-10T11:00:00Z', reason: 'Lunch was longer' }).expect(409);
    expect(errorOf(refused.body)).toMatchObject({ code: 'week_approved', message: 'The week of 2026-03-09 was approved by Test foreman. Only the owner can change it now.' });
    const byOwner = TimeEntry.parse((await own.owner.agent.patch(`/api/time/entries/${id}`).send({ endedAt: '2026-03-10T11:00:00Z', reason: 'Lunch was longer' }).expect(200)).body);
    expect(byOwner).toMatchObject({ isLocked: true, endedAt: '2026-03-10T11:00:00.000Z' });
  });

  it('when a correction would move an entry into an approved week, then the foreman is refused', async () => {
    const own = await benchWorkshop(t);
    const { id } = await entryFor(own, own.priya.userId, '2026-03-17T08:00:00Z', '2026-03-17T09:00:00Z');
    await own.foreman.agent.post('/api/time/weeks/approve').send({ technicianId: own.priya.userId, weekStart: '2026-03-09' }).expect(200);
    await own.foreman.agent.patch(`/api/time/entries/${id}`).send({ startedAt: '2026-03-13T08:00:00Z', endedAt: '2026-03-13T09:00:00Z', reason: 'Wrong day' }).expect(409);
  });

  it('when the week is not a Monday, the technician is still clocked on, or a technician approves, then 400, 409 or 403', async () => {
    const own = await benchWorkshop(t);
    await entryFor(own, own.priya.userId, '2026-03-31T08:00:00Z', null);
    expect(errorOf((await own.foreman.agent.post('/api/time/weeks/approve').send({ technicianId: own.priya.userId, weekStart: '2026-03-31' }).expect(400)).body).fields).toHaveProperty('weekStart');
    const running = await own.foreman.agent.post('/api/time/weeks/approve').send({ technicianId: own.priya.userId, weekStart: '2026-03-30' }).expect(409);
    expect(errorOf(running.body).message).toContain('still clocked on');
    await own.priya.agent.post('/api/time/weeks/approve').send({ technicianId: own.priya.userId, weekStart: '2026-03-23' }).expect(403);
    const other = await signUpWorkshop(t, 'other');
    await other.agent.post('/api/time/weeks/approve').send({ technicianId: own.priya.userId, weekStart: '2026-03-23' }).expect(404);
    expect(await t.sql`select count(*)::int as n from timesheet_weeks where technician_id = ${own.priya.userId}`).toEqual([{ n: 0 }]);
  });
});

describe('GET /api/time/weeks', () => {
  it('when an entry runs from 00:30 to 03:30 local across the spring-forward change, then the week counts 120 minutes for it', async () => {
    const own = await benchWorkshop(t, { timeZone: 'Europe/London' });
    // Source: IANA tz database via @date-fns/tz — Europe/London moves from GMT (UTC+0) to BST (UTC+1)
    // at 01:00 UTC on 2026-03-29, so 00:30 local is 00:30Z and 03:30 local is 02:30Z: 2 hours of real time.
    const { job, task } = await entryFor(own, own.priya.userId, '2026-03-29T00:30:00Z', '2026-03-29T02:30:00Z');
    const week = TimesheetWeek.parse((await own.foreman.agent.get(`/api/time/weeks?technicianId=${own.priya.userId}&weekStart=2026-03-23`).expect(200)).body);
    expect(week.days.map((d) => d.day)).toEqual(['2026-03-23', '2026-03-24', '2026-03-25', '2026-03-26', '2026-03-27', '2026-03-28', '2026-03-29']);
    expect(week.days[6]!.minutes).toBe(120);
    expect(week.totalMinutes).toBe(120);
    expect(week.byJob).toEqual([{ job: { id: job.id, title: job.title }, minutes: 120, tasks: [{ task: { id: task.id, title: 'Regulate the action' }, minutes: 120 }] }]);
  });

  it('when entries cross midnight and the week edges, then each local day gets its own minutes, and totals add up per job and task', async () => {
    const own = await benchWorkshop(t, { timeZone: 'Europe/London' });
    const a = await entryFor(own, own.declan.userId, '2026-03-24T22:00:00Z', '2026-03-25T01:00:00Z', 'Restring the tenor');
    await insertEntry(t, { workshopId: own.workshopId, technicianId: own.declan.userId, taskId: a.task.id, jobId: a.job.id, startedAt: '2026-03-26T08:00:00Z', endedAt: '2026-03-26T08:45:00Z' });
    const b = await entryFor(own, own.declan.userId, '2026-03-22T23:00:00Z', '2026-03-23T01:00:00Z', 'Tune');
    const week = TimesheetWeek.parse((await own.declan.agent.get('/api/time/weeks?weekStart=2026-03-23').expect(200)).body);
    expect(week.technician.id).toBe(own.declan.userId);
    expect(week.days.map((d) => d.minutes)).toEqual([60, 120, 60, 45, 0, 0, 0]);
    expect(week.totalMinutes).toBe(285);
    expect(week.byJob.map((j) => [j.job.id, j.minutes, j.tasks.map((x) => x.minutes)]).sort()).toEqual(
      [
        [a.job.id, 225, [225]],
        [b.job.id, 60, [60]],
      ].sort(),
    );
  });

  it('when a technician asks for another technician’s week, then 403; for a day that is not Monday, 400', async () => {
    await w.priya.agent.get(`/api/time/weeks?technicianId=${w.declan.userId}&weekStart=2026-03-23`).expect(403);
    await w.foreman.agent.get(`/api/time/weeks?technicianId=${w.declan.userId}&weekStart=2026-03-24`).expect(400);
  });

  it('when the week is exported as CSV, then every entry-day is a quoted record and the total comes last', async () => {
    const own = await benchWorkshop(t, { timeZone: 'Europe/London' });
    await entryFor(own, own.priya.userId, '2026-03-24T09:00:00Z', '2026-03-24T11:30:00Z', 'Voice, "bright" treble');
    const res = await own.foreman.agent.get(`/api/time/weeks?technicianId=${own.priya.userId}&weekStart=2026-03-23&format=csv`).expect(200);
    expect(res.headers['content-type']).toBe('text/csv; charset=utf-8');
    expect(res.headers['content-disposition']).toBe('attachment; filename="timesheet-test-technician-2026-03-23.csv"');
    const lines = res.text.split('\r\n');
    expect(lines[0]).toBe('Date,Technician,Job,Task,Started,Ended,Minutes,Hours,Source,Needs review,Corrections');
    expect(lines[1]).toBe('2026-03-24,Test technician,"New hammers, rebush, full regulation","Voice, ""bright"" treble",2026-03-24 09:00,2026-03-24 11:30,150,2:30,web,no,0');
    expect(lines[2]).toBe('Total,Test technician,,,,,150,2:30,,,');
    expect(lines[3]).toBe('');
  });
});
