import { afterAll, afterEach, beforeAll, describe, expect, it } from 'vitest';
import { Board, Task } from '@keybed/shared';
import { createApp } from '../src/app';
import { createLogger } from '../src/lib/logger';
import { createClockService } from '../src/modules/time/clock.service';
import { createEntriesService } from '../src/modules/time/entries.service';
import { createTimeRepo } from '../src/modules/time/time.repo';
import { createSmtpMailer } from '../src/lib/mail';
import supertestRequest from 'supertest';
import type supertest from 'supertest';
import { activeStages, createClient, createJob, createPiano, fillStage } from './board-fixtures';
import { benchWorkshop, clockOn, createTask, insertEntry } from './bench-fixtures';
import { addMember, createTestApp, signUpWorkshop, type TestApp } from './helpers';
import { ANY_MONEY, keysMatching } from './money-fixtures';
import { ErrorBody } from './schemas';

/** The app's clock: the real one unless a test sets `ms`. */
const clock: { ms: number | null } = { ms: null };
const setClock = (iso: string) => {
  clock.ms = Date.parse(iso);
};

let t: TestApp;
let statements: string[] = [];
beforeAll(async () => {
  t = await createTestApp({ onQuery: (query) => statements.push(query), now: () => new Date(clock.ms ?? Date.now()) });
});
afterEach(() => {
  clock.ms = null;
});
afterAll(() => t.close());

const boardOf = async (agent: supertest.Agent, query = '') => Board.parse((await agent.get(`/api/board${query}`).expect(200)).body);
const jobIdsByStage = (board: Board) => Object.fromEntries(board.stages.map((s) => [s.name, s.jobs.map((j) => j.id)]));

