import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { Board, JobDetail, Task, TaskList, TasksFromTemplateResult, TaskTemplate } from '@keybed/shared';
import { activeStages, createJob } from './board-fixtures';
import { benchWorkshop, clockOn, createTask, jobWithTasks, type BenchWorkshop } from './bench-fixtures';
import { createTestApp, signUpWorkshop, type TestApp } from './helpers';
import { ErrorBody } from './schemas';

let t: TestApp;
let w: BenchWorkshop;
beforeAll(async () => {
  t = await createTestApp();
  w = await benchWorkshop(t);
});
afterAll(() => t.close());

const VersionConflict = ErrorBody.extend({ current: Task });
const positions = async (jobId: string) =>
  (await t.sql<{ title: string; position: number }[]>`select title, position from tasks where job_id = ${jobId} order by position`).map((r) => [r.title, r.position]);

describe('POST /api/jobs/:id/tasks', () => {
  it('when the foreman adds tasks, then each goes to the end of the job with its stage, estimate and assignees', async () => {
    const job = await createJob(w.owner.agent);
    const [, , hammers] = await activeStages(w.owner.agent);
    const first = await createTask(w.foreman.agent, job.id, { title: 'Remove old hammers' });
    const res = await w.foreman.agent
      .post(`/api/jobs/${job.id}/tasks`)
      .send({ title: '  Hang new hammers ', stageId: hammers!.id, estimatedMinutes: 600, assigneeIds: [w.priya.userId, w.declan.userId] })
      .expect(201);
    const task = Task.parse(res.body);
    expect(first.position).toBe(0);
    expect(task).toMatchObject({
      jobId: job.id,
      title: 'Hang new hammers',
      stage: { id: hammers!.id, name: 'Hammers' },
      status: 'todo',
      estimatedMinutes: 600,
      loggedMinutes: 0,
      position: 1,
      version: 1,
    });
    expect(task.assignees.map((a) => a.id).sort()).toEqual([w.priya.userId, w.declan.userId].sort());
  });

  it('when the input is bad, then 400 names each field and nothing is added', async () => {
    const job = await createJob(w.owner.agent);
    const res = await w.owner.agent
      .post(`/api/jobs/${job.id}/tasks`)
      .send({ title: ' ', estimatedMinutes: -5, assigneeIds: [w.priya.userId, w.priya.userId] })
      .expect(400);
    expect(Object.keys(ErrorBody.parse(res.body).error.fields!).sort()).toEqual(['assigneeIds', 'estimatedMinutes', 'title']);
    expect(await positions(job.id)).toEqual([]);
  });

  it('when an assignee is not a member of the workshop, then 400 on assigneeIds and nothing is added', async () => {
    const other = await signUpWorkshop(t, 'other');
    const job = await createJob(w.owner.agent);
    const res = await w.owner.agent.post(`/api/jobs/${job.id}/tasks`).send({ title: 'Shape', assigneeIds: [other.me.user.id] }).expect(400);
    expect(ErrorBody.parse(res.body).error.fields).toHaveProperty('assigneeIds');
    expect(await positions(job.id)).toEqual([]);
  });

  it('when a technician tries to add a task, then 403', async () => {
    const job = await createJob(w.owner.agent);
    const res = await w.priya.agent.post(`/api/jobs/${job.id}/tasks`).send({ title: 'Voice' }).expect(403);
    expect(ErrorBody.parse(res.body).error.code).toBe('forbidden');
  });

  it('when the job or the stage belongs to another workshop, then 404 and nothing is added', async () => {
    const other = await signUpWorkshop(t, 'other');
    const theirJob = await createJob(other.agent);
    const [theirStage] = await activeStages(other.agent);
    await w.owner.agent.post(`/api/jobs/${theirJob.id}/tasks`).send({ title: 'Voice' }).expect(404);
    const ours = await createJob(w.owner.agent);
    await w.owner.agent.post(`/api/jobs/${ours.id}/tasks`).send({ title: 'Voice', stageId: theirStage!.id }).expect(404);
    expect(await positions(theirJob.id)).toEqual([]);
    expect(await positions(ours.id)).toEqual([]);
  });
});

