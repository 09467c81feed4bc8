import http from 'node:http';
import type { AddressInfo } from 'node:net';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { Board } from '@keybed/shared';
import { createDatabase } from '@keybed/db/client';
import { createApp } from '../src/app';
import { createLiveEvents, notifyLive, type LiveSink } from '../src/lib/live-events';
import { createLogger } from '../src/lib/logger';
import { createEventsRepo } from '../src/modules/events/events.repo';
import { createSmtpMailer } from '../src/lib/mail';
import { activeStages, createClient, createJob } from './board-fixtures';
import { addMember, createTestApp, signUpWorkshop, type TestApp } from './helpers';
import { openEventStream } from './sse';

/** An app listening on a real port of 127.0.0.1, as a deployed process would. */
async function serve(app: http.RequestListener) {
  const server = http.createServer(app);
  await new Promise<void>((resolve) => server.listen(0, '127.0.0.1', resolve));
  const { port } = server.address() as AddressInfo;
  return {
    url: `http://127.0.0.1:${port}`,
    close: () =>
      new Promise<void>((resolve) => {
        server.closeAllConnections();
        server.close(() => resolve());
      }),
  };
}

/** A JSON request with the session cookie, over real HTTP. */
async function send(baseUrl: string, cookie: string, method: string, path: string, body?: unknown) {
  const res = await fetch(`${baseUrl}${path}`, { method, headers: { cookie, 'content-type': 'application/json' }, body: body === undefined ? undefined : JSON.stringify(body) });
  return { status: res.status, body: (await res.json()) as Record<string, unknown> };
}

// Process A is the test app; process B is a second app on the same database with its own pool and LISTEN connection.
let t: TestApp;
let second: ReturnType<typeof createDatabase>;
let appB: ReturnType<typeof createApp>;
let mailerB: ReturnType<typeof createSmtpMailer>;
let serverA: Awaited<ReturnType<typeof serve>>;
let serverB: Awaited<ReturnType<typeof serve>>;

beforeAll(async () => {
  t = await createTestApp();
  second = createDatabase(t.databaseUrl, { max: 5 });
  mailerB = createSmtpMailer(t.config.smtp);
  appB = createApp({ config: t.config, db: second.db, sql: second.sql, mailer: mailerB, logger: createLogger('silent') });
  serverA = await serve(t.app);
  serverB = await serve(appB);
});

afterAll(async () => {
  await appB.close();
  await serverB.close();
  await serverA.close();
  mailerB.close();
  await second.sql.end({ timeout: 5 });
  await t.close();
});

