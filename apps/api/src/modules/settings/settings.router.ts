import { Router } from 'express';
import { CreateCostRateInput, IdParams, PutSettingsInput } from '@keybed/shared';
import { authOf, routesOn } from '../../http/context';
import { parse } from '../../http/parse';
import type { SettingsService } from './settings.service';

const OWNER = ['owner'] as const;

/** Workshop settings (every member reads what their role may see; the owner writes) and cost rates (owner). */
export function settingsRouter(service: SettingsService) {
  const router = Router();
  const r = routesOn(router);

  r.get('/settings', 'member', async (req, res) => {
    res.json(await service.read(authOf(req)));
  });

  r.put('/settings', OWNER, async (req, res) => {
    res.json(await service.put(authOf(req), parse(PutSettingsInput, req.body)));
  });

  r.get('/team/members/:id/cost-rates', OWNER, async (req, res) => {
    res.json(await service.costRates(authOf(req).workshopId, parse(IdParams, req.params).id));
  });

  r.post('/team/members/:id/cost-rates', OWNER, async (req, res) => {
    const { id } = parse(IdParams, req.params);
    res.status(201).json(await service.addCostRate(authOf(req), id, parse(CreateCostRateInput, req.body)));
  });

  return router;
}
