import { Router } from 'express';
import { CreateTaskInput, IdParams, PutTaskTemplateInput, TasksFromTemplateInput, UpdateTaskInput } from '@keybed/shared';
import { authOf, routesOn } from '../../http/context';
import { parse } from '../../http/parse';
import { BOARD_WRITERS } from '../../http/roles';
import type { TaskTemplatesService } from './task-templates.service';
import type { TasksService } from './tasks.service';

/**
 * Tasks on a job and task templates per stage. Every member reads them; the owner and foreman
 * write them; a technician may change the status of a task assigned to them.
 */
export function tasksRouter(service: TasksService, templates: TaskTemplatesService) {
  const router = Router();
  const r = routesOn(router);

  r.get('/jobs/:id/tasks', 'member', async (req, res) => {
    res.json({ tasks: await service.list(authOf(req).workshopId, parse(IdParams, req.params).id) });
  });

  r.post('/jobs/:id/tasks', BOARD_WRITERS, async (req, res) => {
    const { id } = parse(IdParams, req.params);
    res.status(201).json(await service.create(authOf(req), id, parse(CreateTaskInput, req.body)));
  });

  r.post('/jobs/:id/tasks/from-template', BOARD_WRITERS, async (req, res) => {
    const { id } = parse(IdParams, req.params);
    res.status(201).json(await service.addFromTemplate(authOf(req), id, parse(TasksFromTemplateInput, req.body)));
  });

  r.patch('/tasks/:id', 'member', async (req, res) => {
    const { id } = parse(IdParams, req.params);
    res.json(await service.update(authOf(req), id, parse(UpdateTaskInput, req.body)));
  });

  r.get('/stages/:id/task-template', 'member', async (req, res) => {
    res.json(await templates.get(authOf(req).workshopId, parse(IdParams, req.params).id));
  });

  r.put('/stages/:id/task-template', BOARD_WRITERS, async (req, res) => {
    const { id } = parse(IdParams, req.params);
    res.json(await templates.put(authOf(req).workshopId, id, parse(PutTaskTemplateInput, req.body)));
  });

  r.delete('/stages/:id/task-template', BOARD_WRITERS, async (req, res) => {
    await templates.remove(authOf(req).workshopId, parse(IdParams, req.params).id);
    res.status(204).end();
  });

  return router;
}
