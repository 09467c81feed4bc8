import type { CreateStageInput, ReorderStagesInput, Stage, UpdateStageInput } from '@keybed/shared';
import { AppError, notFound } from '../../http/errors';
import { committed, notifyLive, type Changed } from '../../lib/live-events';
import type { Tx } from '../auth/auth.repo';
import type { StagesRepo } from './stages.repo';

interface Deps {
  repo: StagesRepo;
  now: () => Date;
  changed: Changed;
}

type StageRow = Awaited<ReturnType<StagesRepo['listWithCounts']>>[number];

const toStage = (s: StageRow): Stage => ({
  id: s.id,
  name: s.name,
  position: s.position,
  wipLimit: s.wipLimit,
  isArchived: s.archivedAt !== null,
  jobCount: s.jobCount,
});

const plural = (n: number, one: string, many: string) => `${n} ${n === 1 ? one : many}`;

export function createStagesService({ repo, now, changed }: Deps) {
  const write = <T>(workshopId: string, fn: (tx: Tx) => Promise<T>) => committed(changed, workshopId, repo.transaction(fn));
  const listIn = async (workshopId: string, q?: Tx) => (await repo.listWithCounts(workshopId, q)).map(toStage);
  const findIn = async (tx: Tx, workshopId: string, id: string) => (await listIn(workshopId, tx)).find((s) => s.id === id)!;

  /** Archiving needs an empty stage and leaves at least one active stage for new jobs. */
  async function archive(tx: Tx, stage: { id: string; name: string }, activeCount: number) {
    const onBoard = await repo.countOnBoard(tx, stage.id);
    if (onBoard > 0) {
      throw new AppError(
        'stage_not_empty',
        409,
        `${stage.name} still holds ${plural(onBoard, 'job', 'jobs')} on the board. Move ${onBoard === 1 ? 'it' : 'them'} to another stage before archiving it.`,
      );
    }
    if (activeCount <= 1) throw new AppError('conflict', 409, 'The board needs at least one active stage. Add another stage before archiving this one.');
  }

  return {
    list: (workshopId: string) => listIn(workshopId),

    create: (workshopId: string, input: CreateStageInput) =>
      write(workshopId, async (tx) => {
        const all = await repo.lockAll(tx, workshopId);
        const id = await repo.insert(tx, workshopId, { name: input.name, wipLimit: input.wipLimit ?? null }, all.length);
        await repo.renumber(tx, workshopId, id);
        await notifyLive(tx, workshopId, 'stage.changed', id, now());
        return findIn(tx, workshopId, id);
      }),

    /** Rename, set the WIP limit, archive (empty stages only) or restore (to the end of the board). */
    update: (workshopId: string, id: string, input: UpdateStageInput) =>
      write(workshopId, async (tx) => {
        const all = await repo.lockAll(tx, workshopId);
        const stage = all.find((s) => s.id === id);
        if (!stage) throw notFound('That stage');
        const isArchived = stage.archivedAt !== null;
        const isArchiving = input.isArchived === true && !isArchived;
        const isRestoring = input.isArchived === false && isArchived;
        if (isArchiving) await archive(tx, stage, all.filter((s) => s.archivedAt === null).length);
        const at = now();
        await repo.update(tx, id, {
          name: input.name,
          wipLimit: input.wipLimit,
          ...(isArchiving ? { archivedAt: at } : isRestoring ? { archivedAt: null } : {}),
        });
        if (isArchiving || isRestoring) await repo.renumber(tx, workshopId, id);
        await notifyLive(tx, workshopId, 'stage.changed', id, at);
        return findIn(tx, workshopId, id);
      }),

    /** The new order must list exactly the active stages; positions change in one transaction. */
    reorder: (workshopId: string, { stageIds }: ReorderStagesInput) =>
      write(workshopId, async (tx) => {
        const active = (await repo.lockAll(tx, workshopId)).filter((s) => s.archivedAt === null);
        const activeIds = new Set(active.map((s) => s.id));
        if (stageIds.length !== activeIds.size || stageIds.some((sid) => !activeIds.has(sid))) {
          throw new AppError('validation_failed', 400, 'The new order must list every active stage exactly once', {
            stageIds: [`List each of the ${activeIds.size} active stages once, and no other stage`],
          });
        }
        await repo.reorder(tx, workshopId, stageIds);
        await notifyLive(tx, workshopId, 'stages.reordered', workshopId, now());
        return listIn(workshopId, tx);
      }),
  };
}

export type StagesService = ReturnType<typeof createStagesService>;
