import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { DEFAULT_STAGE_NAMES, Stage, StageList } from '@keybed/shared';
import type supertest from 'supertest';
import { activeStages, createJob } from './board-fixtures';
import { addMember, createTestApp, signUpWorkshop, type TestApp } from './helpers';
import { ErrorBody } from './schemas';

let t: TestApp;
beforeAll(async () => {
  t = await createTestApp();
});
afterAll(() => t.close());

const allStages = async (agent: supertest.Agent) => StageList.parse((await agent.get('/api/stages').expect(200)).body).stages;

/** Stage positions straight from the database: unique per workshop, active ones 0..n-1 first. */
async function positionsOf(workshopId: string) {
  return t.sql<{ name: string; position: number; archived: boolean }[]>`
    select name, position, archived_at is not null as archived from stages where workshop_id = ${workshopId} order by position`;
}

describe('GET /api/stages', () => {
  it('when a workshop is new, then it has the six default stages in order, none archived, none holding jobs', async () => {
    const { agent } = await signUpWorkshop(t);
    const stages = await allStages(agent);
    expect(stages.map((s) => [s.name, s.position, s.isArchived, s.jobCount, s.wipLimit])).toEqual(
      DEFAULT_STAGE_NAMES.map((name, i) => [name, i, false, 0, null]),
    );
  });

  it('when jobs are on the board, then each stage counts only its active and on-hold jobs; a technician may read', async () => {
    const { agent: owner } = await signUpWorkshop(t);
    const [intake] = await activeStages(owner);
    await createJob(owner);
    const held = await createJob(owner);
    const finished = await createJob(owner);
    await owner.patch(`/api/jobs/${held.id}`).send({ version: held.version, status: 'on_hold' }).expect(200);
    await owner.patch(`/api/jobs/${finished.id}`).send({ version: finished.version, status: 'done' }).expect(200);
    const tech = await addMember(t, owner, 'technician');
    const stages = await allStages(tech.agent);
    expect(stages.find((s) => s.id === intake!.id)!.jobCount).toBe(2);
  });
});

describe('POST /api/stages', () => {
  it('when a stage is added, then it goes at the end of the active stages, before archived ones', async () => {
    const { agent, me } = await signUpWorkshop(t);
    const [, , , , , delivery] = await activeStages(agent);
    await agent.patch(`/api/stages/${delivery!.id}`).send({ isArchived: true }).expect(200);
    const res = await agent.post('/api/stages').send({ name: 'Polishing', wipLimit: 3 }).expect(201);
    expect(Stage.parse(res.body)).toMatchObject({ name: 'Polishing', wipLimit: 3, position: 5, isArchived: false, jobCount: 0 });
    expect((await positionsOf(me.workshop.id)).map((s) => [s.name, s.position, s.archived])).toEqual([
      ['Intake', 0, false],
      ['Strip-down', 1, false],
      ['Hammers', 2, false],
      ['Regulation', 3, false],
      ['Finish', 4, false],
      ['Polishing', 5, false],
      ['Delivery', 6, true],
    ]);
  });

  it.each([
    [{ name: '' }, 'name'],
    [{ name: 'x'.repeat(61) }, 'name'],
    [{ name: 'Voicing', wipLimit: 0 }, 'wipLimit'],
    [{ name: 'Voicing', wipLimit: 2.5 }, 'wipLimit'],
    [{ name: 'Voicing', wipLimit: '4' }, 'wipLimit'],
  ])('when %j is sent, then 400 on %s and no stage is added', async (input, field) => {
    const { agent } = await signUpWorkshop(t);
    const res = await agent.post('/api/stages').send(input).expect(400);
    expect(Object.keys(ErrorBody.parse(res.body).error.fields ?? {})).toEqual([field]);
    expect(await allStages(agent)).toHaveLength(6);
  });

  it('when a technician adds a stage, then 403', async () => {
    const { agent: owner } = await signUpWorkshop(t);
    const tech = await addMember(t, owner, 'technician');
    await tech.agent.post('/api/stages').send({ name: 'Voicing' }).expect(403);
  });
});

