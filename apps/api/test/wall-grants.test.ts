import crypto from 'node:crypto';
import { Writable } from 'node:stream';
import pino from 'pino';
import supertest from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { ClockResult, WallPinCheck } from '@keybed/shared';
import { createApp } from '../src/app';
import { createSmtpMailer } from '../src/lib/mail';
import { benchWorkshop, jobWithTasks, membershipOf, pairWall, setPin, type BenchWorkshop } from './bench-fixtures';
import { createTestApp, type TestApp } from './helpers';
import { ErrorBody } from './schemas';

const clock = { ms: Date.parse('2026-03-02T08:00:00Z') };
const later = (minutes: number) => {
  clock.ms += minutes * 60_000;
};
const iso = (value: string) => new Date(value).toISOString();
const minutesAfter = (iso: string, minutes: number) => new Date(Date.parse(iso) + minutes * 60_000).toISOString();

let t: TestApp;
let w: BenchWorkshop;
beforeAll(async () => {
  t = await createTestApp({ now: () => new Date(clock.ms) });
  w = await benchWorkshop(t);
  await setPin(w.owner.agent, w.priya.userId, '246810');
  await setPin(w.owner.agent, w.declan.userId, '135790');
});
afterAll(() => t.close());

const errorOf = (body: unknown) => ErrorBody.parse(body).error;

/** A paired screen where Priya has just entered her PIN: the screen holds her grant. */
async function priyaAtScreen(own: BenchWorkshop = w, name?: string) {
  const screen = await pairWall(t, own.owner, name);
  const res = await screen.agent.post(`/api/wall/technicians/${own.priya.userId}/verify-pin`).send({ pin: '246810' }).expect(200);
  return { ...screen, grant: WallPinCheck.parse(res.body).grant };
}

const entriesOn = (taskId: string) =>
  t.sql<{ id: string; started_at: string; ended_at: string | null; source: string; device_id: string }[]>`
    select id, started_at, ended_at, source, device_id from time_entries where task_id = ${taskId} order by started_at`;

describe('POST /api/wall/technicians/:id/verify-pin: the clock grant', () => {
  it('when the PIN is right, then a grant comes back lasting 24 hours, and only its SHA-256 is stored, for this screen and technician', async () => {
    const { grant, pairing } = await priyaAtScreen();
    expect(grant.token).toMatch(/^[A-Za-z0-9_-]{43}$/);
    expect(grant.issuedAt).toBe(new Date(clock.ms).toISOString());
    expect(grant.expiresAt).toBe(minutesAfter(grant.issuedAt, 24 * 60));
    const hash = crypto.createHash('sha256').update(grant.token).digest('hex');
    const rows = await t.sql<{ device_id: string; technician_id: string; token_hash: string }[]>`
      select device_id, technician_id, token_hash from wall_clock_grants where workshop_id = ${w.workshopId} and token_hash = ${hash}`;
    expect(rows).toEqual([{ device_id: pairing.device.id, technician_id: w.priya.userId, token_hash: hash }]);
    const [row] = await t.sql<{ n: number }[]>`select count(*)::int as n from wall_clock_grants where token_hash = ${grant.token}`;
    expect(row!.n).toBe(0);
  });

  it('when the PIN is wrong, then no grant is made', async () => {
    const own = await benchWorkshop(t);
    await setPin(own.owner.agent, own.priya.userId, '246810');
    const { agent } = await pairWall(t, own.owner);
    const res = await agent.post(`/api/wall/technicians/${own.priya.userId}/verify-pin`).send({ pin: '111111' }).expect(403);
    expect(res.body).not.toHaveProperty('grant');
    expect(await t.sql`select id from wall_clock_grants where workshop_id = ${own.workshopId}`).toHaveLength(0);
  });
});

