import { Router } from 'express';
import { CreateJobInput, IdParams, JobListQuery, MoveJobInput, UpdateJobInput } from '@keybed/shared';
import { authOf, routesOn } from '../../http/context';
import { parse } from '../../http/parse';
import { BOARD_WRITERS } from '../../http/roles';
import type { JobsService } from './jobs.service';

export function jobsRouter(service: JobsService) {
  const router = Router();
  const r = routesOn(router);

  r.get('/jobs', 'member', async (req, res) => {
    res.json({ jobs: await service.list(authOf(req).workshopId, parse(JobListQuery, req.query)) });
  });

  r.post('/jobs', BOARD_WRITERS, async (req, res) => {
    res.status(201).json(await service.create(authOf(req), parse(CreateJobInput, req.body)));
  });

  r.get('/jobs/:id', 'member', async (req, res) => {
    res.json(await service.get(authOf(req).workshopId, parse(IdParams, req.params).id));
  });

  r.patch('/jobs/:id', BOARD_WRITERS, async (req, res) => {
    const { id } = parse(IdParams, req.params);
    res.json(await service.update(authOf(req).workshopId, id, parse(UpdateJobInput, req.body)));
  });

  r.post('/jobs/:id/move', BOARD_WRITERS, async (req, res) => {
    const { id } = parse(IdParams, req.params);
    res.json({ job: await service.move(authOf(req), id, parse(MoveJobInput, req.body)) });
  });

  return router;
}
