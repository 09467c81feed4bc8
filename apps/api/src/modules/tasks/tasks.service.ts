import type { CreateTaskInput, Task, TasksFromTemplateInput, TasksFromTemplateResult, UpdateTaskInput } from '@keybed/shared';
import type { AuthContext } from '../../http/context';
import { AppError, notFound } from '../../http/errors';
import { notifyLive } from '../../lib/live-events';
import type { Tx } from '../auth/auth.repo';
import type { TaskTemplatesRepo } from './task-templates.repo';
import type { TaskRow, TasksRepo } from './tasks.repo';

interface Deps {
  repo: TasksRepo;
  templates: TaskTemplatesRepo;
  now: () => Date;
  /** Told after each committed write: assignees and status show on the board's cards. */
  changed?: (workshopId: string) => void;
}

export const toTask = (t: TaskRow): Task => ({
  id: t.id,
  jobId: t.jobId,
  stage: t.stage,
  title: t.title,
  status: t.status,
  estimatedMinutes: t.estimatedMinutes,
  loggedMinutes: Number(t.loggedMinutes),
  position: t.position,
  version: t.version,
  assignees: t.assignees,
  createdAt: t.createdAt.toISOString(),
  updatedAt: t.updatedAt.toISOString(),
});

const taskNotFound = () => notFound('That task');
const jobNotFound = () => notFound('That job');
const fieldError = (field: string, message: string) => new AppError('validation_failed', 400, message, { [field]: [message] });

