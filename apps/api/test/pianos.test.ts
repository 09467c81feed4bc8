import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { PianoDetail, PianoList } from '@keybed/shared';
import { activeStages, createClient, createJob, createPiano, SALON_GRAND } from './board-fixtures';
import { addMember, createTestApp, signUpWorkshop, type TestApp } from './helpers';
import { ErrorBody } from './schemas';

let t: TestApp;
beforeAll(async () => {
  t = await createTestApp();
});
afterAll(() => t.close());

const countPianos = async (workshopId: string) =>
  (await t.sql<{ n: number }[]>`select count(*)::int as n from pianos where workshop_id = ${workshopId}`)[0]!.n;

describe('POST /api/pianos', () => {
  it('when the owner adds a client’s piano, then 201 with the client’s name and size in millimetres', async () => {
    const { agent } = await signUpWorkshop(t);
    const client = await createClient(agent);
    const piano = await createPiano(agent, client.id);
    expect(piano).toMatchObject({ ...SALON_GRAND, clientId: client.id, clientName: 'Harriet Pembleton', notes: '' });
  });

  it('when only the required fields are given, then the rest take their defaults', async () => {
    const { agent } = await signUpWorkshop(t);
    const client = await createClient(agent, { name: 'Ines Carvalho' });
    const res = await agent.post('/api/pianos').send({ clientId: client.id, maker: 'Carrow & Finch', type: 'upright' }).expect(201);
    expect(res.body).toMatchObject({ model: '', serialNumber: '', sizeMm: null, yearApprox: null, keytopMaterial: 'unknown' });
  });

  it.each([
    [{ sizeMm: -1260 }, 'sizeMm'],
    [{ sizeMm: 0 }, 'sizeMm'],
    [{ sizeMm: 1260.5 }, 'sizeMm'],
    [{ sizeMm: 12600 }, 'sizeMm'],
    [{ yearApprox: 1650 }, 'yearApprox'],
    [{ type: 'spinet-ish' }, 'type'],
    [{ maker: ' ' }, 'maker'],
    [{ keytopMaterial: 'bone' }, 'keytopMaterial'],
    [{ clientId: 'nope' }, 'clientId'],
  ])('when %j is sent, then 400 on %s and nothing is saved', async (change, field) => {
    const { agent, me } = await signUpWorkshop(t);
    const client = await createClient(agent);
    const res = await agent.post('/api/pianos').send({ ...SALON_GRAND, clientId: client.id, ...change }).expect(400);
    expect(Object.keys(ErrorBody.parse(res.body).error.fields ?? {})).toEqual([field]);
    expect(await countPianos(me.workshop.id)).toBe(0);
  });

  it('when the client belongs to another workshop, then 404 and nothing is saved', async () => {
    const { agent, me } = await signUpWorkshop(t);
    const { agent: other } = await signUpWorkshop(t, 'other');
    const theirs = await createClient(other);
    const res = await agent.post('/api/pianos').send({ ...SALON_GRAND, clientId: theirs.id }).expect(404);
    expect(ErrorBody.parse(res.body).error.code).toBe('not_found');
    expect(await countPianos(me.workshop.id)).toBe(0);
  });

  it('when a technician adds a piano, then 403', async () => {
    const { agent: owner } = await signUpWorkshop(t);
    const client = await createClient(owner);
    const tech = await addMember(t, owner, 'technician');
    await tech.agent.post('/api/pianos').send({ ...SALON_GRAND, clientId: client.id }).expect(403);
  });
});

describe('GET /api/pianos', () => {
  it('when filtering by client and searching maker, model or serial, then only matching pianos of this workshop appear', async () => {
    const { agent } = await signUpWorkshop(t);
    const { agent: other } = await signUpWorkshop(t, 'other');
    const harriet = await createClient(agent);
    const school = await createClient(agent, { name: 'Linwood Hall School (music dept.)' });
    const grand = await createPiano(agent, harriet.id);
    const upright = await createPiano(agent, school.id, { maker: 'Osterholt', model: '', serialNumber: 'OH-62-4471', type: 'upright', sizeMm: 1260, yearApprox: 1962, keytopMaterial: 'plastic' });
    await createPiano(other, (await createClient(other)).id);

    const list = async (query: string) => PianoList.parse((await agent.get(`/api/pianos${query}`).expect(200)).body).pianos.map((p) => p.id);
    expect((await list('')).sort()).toEqual([grand.id, upright.id].sort());
    expect(await list(`?clientId=${school.id}`)).toEqual([upright.id]);
    expect(await list('?q=osterHOLT')).toEqual([upright.id]);
    expect(await list('?q=salon')).toEqual([grand.id]);
    expect(await list('?q=4471')).toEqual([upright.id]);
    expect(await list(`?q=salon&clientId=${school.id}`)).toEqual([]);
  });

  it('when clientId is not an id, then 400 on clientId', async () => {
    const { agent } = await signUpWorkshop(t);
    const res = await agent.get('/api/pianos?clientId=42').expect(400);
    expect(Object.keys(ErrorBody.parse(res.body).error.fields ?? {})).toEqual(['clientId']);
  });
});