describe('GET /api/jobs/:id/tasks', () => {
  it('when a technician opens a job, then its tasks come in order with the minutes logged on each', async () => {
    const { job, tasks } = await jobWithTasks(w.owner.agent, 3, [w.priya.userId]);
    await t.sql`insert into time_entries (workshop_id, technician_id, task_id, job_id, started_at, ended_at, source)
      values (${w.workshopId}, ${w.priya.userId}, ${tasks[1]!.id}, ${job.id}, '2026-03-02T08:00:00Z', '2026-03-02T10:30:00Z', 'web')`;
    const list = TaskList.parse((await w.priya.agent.get(`/api/jobs/${job.id}/tasks`).expect(200)).body);
    expect(list.tasks.map((x) => [x.title, x.position, x.loggedMinutes])).toEqual([
      ['Task 0', 0, 0],
      ['Task 1', 1, 150],
      ['Task 2', 2, 0],
    ]);
  });

  it('when the job belongs to another workshop, then 404', async () => {
    const other = await signUpWorkshop(t, 'other');
    const { job } = await jobWithTasks(other.agent, 1);
    expect(ErrorBody.parse((await w.owner.agent.get(`/api/jobs/${job.id}/tasks`).expect(404)).body).error.code).toBe('not_found');
  });
});

describe('PATCH /api/tasks/:id', () => {
  it('when a task moves to another place, then the job’s tasks stay numbered 0..n-1 in the new order', async () => {
    const { job, tasks } = await jobWithTasks(w.owner.agent, 4);
    const res = await w.foreman.agent.patch(`/api/tasks/${tasks[3]!.id}`).send({ version: 1, position: 1 }).expect(200);
    expect(Task.parse(res.body)).toMatchObject({ position: 1, version: 2 });
    expect(await positions(job.id)).toEqual([
      ['Task 0', 0],
      ['Task 3', 1],
      ['Task 1', 2],
      ['Task 2', 3],
    ]);
  });

  it('when a position is past the end, then 400 and the order is unchanged', async () => {
    const { job, tasks } = await jobWithTasks(w.owner.agent, 2);
    await w.owner.agent.patch(`/api/tasks/${tasks[0]!.id}`).send({ version: 1, position: 5 }).expect(400);
    expect(await positions(job.id)).toEqual([
      ['Task 0', 0],
      ['Task 1', 1],
    ]);
  });

  it('when the edit is based on an old version, then 409 with the task as it is now', async () => {
    const { tasks } = await jobWithTasks(w.owner.agent, 1);
    await w.owner.agent.patch(`/api/tasks/${tasks[0]!.id}`).send({ version: 1, title: 'Travel and space' }).expect(200);
    const res = await w.foreman.agent.patch(`/api/tasks/${tasks[0]!.id}`).send({ version: 1, estimatedMinutes: 90 }).expect(409);
    const body = VersionConflict.parse(res.body);
    expect(body.error.code).toBe('version_conflict');
    expect(body.current).toMatchObject({ title: 'Travel and space', estimatedMinutes: 360, version: 2 });
  });

  it('when the foreman reassigns and re-estimates, then the task shows the new values', async () => {
    const { tasks } = await jobWithTasks(w.owner.agent, 1, [w.priya.userId]);
    const res = await w.foreman.agent.patch(`/api/tasks/${tasks[0]!.id}`).send({ version: 1, assigneeIds: [w.declan.userId], estimatedMinutes: 240 }).expect(200);
    expect(Task.parse(res.body)).toMatchObject({ assignees: [{ id: w.declan.userId, name: 'Test technician' }], estimatedMinutes: 240 });
  });

  it('when a technician marks their own task done, then it is done; other edits or others’ tasks are refused', async () => {
    const { tasks } = await jobWithTasks(w.owner.agent, 2, [w.priya.userId]);
    const [mine, theirs] = [tasks[0]!, await createTask(w.owner.agent, tasks[1]!.jobId, { title: 'Case work', assigneeIds: [w.declan.userId] })];
    await w.priya.agent.patch(`/api/tasks/${mine.id}`).send({ version: 1, title: 'Renamed' }).expect(403);
    await w.priya.agent.patch(`/api/tasks/${theirs.id}`).send({ version: 1, status: 'done' }).expect(403);
    const res = await w.priya.agent.patch(`/api/tasks/${mine.id}`).send({ version: 1, status: 'done' }).expect(200);
    expect(Task.parse(res.body)).toMatchObject({ status: 'done', title: 'Task 0' });
  });

  it('when someone is clocked on to the task, then it cannot be marked done until they clock off', async () => {
    const { tasks } = await jobWithTasks(w.owner.agent, 1, [w.declan.userId]);
    await clockOn(w.declan.agent, tasks[0]!.id);
    const res = await w.foreman.agent.patch(`/api/tasks/${tasks[0]!.id}`).send({ version: 2, status: 'done' }).expect(409);
    expect(ErrorBody.parse(res.body).error.message).toContain('Test technician is clocked on');
    await w.declan.agent.post('/api/time/clock-off').send({}).expect(200);
    await w.foreman.agent.patch(`/api/tasks/${tasks[0]!.id}`).send({ version: 2, status: 'done' }).expect(200);
  });

  it('when nothing would change or the task is another workshop’s, then 400 or 404', async () => {
    const other = await signUpWorkshop(t, 'other');
    const { tasks } = await jobWithTasks(other.agent, 1);
    await w.owner.agent.patch(`/api/tasks/${tasks[0]!.id}`).send({ version: 1, title: 'Mine now' }).expect(404);
    await w.owner.agent.patch(`/api/tasks/${tasks[0]!.id}`).send({ version: 1 }).expect(400);
    expect((await t.sql`select title from tasks where id = ${tasks[0]!.id}`)[0]).toEqual({ title: 'Task 0' });
  });
});

