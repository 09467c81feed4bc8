import supertest from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { ClockResult, PinStatus, WallDeviceList, WallPairing, WallTechnicianList, WallTechnicianTasks } from '@keybed/shared';
import { createApp } from '../src/app';
import { createLogger } from '../src/lib/logger';
import { createSmtpMailer } from '../src/lib/mail';
import { benchWorkshop, createTask, jobWithTasks, membershipOf, pairWall, setPin, type BenchWorkshop } from './bench-fixtures';
import { createTestApp, signUpWorkshop, type TestApp } from './helpers';
import { ErrorBody } from './schemas';
import { openEventStream } from './sse';

const clock = { ms: Date.parse('2026-03-02T08:00:00Z') };
const later = (minutes: number) => {
  clock.ms += minutes * 60_000;
};

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
const securityEvents = (workshopId: string) =>
  t.sql<{ kind: string; detail: Record<string, unknown> }[]>`select kind, detail from security_events where workshop_id = ${workshopId} order by at, kind`;

describe('POST /api/wall/pair', () => {
  it('when the owner pairs a browser, then it holds a wall-screen cookie, its member session ends, and the screen is listed', async () => {
    const { agent, pairing, setCookie } = await pairWall(t, w.owner, 'Bench room screen');
    expect(pairing).toEqual({ device: { id: pairing.device.id, name: 'Bench room screen' }, workshop: { id: w.workshopId, name: w.owner.me.workshop.name, timeZone: 'Europe/London' } });
    const wallCookie = setCookie.find((c) => c.startsWith('keybed_wall='))!;
    expect(wallCookie).toMatch(/HttpOnly/i);
    expect(wallCookie).toMatch(/SameSite=Strict/i);
    expect(setCookie.some((c) => /^keybed_session=;/.test(c))).toBe(true);
    await agent.get('/api/me').expect(401);
    expect(WallPairing.parse((await agent.get('/api/wall/session').expect(200)).body).device.id).toBe(pairing.device.id);
    const devices = WallDeviceList.parse((await w.foreman.agent.get('/api/wall/devices').expect(200)).body).devices;
    expect(devices.find((d) => d.id === pairing.device.id)).toMatchObject({ name: 'Bench room screen', revokedAt: null, pairedBy: { id: w.owner.me.user.id } });
  });

  it('when a technician tries to pair, or the name is blank, then 403 or 400', async () => {
    await w.priya.agent.post('/api/wall/pair').send({ name: 'My screen' }).expect(403);
    expect(errorOf((await w.owner.agent.post('/api/wall/pair').send({ name: '  ' }).expect(400)).body).fields).toHaveProperty('name');
  });
});

describe('the wall screen’s device session', () => {
  it('when the wall screen calls member routes, then it is refused as unauthenticated; without a pairing, wall routes are refused', async () => {
    const { agent } = await pairWall(t, w.owner);
    for (const path of ['/api/jobs', '/api/time/running', '/api/time/entries', '/api/team/members', '/api/board']) {
      expect(errorOf((await agent.get(path).expect(401)).body).code).toBe('unauthenticated');
    }
    await agent.post('/api/time/clock-on').send({ taskId: crypto.randomUUID() }).expect(401);
    const res = await w.owner.agent.get('/api/wall/technicians').expect(401);
    expect(errorOf(res.body)).toMatchObject({ code: 'wall_not_paired', message: 'This browser is not paired as a wall screen. An owner or foreman can pair it.' });
  });

  it('when the owner revokes a screen, then its next request is refused and it shows as revoked', async () => {
    const { agent, pairing } = await pairWall(t, w.owner, 'Finishing room');
    await agent.get('/api/wall/technicians').expect(200);
    await w.owner.agent.delete(`/api/wall/devices/${pairing.device.id}`).expect(204);
    const res = await agent.get('/api/wall/technicians').expect(401);
    expect(errorOf(res.body)).toMatchObject({ code: 'wall_not_paired', message: 'This wall screen was unpaired. An owner or foreman can pair it again.' });
    await agent.post('/api/wall/clock-on').send({ technicianId: w.priya.userId, pin: '246810', taskId: crypto.randomUUID() }).expect(401);
    const devices = WallDeviceList.parse((await w.owner.agent.get('/api/wall/devices').expect(200)).body).devices;
    expect(devices.find((d) => d.id === pairing.device.id)!.revokedAt).not.toBeNull();
    expect((await securityEvents(w.workshopId)).map((e) => e.kind)).toContain('wall_revoked');
  });

  it('when another workshop revokes or lists our screen, then 404 or not there', async () => {
    const { pairing } = await pairWall(t, w.owner);
    const other = await signUpWorkshop(t, 'other');
    await other.agent.delete(`/api/wall/devices/${pairing.device.id}`).expect(404);
    expect(WallDeviceList.parse((await other.agent.get('/api/wall/devices').expect(200)).body).devices).toEqual([]);
  });
});

