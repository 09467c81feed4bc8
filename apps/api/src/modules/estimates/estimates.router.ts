import { Router } from 'express';
import { AcceptEstimateInput, CreateEstimateInput, IdParams, UpdateEstimateInput } from '@keybed/shared';
import { authOf, routesOn } from '../../http/context';
import { parse } from '../../http/parse';
import { BOARD_WRITERS } from '../../http/roles';
import type { EstimatesService } from './estimates.service';

/**
 * A job's estimates. Every member reads them (prices for the owner and foreman, costs for the
 * owner, no money for technicians); the owner and foreman draft, issue, and record the client's
 * acceptance or refusal.
 */
export function estimatesRouter(service: EstimatesService) {
  const router = Router();
  const r = routesOn(router);

  r.get('/jobs/:id/estimates', 'member', async (req, res) => {
    res.json(await service.list(authOf(req), parse(IdParams, req.params).id));
  });

  r.post('/jobs/:id/estimates', BOARD_WRITERS, async (req, res) => {
    const { id } = parse(IdParams, req.params);
    res.status(201).json(await service.create(authOf(req), id, parse(CreateEstimateInput, req.body)));
  });

  r.get('/estimates/:id', 'member', async (req, res) => {
    res.json(await service.get(authOf(req), parse(IdParams, req.params).id));
  });

  r.patch('/estimates/:id', BOARD_WRITERS, async (req, res) => {
    const { id } = parse(IdParams, req.params);
    res.json(await service.update(authOf(req), id, parse(UpdateEstimateInput, req.body)));
  });

  r.post('/estimates/:id/issue', BOARD_WRITERS, async (req, res) => {
    res.json(await service.issue(authOf(req), parse(IdParams, req.params).id));
  });

  r.post('/estimates/:id/accept', BOARD_WRITERS, async (req, res) => {
    const { id } = parse(IdParams, req.params);
    res.json(await service.accept(authOf(req), id, parse(AcceptEstimateInput, req.body ?? {})));
  });

  r.post('/estimates/:id/decline', BOARD_WRITERS, async (req, res) => {
    res.json(await service.decline(authOf(req), parse(IdParams, req.params).id));
  });

  return router;
}