describe('task templates and POST /api/jobs/:id/tasks/from-template', () => {
  const HAMMERS = [
    { title: 'Remove old hammers', estimatedMinutes: 90 },
    { title: 'Hang new hammers', estimatedMinutes: 420 },
    { title: 'Travel and space', estimatedMinutes: 180 },
    { title: 'Shape and voice', estimatedMinutes: 240 },
  ];

  it('when the foreman saves a stage’s template, then every member reads it in order', async () => {
    const [, , hammers] = await activeStages(w.owner.agent);
    await w.foreman.agent.put(`/api/stages/${hammers!.id}/task-template`).send({ items: HAMMERS }).expect(200);
    const template = TaskTemplate.parse((await w.priya.agent.get(`/api/stages/${hammers!.id}/task-template`).expect(200)).body);
    expect(template.stage.name).toBe('Hammers');
    expect(template.items.map((i) => [i.title, i.estimatedMinutes, i.position])).toEqual(HAMMERS.map((h, i) => [h.title, h.estimatedMinutes, i]));
  });

  it('when a job enters the stage, then its template’s tasks are added in one action, and a second time adds none twice', async () => {
    const [, , hammers] = await activeStages(w.owner.agent);
    await w.owner.agent.put(`/api/stages/${hammers!.id}/task-template`).send({ items: HAMMERS }).expect(200);
    const job = await createJob(w.owner.agent, { stageId: hammers!.id });
    await createTask(w.owner.agent, job.id, { title: 'Measure strike point' });
    const first = TasksFromTemplateResult.parse((await w.foreman.agent.post(`/api/jobs/${job.id}/tasks/from-template`).send({ stageId: hammers!.id }).expect(201)).body);
    expect(first.tasks.map((x) => [x.title, x.position, x.estimatedMinutes, x.stage?.name])).toEqual(HAMMERS.map((h, i) => [h.title, i + 1, h.estimatedMinutes, 'Hammers']));
    const again = TasksFromTemplateResult.parse((await w.foreman.agent.post(`/api/jobs/${job.id}/tasks/from-template`).send({ stageId: hammers!.id }).expect(201)).body);
    expect(again).toEqual({ tasks: [], skippedTitles: HAMMERS.map((h) => h.title) });
    expect((await positions(job.id)).length).toBe(5);
  });

  it('when the stage has no template, then 404 and nothing is added', async () => {
    const [, , , , finish] = await activeStages(w.owner.agent);
    const job = await createJob(w.owner.agent);
    await w.owner.agent.post(`/api/jobs/${job.id}/tasks/from-template`).send({ stageId: finish!.id }).expect(404);
    expect(await positions(job.id)).toEqual([]);
  });

  it('when a template lists a title twice or a technician edits it, then 400 or 403; another workshop’s stage is 404', async () => {
    const [intake] = await activeStages(w.owner.agent);
    const other = await signUpWorkshop(t, 'other');
    const [theirs] = await activeStages(other.agent);
    await w.owner.agent.put(`/api/stages/${intake!.id}/task-template`).send({ items: [{ title: 'Photograph' }, { title: 'photograph' }] }).expect(400);
    await w.priya.agent.put(`/api/stages/${intake!.id}/task-template`).send({ items: [{ title: 'Photograph' }] }).expect(403);
    await w.owner.agent.get(`/api/stages/${theirs!.id}/task-template`).expect(404);
    await w.owner.agent.put(`/api/stages/${theirs!.id}/task-template`).send({ items: [] }).expect(404);
  });

  it('when the template is deleted, then the stage answers an empty template', async () => {
    const [, stripDown] = await activeStages(w.owner.agent);
    await w.owner.agent.put(`/api/stages/${stripDown!.id}/task-template`).send({ items: [{ title: 'Remove action', estimatedMinutes: 60 }] }).expect(200);
    await w.owner.agent.delete(`/api/stages/${stripDown!.id}/task-template`).expect(204);
    expect(TaskTemplate.parse((await w.owner.agent.get(`/api/stages/${stripDown!.id}/task-template`).expect(200)).body).items).toEqual([]);
    await w.owner.agent.delete(`/api/stages/${stripDown!.id}/task-template`).expect(404);
  });
});

