import { Router } from 'express';
import { IdParams, PairWallInput, VerifyPinInput, WallClockOffInput, WallClockOnInput } from '@keybed/shared';
import { authOf, routesOn, wallOf } from '../../http/context';
import { AppError } from '../../http/errors';
import { parse } from '../../http/parse';
import { clearSessionCookie } from '../../http/session';
import type { LiveEvents } from '../../lib/live-events';
import type { SessionStore } from '../../lib/sessions';
import { clearWallCookie, readWallCookie, setWallCookie } from './device-session';
import type { WallService } from './wall.service';

const PAIRERS = ['owner', 'foreman'] as const;

export function wallRouter(service: WallService, sessions: SessionStore, live: LiveEvents) {
  const router = Router();
  const r = routesOn(router);

  /**
   * Turns this browser into a wall screen: it gets the device cookie, and the member who paired it
   * is signed out here, so the screen on the wall carries no member's powers.
   */
  r.post('/wall/pair', PAIRERS, async (req, res) => {
    const auth = authOf(req);
    const { token, pairing } = await service.pair(auth, parse(PairWallInput, req.body));
    await sessions.end(auth.sessionId);
    clearSessionCookie(req, res);
    setWallCookie(req, res, token);
    res.status(201).json(pairing);
  });

  r.get('/wall/devices', PAIRERS, async (req, res) => {
    res.json({ devices: await service.devices(authOf(req).workshopId) });
  });

  r.delete('/wall/devices/:id', PAIRERS, async (req, res) => {
    await service.revoke(authOf(req), parse(IdParams, req.params).id);
    res.status(204).end();
  });

  /** Which workshop this screen belongs to; also renews the device cookie's lifetime. */
  r.get('/wall/session', 'wall', async (req, res) => {
    const token = readWallCookie(req.headers.cookie);
    if (token) setWallCookie(req, res, token);
    res.json(await service.session(wallOf(req)));
  });

  /** The screen forgets its pairing (the device stays listed until revoked). */
  r.post('/wall/forget', 'public', async (req, res) => {
    clearWallCookie(req, res);
    res.status(204).end();
  });

  r.get('/wall/technicians', 'wall', async (req, res) => {
    res.json({ technicians: await service.technicians(wallOf(req)) });
  });

  r.get('/wall/running', 'wall', async (req, res) => {
    res.json({ running: await service.running(wallOf(req)) });
  });

  r.post('/wall/technicians/:id/verify-pin', 'wall', async (req, res) => {
    const { id } = parse(IdParams, req.params);
    res.json(await service.verifyPin(wallOf(req), id, parse(VerifyPinInput, req.body).pin));
  });

  r.post('/wall/clock-on', 'wall', async (req, res) => {
    const { result, isNew } = await service.clockOn(wallOf(req), parse(WallClockOnInput, req.body));
    res.status(isNew ? 201 : 200).json(result);
  });

  r.post('/wall/clock-off', 'wall', async (req, res) => {
    res.json((await service.clockOff(wallOf(req), parse(WallClockOffInput, req.body))).result);
  });

  /** The workshop's live events for the screen ("who is working on what" updates). */
  r.get('/wall/events', 'wall', async (req, res) => {
    const { workshopId } = wallOf(req);
    await live.ready().catch(() => {
      throw new AppError('service_unavailable', 503, 'Live updates are not available right now. The screen retries by itself.');
    });
    res.writeHead(200, { 'Content-Type': 'text/event-stream; charset=utf-8', 'Cache-Control': 'no-store', Connection: 'keep-alive', 'X-Accel-Buffering': 'no' });
    const stop = live.subscribe(workshopId, res);
    res.on('close', stop);
  });

  return router;
}
