import { Router } from 'express';
import { BoardQuery } from '@keybed/shared';
import { authOf, routesOn } from '../../http/context';
import { parse } from '../../http/parse';
import type { BoardService } from './board.service';

export function boardRouter(service: BoardService) {
  const router = Router();
  routesOn(router).get('/board', 'member', async (req, res) => {
    const board = await service.get(authOf(req).workshopId, parse(BoardQuery, req.query));
    // Browsers revalidate each time; an unchanged board answers 304 without a body.
    res.set({ 'Cache-Control': 'no-cache', ETag: board.etag }).type('json').send(board.bytes);
  });
  return router;
}