describe('GET /api/wall/technicians and POST /api/wall/technicians/:id/verify-pin', () => {
  it('when the screen lists technicians, then each shows whether they have a PIN and what they are on', async () => {
    const { agent } = await pairWall(t, w.owner);
    const list = WallTechnicianList.parse((await agent.get('/api/wall/technicians').expect(200)).body).technicians;
    expect(list.map((x) => [x.id, x.hasPin, x.lockedUntil])).toEqual(
      expect.arrayContaining([
        [w.priya.userId, true, null],
        [w.declan.userId, true, null],
      ]),
    );
    expect(list.map((x) => x.id)).not.toContain(w.owner.me.user.id);
  });

  it('when the PIN is right, then the technician’s open tasks come back, assigned ones first, done tasks and inactive jobs left out', async () => {
    const { agent } = await pairWall(t, w.owner);
    const other = await jobWithTasks(w.owner.agent, 1);
    const mine = await jobWithTasks(w.owner.agent, 2, [w.priya.userId]);
    const done = await createTask(w.owner.agent, mine.job.id, { title: 'Already done', assigneeIds: [w.priya.userId] });
    await w.owner.agent.patch(`/api/tasks/${done.id}`).send({ version: 1, status: 'done' }).expect(200);
    const held = await jobWithTasks(w.owner.agent, 1, [w.priya.userId]);
    await w.owner.agent.patch(`/api/jobs/${held.job.id}`).send({ version: 1, status: 'on_hold' }).expect(200);
    const res = await agent.post(`/api/wall/technicians/${w.priya.userId}/verify-pin`).send({ pin: '246810' }).expect(200);
    const body = WallTechnicianTasks.parse(res.body);
    expect(body.technician).toEqual({ id: w.priya.userId, name: 'Test technician' });
    const ids = body.tasks.map((x) => x.id);
    expect(ids.slice(0, 2).sort()).toEqual(mine.tasks.map((x) => x.id).sort());
    expect(ids).toContain(other.tasks[0]!.id);
    expect(ids).not.toContain(done.id);
    expect(ids).not.toContain(held.tasks[0]!.id);
    expect(body.tasks[0]).toMatchObject({ isAssigned: true, job: { clientName: 'Harriet Pembleton', pianoLabel: 'Carrow & Finch Salon grand' } });
  });

  it('when a PIN is wrong, then 403 says how many tries are left, and a security event is kept without the PIN', async () => {
    const own = await benchWorkshop(t);
    await setPin(own.owner.agent, own.priya.userId, '246810');
    const { agent } = await pairWall(t, own.owner);
    const res = await agent.post(`/api/wall/technicians/${own.priya.userId}/verify-pin`).send({ pin: '111111' }).expect(403);
    expect(errorOf(res.body)).toMatchObject({ code: 'pin_incorrect', message: 'Wrong PIN. 4 more tries before a 5-minute lock.' });
    const events = await securityEvents(own.workshopId);
    expect(events.filter((e) => e.kind === 'pin_failed')).toEqual([{ kind: 'pin_failed', detail: { failedInARow: 1 } }]);
    expect(JSON.stringify(events)).not.toContain('111111');
    expect(JSON.stringify(events)).not.toContain('246810');
  });

  it('when a PIN is not six digits or the technician has none, then 400 or 409 pin_not_set', async () => {
    const own = await benchWorkshop(t);
    const { agent } = await pairWall(t, own.owner);
    expect(errorOf((await agent.post(`/api/wall/technicians/${own.priya.userId}/verify-pin`).send({ pin: '12345' }).expect(400)).body).fields).toHaveProperty('pin');
    expect(errorOf((await agent.post(`/api/wall/technicians/${own.priya.userId}/verify-pin`).send({ pin: '123456' }).expect(409)).body).code).toBe('pin_not_set');
  });

  it('when a screen names a technician of another workshop, then 404', async () => {
    const { agent } = await pairWall(t, w.owner);
    const other = await benchWorkshop(t);
    await setPin(other.owner.agent, other.priya.userId, '246810');
    await agent.post(`/api/wall/technicians/${other.priya.userId}/verify-pin`).send({ pin: '246810' }).expect(404);
  });
});