describe('GET /api/events', () => {
  it('when nobody is signed in, then 401 and no stream', async () => {
    const res = await fetch(`${serverA.url}/api/events`);
    expect(res.status).toBe(401);
    expect(res.headers.get('content-type')).toContain('application/json');
  });

  it('when a member connects, then the stream is text/event-stream, uncached, and starts with a retry hint', async () => {
    const { cookie } = await signUpWorkshop(t);
    const stream = await openEventStream(`${serverA.url}/api/events`, cookie);
    try {
      expect(stream.res.status).toBe(200);
      expect(stream.res.headers.get('content-type')).toBe('text/event-stream; charset=utf-8');
      expect(stream.res.headers.get('cache-control')).toBe('no-store');
      expect((await stream.nextFrame(1000, (f) => f.retry !== undefined)).retry).toBe(3000);
    } finally {
      stream.close();
    }
  });

  it('when a job is moved through process A, then an SSE client of process B hears it within a second, and another workshop’s client on B hears nothing of it', async () => {
    const fennick = await signUpWorkshop(t, 'fennick');
    const other = await signUpWorkshop(t, 'other');
    const [, stripDown] = await activeStages(fennick.agent);
    const job = await createJob(fennick.agent);

    const ours = await openEventStream(`${serverB.url}/api/events`, fennick.cookie);
    const theirs = await openEventStream(`${serverB.url}/api/events`, other.cookie);
    try {
      const moved = await send(serverA.url, fennick.cookie, 'POST', `/api/jobs/${job.id}/move`, { stageId: stripDown!.id, index: 0, version: job.version });
      expect(moved.status).toBe(200);
      const event = await ours.nextEvent(1000);
      expect(event).toMatchObject({ kind: 'job.moved', id: job.id });
      expect(Object.keys(event).sort()).toEqual(['at', 'id', 'kind']);

      // Events leave B's one listener in commit order, so the other workshop's first event being its
      // own change proves the move above was never sent to it.
      const client = await send(serverA.url, other.cookie, 'POST', '/api/clients', { name: 'Oscar Feld' });
      expect(await theirs.nextEvent(1000)).toMatchObject({ kind: 'client.changed', id: client.body.id });
      const again = await send(serverA.url, fennick.cookie, 'PATCH', `/api/jobs/${job.id}`, { version: job.version + 1, priority: 'urgent' });
      expect(again.status).toBe(200);
      expect(await ours.nextEvent(1000)).toMatchObject({ kind: 'job.updated', id: job.id });
    } finally {
      ours.close();
      theirs.close();
    }
  });

  it('when every kind of change is made, then the workshop’s streams on both processes hear each of them', async () => {
    const { agent, cookie, me } = await signUpWorkshop(t);
    const tech = await addMember(t, agent, 'technician');
    const techCookie = await signInCookie(tech.email);
    const onA = await openEventStream(`${serverA.url}/api/events`, techCookie);
    const onB = await openEventStream(`${serverB.url}/api/events`, cookie);
    try {
      const client = await createClient(agent);
      const piano = await send(serverB.url, cookie, 'POST', '/api/pianos', { clientId: client.id, maker: 'Osterholt', type: 'upright', sizeMm: 1260 });
      const job = await send(serverB.url, cookie, 'POST', '/api/jobs', { pianoId: piano.body.id, title: 'Rebush, new dampers, pitch raise' });
      const stage = await send(serverA.url, cookie, 'POST', '/api/stages', { name: 'Voicing' });
      const stageIds = (await activeStages(agent)).map((s) => s.id).reverse();
      await send(serverA.url, cookie, 'POST', '/api/stages/reorder', { stageIds });
      const expected = [
        { kind: 'client.changed', id: client.id },
        { kind: 'piano.changed', id: piano.body.id },
        { kind: 'job.created', id: job.body.id },
        { kind: 'stage.changed', id: stage.body.id },
        { kind: 'stages.reordered', id: me.workshop.id },
      ];
      for (const stream of [onA, onB]) {
        const heard = [];
        for (const _ of expected) heard.push(await stream.nextEvent(1000));
        expect(heard).toMatchObject(expected);
      }
    } finally {
      onA.close();
      onB.close();
    }
  });

  it('when a job is moved through process A, then process B’s board shows the move by the time B’s stream hears of it', async () => {
    const { agent, cookie } = await signUpWorkshop(t);
    const [intake, stripDown] = await activeStages(agent);
    const job = await createJob(agent, { stageId: intake!.id });
    const boardOnB = async () => Board.parse((await send(serverB.url, cookie, 'GET', '/api/board')).body);
    const stageOnB = async () => (await boardOnB()).stages.find((s) => s.jobs.some((j) => j.id === job.id))!.id;
    expect(await stageOnB()).toBe(intake!.id);
    expect(await stageOnB()).toBe(intake!.id);
    const stream = await openEventStream(`${serverB.url}/api/events`, cookie);
    try {
      await send(serverA.url, cookie, 'POST', `/api/jobs/${job.id}/move`, { stageId: stripDown!.id, index: 0, version: 1 });
      expect(await stream.nextEvent(1000)).toMatchObject({ kind: 'job.moved', id: job.id });
      expect(await stageOnB()).toBe(stripDown!.id);
    } finally {
      stream.close();
    }
  });

  it('when a write is refused and rolled back, then no event is sent for it', async () => {
    const { agent, cookie } = await signUpWorkshop(t);
    const [, stripDown] = await activeStages(agent);
    const job = await createJob(agent);
    const stream = await openEventStream(`${serverB.url}/api/events`, cookie);
    try {
      const stale = await send(serverA.url, cookie, 'POST', `/api/jobs/${job.id}/move`, { stageId: stripDown!.id, index: 0, version: job.version + 5 });
      expect(stale.status).toBe(409);
      const outOfRange = await send(serverA.url, cookie, 'POST', `/api/jobs/${job.id}/move`, { stageId: stripDown!.id, index: 3, version: job.version });
      expect(outOfRange.status).toBe(400);
      const client = await createClient(agent, { name: 'Ines Carvalho' });
      expect(await stream.nextEvent(1000)).toMatchObject({ kind: 'client.changed', id: client.id });
    } finally {
      stream.close();
    }
  });

  it('when the browser goes away, then the process forgets the stream; when the app closes, then open streams end', async () => {
    const { cookie } = await signUpWorkshop(t);
    const before = appB.liveStreamCount();
    const leaving = await openEventStream(`${serverB.url}/api/events`, cookie);
    await leaving.nextFrame(1000, (f) => f.retry !== undefined);
    expect(appB.liveStreamCount()).toBe(before + 1);
    leaving.close();
    await waitUntil(() => appB.liveStreamCount() === before);

    const third = createDatabase(t.databaseUrl, { max: 2 });
    const appC = createApp({ config: t.config, db: third.db, sql: third.sql, mailer: mailerB, logger: createLogger('silent') });
    const serverC = await serve(appC);
    const staying = await openEventStream(`${serverC.url}/api/events`, cookie);
    try {
      await staying.nextFrame(1000, (f) => f.retry !== undefined);
      await appC.close();
      expect(await staying.ended(1000)).toBe(true);
      expect(appC.liveStreamCount()).toBe(0);
    } finally {
      staying.close();
      await serverC.close();
      await third.sql.end({ timeout: 5 });
    }
  });
});