describe('technicians on board cards', () => {
  it('when technicians have open tasks on a job, then its card lists them and the technician filter finds it; a done task drops them', async () => {
    const own = await benchWorkshop(t);
    const job = await createJob(own.owner.agent, { title: 'Rebush keys' });
    await createTask(own.owner.agent, job.id, { title: 'Rebush keys', assigneeIds: [own.priya.userId] });
    await createTask(own.owner.agent, job.id, { title: 'Check key dip', assigneeIds: [own.priya.userId, own.declan.userId] });
    const detail = JobDetail.parse((await own.owner.agent.get(`/api/jobs/${job.id}`).expect(200)).body);
    expect(detail.technicians.map((x) => x.id).sort()).toEqual([own.priya.userId, own.declan.userId].sort());
    const filtered = Board.parse((await own.owner.agent.get(`/api/board?technicianId=${own.declan.userId}`).expect(200)).body);
    expect(filtered.stages.flatMap((s) => s.jobs).map((j) => j.id)).toEqual([job.id]);
    const second = (await t.sql<{ id: string; version: number }[]>`select id, version from tasks where job_id = ${job.id} and title = 'Check key dip'`)[0]!;
    await own.owner.agent.patch(`/api/tasks/${second.id}`).send({ version: second.version, status: 'done' }).expect(200);
    const board = Board.parse((await own.owner.agent.get('/api/board').expect(200)).body);
    expect(board.stages.flatMap((s) => s.jobs).find((j) => j.id === job.id)!.technicians.map((x) => x.id)).toEqual([own.priya.userId]);
  });
});
