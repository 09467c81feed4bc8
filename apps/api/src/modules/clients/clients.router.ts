import { Router } from 'express';
import { ClientListQuery, CreateClientInput, IdParams, UpdateClientInput } from '@keybed/shared';
import { authOf, routesOn } from '../../http/context';
import { parse } from '../../http/parse';
import { BOARD_WRITERS } from '../../http/roles';
import type { ClientsService } from './clients.service';

export function clientsRouter(service: ClientsService) {
  const router = Router();
  const r = routesOn(router);

  r.get('/clients', 'member', async (req, res) => {
    res.json({ clients: await service.list(authOf(req).workshopId, parse(ClientListQuery, req.query)) });
  });

  r.post('/clients', BOARD_WRITERS, async (req, res) => {
    res.status(201).json(await service.create(authOf(req).workshopId, parse(CreateClientInput, req.body)));
  });

  r.get('/clients/:id', 'member', async (req, res) => {
    res.json(await service.get(authOf(req).workshopId, parse(IdParams, req.params).id));
  });

  r.patch('/clients/:id', BOARD_WRITERS, async (req, res) => {
    const { id } = parse(IdParams, req.params);
    res.json(await service.update(authOf(req).workshopId, id, parse(UpdateClientInput, req.body)));
  });

  return router;
}