describe('PIN lockout', () => {
  it('when five wrong PINs come in a row, then the technician is refused for 5 minutes, even with the right PIN, and the lock is recorded', async () => {
    const own = await benchWorkshop(t);
    await setPin(own.owner.agent, own.priya.userId, '246810');
    const { agent } = await pairWall(t, own.owner);
    const verify = (pin: string) => agent.post(`/api/wall/technicians/${own.priya.userId}/verify-pin`).send({ pin });
    for (let i = 0; i < 4; i++) expect((await verify('000000')).status).toBe(403);
    const fifth = await verify('000000');
    expect(fifth.status).toBe(429);
    expect(errorOf(fifth.body)).toMatchObject({ code: 'pin_locked', message: 'Test technician is locked for 5 minutes after 5 wrong PINs. An owner or foreman can unlock sooner.' });
    expect(fifth.body).toMatchObject({ lockedMinutes: 5 });
    const right = await verify('246810');
    expect(right.status).toBe(429);
    later(2);
    expect(errorOf((await verify('246810')).body).message).toContain('locked for 3 minutes');
    later(3);
    await verify('246810').expect(200);
    const kinds = (await securityEvents(own.workshopId)).map((e) => e.kind);
    expect(kinds.filter((k) => k === 'pin_failed')).toHaveLength(5);
    expect(kinds.filter((k) => k === 'pin_locked')).toHaveLength(1);
  });

  it('when five wrong PINs arrive at once, then exactly five failures count and the technician ends up locked', async () => {
    const own = await benchWorkshop(t);
    await setPin(own.owner.agent, own.priya.userId, '246810');
    const { agent } = await pairWall(t, own.owner);
    const statuses = (await Promise.all(Array.from({ length: 5 }, () => agent.post(`/api/wall/technicians/${own.priya.userId}/verify-pin`).send({ pin: '999999' })))).map((r) => r.status);
    expect(statuses.sort()).toEqual([403, 403, 403, 403, 429]);
    const [row] = await t.sql<{ pin_locked_until: string | null }[]>`select pin_locked_until from memberships where user_id = ${own.priya.userId}`;
    expect(row!.pin_locked_until).not.toBeNull();
  });

  it('when the API restarts while a technician is locked, then the lock still holds (it lives in the database)', async () => {
    const own = await benchWorkshop(t);
    await setPin(own.owner.agent, own.priya.userId, '246810');
    const { agent, setCookie } = await pairWall(t, own.owner);
    for (let i = 0; i < 5; i++) await agent.post(`/api/wall/technicians/${own.priya.userId}/verify-pin`).send({ pin: '000000' });
    const restarted = createApp({ config: t.config, db: t.db, sql: t.sql, mailer: createSmtpMailer(t.config.smtp), logger: createLogger('silent'), now: () => new Date(clock.ms) });
    try {
      const cookie = setCookie.find((c) => c.startsWith('keybed_wall='))!.split(';')[0]!;
      const res = await supertest(restarted).post(`/api/wall/technicians/${own.priya.userId}/verify-pin`).set('Cookie', cookie).send({ pin: '246810' }).expect(429);
      expect(errorOf(res.body).code).toBe('pin_locked');
    } finally {
      await restarted.close();
    }
  });

  it('when the foreman unlocks a locked technician, then the right PIN works at once; a technician cannot unlock', async () => {
    const own = await benchWorkshop(t);
    await setPin(own.owner.agent, own.priya.userId, '246810');
    const { agent } = await pairWall(t, own.owner);
    for (let i = 0; i < 5; i++) await agent.post(`/api/wall/technicians/${own.priya.userId}/verify-pin`).send({ pin: '000000' });
    const membershipId = await membershipOf(own.owner.agent, own.priya.userId);
    expect(PinStatus.parse((await own.foreman.agent.get(`/api/team/members/${membershipId}/pin`).expect(200)).body).lockedUntil).not.toBeNull();
    await own.priya.agent.post(`/api/team/members/${membershipId}/unlock-pin`).expect(403);
    const status = PinStatus.parse((await own.foreman.agent.post(`/api/team/members/${membershipId}/unlock-pin`).expect(200)).body);
    expect(status).toEqual({ hasPin: true, lockedUntil: null, failedAttempts: 0 });
    await agent.post(`/api/wall/technicians/${own.priya.userId}/verify-pin`).send({ pin: '246810' }).expect(200);
    expect((await securityEvents(own.workshopId)).map((e) => e.kind)).toContain('pin_unlocked');
  });

  it('when the owner unlocks a locked technician, then the lock is gone and the right PIN works', async () => {
    const own = await benchWorkshop(t);
    await setPin(own.owner.agent, own.declan.userId, '135790');
    const { agent } = await pairWall(t, own.owner);
    for (let i = 0; i < 5; i++) await agent.post(`/api/wall/technicians/${own.declan.userId}/verify-pin`).send({ pin: '000000' });
    await agent.post(`/api/wall/technicians/${own.declan.userId}/verify-pin`).send({ pin: '135790' }).expect(429);
    const membershipId = await membershipOf(own.owner.agent, own.declan.userId);
    expect(PinStatus.parse((await own.owner.agent.post(`/api/team/members/${membershipId}/unlock-pin`).expect(200)).body).lockedUntil).toBeNull();
    const list = WallTechnicianList.parse((await agent.get('/api/wall/technicians').expect(200)).body).technicians;
    expect(list.find((x) => x.id === own.declan.userId)!.lockedUntil).toBeNull();
    await agent.post(`/api/wall/technicians/${own.declan.userId}/verify-pin`).send({ pin: '135790' }).expect(200);
  });

  it('when another workshop tries to unlock our technician, then 404', async () => {
    const other = await signUpWorkshop(t, 'other');
    await other.agent.post(`/api/team/members/${await membershipOf(w.owner.agent, w.priya.userId)}/unlock-pin`).expect(404);
  });
});