describe('PATCH /api/stages/:id', () => {
  it('when the foreman renames a stage and sets then clears its WIP limit, then the stage shows each change', async () => {
    const { agent: owner } = await signUpWorkshop(t);
    const foreman = await addMember(t, owner, 'foreman');
    const [, , hammers] = await activeStages(owner);
    const renamed = await foreman.agent.patch(`/api/stages/${hammers!.id}`).send({ name: 'Hammers & shanks', wipLimit: 4 }).expect(200);
    expect(Stage.parse(renamed.body)).toMatchObject({ name: 'Hammers & shanks', wipLimit: 4, position: 2 });
    const cleared = await foreman.agent.patch(`/api/stages/${hammers!.id}`).send({ wipLimit: null }).expect(200);
    expect(Stage.parse(cleared.body)).toMatchObject({ name: 'Hammers & shanks', wipLimit: null });
  });

  it('when an empty stage is archived, then the others close up; when restored, it comes back at the end', async () => {
    const { agent, me } = await signUpWorkshop(t);
    const [, stripDown] = await activeStages(agent);
    const archived = await agent.patch(`/api/stages/${stripDown!.id}`).send({ isArchived: true }).expect(200);
    expect(Stage.parse(archived.body).isArchived).toBe(true);
    expect((await activeStages(agent)).map((s) => [s.name, s.position])).toEqual([
      ['Intake', 0],
      ['Hammers', 1],
      ['Regulation', 2],
      ['Finish', 3],
      ['Delivery', 4],
    ]);
    expect((await allStages(agent)).at(-1)).toMatchObject({ name: 'Strip-down', isArchived: true });

    const restored = await agent.patch(`/api/stages/${stripDown!.id}`).send({ isArchived: false }).expect(200);
    expect(Stage.parse(restored.body)).toMatchObject({ isArchived: false, position: 5 });
    expect((await positionsOf(me.workshop.id)).map((s) => s.name)).toEqual(['Intake', 'Hammers', 'Regulation', 'Finish', 'Delivery', 'Strip-down']);
  });

  it('when the stage still holds a job, then 409 stage_not_empty with a clear message, and it stays active', async () => {
    const { agent } = await signUpWorkshop(t);
    const [intake] = await activeStages(agent);
    await createJob(agent, { stageId: intake!.id });
    const res = await agent.patch(`/api/stages/${intake!.id}`).send({ isArchived: true }).expect(409);
    const { error } = ErrorBody.parse(res.body);
    expect(error.code).toBe('stage_not_empty');
    expect(error.message).toContain('Intake still holds 1 job');
    expect((await activeStages(agent)).map((s) => s.id)).toContain(intake!.id);
  });

  it('when a stage holds only finished jobs, then it can be archived and the jobs keep it', async () => {
    const { agent } = await signUpWorkshop(t);
    const [intake] = await activeStages(agent);
    const job = await createJob(agent, { stageId: intake!.id });
    await agent.patch(`/api/jobs/${job.id}`).send({ version: job.version, status: 'done' }).expect(200);
    await agent.patch(`/api/stages/${intake!.id}`).send({ isArchived: true }).expect(200);
    expect((await agent.get(`/api/jobs/${job.id}`).expect(200)).body.stageId).toBe(intake!.id);
  });

  it('when the last active stage would be archived, then 409 and it stays', async () => {
    const { agent } = await signUpWorkshop(t);
    const stages = await activeStages(agent);
    for (const stage of stages.slice(1)) await agent.patch(`/api/stages/${stage.id}`).send({ isArchived: true }).expect(200);
    const res = await agent.patch(`/api/stages/${stages[0]!.id}`).send({ isArchived: true }).expect(409);
    expect(ErrorBody.parse(res.body).error.code).toBe('conflict');
    expect(await activeStages(agent)).toHaveLength(1);
  });

  it('when nothing is sent or the name is blank, then 400', async () => {
    const { agent } = await signUpWorkshop(t);
    const [intake] = await activeStages(agent);
    await agent.patch(`/api/stages/${intake!.id}`).send({}).expect(400);
    const res = await agent.patch(`/api/stages/${intake!.id}`).send({ name: '  ' }).expect(400);
    expect(Object.keys(ErrorBody.parse(res.body).error.fields ?? {})).toEqual(['name']);
  });

  it('when another workshop changes our stage, then 404 and it is unchanged; a technician gets 403', async () => {
    const { agent } = await signUpWorkshop(t);
    const { agent: other } = await signUpWorkshop(t, 'other');
    const [intake] = await activeStages(agent);
    await other.patch(`/api/stages/${intake!.id}`).send({ name: 'Mine now', isArchived: true }).expect(404);
    const tech = await addMember(t, agent, 'technician');
    await tech.agent.patch(`/api/stages/${intake!.id}`).send({ name: 'Mine now' }).expect(403);
    expect((await activeStages(agent))[0]).toMatchObject({ id: intake!.id, name: 'Intake' });
  });
});

