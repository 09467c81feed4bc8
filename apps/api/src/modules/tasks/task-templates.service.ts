import type { PutTaskTemplateInput, TaskTemplate } from '@keybed/shared';
import { notFound } from '../../http/errors';
import type { Tx } from '../auth/auth.repo';
import type { TaskTemplatesRepo } from './task-templates.repo';

interface Deps {
  repo: TaskTemplatesRepo;
  now: () => Date;
}

const stageNotFound = () => notFound('That stage');

export function createTaskTemplatesService({ repo, now }: Deps) {
  async function ourStage(workshopId: string, stageId: string, q?: Tx) {
    const stage = await repo.findStage(stageId, q);
    if (!stage || stage.workshopId !== workshopId) throw stageNotFound();
    return stage;
  }

  async function view(workshopId: string, stage: { id: string; name: string }, q?: Tx): Promise<TaskTemplate> {
    const template = await repo.findTemplate(workshopId, stage.id, q);
    const items = await repo.items(workshopId, stage.id, q);
    return { stage: { id: stage.id, name: stage.name }, items, updatedAt: template?.updatedAt.toISOString() ?? null };
  }

  return {
    /** The stage's template; a stage without one answers an empty list. */
    async get(workshopId: string, stageId: string) {
      return view(workshopId, await ourStage(workshopId, stageId));
    },

    /** Replaces the stage's template items with the given list, in order. */
    put: (workshopId: string, stageId: string, input: PutTaskTemplateInput) =>
      repo.transaction(async (tx) => {
        const stage = await ourStage(workshopId, stageId, tx);
        const templateId = await repo.upsertTemplate(tx, workshopId, stageId, now());
        await repo.replaceItems(tx, workshopId, templateId, input.items.map((i) => ({ title: i.title, estimatedMinutes: i.estimatedMinutes ?? null })));
        return view(workshopId, stage, tx);
      }),

    async remove(workshopId: string, stageId: string) {
      await ourStage(workshopId, stageId);
      if (!(await repo.deleteTemplate(workshopId, stageId))) throw notFound('That stage’s task template');
    },
  };
}

export type TaskTemplatesService = ReturnType<typeof createTaskTemplatesService>;
