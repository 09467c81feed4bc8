import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { Job, JobDetail, JobList, MoveJobResult } from '@keybed/shared';
import { activeStages, createClient, createJob, createPiano, fillStage, idsByPosition, positionsIn, range } from './board-fixtures';
import { addMember, createTestApp, signUpWorkshop, type TestApp } from './helpers';
import { ErrorBody } from './schemas';

let t: TestApp;
beforeAll(async () => {
  t = await createTestApp();
});
afterAll(() => t.close());

const VersionConflict = ErrorBody.extend({ current: Job });
const jobRow = async (id: string) =>
  (await t.sql<{ stage_id: string; position: number | null; version: number; title: string; status: string }[]>`
    select stage_id, position, version, title, status from jobs where id = ${id}`)[0]!;
const eventsOf = async (jobId: string) =>
  t.sql<{ from_stage_id: string | null; to_stage_id: string }[]>`select from_stage_id, to_stage_id from job_stage_events where job_id = ${jobId} order by at, id`;

describe('POST /api/jobs', () => {
  it('when no stage is given, then the job goes to the end of the first stage with the piano’s client, and its arrival is recorded', async () => {
    const { agent, me } = await signUpWorkshop(t);
    const [intake] = await activeStages(agent);
    const client = await createClient(agent);
    const piano = await createPiano(agent, client.id);
    const first = await createJob(agent, { pianoId: piano.id });
    const res = await agent.post('/api/jobs').send({ pianoId: piano.id, title: ' Revive the shellac ', priority: 'high', promisedOn: '2027-03-31' }).expect(201);
    const job = Job.parse(res.body);
    expect(first.position).toBe(0);
    expect(job).toMatchObject({
      title: 'Revive the shellac',
      status: 'active',
      priority: 'high',
      promisedOn: '2027-03-31',
      stageId: intake!.id,
      position: 1,
      version: 1,
      isBlocked: false,
      client: { id: client.id, name: 'Harriet Pembleton' },
      piano: { id: piano.id, maker: 'Carrow & Finch', model: 'Salon', type: 'grand', sizeMm: 1778, keytopMaterial: 'ivory' },
      technicians: [],
    });
    const [event] = await t.sql`select from_stage_id, to_stage_id, by_user_id from job_stage_events where job_id = ${job.id}`;
    expect(event).toEqual({ from_stage_id: null, to_stage_id: intake!.id, by_user_id: me.user.id });
  });

  it('when a stage is given, then the job goes to the end of that stage', async () => {
    const { agent } = await signUpWorkshop(t);
    const [, , hammers] = await activeStages(agent);
    await fillStage(agent, hammers!.id, 2);
    const job = await createJob(agent, { stageId: hammers!.id });
    expect(job).toMatchObject({ stageId: hammers!.id, position: 2 });
  });

  it('when the first stage was archived, then a job without a stage goes to the first active one', async () => {
    const { agent } = await signUpWorkshop(t);
    const [intake, stripDown] = await activeStages(agent);
    await agent.patch(`/api/stages/${intake!.id}`).send({ isArchived: true }).expect(200);
    expect((await createJob(agent)).stageId).toBe(stripDown!.id);
  });

  it.each([
    [{ title: '' }, 'title'],
    [{ title: '   ' }, 'title'],
    [{ title: 'x'.repeat(201) }, 'title'],
    [{ priority: 'whenever' }, 'priority'],
    [{ promisedOn: '31/03/2027' }, 'promisedOn'],
    [{ pianoId: 'abc' }, 'pianoId'],
    [{ stageId: 'abc' }, 'stageId'],
  ])('when %j is sent, then 400 on %s and no job is made', async (change, field) => {
    const { agent, me } = await signUpWorkshop(t);
    const piano = await createPiano(agent, (await createClient(agent)).id);
    const res = await agent.post('/api/jobs').send({ title: 'Full restring', pianoId: piano.id, ...change }).expect(400);
    expect(Object.keys(ErrorBody.parse(res.body).error.fields ?? {})).toEqual([field]);
    const [row] = await t.sql`select count(*)::int as n from jobs where workshop_id = ${me.workshop.id}`;
    expect(row!.n).toBe(0);
  });

  it('when the stage is unknown or archived, then 400 on stageId; when it is another workshop’s, then 404', async () => {
    const { agent, me } = await signUpWorkshop(t);
    const { agent: other } = await signUpWorkshop(t, 'other');
    const piano = await createPiano(agent, (await createClient(agent)).id);
    const [, stripDown] = await activeStages(agent);
    const [theirs] = await activeStages(other);
    await agent.patch(`/api/stages/${stripDown!.id}`).send({ isArchived: true }).expect(200);
    const send = (stageId: string) => agent.post('/api/jobs').send({ title: 'Full restring', pianoId: piano.id, stageId });

    const unknown = await send('7d0e4b8a-1c2f-4e3a-9b5d-6f7a8b9c0d1e').expect(400);
    expect(ErrorBody.parse(unknown.body).error.fields).toHaveProperty('stageId');
    const archived = await send(stripDown!.id).expect(400);
    expect(ErrorBody.parse(archived.body).error.fields?.stageId?.[0]).toContain('archived');
    const foreign = await send(theirs!.id).expect(404);
    expect(ErrorBody.parse(foreign.body).error.code).toBe('not_found');
    const [row] = await t.sql`select count(*)::int as n from jobs where workshop_id = ${me.workshop.id}`;
    expect(row!.n).toBe(0);
  });

  it('when the piano is another workshop’s, then 404 and no job is made', async () => {
    const { agent, me } = await signUpWorkshop(t);
    const { agent: other } = await signUpWorkshop(t, 'other');
    const theirs = await createPiano(other, (await createClient(other)).id);
    await agent.post('/api/jobs').send({ title: 'Full restring', pianoId: theirs.id }).expect(404);
    const [row] = await t.sql`select count(*)::int as n from jobs where workshop_id = ${me.workshop.id}`;
    expect(row!.n).toBe(0);
  });

  it('when a technician makes a job, then 403 and no job is made', async () => {
    const { agent: owner, me } = await signUpWorkshop(t);
    const piano = await createPiano(owner, (await createClient(owner)).id);
    const tech = await addMember(t, owner, 'technician');
    await tech.agent.post('/api/jobs').send({ title: 'Full restring', pianoId: piano.id }).expect(403);
    const [row] = await t.sql`select count(*)::int as n from jobs where workshop_id = ${me.workshop.id}`;
    expect(row!.n).toBe(0);
  });
});

