import { Router } from 'express';
import {
  CreatePartInput,
  CreateStockMovementInput,
  IdParams,
  PartListQuery,
  PartsUsedCorrectionInput,
  PartsUsedInput,
  UpdatePartInput,
  WallPartsUsedInput,
} from '@keybed/shared';
import { authOf, routesOn, wallOf } from '../../http/context';
import { parse } from '../../http/parse';
import { BOARD_WRITERS } from '../../http/roles';
import type { PartsService } from './parts.service';
import type { StockService } from './stock.service';

const OWNER = ['owner'] as const;

/**
 * Parts and stock. Every member reads the catalogue (money as their role allows); the owner keeps
 * it; the owner and foreman record deliveries, returns, adjustments and corrections; technicians
 * log parts used on their tasks, here or at the wall screen.
 */
export function partsRouter(parts: PartsService, stock: StockService) {
  const router = Router();
  const r = routesOn(router);

  r.get('/parts', 'member', async (req, res) => {
    res.json(await parts.list(authOf(req), parse(PartListQuery, req.query)));
  });

  r.post('/parts', OWNER, async (req, res) => {
    res.status(201).json(await parts.create(authOf(req), parse(CreatePartInput, req.body)));
  });

  r.get('/parts/:id', 'member', async (req, res) => {
    res.json(await parts.get(authOf(req), parse(IdParams, req.params).id));
  });

  r.patch('/parts/:id', OWNER, async (req, res) => {
    const { id } = parse(IdParams, req.params);
    res.json(await parts.update(authOf(req), id, parse(UpdatePartInput, req.body)));
  });

  r.post('/parts/:id/movements', BOARD_WRITERS, async (req, res) => {
    const { id } = parse(IdParams, req.params);
    res.status(201).json(await stock.movement(authOf(req), id, parse(CreateStockMovementInput, req.body)));
  });

  r.get('/tasks/:id/parts-used', 'member', async (req, res) => {
    res.json(await stock.taskPartsUsed(authOf(req), parse(IdParams, req.params).id));
  });

  r.post('/tasks/:id/parts-used', 'member', async (req, res) => {
    const { id } = parse(IdParams, req.params);
    res.status(201).json(await stock.partsUsed(authOf(req), id, parse(PartsUsedInput, req.body)));
  });

  r.post('/tasks/:id/parts-used/corrections', BOARD_WRITERS, async (req, res) => {
    const { id } = parse(IdParams, req.params);
    res.status(201).json(await stock.correction(authOf(req), id, parse(PartsUsedCorrectionInput, req.body)));
  });

  r.get('/wall/parts', 'wall', async (req, res) => {
    res.json({ parts: await stock.wallParts(wallOf(req)) });
  });

  r.post('/wall/parts-used', 'wall', async (req, res) => {
    res.status(201).json(await stock.wallPartsUsed(wallOf(req), parse(WallPartsUsedInput, req.body)));
  });

  return router;
}
