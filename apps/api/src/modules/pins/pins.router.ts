import { Router } from 'express';
import { IdParams, SetMemberPinInput, SetOwnPinInput } from '@keybed/shared';
import { authOf, routesOn } from '../../http/context';
import { parse } from '../../http/parse';
import type { PinsService } from './pins.service';

const OWNER = ['owner'] as const;
const OWNER_OR_FOREMAN = ['owner', 'foreman'] as const;

/** The workshop's bench people and their wall-screen PINs: members set their own; the owner sets anyone's; owner or foreman unlock. */
export function pinsRouter(service: PinsService) {
  const router = Router();
  const r = routesOn(router);

  r.get('/technicians', 'member', async (req, res) => {
    res.json({ technicians: await service.technicians(authOf(req).workshopId) });
  });

  r.get('/me/pin', 'member', async (req, res) => {
    res.json(await service.ownStatus(authOf(req)));
  });

  r.put('/me/pin', 'member', async (req, res) => {
    await service.setOwn(authOf(req), parse(SetOwnPinInput, req.body));
    res.status(204).end();
  });

  r.get('/team/members/:id/pin', OWNER_OR_FOREMAN, async (req, res) => {
    res.json(await service.memberStatus(authOf(req).workshopId, parse(IdParams, req.params).id));
  });

  r.put('/team/members/:id/pin', OWNER, async (req, res) => {
    const { id } = parse(IdParams, req.params);
    await service.setForMember(authOf(req), id, parse(SetMemberPinInput, req.body));
    res.status(204).end();
  });

  r.post('/team/members/:id/unlock-pin', OWNER_OR_FOREMAN, async (req, res) => {
    res.json(await service.unlock(authOf(req), parse(IdParams, req.params).id));
  });

  return router;
}