describe('GET /api/jobs', () => {
  it('when filtering by status, piano, client and text, then only matching jobs of this workshop appear', async () => {
    const { agent } = await signUpWorkshop(t);
    const { agent: other } = await signUpWorkshop(t, 'other');
    const oscar = await createClient(agent, { name: 'Oscar Feld' });
    const parlour = await createPiano(agent, oscar.id, { maker: 'Brandauer & Sons', model: 'Parlour', serialNumber: 'BS-26-118', sizeMm: 1575, keytopMaterial: 'plastic' });
    const restring = await createJob(agent, { title: 'Full restring, new tuning pins', pianoId: parlour.id });
    const hammers = await createJob(agent, { title: 'New hammers' });
    await agent.patch(`/api/jobs/${hammers.id}`).send({ version: 1, status: 'done' }).expect(200);
    await createJob(other, { title: 'Full restring, new tuning pins' });

    const ids = async (query: string) => JobList.parse((await agent.get(`/api/jobs${query}`).expect(200)).body).jobs.map((j) => j.id);
    expect((await ids('')).sort()).toEqual([restring.id, hammers.id].sort());
    expect(await ids('?status=done')).toEqual([hammers.id]);
    expect(await ids(`?pianoId=${parlour.id}`)).toEqual([restring.id]);
    expect(await ids(`?clientId=${oscar.id}`)).toEqual([restring.id]);
    expect(await ids('?q=brandauer')).toEqual([restring.id]);
    expect(await ids('?q=oscar')).toEqual([restring.id]);
    expect(await ids('?q=bs-26')).toEqual([restring.id]);
    await agent.get('/api/jobs?status=finished').expect(400);
  });

  it('when a technician lists jobs, then they may read them', async () => {
    const { agent: owner } = await signUpWorkshop(t);
    await createJob(owner);
    const tech = await addMember(t, owner, 'technician');
    expect(JobList.parse((await tech.agent.get('/api/jobs').expect(200)).body).jobs).toHaveLength(1);
  });
});

