import { Router } from 'express';
import { CatalogueListQuery, CreateCatalogueOperationInput, IdParams, UpdateCatalogueOperationInput } from '@keybed/shared';
import { authOf, routesOn } from '../../http/context';
import { parse } from '../../http/parse';
import { BOARD_WRITERS } from '../../http/roles';
import type { CatalogueService } from './catalogue.service';

/** The work catalogue: every member reads it (money as the role may see), the owner and foreman keep it. */
export function catalogueRouter(service: CatalogueService) {
  const router = Router();
  const r = routesOn(router);

  r.get('/catalogue', 'member', async (req, res) => {
    res.json(await service.list(authOf(req), parse(CatalogueListQuery, req.query)));
  });

  r.post('/catalogue', BOARD_WRITERS, async (req, res) => {
    res.status(201).json(await service.create(authOf(req), parse(CreateCatalogueOperationInput, req.body)));
  });

  r.patch('/catalogue/:id', BOARD_WRITERS, async (req, res) => {
    const { id } = parse(IdParams, req.params);
    res.json(await service.update(authOf(req), id, parse(UpdateCatalogueOperationInput, req.body)));
  });

  return router;
}