describe('the screen’s hourly cap on wrong PINs', () => {
  it('when a screen reaches its cap across technicians, then it is refused for the rest of the hour, even for a right PIN', async () => {
    const capped = await createTestApp({ now: () => new Date(clock.ms), limits: { wallPinFailuresPerDevicePerHour: 6 } });
    try {
      const own = await benchWorkshop(capped);
      await setPin(own.owner.agent, own.priya.userId, '246810');
      await setPin(own.owner.agent, own.declan.userId, '135790');
      const { agent } = await pairWall(capped, own.owner);
      const verify = (id: string, pin: string) => agent.post(`/api/wall/technicians/${id}/verify-pin`).send({ pin });
      for (let i = 0; i < 3; i++) await verify(own.priya.userId, '000000').expect(403);
      for (let i = 0; i < 3; i++) await verify(own.declan.userId, '000000').expect(403);
      const refused = await verify(own.declan.userId, '135790').expect(429);
      expect(errorOf(refused.body)).toMatchObject({ code: 'wall_pin_limit' });
      expect(errorOf(refused.body).message).toContain('Too many wrong PINs on this screen in the last hour. Try again in 60 minutes');
      const [row] = await capped.sql<{ n: number }[]>`select count(*)::int as n from security_events where kind = 'wall_pin_limit'`;
      expect(row!.n).toBe(1);
      const second = await pairWall(capped, own.owner, 'Second screen');
      await second.agent.post(`/api/wall/technicians/${own.declan.userId}/verify-pin`).send({ pin: '135790' }).expect(200);
      later(61);
      await verify(own.declan.userId, '135790').expect(200);
    } finally {
      await capped.close();
    }
  });
});