describe('GET /api/jobs/:id', () => {
  it('when a job has moved, then its page shows client contact, piano details and the stage history with who and when', async () => {
    const { agent: owner, me } = await signUpWorkshop(t);
    const foreman = await addMember(t, owner, 'foreman');
    const [intake, stripDown, hammers] = await activeStages(owner);
    const client = await createClient(owner, { name: 'Harriet Pembleton', email: 'harriet@pembleton.example', phone: '01632 960555' });
    const piano = await createPiano(owner, client.id);
    const job = await createJob(owner, { pianoId: piano.id });
    const moved = MoveJobResult.parse((await owner.post(`/api/jobs/${job.id}/move`).send({ stageId: stripDown!.id, index: 0, version: 1 }).expect(200)).body).job;
    await foreman.agent.post(`/api/jobs/${job.id}/move`).send({ stageId: hammers!.id, index: 0, version: moved.version }).expect(200);

    const res = await foreman.agent.get(`/api/jobs/${job.id}`).expect(200);
    const detail = JobDetail.parse(res.body);
    expect(detail.client).toEqual({ id: client.id, name: 'Harriet Pembleton', email: 'harriet@pembleton.example', phone: '01632 960555' });
    expect(detail.piano).toMatchObject({ yearApprox: 1911, caseFinish: 'Figured rosewood, shellac', keytopMaterial: 'ivory' });
    expect(detail.history.map((e) => [e.fromStage?.name ?? null, e.toStage.name, e.by?.id])).toEqual([
      [null, intake!.name, me.user.id],
      ['Intake', 'Strip-down', me.user.id],
      ['Strip-down', 'Hammers', foreman.userId],
    ]);
    expect(detail.history.every((e) => !Number.isNaN(Date.parse(e.at)))).toBe(true);
  });

  it('when the job is another workshop’s, then 404', async () => {
    const { agent } = await signUpWorkshop(t);
    const { agent: other } = await signUpWorkshop(t, 'other');
    const theirs = await createJob(other);
    await agent.get(`/api/jobs/${theirs.id}`).expect(404);
  });
});