describe('clock actions sent with a grant', () => {
  it('when a clock-on kept offline is sent with its grant and original time, twice, then it is applied once at that time', async () => {
    const { agent, grant, pairing } = await priyaAtScreen();
    const { tasks } = await jobWithTasks(w.owner.agent, 1, [w.priya.userId]);
    const at = minutesAfter(grant.issuedAt, 1);
    later(120); // the network comes back two hours later
    const body = { technicianId: w.priya.userId, grant: grant.token, taskId: tasks[0]!.id, at, idempotencyKey: 'grant-replay-0001' };
    const first = ClockResult.parse((await agent.post('/api/wall/clock-on').send(body).expect(201)).body);
    expect(first.entry).toMatchObject({ startedAt: at, source: 'wall', technician: { id: w.priya.userId }, createdBy: { id: w.priya.userId } });
    const again = ClockResult.parse((await agent.post('/api/wall/clock-on').send(body).expect(200)).body);
    expect(again.entry.id).toBe(first.entry.id);
    const rows = await entriesOn(tasks[0]!.id);
    expect(rows.map((r) => [iso(r.started_at), r.source, r.device_id])).toEqual([[at, 'wall', pairing.device.id]]);

    const off = { technicianId: w.priya.userId, grant: grant.token, at: minutesAfter(grant.issuedAt, 4), idempotencyKey: 'grant-replay-0002' };
    await agent.post('/api/wall/clock-off').send(off).expect(200);
    await agent.post('/api/wall/clock-off').send(off).expect(200);
    expect((await entriesOn(tasks[0]!.id)).map((r) => [iso(r.started_at), r.ended_at && iso(r.ended_at)])).toEqual([[at, off.at]]);
  });

  it('when the usual rules refuse the replayed action, then the grant does not lift them', async () => {
    const { agent, grant } = await priyaAtScreen();
    const { tasks } = await jobWithTasks(w.owner.agent, 1);
    await w.owner.agent.patch(`/api/tasks/${tasks[0]!.id}`).send({ version: 1, status: 'done' }).expect(200);
    const res = await agent
      .post('/api/wall/clock-on')
      .send({ technicianId: w.priya.userId, grant: grant.token, taskId: tasks[0]!.id, at: minutesAfter(grant.issuedAt, 1), idempotencyKey: 'grant-done-task-01' })
      .expect(409);
    expect(errorOf(res.body).code).toBe('task_not_open');
    expect(await entriesOn(tasks[0]!.id)).toHaveLength(0);
  });
});

