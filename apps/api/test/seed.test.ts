import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { Board, JobDetail, PianoDetail } from '@keybed/shared';
import { DEMO_PASSWORD, seedDemo } from '@keybed/db/seed/index';
import { hashPassword } from '../src/lib/password';
import { createTestApp, type TestApp } from './helpers';

let t: TestApp;
const seededAt = new Date('2026-12-01T09:00:00Z');
beforeAll(async () => {
  t = await createTestApp();
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
      (select count(*)::int from clients) as clients, (select count(*)::int from pianos) as pianos,
      (select count(*)::int from jobs) as jobs, (select count(*)::int from job_stage_events) as events,
      (select count(*)::int from stages) as stages`)[0];

describe('demo data', () => {
  it('when the foreman opens the board, then the scenario’s jobs are spread over the stages, one blocked for parts and one overdue', async () => {
    const tom = await signIn('tom@fennick.example');
    const board = Board.parse((await tom.get('/api/board').expect(200)).body);
    const byStage = Object.fromEntries(board.stages.map((s) => [s.name, s.jobs.map((j) => j.client.name)]));
    expect(byStage).toEqual({
      Intake: ['Harriet Pembleton'],
      'Strip-down': ['Oscar Feld'],
      Hammers: ['Harriet Pembleton'],
      Regulation: ['Linwood Hall School (music dept.)'],
      Finish: [],
      Delivery: [],
    });
    const cards = board.stages.flatMap((s) => s.jobs);
    expect(cards.filter((j) => j.isBlocked).map((j) => j.blockedReason)).toEqual(['Waiting for parts: grand hammer set from Larkspur Felts']);
    const today = seededAt.toISOString().slice(0, 10);
    expect(cards.filter((j) => j.promisedOn !== null && j.promisedOn < today).map((j) => j.piano.maker)).toEqual(['Osterholt']);
    expect(cards.find((j) => j.piano.maker === 'Osterholt')!.piano.sizeMm).toBe(1260);
  });

  it('when a job page opens, then its stage history shows each move by the foreman', async () => {
    const tech = await signIn('priya@fennick.example');
    const res = await tech.get('/api/jobs/4e9f3b85-6c2a-4da4-9b5d-3f8a0c2d4e03').expect(200);
    const job = JobDetail.parse(res.body);
    expect(job.history.map((e) => [e.fromStage?.name ?? null, e.toStage.name, e.by?.name])).toEqual([
      [null, 'Intake', 'Tom Albright'],
      ['Intake', 'Strip-down', 'Tom Albright'],
      ['Strip-down', 'Hammers', 'Tom Albright'],
      ['Hammers', 'Regulation', 'Tom Albright'],
    ]);
  });

  it('when Ines Carvalho’s upright is opened, then its only job is the cancelled assessment, off the board', async () => {
    const margaret = await signIn('margaret@fennick.example');
    const piano = PianoDetail.parse((await margaret.get('/api/pianos/3d8e2a74-5b1f-4c93-8a4c-2e7f9b1c3d04').expect(200)).body);
    expect(piano).toMatchObject({ clientName: 'Ines Carvalho', keytopMaterial: 'ivory', yearApprox: 1898 });
    expect(piano.jobs.map((j) => [j.title, j.status])).toEqual([['Assessment and estimate', 'cancelled']]);
  });

  it('when the seed runs again, then nothing is added or changed', async () => {
    const before = await counts();
    const positions = await t.sql`select id, stage_id, position, version from jobs order by id`;
    await seedDemo(t.db, hashPassword, new Date('2027-01-15T09:00:00Z'));
    expect(await counts()).toEqual(before);
    expect(await t.sql`select id, stage_id, position, version from jobs order by id`).toEqual(positions);
    expect(before).toMatchObject({ clients: 4, pianos: 4, jobs: 5, events: 11, stages: 6 });
  });
});