describe('POST /api/wall/clock-on and /api/wall/clock-off', () => {
  it('when a technician clocks on by PIN at the screen, then the entry is the wall’s, and clock-off stops it', async () => {
    const { agent, pairing } = await pairWall(t, w.owner);
    const { tasks } = await jobWithTasks(w.owner.agent, 1, [w.declan.userId]);
    later(60);
    const res = await agent.post('/api/wall/clock-on').send({ technicianId: w.declan.userId, pin: '135790', taskId: tasks[0]!.id }).expect(201);
    const { entry } = ClockResult.parse(res.body);
    expect(entry).toMatchObject({ source: 'wall', technician: { id: w.declan.userId }, createdBy: { id: w.declan.userId }, endedAt: null });
    const [row] = await t.sql<{ device_id: string }[]>`select device_id from time_entries where id = ${entry.id}`;
    expect(row!.device_id).toBe(pairing.device.id);
    const list = WallTechnicianList.parse((await agent.get('/api/wall/technicians').expect(200)).body).technicians;
    expect(list.find((x) => x.id === w.declan.userId)!.running).toMatchObject({ entryId: entry.id, task: { id: tasks[0]!.id } });
    later(45);
    const off = ClockResult.parse((await agent.post('/api/wall/clock-off').send({ technicianId: w.declan.userId, pin: '135790' }).expect(200)).body);
    expect(off.entry).toMatchObject({ id: entry.id, minutes: 45 });
  });

  it('when the PIN is wrong, then nothing is clocked', async () => {
    const { agent } = await pairWall(t, w.owner);
    const { tasks } = await jobWithTasks(w.owner.agent, 1);
    await agent.post('/api/wall/clock-on').send({ technicianId: w.priya.userId, pin: '000001', taskId: tasks[0]!.id }).expect(403);
    expect(await t.sql`select id from time_entries where task_id = ${tasks[0]!.id}`).toHaveLength(0);
    await w.owner.agent.post(`/api/team/members/${await membershipOf(w.owner.agent, w.priya.userId)}/unlock-pin`).expect(200);
  });

  it('when the screen replays offline actions twice with their keys and times, then each is counted once', async () => {
    const { agent } = await pairWall(t, w.owner);
    const { tasks } = await jobWithTasks(w.owner.agent, 2);
    later(600);
    const base = new Date(clock.ms);
    const iso = (minutesAgo: number) => new Date(base.getTime() - minutesAgo * 60_000).toISOString();
    const queue = [
      ['/api/wall/clock-on', { technicianId: w.priya.userId, pin: '246810', taskId: tasks[0]!.id, at: iso(180), idempotencyKey: 'offline-a-0001' }],
      ['/api/wall/clock-on', { technicianId: w.priya.userId, pin: '246810', taskId: tasks[1]!.id, at: iso(120), idempotencyKey: 'offline-a-0002' }],
      ['/api/wall/clock-off', { technicianId: w.priya.userId, pin: '246810', at: iso(30), idempotencyKey: 'offline-a-0003' }],
    ] as const;
    for (const [path, body] of queue) await agent.post(path).send(body).expect((r) => expect([200, 201]).toContain(r.status));
    for (const [path, body] of queue) await agent.post(path).send(body).expect(200);
    const rows = await t.sql<{ task_id: string; started_at: string; ended_at: string }[]>`
      select task_id, started_at, ended_at from time_entries where technician_id = ${w.priya.userId} and task_id in (${tasks[0]!.id}, ${tasks[1]!.id}) order by started_at`;
    expect(rows.map((r) => [r.task_id, new Date(r.started_at).toISOString(), new Date(r.ended_at).toISOString()])).toEqual([
      [tasks[0]!.id, iso(180), iso(120)],
      [tasks[1]!.id, iso(120), iso(30)],
    ]);
  });
});

