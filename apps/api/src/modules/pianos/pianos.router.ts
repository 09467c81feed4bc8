import { Router } from 'express';
import { CreatePianoInput, IdParams, PianoListQuery, UpdatePianoInput } from '@keybed/shared';
import { authOf, routesOn } from '../../http/context';
import { parse } from '../../http/parse';
import { BOARD_WRITERS } from '../../http/roles';
import type { PianosService } from './pianos.service';

export function pianosRouter(service: PianosService) {
  const router = Router();
  const r = routesOn(router);

  r.get('/pianos', 'member', async (req, res) => {
    res.json({ pianos: await service.list(authOf(req).workshopId, parse(PianoListQuery, req.query)) });
  });

  r.post('/pianos', BOARD_WRITERS, async (req, res) => {
    res.status(201).json(await service.create(authOf(req).workshopId, parse(CreatePianoInput, req.body)));
  });

  r.get('/pianos/:id', 'member', async (req, res) => {
    res.json(await service.get(authOf(req).workshopId, parse(IdParams, req.params).id));
  });

  r.patch('/pianos/:id', BOARD_WRITERS, async (req, res) => {
    const { id } = parse(IdParams, req.params);
    res.json(await service.update(authOf(req).workshopId, id, parse(UpdatePianoInput, req.body)));
  });

  return router;
}