describe('POST /api/stages/reorder', () => {
  it('when every active stage is listed in a new order, then positions follow it and archived stages stay after', async () => {
    const { agent, me } = await signUpWorkshop(t);
    const stages = await activeStages(agent);
    await agent.patch(`/api/stages/${stages[5]!.id}`).send({ isArchived: true }).expect(200);
    const order = stages.slice(0, 5).reverse().map((s) => s.id);
    const res = await agent.post('/api/stages/reorder').send({ stageIds: order }).expect(200);
    expect(StageList.parse(res.body).stages.filter((s) => !s.isArchived).map((s) => s.id)).toEqual(order);
    expect((await positionsOf(me.workshop.id)).map((s) => [s.name, s.position])).toEqual([
      ['Finish', 0],
      ['Regulation', 1],
      ['Hammers', 2],
      ['Strip-down', 3],
      ['Intake', 4],
      ['Delivery', 5],
    ]);
  });

  it('when a stage is missing, listed twice, archived or another workshop’s, then 400 on stageIds and the order is unchanged', async () => {
    const { agent } = await signUpWorkshop(t);
    const { agent: other } = await signUpWorkshop(t, 'other');
    const ids = (await activeStages(agent)).map((s) => s.id);
    const [theirs] = await activeStages(other);
    await agent.patch(`/api/stages/${ids[5]}`).send({ isArchived: true }).expect(200);
    const active = ids.slice(0, 5);
    for (const stageIds of [
      active.slice(1),
      [...active.slice(0, 4), active[0]],
      [...active, ids[5]],
      [...active.slice(1), theirs!.id],
      [],
      ['not-an-id', ...active.slice(1)],
    ]) {
      const res = await agent.post('/api/stages/reorder').send({ stageIds }).expect(400);
      expect(Object.keys(ErrorBody.parse(res.body).error.fields ?? {})[0]).toMatch(/^stageIds/);
    }
    expect((await activeStages(agent)).map((s) => s.id)).toEqual(active);
    expect((await activeStages(other))[0]!.id).toBe(theirs!.id);
  });

  it('when a technician reorders, then 403', async () => {
    const { agent: owner } = await signUpWorkshop(t);
    const tech = await addMember(t, owner, 'technician');
    const ids = (await activeStages(owner)).map((s) => s.id);
    await tech.agent.post('/api/stages/reorder').send({ stageIds: ids.reverse() }).expect(403);
  });

  it('when two reorders race, then the stages end in one of the two orders with unique positions', async () => {
    const { agent, me } = await signUpWorkshop(t);
    const ids = (await activeStages(agent)).map((s) => s.id);
    const reversed = [...ids].reverse();
    const rotated = [...ids.slice(1), ids[0]!];
    await Promise.all([agent.post('/api/stages/reorder').send({ stageIds: reversed }).expect(200), agent.post('/api/stages/reorder').send({ stageIds: rotated }).expect(200)]);
    const final = (await activeStages(agent)).map((s) => s.id);
    expect([reversed, rotated]).toContainEqual(final);
    expect((await positionsOf(me.workshop.id)).map((s) => s.position)).toEqual([0, 1, 2, 3, 4, 5]);
  });
});
