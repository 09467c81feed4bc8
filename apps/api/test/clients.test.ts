import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { ClientDetail, ClientList } from '@keybed/shared';
import { createClient, createPiano } from './board-fixtures';
import { addMember, createTestApp, signUpWorkshop, type TestApp } from './helpers';
import { ErrorBody } from './schemas';

let t: TestApp;
beforeAll(async () => {
  t = await createTestApp();
});
afterAll(() => t.close());

describe('POST /api/clients', () => {
  it('when the owner adds a client, then 201 with the client, e-mail lower-cased and blanks as null', async () => {
    const { agent } = await signUpWorkshop(t);
    const client = await createClient(agent, { name: '  Harriet Pembleton ', email: 'Harriet@Pembleton.Example', phone: '', address: '3 Mill Lane\nFennick Cross' });
    expect(client).toMatchObject({ name: 'Harriet Pembleton', email: 'harriet@pembleton.example', phone: null, address: '3 Mill Lane\nFennick Cross', notes: '' });
  });

  it('when a foreman adds a client, then it is allowed', async () => {
    const { agent: owner } = await signUpWorkshop(t);
    const foreman = await addMember(t, owner, 'foreman');
    await createClient(foreman.agent, { name: 'Linwood Hall School (music dept.)' });
  });

  it('when the name is blank, the e-mail is bad and the notes too long, then 400 with those fields and nothing is saved', async () => {
    const { agent, me } = await signUpWorkshop(t);
    const res = await agent.post('/api/clients').send({ name: '   ', email: 'oscar@', notes: 'x'.repeat(5001) }).expect(400);
    expect(Object.keys(ErrorBody.parse(res.body).error.fields ?? {}).sort()).toEqual(['email', 'name', 'notes']);
    const [row] = await t.sql`select count(*)::int as n from clients where workshop_id = ${me.workshop.id}`;
    expect(row!.n).toBe(0);
  });

  it('when a technician tries to add a client, then 403 and nothing is saved', async () => {
    const { agent: owner, me } = await signUpWorkshop(t);
    const tech = await addMember(t, owner, 'technician');
    const res = await tech.agent.post('/api/clients').send({ name: 'Oscar Feld' }).expect(403);
    expect(ErrorBody.parse(res.body).error.code).toBe('forbidden');
    const [row] = await t.sql`select count(*)::int as n from clients where workshop_id = ${me.workshop.id}`;
    expect(row!.n).toBe(0);
  });

  it('when nobody is signed in, then 401', async () => {
    await t.request().post('/api/clients').send({ name: 'Oscar Feld' }).expect(401);
  });
});

describe('GET /api/clients', () => {
  it('when searching, then name and e-mail match without regard to case, and only this workshop’s clients appear', async () => {
    const { agent } = await signUpWorkshop(t);
    const { agent: other } = await signUpWorkshop(t, 'other');
    await createClient(agent, { name: 'Harriet Pembleton', email: 'harriet@pembleton.example' });
    await createClient(agent, { name: 'Oscar Feld', email: 'oscar@feld.example' });
    await createClient(agent, { name: 'Ines Carvalho', email: 'ines@carvalho.example' });
    await createClient(other, { name: 'Harriet Pembleton', email: 'harriet@elsewhere.example' });

    const all = ClientList.parse((await agent.get('/api/clients').expect(200)).body).clients;
    expect(all.map((c) => c.name)).toEqual(['Harriet Pembleton', 'Ines Carvalho', 'Oscar Feld']);
    const byName = ClientList.parse((await agent.get('/api/clients?q=PEMBLE').expect(200)).body).clients;
    expect(byName.map((c) => c.email)).toEqual(['harriet@pembleton.example']);
    const byEmail = ClientList.parse((await agent.get('/api/clients?q=feld.EXAMPLE').expect(200)).body).clients;
    expect(byEmail.map((c) => c.name)).toEqual(['Oscar Feld']);
    const wildcard = ClientList.parse((await agent.get('/api/clients?q=%25').expect(200)).body).clients;
    expect(wildcard).toEqual([]);
  });

  it('when a technician lists clients, then they may read them', async () => {
    const { agent: owner } = await signUpWorkshop(t);
    await createClient(owner, { name: 'Oscar Feld' });
    const tech = await addMember(t, owner, 'technician');
    const res = await tech.agent.get('/api/clients').expect(200);
    expect(ClientList.parse(res.body).clients).toHaveLength(1);
  });

  it('when the limit is not a number in range, then 400 on limit', async () => {
    const { agent } = await signUpWorkshop(t);
    const res = await agent.get('/api/clients?limit=0').expect(400);
    expect(Object.keys(ErrorBody.parse(res.body).error.fields ?? {})).toEqual(['limit']);
  });
});

