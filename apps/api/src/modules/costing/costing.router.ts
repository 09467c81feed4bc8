import { Router } from 'express';
import { CreateSubletBillInput, IdParams, MarginsQuery } from '@keybed/shared';
import { authOf, routesOn } from '../../http/context';
import { parse } from '../../http/parse';
import { marginsCsv } from './margins-csv';
import type { CostingService } from './costing.service';

const OWNER = ['owner'] as const;

/** Job costing (every member: money for the owner only), sublet bills and the margins report (owner). */
export function costingRouter(service: CostingService) {
  const router = Router();
  const r = routesOn(router);

  r.get('/jobs/:id/costing', 'member', async (req, res) => {
    res.json(await service.job(authOf(req), parse(IdParams, req.params).id));
  });

  r.get('/jobs/:id/sublet-bills', OWNER, async (req, res) => {
    res.json(await service.subletBills(authOf(req), parse(IdParams, req.params).id));
  });

  r.post('/jobs/:id/sublet-bills', OWNER, async (req, res) => {
    const { id } = parse(IdParams, req.params);
    res.status(201).json(await service.addSubletBill(authOf(req), id, parse(CreateSubletBillInput, req.body)));
  });

  r.get('/reports/margins', OWNER, async (req, res) => {
    const query = parse(MarginsQuery, req.query);
    const report = await service.margins(authOf(req), query);
    if (query.format === 'csv') {
      res.setHeader('Content-Type', 'text/csv; charset=utf-8');
      res.setHeader('Content-Disposition', `attachment; filename="margins-${report.from}-to-${report.to}.csv"`);
      res.send(marginsCsv(report));
      return;
    }
    res.json(report);
  });

  return router;
}