describe('GET /api/board', () => {
  it('when jobs sit in several stages, then active stages come in order with their jobs by position and their counts', async () => {
    const { agent } = await signUpWorkshop(t);
    const [intake, stripDown, hammers] = await activeStages(agent);
    const [a, b, c] = await fillStage(agent, intake!.id, 3, 'Intake');
    const [x] = await fillStage(agent, hammers!.id, 1, 'Hammers');
    await agent.post(`/api/jobs/${c!.id}/move`).send({ stageId: intake!.id, index: 0, version: 1 }).expect(200);
    await agent.patch(`/api/stages/${stripDown!.id}`).send({ wipLimit: 2 }).expect(200);

    const board = await boardOf(agent);
    expect(board.stages.map((s) => [s.name, s.position, s.jobCount, s.wipLimit])).toEqual([
      ['Intake', 0, 3, null],
      ['Strip-down', 1, 0, 2],
      ['Hammers', 2, 1, null],
      ['Regulation', 3, 0, null],
      ['Finish', 4, 0, null],
      ['Delivery', 5, 0, null],
    ]);
    expect(board.stages[0]!.jobs.map((j) => [j.id, j.position])).toEqual([
      [c!.id, 0],
      [a!.id, 1],
      [b!.id, 2],
    ]);
    expect(board.stages[2]!.jobs[0]).toMatchObject({ id: x!.id, client: { name: 'Harriet Pembleton' }, piano: { maker: 'Carrow & Finch', sizeMm: 1778 }, technicians: [] });
  });

  it('when jobs are done, cancelled or in an archived stage’s past, then the board leaves them out', async () => {
    const { agent } = await signUpWorkshop(t);
    const [intake, stripDown] = await activeStages(agent);
    const done = await createJob(agent, { stageId: stripDown!.id });
    const cancelled = await createJob(agent, { stageId: intake!.id });
    const held = await createJob(agent, { stageId: intake!.id });
    await agent.patch(`/api/jobs/${done.id}`).send({ version: 1, status: 'done' }).expect(200);
    await agent.patch(`/api/jobs/${cancelled.id}`).send({ version: 1, status: 'cancelled' }).expect(200);
    await agent.patch(`/api/jobs/${held.id}`).send({ version: 1, status: 'on_hold' }).expect(200);
    await agent.patch(`/api/stages/${stripDown!.id}`).send({ isArchived: true }).expect(200);

    const board = await boardOf(agent);
    expect(board.stages.map((s) => s.name)).not.toContain('Strip-down');
    expect(jobIdsByStage(board).Intake).toEqual([held.id]);
    expect(board.stages[0]!.jobs[0]!.status).toBe('on_hold');
  });

  it('when filtering by text, blocked or technician, then only matching jobs show while stage counts stay whole', async () => {
    const { agent } = await signUpWorkshop(t);
    const [intake, , hammers] = await activeStages(agent);
    const school = await createClient(agent, { name: 'Linwood Hall School (music dept.)' });
    const upright = await createPiano(agent, school.id, { maker: 'Osterholt', model: '', serialNumber: 'OH-62-4471', type: 'upright', sizeMm: 1260, yearApprox: 1962, keytopMaterial: 'plastic' });
    const rebush = await createJob(agent, { title: 'Rebush, new dampers, pitch raise', pianoId: upright.id, stageId: intake!.id });
    const grand = await createJob(agent, { title: 'New hammers', stageId: hammers!.id });
    await agent.patch(`/api/jobs/${grand.id}`).send({ version: 1, isBlocked: true, blockedReason: 'Waiting for parts' }).expect(200);
    const tech = await addMember(t, agent, 'technician');

    expect(jobIdsByStage(await boardOf(agent, '?q=linwood'))).toMatchObject({ Intake: [rebush.id], Hammers: [] });
    expect(jobIdsByStage(await boardOf(agent, '?q=oh-62'))).toMatchObject({ Intake: [rebush.id], Hammers: [] });
    expect(jobIdsByStage(await boardOf(agent, '?q=CARROW'))).toMatchObject({ Intake: [], Hammers: [grand.id] });
    const blocked = await boardOf(agent, '?blocked=true');
    expect(jobIdsByStage(blocked)).toMatchObject({ Intake: [], Hammers: [grand.id] });
    expect(blocked.stages[0]!.jobCount).toBe(1);
    expect(jobIdsByStage(await boardOf(agent, '?blocked=false'))).toMatchObject({ Intake: [rebush.id], Hammers: [] });
    const byTechnician = await boardOf(agent, `?technicianId=${tech.userId}`);
    expect(byTechnician.stages.flatMap((s) => s.jobs)).toEqual([]);
    expect(byTechnician.stages.map((s) => s.jobCount)).toEqual([1, 0, 1, 0, 0, 0]);
  });

  it('when a filter is malformed, then 400 on that field', async () => {
    const { agent } = await signUpWorkshop(t);
    for (const [query, field] of [
      ['?blocked=yes', 'blocked'],
      ['?technicianId=priya', 'technicianId'],
      [`?q=${'x'.repeat(201)}`, 'q'],
    ] as const) {
      const res = await agent.get(`/api/board${query}`).expect(400);
      expect(Object.keys(ErrorBody.parse(res.body).error.fields ?? {})).toEqual([field]);
    }
  });

  it('when another workshop has jobs, then they never appear; a technician reads the board; nobody signed in gets 401', async () => {
    const { agent } = await signUpWorkshop(t);
    const { agent: other } = await signUpWorkshop(t, 'other');
    await createJob(other);
    const mine = await createJob(agent);
    const tech = await addMember(t, agent, 'technician');
    const board = await boardOf(tech.agent);
    expect(board.stages.flatMap((s) => s.jobs.map((j) => j.id))).toEqual([mine.id]);
    await t.request().get('/api/board').expect(401);
  });

  it('when the board holds 2 or 42 jobs, with or without tasks and time, then it takes the same number of SQL statements', async () => {
    const { agent, me } = await signUpWorkshop(t);
    const stages = await activeStages(agent);
    await fillStage(agent, stages[0]!.id, 2);
    const count = async () => {
      statements = [];
      await agent.get('/api/board').expect(200);
      return statements.length;
    };
    const withTwo = await count();
    for (const stage of stages.slice(1)) await fillStage(agent, stage.id, 8);
    const [row] = await t.sql`select count(*)::int as n from jobs j join stages s on s.id = j.stage_id where s.id = any(${stages.map((s) => s.id)}) and j.position is not null`;
    expect(row!.n).toBe(42);
    const withFortyTwo = await count();
    expect(withFortyTwo).toBe(withTwo);
    const onBoard = (await boardOf(agent)).stages.flatMap((s) => s.jobs).slice(0, 20);
    for (const [i, job] of onBoard.entries()) {
      const task = await createTask(agent, job.id, { estimatedMinutes: 120 });
      const hour = Date.parse('2026-03-02T08:00:00Z') + i * 3600_000;
      const slot = { startedAt: new Date(hour).toISOString(), endedAt: new Date(hour + 1800_000).toISOString() };
      await insertEntry(t, { workshopId: me.workshop.id, technicianId: me.user.id, taskId: task.id, jobId: job.id, ...slot });
    }
    const withHours = await count();
    expect(withHours).toBe(withTwo);
    expect(withTwo).toBeLessThanOrEqual(6);
  });

  it('when the board is read again with nothing changed, then only the session is checked, the bytes are the same, and a conditional read gets 304', async () => {
    const { agent } = await signUpWorkshop(t);
    await fillStage(agent, (await activeStages(agent))[0]!.id, 3);
    statements = [];
    const first = await agent.get('/api/board').expect(200);
    const cold = statements.length;
    statements = [];
    const second = await agent.get('/api/board').expect(200);
    expect(statements.length).toBeLessThan(cold);
    expect(statements.some((q) => /from "jobs"/i.test(q))).toBe(false);
    expect(second.text).toBe(first.text);
    expect(second.headers.etag).toBe(first.headers.etag);
    expect(second.headers['cache-control']).toBe('no-cache');
    await agent.get('/api/board').set('If-None-Match', first.headers.etag!).expect(304);
  });

  it('when a job, stage, client or piano changes, then the very next board read shows it', async () => {
    const { agent } = await signUpWorkshop(t);
    const [intake, stripDown] = await activeStages(agent);
    const job = await createJob(agent, { stageId: intake!.id });
    const card = async () => {
      const board = await boardOf(agent);
      const stage = board.stages.find((s) => s.jobs.some((j) => j.id === job.id))!;
      return { stage: stage.name, job: stage.jobs.find((j) => j.id === job.id)! };
    };
    await card();
    await agent.patch(`/api/jobs/${job.id}`).send({ version: 1, title: 'Hammers and rebush' }).expect(200);
    expect((await card()).job.title).toBe('Hammers and rebush');
    await agent.post(`/api/jobs/${job.id}/move`).send({ stageId: stripDown!.id, index: 0, version: 2 }).expect(200);
    expect((await card()).stage).toBe('Strip-down');
    await agent.patch(`/api/stages/${stripDown!.id}`).send({ name: 'Dismantling' }).expect(200);
    expect((await card()).stage).toBe('Dismantling');
    await agent.patch(`/api/clients/${job.client.id}`).send({ name: 'Harriet Pembleton-Shaw' }).expect(200);
    expect((await card()).job.client.name).toBe('Harriet Pembleton-Shaw');
    await agent.patch(`/api/pianos/${job.piano.id}`).send({ sizeMm: 1780 }).expect(200);
    expect((await card()).job.piano.sizeMm).toBe(1780);
    await createJob(agent, { stageId: stripDown!.id });
    expect((await boardOf(agent)).stages[1]!.jobCount).toBe(2);
    await agent.post('/api/stages').send({ name: 'Voicing' }).expect(201);
    expect((await boardOf(agent)).stages.at(-1)!.name).toBe('Voicing');
  });

  it('when boards are kept between changes or built every time, then both answer the same board', async () => {
    const { agent, cookie } = await signUpWorkshop(t);
    const stages = await activeStages(agent);
    await fillStage(agent, stages[0]!.id, 3);
    await fillStage(agent, stages[3]!.id, 2);
    const mailer = createSmtpMailer(t.config.smtp);
    const uncached = createApp({ config: t.config, db: t.db, sql: t.sql, mailer, logger: createLogger('silent'), cacheBoards: false });
    try {
      const kept = [(await agent.get('/api/board').expect(200)).text, (await agent.get('/api/board').expect(200)).text];
      const built = (await supertestRequest(uncached).get('/api/board').set('Cookie', cookie).expect(200)).text;
      expect(kept).toEqual([built, built]);
    } finally {
      await uncached.close();
      mailer.close();
    }
  });
});