describe('clock grants refused', () => {
  /** Sends a clock-on with the grant and expects a refusal that writes nothing. */
  async function refused(agent: supertest.Agent, body: Record<string, unknown>, status: number, code: string) {
    const { tasks } = await jobWithTasks(w.owner.agent, 1);
    const res = await agent.post('/api/wall/clock-on').send({ taskId: tasks[0]!.id, idempotencyKey: `refused-${crypto.randomUUID()}`, ...body }).expect(status);
    expect(errorOf(res.body).code).toBe(code);
    expect(await entriesOn(tasks[0]!.id)).toHaveLength(0);
    return errorOf(res.body);
  }

  it('when another screen sends it, then 403 grant_refused and nothing is written', async () => {
    const { grant } = await priyaAtScreen();
    const other = await pairWall(t, w.owner, 'Finishing room');
    const error = await refused(other.agent, { technicianId: w.priya.userId, grant: grant.token, at: minutesAfter(grant.issuedAt, 1) }, 403, 'grant_refused');
    expect(error.message).toBe('This grant is not valid for this screen and technician. Enter the PIN to send the action.');
  });

  it('when it is sent for another technician, then 403 grant_refused and nothing is written', async () => {
    const { agent, grant } = await priyaAtScreen();
    await refused(agent, { technicianId: w.declan.userId, grant: grant.token, at: minutesAfter(grant.issuedAt, 1) }, 403, 'grant_refused');
  });

  it('when a screen of another workshop sends it, then 403 grant_refused', async () => {
    const { grant } = await priyaAtScreen();
    const own = await benchWorkshop(t);
    const { agent } = await pairWall(t, own.owner);
    const { tasks } = await jobWithTasks(own.owner.agent, 1);
    const res = await agent.post('/api/wall/clock-on').send({ technicianId: w.priya.userId, grant: grant.token, taskId: tasks[0]!.id, at: minutesAfter(grant.issuedAt, 1) }).expect(403);
    expect(errorOf(res.body).code).toBe('grant_refused');
  });

  it('when an unknown token is sent, then 403 grant_refused', async () => {
    const { agent } = await priyaAtScreen();
    await refused(agent, { technicianId: w.priya.userId, grant: crypto.randomBytes(32).toString('base64url') }, 403, 'grant_refused');
  });

  it('when it has expired, then 403 grant_refused and nothing is written', async () => {
    const { agent, grant } = await priyaAtScreen();
    later(24 * 60);
    const error = await refused(agent, { technicianId: w.priya.userId, grant: grant.token, at: minutesAfter(grant.issuedAt, 1) }, 403, 'grant_refused');
    expect(error.message).toBe('This grant has expired. Enter the PIN to send the action.');
  });

  it('when the screen has been revoked, then its grants are refused with it (401 wall_not_paired) and nothing is written', async () => {
    const { agent, grant, pairing } = await priyaAtScreen();
    await w.owner.agent.delete(`/api/wall/devices/${pairing.device.id}`).expect(204);
    await refused(agent, { technicianId: w.priya.userId, grant: grant.token, at: minutesAfter(grant.issuedAt, 1) }, 401, 'wall_not_paired');
  });

  it('when the technician’s PIN has changed since, then 403 grant_refused and their grants are gone', async () => {
    const own = await benchWorkshop(t);
    await setPin(own.owner.agent, own.priya.userId, '246810');
    const { agent, grant } = await priyaAtScreen(own);
    const declanScreen = await pairWall(t, own.owner);
    await setPin(own.owner.agent, own.declan.userId, '135790');
    await declanScreen.agent.post(`/api/wall/technicians/${own.declan.userId}/verify-pin`).send({ pin: '135790' }).expect(200);
    await own.priya.agent.put('/api/me/pin').send({ pin: '112358', password: 'member password 1' }).expect(204);
    const left = await t.sql<{ technician_id: string }[]>`select technician_id from wall_clock_grants where workshop_id = ${own.workshopId}`;
    expect(left.map((r) => r.technician_id)).toEqual([own.declan.userId]);
    const { tasks } = await jobWithTasks(own.owner.agent, 1);
    const res = await agent.post('/api/wall/clock-on').send({ technicianId: own.priya.userId, grant: grant.token, taskId: tasks[0]!.id, at: minutesAfter(grant.issuedAt, 1) }).expect(403);
    expect(errorOf(res.body).code).toBe('grant_refused');
    expect(await entriesOn(tasks[0]!.id)).toHaveLength(0);
  });

  it('when the technician’s PIN is locked by wrong PINs, then their grants are gone and refused', async () => {
    const own = await benchWorkshop(t);
    await setPin(own.owner.agent, own.priya.userId, '246810');
    const { agent, grant } = await priyaAtScreen(own);
    for (let i = 0; i < 5; i++) await agent.post(`/api/wall/technicians/${own.priya.userId}/verify-pin`).send({ pin: '000000' });
    expect(await t.sql`select id from wall_clock_grants where workshop_id = ${own.workshopId}`).toHaveLength(0);
    await own.owner.agent.post(`/api/team/members/${await membershipOf(own.owner.agent, own.priya.userId)}/unlock-pin`).expect(200);
    const { tasks } = await jobWithTasks(own.owner.agent, 1);
    const res = await agent.post('/api/wall/clock-on').send({ technicianId: own.priya.userId, grant: grant.token, taskId: tasks[0]!.id, at: minutesAfter(grant.issuedAt, 1) }).expect(403);
    expect(errorOf(res.body).code).toBe('grant_refused');
    expect(await entriesOn(tasks[0]!.id)).toHaveLength(0);
  });

  it('when the action’s time lies outside the 5 minutes after the PIN check, or it has no time hours later, then 403 with the field and nothing is written', async () => {
    const { agent, grant } = await priyaAtScreen();
    const technicianId = w.priya.userId;
    const before = await refused(agent, { technicianId, grant: grant.token, at: minutesAfter(grant.issuedAt, -1) }, 403, 'grant_refused');
    expect(before.fields).toEqual({ at: ['A grant covers only actions made within 5 minutes of the PIN check it came from. Enter the PIN to send this action.'] });
    await refused(agent, { technicianId, grant: grant.token, at: minutesAfter(grant.issuedAt, 5.5) }, 403, 'grant_refused');
    later(180);
    await refused(agent, { technicianId, grant: grant.token }, 403, 'grant_refused');
    await refused(agent, { technicianId, grant: grant.token, at: new Date(clock.ms).toISOString() }, 403, 'grant_refused');
    const off = await agent.post('/api/wall/clock-off').send({ technicianId, grant: grant.token, at: new Date(clock.ms).toISOString() }).expect(403);
    expect(errorOf(off.body).code).toBe('grant_refused');
  });

  it('when the action’s time is the last moment of the window, then it is accepted', async () => {
    const { agent, grant } = await priyaAtScreen();
    const { tasks } = await jobWithTasks(w.owner.agent, 1);
    later(30);
    const at = minutesAfter(grant.issuedAt, 5);
    await agent.post('/api/wall/clock-on').send({ technicianId: w.priya.userId, grant: grant.token, taskId: tasks[0]!.id, at, idempotencyKey: 'grant-window-end-01' }).expect(201);
    expect((await entriesOn(tasks[0]!.id)).map((r) => iso(r.started_at))).toEqual([at]);
    later(1);
    await agent.post('/api/wall/clock-off').send({ technicianId: w.priya.userId, pin: '246810' }).expect(200);
  });
});