describe('live events hub', () => {
  it('when streams stay open, then each gets a heartbeat comment at the set interval, and only its workshop’s events', async () => {
    const hub = createLiveEvents({ sql: t.sql, logger: createLogger('silent'), heartbeatMs: 20 });
    const frames: { a: string[]; b: string[] } = { a: [], b: [] };
    const sink = (into: string[]): LiveSink => ({ write: (chunk) => into.push(chunk), end: () => undefined });
    try {
      await hub.ready();
      hub.subscribe('a7c1e0d2-0000-4000-8000-00000000000a', sink(frames.a));
      hub.subscribe('a7c1e0d2-0000-4000-8000-00000000000b', sink(frames.b));
      await t.db.transaction((tx) => notifyLive(tx, 'a7c1e0d2-0000-4000-8000-00000000000a', 'job.updated', 'job-1', new Date('2026-12-01T09:00:00Z')));
      await waitUntil(() => frames.a.some((f) => f.startsWith('data:')) && frames.b.filter((f) => f === ': heartbeat\n\n').length >= 2);
      expect(frames.a).toContain('data: {"kind":"job.updated","id":"job-1","at":"2026-12-01T09:00:00.000Z"}\n\n');
      expect(frames.a[0]).toBe('retry: 3000\n\n');
      expect(frames.b.some((f) => f.startsWith('data:'))).toBe(false);
    } finally {
      await hub.close();
    }
  });

  it('when the member signs out or is deactivated, then their stream ends at the next heartbeat; others stay open', async () => {
    const { agent: owner, cookie, me } = await signUpWorkshop(t);
    const tech = await addMember(t, owner, 'technician');
    const techCookie = await signInCookie(tech.email);
    const repo = createEventsRepo(t.db);
    const hub = createLiveEvents({ sql: t.sql, logger: createLogger('silent'), heartbeatMs: 20 });
    const ended = { owner: false, tech: false };
    const sink = (who: keyof typeof ended): LiveSink => ({ write: () => undefined, end: () => (ended[who] = true) });
    const sessionOf = (c: string) => c.slice('keybed_session='.length);
    try {
      await hub.ready();
      hub.subscribe(me.workshop.id, sink('owner'), { isStillAllowed: () => repo.isSessionLive(sessionOf(cookie), new Date()) });
      hub.subscribe(me.workshop.id, sink('tech'), { isStillAllowed: () => repo.isSessionLive(sessionOf(techCookie), new Date()) });
      const members = await owner.get('/api/team/members').expect(200);
      const techId = members.body.members.find((m: { email: string }) => m.email === tech.email).id;
      await owner.patch(`/api/team/members/${techId}`).send({ isActive: false }).expect(200);
      await waitUntil(() => ended.tech);
      expect(ended.owner).toBe(false);
      expect(hub.subscriberCount()).toBe(1);
      await fetch(`${serverA.url}/api/auth/sign-out`, { method: 'POST', headers: { cookie } });
      await waitUntil(() => ended.owner);
      expect(hub.subscriberCount()).toBe(0);
    } finally {
      await hub.close();
    }
  });
});

/** Waits for a condition that an asynchronous effect makes true; fails after two seconds. */
async function waitUntil(condition: () => boolean, timeoutMs = 2000) {
  const until = Date.now() + timeoutMs;
  while (!condition()) {
    if (Date.now() > until) throw new Error('Condition not met in time');
    await new Promise((r) => setTimeout(r, 10));
  }
}

async function signInCookie(email: string) {
  const res = await fetch(`${serverA.url}/api/auth/sign-in`, { method: 'POST', headers: { 'content-type': 'application/json' }, body: JSON.stringify({ email, password: 'member password 1' }) });
  expect(res.status).toBe(200);
  return res.headers.getSetCookie().map((c) => c.split(';')[0]!).find((c) => c.startsWith('keybed_session='))!;
}
