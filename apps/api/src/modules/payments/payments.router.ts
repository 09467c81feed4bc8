import express, { Router } from 'express';
import { IdParams } from '@keybed/shared';
import { authOf, routesOn } from '../../http/context';
import { notFound } from '../../http/errors';
import { parse } from '../../http/parse';
import { BOARD_WRITERS } from '../../http/roles';
import type { PaymentsService } from './payments.service';

/**
 * The card provider's events. Mounted before the JSON body parser: the signature covers the exact
 * bytes sent, so the body is read raw and verified before it is parsed.
 */
export function paymentsWebhookRouter(service: PaymentsService) {
  const router = Router();
  routesOn(router).post('/webhooks/payments', 'public', express.raw({ type: '*/*', limit: '256kb' }), async (req, res) => {
    const body = Buffer.isBuffer(req.body) ? req.body : Buffer.alloc(0);
    res.json(await service.receive(body, req.get('stripe-signature')));
  });
  return router;
}

/** Money received on a job (owner and foreman), until costing shows it beside the costs. */
export function paymentsRouter(service: PaymentsService, jobExists: (workshopId: string, jobId: string) => Promise<boolean>) {
  const router = Router();
  routesOn(router).get('/jobs/:id/payments', BOARD_WRITERS, async (req, res) => {
    const { workshopId } = authOf(req);
    const { id } = parse(IdParams, req.params);
    if (!(await jobExists(workshopId, id))) throw notFound('That job');
    res.json(await service.listForJob(workshopId, id));
  });
  return router;
}