describe('GET /api/board: hours on the cards', () => {
  const cardOf = (board: Board, jobId: string) => board.stages.flatMap((s) => s.jobs).find((j) => j.id === jobId)!;

  it('when a job has tasks and time, then every role sees its estimated minutes and its logged minutes, running entries up to now, and no money', async () => {
    const w = await benchWorkshop(t);
    setClock('2026-03-02T10:00:00Z');
    const job = await createJob(w.owner.agent, { title: 'New hammers, rebush, full regulation' });
    const idle = await createJob(w.owner.agent, { title: 'Rebush, new dampers, pitch raise' });
    const hammers = await createTask(w.owner.agent, job.id, { title: 'Hang new hammers', estimatedMinutes: 360 });
    const rebush = await createTask(w.owner.agent, job.id, { title: 'Rebush keys', estimatedMinutes: 90 });
    await createTask(w.owner.agent, job.id, { title: 'Check the trapwork', estimatedMinutes: null });
    const base = { workshopId: w.workshopId, jobId: job.id };
    // 75 min 30 s counts 75 whole minutes; the running entry 39 min 15 s up to 10:00 counts 39.
    await insertEntry(t, { ...base, technicianId: w.priya.userId, taskId: hammers.id, startedAt: '2026-03-02T08:00:00Z', endedAt: '2026-03-02T09:15:30Z' });
    await insertEntry(t, { ...base, technicianId: w.declan.userId, taskId: rebush.id, startedAt: '2026-03-02T09:20:45Z', endedAt: null });

    for (const agent of [w.owner.agent, w.foreman.agent, w.priya.agent]) {
      const board = await boardOf(agent);
      expect(cardOf(board, job.id).hours).toEqual({ estimatedMinutes: 450, loggedMinutes: 114 });
      expect(cardOf(board, idle.id).hours).toEqual({ estimatedMinutes: 0, loggedMinutes: 0 });
      expect(keysMatching(board, ANY_MONEY)).toEqual([]);
    }
    expect(cardOf(await boardOf(w.owner.agent, '?q=hammers'), job.id).hours).toEqual({ estimatedMinutes: 450, loggedMinutes: 114 });
    const costing = (await w.owner.agent.get(`/api/jobs/${job.id}/costing`).expect(200)).body as { hours: { estimatedMinutes: number; actualMinutes: number } };
    expect(costing.hours).toMatchObject({ estimatedMinutes: 450, actualMinutes: 114 });
  });

  it('when someone clocks on or off, a time entry is corrected or a task’s estimate changes, then the very next board read shows the new hours', async () => {
    const w = await benchWorkshop(t);
    setClock('2026-03-02T10:00:00Z');
    const job = await createJob(w.owner.agent);
    const task = await createTask(w.foreman.agent, job.id, { estimatedMinutes: 360, assigneeIds: [w.priya.userId] });
    const hours = async () => cardOf(await boardOf(w.owner.agent), job.id).hours;
    expect(await hours()).toEqual({ estimatedMinutes: 360, loggedMinutes: 0 });

    const on = await clockOn(w.priya.agent, task.id, { at: '2026-03-02T09:15:00Z' });
    expect(await hours()).toEqual({ estimatedMinutes: 360, loggedMinutes: 45 });

    setClock('2026-03-02T10:30:00Z');
    await w.priya.agent.post('/api/time/clock-off').send({ at: '2026-03-02T10:10:00Z' }).expect(200);
    expect(await hours()).toEqual({ estimatedMinutes: 360, loggedMinutes: 55 });

    await w.foreman.agent.patch(`/api/time/entries/${on.entry.id}`).send({ endedAt: '2026-03-02T10:20:00Z', reason: 'Stayed to finish the hammer line' }).expect(200);
    expect(await hours()).toEqual({ estimatedMinutes: 360, loggedMinutes: 65 });

    const current = Task.parse((await w.foreman.agent.get(`/api/jobs/${job.id}/tasks`).expect(200)).body.tasks[0]);
    await w.foreman.agent.patch(`/api/tasks/${task.id}`).send({ version: current.version, estimatedMinutes: 480 }).expect(200);
    expect(await hours()).toEqual({ estimatedMinutes: 480, loggedMinutes: 65 });
  });

  it('when a clock action or a correction commits, then the board is dropped in this process at once, not only when the notification comes back; a refused one drops nothing', async () => {
    const w = await benchWorkshop(t);
    setClock('2026-03-02T10:00:00Z');
    const job = await createJob(w.owner.agent);
    const task = await createTask(w.foreman.agent, job.id, { assigneeIds: [w.priya.userId] });
    const dropped: string[] = [];
    const deps = { repo: createTimeRepo(t.db), now: () => new Date(clock.ms!), changed: (workshopId: string) => dropped.push(workshopId) };
    const clockService = createClockService(deps);
    const entries = createEntriesService(deps);
    const actor = { workshopId: w.workshopId, technicianId: w.priya.userId, byUserId: w.priya.userId, source: 'web' as const };

    await expect(clockService.clockOff(actor, {})).rejects.toMatchObject({ code: 'not_running' });
    expect(dropped).toEqual([]);
    const { result } = await clockService.clockOn(actor, { taskId: task.id, at: '2026-03-02T09:00:00Z' });
    expect(dropped).toEqual([w.workshopId]);
    await clockService.clockOff(actor, {});
    expect(dropped).toEqual([w.workshopId, w.workshopId]);
    const foreman = { userId: w.foreman.userId, workshopId: w.workshopId, role: 'foreman' as const, membershipId: '', sessionId: '' };
    await entries.correct(foreman, result.entry.id, { endedAt: '2026-03-02T09:50:00Z', reason: 'Left for lunch at ten to' });
    expect(dropped).toHaveLength(3);
  });
});