describe('wall clock input', () => {
  it('when neither a PIN nor a grant comes, or both, or a malformed grant, then 400 with the fields and nothing is written', async () => {
    const { agent, grant } = await priyaAtScreen();
    const { tasks } = await jobWithTasks(w.owner.agent, 1);
    const neither = errorOf((await agent.post('/api/wall/clock-on').send({ technicianId: w.priya.userId, taskId: tasks[0]!.id }).expect(400)).body);
    expect(neither).toMatchObject({ code: 'validation_failed' });
    expect(neither.fields).toEqual({
      pin: ['Enter the 6-digit PIN, or send the grant from the PIN check'],
      grant: ['Enter the 6-digit PIN, or send the grant from the PIN check'],
    });
    const offNeither = errorOf((await agent.post('/api/wall/clock-off').send({ technicianId: w.priya.userId }).expect(400)).body);
    expect(Object.keys(offNeither.fields ?? {}).sort()).toEqual(['grant', 'pin']);
    const both = errorOf((await agent.post('/api/wall/clock-on').send({ technicianId: w.priya.userId, taskId: tasks[0]!.id, pin: '246810', grant: grant.token }).expect(400)).body);
    expect(both.fields).toEqual({ grant: ['Send the PIN or a grant, not both'] });
    const malformed = errorOf((await agent.post('/api/wall/clock-on').send({ technicianId: w.priya.userId, taskId: tasks[0]!.id, grant: 'not a grant' }).expect(400)).body);
    expect(malformed.fields).toHaveProperty('grant');
    expect(await entriesOn(tasks[0]!.id)).toHaveLength(0);
  });
});