describe('GET /api/clients/:id', () => {
  it('when the client has pianos, then they come with the client', async () => {
    const { agent } = await signUpWorkshop(t);
    const client = await createClient(agent);
    const piano = await createPiano(agent, client.id);
    const res = await agent.get(`/api/clients/${client.id}`).expect(200);
    const detail = ClientDetail.parse(res.body);
    expect(detail.pianos.map((p) => p.id)).toEqual([piano.id]);
    expect(detail.pianos[0]).toMatchObject({ clientName: 'Harriet Pembleton', sizeMm: 1778, keytopMaterial: 'ivory' });
  });

  it('when the id is another workshop’s client, then 404; when it is not an id, then 400', async () => {
    const { agent } = await signUpWorkshop(t);
    const { agent: other } = await signUpWorkshop(t, 'other');
    const theirs = await createClient(other);
    const res = await agent.get(`/api/clients/${theirs.id}`).expect(404);
    expect(ErrorBody.parse(res.body).error.code).toBe('not_found');
    await agent.get('/api/clients/not-an-id').expect(400);
  });
});

describe('PATCH /api/clients/:id', () => {
  it('when the foreman changes the phone, then the client is updated and the rest kept', async () => {
    const { agent: owner } = await signUpWorkshop(t);
    const foreman = await addMember(t, owner, 'foreman');
    const client = await createClient(owner, { name: 'Oscar Feld', email: 'oscar@feld.example', notes: 'Prefers mornings' });
    const res = await foreman.agent.patch(`/api/clients/${client.id}`).send({ phone: '01632 960123' }).expect(200);
    expect(res.body).toMatchObject({ name: 'Oscar Feld', email: 'oscar@feld.example', phone: '01632 960123', notes: 'Prefers mornings' });
  });

  it('when nothing is sent or the name is blank, then 400 and the client is unchanged', async () => {
    const { agent } = await signUpWorkshop(t);
    const client = await createClient(agent, { name: 'Oscar Feld' });
    await agent.patch(`/api/clients/${client.id}`).send({}).expect(400);
    const res = await agent.patch(`/api/clients/${client.id}`).send({ name: '' }).expect(400);
    expect(ErrorBody.parse(res.body).error.fields).toHaveProperty('name');
    expect((await agent.get(`/api/clients/${client.id}`)).body.name).toBe('Oscar Feld');
  });

  it('when another workshop’s owner changes our client, then 404 and nothing changes', async () => {
    const { agent } = await signUpWorkshop(t);
    const { agent: other } = await signUpWorkshop(t, 'other');
    const client = await createClient(agent, { name: 'Oscar Feld' });
    await other.patch(`/api/clients/${client.id}`).send({ name: 'Taken over' }).expect(404);
    expect((await agent.get(`/api/clients/${client.id}`)).body.name).toBe('Oscar Feld');
  });

  it('when a technician changes a client, then 403', async () => {
    const { agent: owner } = await signUpWorkshop(t);
    const client = await createClient(owner, { name: 'Oscar Feld' });
    const tech = await addMember(t, owner, 'technician');
    await tech.agent.patch(`/api/clients/${client.id}`).send({ name: 'Someone' }).expect(403);
  });
});
