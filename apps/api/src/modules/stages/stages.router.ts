import { Router } from 'express';
import { CreateStageInput, IdParams, ReorderStagesInput, UpdateStageInput } from '@keybed/shared';
import { authOf, routesOn } from '../../http/context';
import { parse } from '../../http/parse';
import { BOARD_WRITERS } from '../../http/roles';
import type { StagesService } from './stages.service';

export function stagesRouter(service: StagesService) {
  const router = Router();
  const r = routesOn(router);

  r.get('/stages', 'member', async (req, res) => {
    res.json({ stages: await service.list(authOf(req).workshopId) });
  });

  r.post('/stages', BOARD_WRITERS, async (req, res) => {
    res.status(201).json(await service.create(authOf(req).workshopId, parse(CreateStageInput, req.body)));
  });

  r.post('/stages/reorder', BOARD_WRITERS, async (req, res) => {
    res.json({ stages: await service.reorder(authOf(req).workshopId, parse(ReorderStagesInput, req.body)) });
  });

  r.patch('/stages/:id', BOARD_WRITERS, async (req, res) => {
    const { id } = parse(IdParams, req.params);
    res.json(await service.update(authOf(req).workshopId, id, parse(UpdateStageInput, req.body)));
  });

  return router;
}
