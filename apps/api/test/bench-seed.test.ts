import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { Board, TaskList, TaskTemplate, TimeEntryList, TimesheetWeek, WallTechnicianTasks } from '@keybed/shared';
import { DEMO_PASSWORD, DEMO_PINS, seedDemo } from '@keybed/db/seed/index';
import { hashPassword } from '../src/lib/password';
import { createTestApp, type TestApp } from './helpers';

const SALON = '4e9f3b85-6c2a-4da4-9b5d-3f8a0c2d4e01';
const PRIYA = '1f6a0e52-3b9c-4d71-8e2a-0c5b7d9e1a03';
const DECLAN = '1f6a0e52-3b9c-4d71-8e2a-0c5b7d9e1a04';

let t: TestApp;
// A Tuesday: the three working days before it are Thursday 26, Friday 27 and Monday 30 November.
const seededAt = new Date('2026-12-01T09:00:00Z');
beforeAll(async () => {
  t = await createTestApp({ now: () => seededAt });
  await seedDemo(t.db, hashPassword, seededAt);
});
afterAll(() => t.close());

async function signIn(email: string) {
  const agent = t.agent();
  await agent.post('/api/auth/sign-in').send({ email, password: DEMO_PASSWORD }).expect(200);
  return agent;
}

const counts = async () =>
  (await t.sql`select
      (select count(*)::int from tasks) as tasks, (select count(*)::int from task_assignees) as assignees,
      (select count(*)::int from task_templates) as templates, (select count(*)::int from task_template_items) as items,
      (select count(*)::int from time_entries) as entries,
      (select string_agg(pin_hash, ',' order by id) from memberships) as pins`)[0];

describe('demo bench data', () => {
  it('when Priya opens the Salon grand’s job, then its tasks follow the hammer work in order, hers assigned', async () => {
    const priya = await signIn('priya@fennick.example');
    const list = TaskList.parse((await priya.get(`/api/jobs/${SALON}/tasks`).expect(200)).body).tasks;
    expect(list.map((x) => [x.title, x.status, x.assignees.map((a) => a.name)])).toEqual([
      ['Remove action and keys', 'done', ['Priya Natarajan']],
      ['Remove old hammers', 'done', ['Priya Natarajan']],
      ['Rebush keys', 'in_progress', ['Priya Natarajan']],
      ['Hang new hammers', 'todo', ['Priya Natarajan']],
      ['Travel and space', 'todo', ['Priya Natarajan']],
      ['Shape and voice', 'todo', ['Priya Natarajan']],
      ['Full regulation', 'todo', ['Priya Natarajan']],
      ['Fine tuning', 'todo', ['Declan Moss']],
    ]);
    const board = Board.parse((await priya.get('/api/board').expect(200)).body);
    const card = board.stages.flatMap((s) => s.jobs).find((j) => j.id === SALON)!;
    expect(card.technicians.map((x) => x.name)).toEqual(['Declan Moss', 'Priya Natarajan']);
  });

  it('when the Hammers stage’s template is read, then it lists the four hammer steps', async () => {
    const tom = await signIn('tom@fennick.example');
    const stages = (await tom.get('/api/stages').expect(200)).body.stages as Array<{ id: string; name: string }>;
    const hammers = stages.find((s) => s.name === 'Hammers')!;
    const template = TaskTemplate.parse((await tom.get(`/api/stages/${hammers.id}/task-template`).expect(200)).body);
    expect(template.items.map((i) => i.title)).toEqual(['Remove old hammers', 'Hang new hammers', 'Travel and space', 'Shape and voice']);
  });

  it('when each demo technician enters their PIN at a wall screen, then it is accepted', async () => {
    const margaret = await signIn('margaret@fennick.example');
    await margaret.post('/api/wall/pair').send({ name: 'Bench room screen' }).expect(201);
    const ids = (await margaret.get('/api/wall/technicians').expect(200)).body.technicians as Array<{ id: string; name: string }>;
    for (const { email, pin } of DEMO_PINS) {
      const id = ids.find((x) => email.startsWith(x.name.split(' ')[0]!.toLowerCase()))!.id;
      const res = await margaret.post(`/api/wall/technicians/${id}/verify-pin`).send({ pin }).expect(200);
      expect(WallTechnicianTasks.parse(res.body).tasks.length).toBeGreaterThan(0);
    }
  });

  it('when the foreman opens Priya’s last full week, then Thursday and Friday hold eight hours each', async () => {
    const tom = await signIn('tom@fennick.example');
    const week = TimesheetWeek.parse((await tom.get(`/api/time/weeks?technicianId=${PRIYA}&weekStart=2026-11-23`).expect(200)).body);
    expect(week.days.map((d) => d.minutes)).toEqual([0, 0, 0, 480, 480, 0, 0]);
    const review = TimeEntryList.parse((await tom.get('/api/time/entries?needsReview=true').expect(200)).body).entries;
    expect(review.map((e) => [e.technician.id, e.endedAt])).toEqual([[DECLAN, '2026-11-30T19:00:00.000Z']]);
  });

  it('when the seed runs again, then nothing is added or changed', async () => {
    const before = await counts();
    await seedDemo(t.db, hashPassword, new Date('2027-01-15T09:00:00Z'));
    expect(await counts()).toEqual(before);
    expect(before).toMatchObject({ tasks: 20, templates: 5, entries: 11 });
  });
});