describe('wall_clock_grants in the database', () => {
  const hash = () => crypto.randomBytes(32).toString('hex');
  const issued = '2026-03-02T08:00:00Z';
  const expires = '2026-03-03T08:00:00Z';

  it('when a grant names a screen or a technician of another workshop, then the database refuses it', async () => {
    const { pairing } = await pairWall(t, w.owner);
    const other = await benchWorkshop(t);
    const otherScreen = await pairWall(t, other.owner);
    await expect(
      t.sql`insert into wall_clock_grants (workshop_id, device_id, technician_id, token_hash, issued_at, expires_at)
            values (${w.workshopId}, ${otherScreen.pairing.device.id}, ${w.priya.userId}, ${hash()}, ${issued}, ${expires})`,
    ).rejects.toMatchObject({ code: '23503', constraint_name: 'wall_clock_grants_device_same_workshop' });
    await expect(
      t.sql`insert into wall_clock_grants (workshop_id, device_id, technician_id, token_hash, issued_at, expires_at)
            values (${w.workshopId}, ${pairing.device.id}, ${other.priya.userId}, ${hash()}, ${issued}, ${expires})`,
    ).rejects.toMatchObject({ code: '23503', constraint_name: 'wall_clock_grants_technician_same_workshop' });
  });

  it('when a grant lasts other than 24 hours, holds no SHA-256, or repeats a token hash, then the database refuses it', async () => {
    const { pairing } = await pairWall(t, w.owner);
    const insert = (tokenHash: string, expiresAt: string) =>
      t.sql`insert into wall_clock_grants (workshop_id, device_id, technician_id, token_hash, issued_at, expires_at)
            values (${w.workshopId}, ${pairing.device.id}, ${w.priya.userId}, ${tokenHash}, ${issued}, ${expiresAt})`;
    await expect(insert(hash(), '2026-03-09T08:00:00Z')).rejects.toMatchObject({ code: '23514', constraint_name: 'wall_clock_grants_lasts_24_hours' });
    await expect(insert('a-plain-token-not-a-hash', expires)).rejects.toMatchObject({ code: '23514', constraint_name: 'wall_clock_grants_token_hash_sha256' });
    const same = hash();
    await insert(same, expires);
    await expect(insert(same, expires)).rejects.toMatchObject({ code: '23505', constraint_name: 'wall_clock_grants_token_hash' });
  });
});

describe('logs', () => {
  it('when grants are made, used and refused, then neither the PIN nor the token appears in the log', async () => {
    const lines: string[] = [];
    const sink = new Writable({
      write(chunk, _encoding, done) {
        lines.push(String(chunk));
        done();
      },
    });
    const mailer = createSmtpMailer(t.config.smtp);
    const logged = createApp({ config: t.config, db: t.db, sql: t.sql, mailer, logger: pino({ level: 'debug' }, sink), now: () => new Date(clock.ms) });
    try {
      const { setCookie } = await pairWall(t, w.owner);
      const cookie = setCookie.find((c) => c.startsWith('keybed_wall='))!.split(';')[0]!;
      const request = (path: string, body: object) => supertest(logged).post(path).set('Cookie', cookie).send(body);
      const { grant } = WallPinCheck.parse((await request(`/api/wall/technicians/${w.declan.userId}/verify-pin`, { pin: '135790' }).expect(200)).body);
      const { tasks } = await jobWithTasks(w.owner.agent, 1);
      await request('/api/wall/clock-on', { technicianId: w.declan.userId, grant: grant.token, taskId: tasks[0]!.id, at: grant.issuedAt, idempotencyKey: 'grant-logged-0001' }).expect(201);
      await request('/api/wall/clock-on', { technicianId: w.priya.userId, grant: grant.token, taskId: tasks[0]!.id, at: grant.issuedAt }).expect(403);
      later(1);
      await request('/api/wall/clock-off', { technicianId: w.declan.userId, pin: '135790' }).expect(200);
      const log = lines.join('');
      expect(log).toContain('wall clock grant refused');
      expect(log).not.toContain(grant.token);
      expect(log).not.toContain('135790');
    } finally {
      await logged.close();
      mailer.close();
    }
  });
});