describe('PUT /api/me/pin and PUT /api/team/members/:id/pin', () => {
  it('when a technician sets their own PIN with their password, then it works at the wall; a wrong password changes nothing', async () => {
    const own = await benchWorkshop(t);
    await own.priya.agent.put('/api/me/pin').send({ pin: '112358', password: 'wrong password' }).expect(400);
    expect(PinStatus.parse((await own.priya.agent.get('/api/me/pin').expect(200)).body).hasPin).toBe(false);
    await own.priya.agent.put('/api/me/pin').send({ pin: '112358', password: 'member password 1' }).expect(204);
    const { agent } = await pairWall(t, own.owner);
    await agent.post(`/api/wall/technicians/${own.priya.userId}/verify-pin`).send({ pin: '112358' }).expect(200);
    const [row] = await t.sql<{ pin_hash: string }[]>`select pin_hash from memberships where user_id = ${own.priya.userId}`;
    expect(row!.pin_hash).toMatch(/^\$argon2id\$/);
  });

  it('when the foreman tries to set someone’s PIN, then 403; only the owner may', async () => {
    const membershipId = await membershipOf(w.owner.agent, w.priya.userId);
    await w.foreman.agent.put(`/api/team/members/${membershipId}/pin`).send({ pin: '123456' }).expect(403);
    await w.owner.agent.put(`/api/team/members/${membershipId}/pin`).send({ pin: '12345a' }).expect(400);
  });
});

describe('GET /api/wall/events', () => {
  it('when a technician clocks on anywhere, then the wall screen’s stream hears who changed', async () => {
    const server = t.app.listen(0, '127.0.0.1');
    await new Promise<void>((resolve) => server.once('listening', resolve));
    const { port } = server.address() as { port: number };
    const { setCookie } = await pairWall(t, w.owner);
    const cookie = setCookie.find((c) => c.startsWith('keybed_wall='))!.split(';')[0]!;
    const stream = await openEventStream(`http://127.0.0.1:${port}/api/wall/events`, cookie);
    try {
      expect(stream.res.status).toBe(200);
      const { tasks } = await jobWithTasks(w.owner.agent, 1);
      later(600);
      await w.declan.agent.post('/api/time/clock-on').send({ taskId: tasks[0]!.id }).expect(201);
      let event = await stream.nextEvent(3000);
      while (event.kind !== 'time.changed') event = await stream.nextEvent(3000);
      expect(event.id).toBe(w.declan.userId);
      later(30);
      await w.declan.agent.post('/api/time/clock-off').send({}).expect(200);
    } finally {
      stream.close();
      server.closeAllConnections();
      await new Promise((resolve) => server.close(resolve));
    }
  });
});