export function createTasksService({ repo, templates, now, changed = () => {} }: Deps) {
  /** Runs a write transaction, then reports the workshop changed (only if it committed). */
  async function afterCommit<T>(workshopId: string, write: (tx: Tx) => Promise<T>): Promise<T> {
    const result = await repo.transaction(write);
    changed(workshopId);
    return result;
  }

  async function current(q: Tx, workshopId: string, id: string) {
    return toTask((await repo.find(workshopId, id, now(), q))!);
  }

  /** Unknown stage: 400 on `stageId`; another workshop's: 404. */
  async function checkStage(tx: Tx, workshopId: string, stageId: string) {
    const stage = await repo.findStage(tx, stageId);
    if (!stage) throw fieldError('stageId', 'There is no such stage');
    if (stage.workshopId !== workshopId) throw notFound('That stage');
  }

  async function checkAssignees(tx: Tx, workshopId: string, userIds: string[]) {
    const members = await repo.activeMemberIds(tx, workshopId, userIds);
    if (userIds.some((id) => !members.has(id))) throw fieldError('assigneeIds', 'Assign only active members of this workshop');
  }

  /** Technicians may mark the status of tasks they are assigned to, and change nothing else. */
  async function checkTechnicianEdit(tx: Tx, auth: AuthContext, id: string, input: UpdateTaskInput) {
    if (auth.role !== 'technician') return;
    const { version: _version, status, ...others } = input;
    const isStatusOnly = status !== undefined && Object.values(others).every((v) => v === undefined);
    if (!isStatusOnly || !(await repo.isAssigned(tx, id, auth.userId))) {
      throw new AppError('forbidden', 403, 'Technicians can change only the status of tasks assigned to them');
    }
  }

  return {
    async list(workshopId: string, jobId: string) {
      if (!(await repo.jobExists(workshopId, jobId))) throw jobNotFound();
      return (await repo.listForJob(workshopId, jobId, now())).map(toTask);
    },

    /** A new task at the end of the job's list. */
    create: (auth: AuthContext, jobId: string, input: CreateTaskInput) =>
      afterCommit(auth.workshopId, async (tx) => {
        const { workshopId } = auth;
        if (!(await repo.lockJob(tx, workshopId, jobId))) throw jobNotFound();
        if (input.stageId) await checkStage(tx, workshopId, input.stageId);
        const assigneeIds = input.assigneeIds ?? [];
        await checkAssignees(tx, workshopId, assigneeIds);
        const at = now();
        const id = await repo.insert(tx, {
          workshopId,
          jobId,
          stageId: input.stageId ?? null,
          title: input.title,
          estimatedMinutes: input.estimatedMinutes ?? null,
          position: (await repo.orderedIds(tx, jobId)).length,
          createdBy: auth.userId,
          createdAt: at,
          updatedAt: at,
        });
        await repo.setAssignees(tx, workshopId, id, assigneeIds);
        await notifyLive(tx, workshopId, 'task.changed', jobId, at);
        return current(tx, workshopId, id);
      }),

    /**
     * Title, stage, assignees, estimate, status and place in the list. Edits carry the version they
     * were based on. A task someone is clocked on to cannot be marked done until they clock off.
     */
    update: (auth: AuthContext, id: string, input: UpdateTaskInput) =>
      afterCommit(auth.workshopId, async (tx) => {
        const { workshopId } = auth;
        const jobId = await repo.peekJob(tx, workshopId, id);
        if (!jobId) throw taskNotFound();
        await repo.lockJob(tx, workshopId, jobId);
        const task = (await repo.lock(tx, workshopId, id))!;
        await checkTechnicianEdit(tx, auth, id, input);
        if (task.version !== input.version) {
          throw new AppError('version_conflict', 409, 'Someone changed this task since you loaded it. Check its current state and try again.', undefined, {
            current: await current(tx, workshopId, id),
          });
        }
        if (input.stageId) await checkStage(tx, workshopId, input.stageId);
        if (input.assigneeIds) await checkAssignees(tx, workshopId, input.assigneeIds);
        if (input.status === 'done' && task.status !== 'done') {
          const running = await repo.runningOn(tx, id);
          if (running.length > 0) {
            throw new AppError('conflict', 409, `${running.join(' and ')} ${running.length > 1 ? 'are' : 'is'} clocked on to this task. Clock off before marking it done.`);
          }
        }
        const at = now();
        const { version: _version, assigneeIds, position, ...changes } = input;
        await repo.bump(tx, id, changes, at);
        if (assigneeIds) await repo.setAssignees(tx, workshopId, id, assigneeIds);
        if (position !== undefined && position !== task.position) {
          const ids = (await repo.orderedIds(tx, jobId)).filter((x) => x !== id);
          if (position > ids.length) throw fieldError('position', `Position must be between 0 and ${ids.length}`);
          ids.splice(position, 0, id);
          await repo.renumber(tx, jobId, ids);
        }
        await notifyLive(tx, workshopId, 'task.changed', jobId, at);
        return current(tx, workshopId, id);
      }),

    /** Adds the stage template's tasks the job does not already have in that stage, at the end. */
    addFromTemplate: (auth: AuthContext, jobId: string, input: TasksFromTemplateInput): Promise<TasksFromTemplateResult> =>
      afterCommit(auth.workshopId, async (tx) => {
        const { workshopId } = auth;
        if (!(await repo.lockJob(tx, workshopId, jobId))) throw jobNotFound();
        await checkStage(tx, workshopId, input.stageId);
        const items = await templates.items(workshopId, input.stageId, tx);
        if (items.length === 0) throw new AppError('not_found', 404, 'This stage has no task template yet. Add one under the stage first.');
        const present = await repo.titlesInStage(tx, jobId, input.stageId);
        const missing = items.filter((i) => !present.has(i.title.toLowerCase()));
        const start = (await repo.orderedIds(tx, jobId)).length;
        const at = now();
        const ids = await repo.insertMany(
          tx,
          missing.map((item, i) => ({
            workshopId,
            jobId,
            stageId: input.stageId,
            title: item.title,
            estimatedMinutes: item.estimatedMinutes,
            position: start + i,
            createdBy: auth.userId,
            createdAt: at,
            updatedAt: at,
          })),
        );
        if (ids.length > 0) await notifyLive(tx, workshopId, 'task.changed', jobId, at);
        const created = await repo.findMany(workshopId, ids, at, tx);
        return { tasks: created.map(toTask), skippedTitles: items.filter((i) => present.has(i.title.toLowerCase())).map((i) => i.title) };
      }),
  };
}

export type TasksService = ReturnType<typeof createTasksService>;