describe('PATCH /api/jobs/:id', () => {
  it('when the title, priority and promised date change with the current version, then the version goes up by one', async () => {
    const { agent } = await signUpWorkshop(t);
    const job = await createJob(agent);
    const res = await agent.patch(`/api/jobs/${job.id}`).send({ version: 1, title: 'Hammers and rebush', priority: 'urgent', promisedOn: '2027-01-15', notes: 'Keytops: ivory, keep' }).expect(200);
    expect(Job.parse(res.body)).toMatchObject({ title: 'Hammers and rebush', priority: 'urgent', promisedOn: '2027-01-15', notes: 'Keytops: ivory, keep', version: 2, position: 0 });
  });

  it('when the version is stale, then 409 version_conflict with the job as it is now, and nothing changes', async () => {
    const { agent } = await signUpWorkshop(t);
    const job = await createJob(agent);
    await agent.patch(`/api/jobs/${job.id}`).send({ version: 1, title: 'First edit' }).expect(200);
    const res = await agent.patch(`/api/jobs/${job.id}`).send({ version: 1, title: 'Second edit' }).expect(409);
    const body = VersionConflict.parse(res.body);
    expect(body.error.code).toBe('version_conflict');
    expect(body.current).toMatchObject({ id: job.id, title: 'First edit', version: 2 });
    expect(await jobRow(job.id)).toMatchObject({ title: 'First edit', version: 2 });
  });

  it('when a job is done, then it leaves the board and its stage closes the gap; when reopened, it goes to the end', async () => {
    const { agent } = await signUpWorkshop(t);
    const [intake] = await activeStages(agent);
    const jobs = await fillStage(agent, intake!.id, 4);
    const done = await agent.patch(`/api/jobs/${jobs[1]!.id}`).send({ version: 1, status: 'done' }).expect(200);
    expect(Job.parse(done.body)).toMatchObject({ status: 'done', position: null, version: 2 });
    expect(await idsByPosition(t, intake!.id)).toEqual([jobs[0]!.id, jobs[2]!.id, jobs[3]!.id]);
    expect(await positionsIn(t, intake!.id)).toEqual([0, 1, 2]);

    const reopened = await agent.patch(`/api/jobs/${jobs[1]!.id}`).send({ version: 2, status: 'on_hold' }).expect(200);
    expect(Job.parse(reopened.body)).toMatchObject({ status: 'on_hold', position: 3, version: 3 });
    expect(await positionsIn(t, intake!.id)).toEqual([0, 1, 2, 3]);
  });

  it('when a cancelled job’s stage is archived, then reopening it is refused with 409 and it stays cancelled', async () => {
    const { agent } = await signUpWorkshop(t);
    const [, stripDown] = await activeStages(agent);
    const job = await createJob(agent, { stageId: stripDown!.id });
    await agent.patch(`/api/jobs/${job.id}`).send({ version: 1, status: 'cancelled' }).expect(200);
    await agent.patch(`/api/stages/${stripDown!.id}`).send({ isArchived: true }).expect(200);
    const res = await agent.patch(`/api/jobs/${job.id}`).send({ version: 2, status: 'active' }).expect(409);
    expect(ErrorBody.parse(res.body).error.message).toContain('Strip-down');
    expect(await jobRow(job.id)).toMatchObject({ status: 'cancelled', position: null });
  });

  it('when blocked, then a reason is needed; unblocking clears it', async () => {
    const { agent } = await signUpWorkshop(t);
    const job = await createJob(agent);
    const missing = await agent.patch(`/api/jobs/${job.id}`).send({ version: 1, isBlocked: true }).expect(400);
    expect(Object.keys(ErrorBody.parse(missing.body).error.fields ?? {})).toEqual(['blockedReason']);
    await agent.patch(`/api/jobs/${job.id}`).send({ version: 1, isBlocked: true, blockedReason: '   ' }).expect(400);
    const blocked = await agent.patch(`/api/jobs/${job.id}`).send({ version: 1, isBlocked: true, blockedReason: 'Waiting for parts: hammer set from Larkspur Felts' }).expect(200);
    expect(Job.parse(blocked.body)).toMatchObject({ isBlocked: true, blockedReason: 'Waiting for parts: hammer set from Larkspur Felts', version: 2 });
    const emptied = await agent.patch(`/api/jobs/${job.id}`).send({ version: 2, blockedReason: null }).expect(400);
    expect(Object.keys(ErrorBody.parse(emptied.body).error.fields ?? {})).toEqual(['blockedReason']);
    const unblocked = await agent.patch(`/api/jobs/${job.id}`).send({ version: 2, isBlocked: false }).expect(200);
    expect(Job.parse(unblocked.body)).toMatchObject({ isBlocked: false, blockedReason: null, version: 3 });
  });

  it.each([
    [{ version: 1 }, 'title'],
    [{ title: 'No version' }, 'version'],
    [{ version: 0, title: 'Zero' }, 'version'],
    [{ version: 1, title: '' }, 'title'],
    [{ version: 1, status: 'archived' }, 'status'],
    [{ version: 1, promisedOn: '2027-02-30' }, 'promisedOn'],
  ])('when %j is sent, then 400 on %s and the job is unchanged', async (input, field) => {
    const { agent } = await signUpWorkshop(t);
    const job = await createJob(agent);
    const res = await agent.patch(`/api/jobs/${job.id}`).send(input).expect(400);
    expect(Object.keys(ErrorBody.parse(res.body).error.fields ?? {})).toContain(field);
    expect(await jobRow(job.id)).toMatchObject({ version: 1, title: job.title });
  });

  it('when another workshop edits our job, then 404 and it is unchanged; a technician gets 403', async () => {
    const { agent: owner } = await signUpWorkshop(t);
    const { agent: other } = await signUpWorkshop(t, 'other');
    const job = await createJob(owner);
    await other.patch(`/api/jobs/${job.id}`).send({ version: 1, title: 'Taken', status: 'cancelled' }).expect(404);
    const tech = await addMember(t, owner, 'technician');
    await tech.agent.patch(`/api/jobs/${job.id}`).send({ version: 1, title: 'Taken' }).expect(403);
    expect(await jobRow(job.id)).toMatchObject({ version: 1, title: job.title, status: 'active' });
  });
});