describe('GET /api/pianos/:id', () => {
  it('when the piano has had jobs, then its history lists them newest first with status and stage name', async () => {
    const { agent } = await signUpWorkshop(t);
    const piano = await createPiano(agent, (await createClient(agent)).id);
    const [intake, , hammers] = await activeStages(agent);
    const first = await createJob(agent, { title: 'Assessment', pianoId: piano.id });
    await agent.patch(`/api/jobs/${first.id}`).send({ version: first.version, status: 'cancelled' }).expect(200);
    const second = await createJob(agent, { title: 'New hammers, rebush, full regulation', pianoId: piano.id, stageId: hammers!.id });

    const res = await agent.get(`/api/pianos/${piano.id}`).expect(200);
    const detail = PianoDetail.parse(res.body);
    expect(detail.jobs.map((j) => [j.id, j.status, j.stageName])).toEqual([
      [second.id, 'active', 'Hammers'],
      [first.id, 'cancelled', intake!.name],
    ]);
  });

  it('when the piano is another workshop’s, then 404', async () => {
    const { agent } = await signUpWorkshop(t);
    const { agent: other } = await signUpWorkshop(t, 'other');
    const theirs = await createPiano(other, (await createClient(other)).id);
    await agent.get(`/api/pianos/${theirs.id}`).expect(404);
  });
});

describe('PATCH /api/pianos/:id', () => {
  it('when the size and owner change, then the piano shows the new owner’s name', async () => {
    const { agent } = await signUpWorkshop(t);
    const piano = await createPiano(agent, (await createClient(agent)).id);
    const oscar = await createClient(agent, { name: 'Oscar Feld' });
    const res = await agent.patch(`/api/pianos/${piano.id}`).send({ sizeMm: 1575, clientId: oscar.id }).expect(200);
    expect(res.body).toMatchObject({ sizeMm: 1575, clientId: oscar.id, clientName: 'Oscar Feld', maker: 'Carrow & Finch' });
  });

  it('when the new owner is another workshop’s client, then 404 and the piano keeps its owner', async () => {
    const { agent } = await signUpWorkshop(t);
    const { agent: other } = await signUpWorkshop(t, 'other');
    const client = await createClient(agent);
    const piano = await createPiano(agent, client.id);
    const theirs = await createClient(other);
    await agent.patch(`/api/pianos/${piano.id}`).send({ clientId: theirs.id }).expect(404);
    expect((await agent.get(`/api/pianos/${piano.id}`)).body.clientId).toBe(client.id);
  });

  it('when the size is negative or nothing is sent, then 400 and the piano is unchanged', async () => {
    const { agent } = await signUpWorkshop(t);
    const piano = await createPiano(agent, (await createClient(agent)).id);
    const res = await agent.patch(`/api/pianos/${piano.id}`).send({ sizeMm: -5 }).expect(400);
    expect(Object.keys(ErrorBody.parse(res.body).error.fields ?? {})).toEqual(['sizeMm']);
    await agent.patch(`/api/pianos/${piano.id}`).send({}).expect(400);
    expect((await agent.get(`/api/pianos/${piano.id}`)).body.sizeMm).toBe(1778);
  });

  it('when another workshop changes our piano, then 404 and nothing changes; a technician gets 403', async () => {
    const { agent: owner } = await signUpWorkshop(t);
    const { agent: other } = await signUpWorkshop(t, 'other');
    const piano = await createPiano(owner, (await createClient(owner)).id);
    await other.patch(`/api/pianos/${piano.id}`).send({ model: 'Changed' }).expect(404);
    const tech = await addMember(t, owner, 'technician');
    await tech.agent.patch(`/api/pianos/${piano.id}`).send({ model: 'Changed' }).expect(403);
    expect((await owner.get(`/api/pianos/${piano.id}`)).body.model).toBe('Salon');
  });
});
