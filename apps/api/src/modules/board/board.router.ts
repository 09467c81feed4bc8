import { Router } from 'express';
import { BoardQuery } from '@keybed/shared';
import { authOf, routesOn } from '../../http/context';
import { parse } from '../../http/parse';
import type { BoardService } from './board.service';

export function boardRouter(service: BoardService) {
  const router = Router();
  routesOn(router).get('/board', 'member', async (req, res) => {
    res.json(await service.get(authOf(req).workshopId, parse(BoardQuery, req.query)));
  });
  return router;
}