describe('POST /api/jobs/:id/move', () => {
  it('when a job moves down within its stage, then the others close up around it and no stage change is recorded', async () => {
    const { agent } = await signUpWorkshop(t);
    const [intake] = await activeStages(agent);
    const [a, b, c, d] = await fillStage(agent, intake!.id, 4);
    const res = await agent.post(`/api/jobs/${a!.id}/move`).send({ stageId: intake!.id, index: 2, version: 1 }).expect(200);
    expect(MoveJobResult.parse(res.body).job).toMatchObject({ id: a!.id, stageId: intake!.id, position: 2, version: 2 });
    expect(await idsByPosition(t, intake!.id)).toEqual([b!.id, c!.id, a!.id, d!.id]);
    expect(await eventsOf(a!.id)).toHaveLength(1);
  });

  it('when a job moves up within its stage to the top, then it is first', async () => {
    const { agent } = await signUpWorkshop(t);
    const [intake] = await activeStages(agent);
    const [a, b, c] = await fillStage(agent, intake!.id, 3);
    await agent.post(`/api/jobs/${c!.id}/move`).send({ stageId: intake!.id, index: 0, version: 1 }).expect(200);
    expect(await idsByPosition(t, intake!.id)).toEqual([c!.id, a!.id, b!.id]);
  });

  it('when a job moves to another stage, then both stages are numbered without gaps and the change is recorded', async () => {
    const { agent } = await signUpWorkshop(t);
    const [intake, stripDown] = await activeStages(agent);
    const [a, b, c] = await fillStage(agent, intake!.id, 3, 'In');
    const [x, y] = await fillStage(agent, stripDown!.id, 2, 'Out');
    const res = await agent.post(`/api/jobs/${b!.id}/move`).send({ stageId: stripDown!.id, index: 1, version: 1 }).expect(200);
    expect(MoveJobResult.parse(res.body).job).toMatchObject({ stageId: stripDown!.id, position: 1, version: 2 });
    expect(await idsByPosition(t, intake!.id)).toEqual([a!.id, c!.id]);
    expect(await positionsIn(t, intake!.id)).toEqual([0, 1]);
    expect(await idsByPosition(t, stripDown!.id)).toEqual([x!.id, b!.id, y!.id]);
    expect(await positionsIn(t, stripDown!.id)).toEqual([0, 1, 2]);
    expect(await eventsOf(b!.id)).toEqual([
      { from_stage_id: null, to_stage_id: intake!.id },
      { from_stage_id: intake!.id, to_stage_id: stripDown!.id },
    ]);
  });

  it('when a job moves to the end of an empty stage or past the last job, then index n is accepted and n+1 is not', async () => {
    const { agent } = await signUpWorkshop(t);
    const [intake, stripDown] = await activeStages(agent);
    const [a, b] = await fillStage(agent, intake!.id, 2);
    await agent.post(`/api/jobs/${a!.id}/move`).send({ stageId: stripDown!.id, index: 0, version: 1 }).expect(200);
    await agent.post(`/api/jobs/${b!.id}/move`).send({ stageId: stripDown!.id, index: 1, version: 1 }).expect(200);
    const tooFar = await agent.post(`/api/jobs/${a!.id}/move`).send({ stageId: stripDown!.id, index: 2, version: 2 }).expect(400);
    const { error } = ErrorBody.parse(tooFar.body);
    expect(Object.keys(error.fields ?? {})).toEqual(['index']);
    expect(error.message).toContain('between 0 and 1');
    expect(await idsByPosition(t, stripDown!.id)).toEqual([a!.id, b!.id]);
  });

  it.each([
    [{ index: -1 }, 'index'],
    [{ index: 0.5 }, 'index'],
    [{ index: '1' }, 'index'],
    [{ stageId: 'intake' }, 'stageId'],
    [{ version: undefined }, 'version'],
  ])('when %j is sent, then 400 on %s', async (change, field) => {
    const { agent } = await signUpWorkshop(t);
    const [intake] = await activeStages(agent);
    const job = await createJob(agent);
    const res = await agent.post(`/api/jobs/${job.id}/move`).send({ stageId: intake!.id, index: 0, version: 1, ...change }).expect(400);
    expect(Object.keys(ErrorBody.parse(res.body).error.fields ?? {})).toEqual([field]);
  });

  it('when the target stage is unknown or archived, then 400 on stageId; another workshop’s stage, then 404; the job stays', async () => {
    const { agent } = await signUpWorkshop(t);
    const { agent: other } = await signUpWorkshop(t, 'other');
    const [, stripDown] = await activeStages(agent);
    const [theirs] = await activeStages(other);
    await agent.patch(`/api/stages/${stripDown!.id}`).send({ isArchived: true }).expect(200);
    const job = await createJob(agent);
    const move = (stageId: string) => agent.post(`/api/jobs/${job.id}/move`).send({ stageId, index: 0, version: 1 });
    expect(ErrorBody.parse((await move('7d0e4b8a-1c2f-4e3a-9b5d-6f7a8b9c0d1e').expect(400)).body).error.fields).toHaveProperty('stageId');
    expect(ErrorBody.parse((await move(stripDown!.id).expect(400)).body).error.fields).toHaveProperty('stageId');
    expect(ErrorBody.parse((await move(theirs!.id).expect(404)).body).error.code).toBe('not_found');
    expect(await jobRow(job.id)).toMatchObject({ stage_id: job.stageId, position: 0, version: 1 });
  });

  it('when the version is stale, then 409 version_conflict with the current job, and nothing moves', async () => {
    const { agent } = await signUpWorkshop(t);
    const [intake, stripDown] = await activeStages(agent);
    const [a, b] = await fillStage(agent, intake!.id, 2);
    await agent.post(`/api/jobs/${a!.id}/move`).send({ stageId: intake!.id, index: 1, version: 1 }).expect(200);
    const res = await agent.post(`/api/jobs/${a!.id}/move`).send({ stageId: stripDown!.id, index: 0, version: 1 }).expect(409);
    const body = VersionConflict.parse(res.body);
    expect(body.error.code).toBe('version_conflict');
    expect(body.current).toMatchObject({ id: a!.id, stageId: intake!.id, position: 1, version: 2 });
    expect(await idsByPosition(t, intake!.id)).toEqual([b!.id, a!.id]);
    expect(await idsByPosition(t, stripDown!.id)).toEqual([]);
  });

  it('when the job is done, then it cannot be moved (409)', async () => {
    const { agent } = await signUpWorkshop(t);
    const [intake] = await activeStages(agent);
    const job = await createJob(agent);
    await agent.patch(`/api/jobs/${job.id}`).send({ version: 1, status: 'done' }).expect(200);
    const res = await agent.post(`/api/jobs/${job.id}/move`).send({ stageId: intake!.id, index: 0, version: 2 }).expect(409);
    expect(ErrorBody.parse(res.body).error.code).toBe('conflict');
    expect(await jobRow(job.id)).toMatchObject({ position: null, version: 2 });
  });

  it('when a technician moves a job, then 403 and it stays; another workshop moving it gets 404', async () => {
    const { agent: owner } = await signUpWorkshop(t);
    const { agent: other } = await signUpWorkshop(t, 'other');
    const [, stripDown] = await activeStages(owner);
    const [theirStage] = await activeStages(other);
    const job = await createJob(owner);
    const tech = await addMember(t, owner, 'technician');
    const denied = await tech.agent.post(`/api/jobs/${job.id}/move`).send({ stageId: stripDown!.id, index: 0, version: 1 }).expect(403);
    expect(ErrorBody.parse(denied.body).error.code).toBe('forbidden');
    await other.post(`/api/jobs/${job.id}/move`).send({ stageId: theirStage!.id, index: 0, version: 1 }).expect(404);
    expect(await jobRow(job.id)).toMatchObject({ stage_id: job.stageId, position: 0, version: 1 });
  });

  it('when 20 jobs from three stages move into one stage at once, then every move succeeds and positions are 0..n-1 without gaps or duplicates', async () => {
    const { agent } = await signUpWorkshop(t);
    const [intake, stripDown, hammers, regulation] = await activeStages(agent);
    const movers = [
      ...(await fillStage(agent, intake!.id, 8, 'Intake')),
      ...(await fillStage(agent, stripDown!.id, 6, 'Strip')),
      ...(await fillStage(agent, hammers!.id, 6, 'Hammers')),
    ];
    const already = await fillStage(agent, regulation!.id, 3, 'Regulation');
    const results = await Promise.all(
      movers.map((job, i) => agent.post(`/api/jobs/${job.id}/move`).send({ stageId: regulation!.id, index: i % 4, version: job.version })),
    );
    expect(results.map((r) => r.status)).toEqual(movers.map(() => 200));

    const [check] = await t.sql<{ n: number; distinct_positions: number; min: number; max: number }[]>`
      select count(*)::int as n, count(distinct position)::int as distinct_positions, min(position) as min, max(position) as max
      from jobs where stage_id = ${regulation!.id} and position is not null`;
    expect(check).toEqual({ n: 23, distinct_positions: 23, min: 0, max: 22 });
    expect(await positionsIn(t, regulation!.id)).toEqual(range(23));
    for (const stage of [intake!, stripDown!, hammers!]) expect(await positionsIn(t, stage.id)).toEqual([]);
    expect((await idsByPosition(t, regulation!.id)).sort()).toEqual([...movers, ...already].map((j) => j.id).sort());
    const [events] = await t.sql`select count(*)::int as n from job_stage_events where to_stage_id = ${regulation!.id} and from_stage_id is not null`;
    expect(events!.n).toBe(20);
  });

  it('when 20 moves within one stage race, then the stage still holds each job once at positions 0..n-1', async () => {
    const { agent } = await signUpWorkshop(t);
    const [intake] = await activeStages(agent);
    const jobs = await fillStage(agent, intake!.id, 20);
    const results = await Promise.all(jobs.map((job, i) => agent.post(`/api/jobs/${job.id}/move`).send({ stageId: intake!.id, index: (i * 7) % 20, version: 1 })));
    expect(results.every((r) => r.status === 200)).toBe(true);
    expect(await positionsIn(t, intake!.id)).toEqual(range(20));
    expect((await idsByPosition(t, intake!.id)).sort()).toEqual(jobs.map((j) => j.id).sort());
  });

  it('when the same job is moved twice at once with one version, then one move wins and the other gets 409', async () => {
    const { agent } = await signUpWorkshop(t);
    const [intake, stripDown, hammers] = await activeStages(agent);
    const job = await createJob(agent, { stageId: intake!.id });
    const results = await Promise.all([
      agent.post(`/api/jobs/${job.id}/move`).send({ stageId: stripDown!.id, index: 0, version: 1 }),
      agent.post(`/api/jobs/${job.id}/move`).send({ stageId: hammers!.id, index: 0, version: 1 }),
    ]);
    expect(results.map((r) => r.status).sort()).toEqual([200, 409]);
    const row = await jobRow(job.id);
    expect(row.version).toBe(2);
    expect((await positionsIn(t, stripDown!.id)).length + (await positionsIn(t, hammers!.id)).length).toBe(1);
  });
});

describe('database invariants behind the board', () => {
  it('when two jobs of a stage get one position, then the database refuses it at commit', async () => {
    const { agent } = await signUpWorkshop(t);
    const [intake] = await activeStages(agent);
    const [a, b] = await fillStage(agent, intake!.id, 2);
    await expect(t.sql.begin((tx) => tx`update jobs set position = 0 where id = ${b!.id}`)).rejects.toMatchObject({ code: '23505' });
    expect(await idsByPosition(t, intake!.id)).toEqual([a!.id, b!.id]);
  });

  it('when a job off the board keeps a position, or a stage event names the same stage twice, then the database refuses it', async () => {
    const { agent, me } = await signUpWorkshop(t);
    const job = await createJob(agent);
    await expect(t.sql`update jobs set status = 'done' where id = ${job.id}`).rejects.toMatchObject({ code: '23514' });
    await expect(
      t.sql`insert into job_stage_events (workshop_id, job_id, from_stage_id, to_stage_id) values (${me.workshop.id}, ${job.id}, ${job.stageId}, ${job.stageId})`,
    ).rejects.toMatchObject({ code: '23514' });
    expect(await jobRow(job.id)).toMatchObject({ status: 'active', position: 0 });
  });
});
