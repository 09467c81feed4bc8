import {
  averageUnitCostMinor,
  formatQuantityMilli,
  issueStock,
  issueStockAllowingShortfall,
  receiveStock,
  type CreateStockMovementInput,
  type PartsUsedCorrectionInput,
  type PartsUsedInput,
  type Role,
  type StockMovementKind,
  type StockMovementResult,
  type StockValue,
  type TaskPartsUsed,
  type WallPart,
  type WallPartsUsedInput,
} from '@keybed/shared';
import type { AuthContext, WallContext } from '../../http/context';
import { AppError, notFound } from '../../http/errors';
import { seesCosts } from '../../http/money-access';
import { notifyLive } from '../../lib/live-events';
import { constraintOf } from '../../lib/pg-errors';
import type { Tx } from '../auth/auth.repo';
import type { PinsService } from '../pins/pins.service';
import { toMovement, toPart } from './part-view';
import type { PartsRepo } from './parts.repo';

interface Deps {
  repo: PartsRepo;
  pins: PinsService;
  now: () => Date;
}

/** Who records a movement: a member, or a technician at the wall screen (identified by PIN). */
interface Actor {
  workshopId: string;
  userId: string;
  role: Role;
  isAtWall?: boolean;
}

/** What one movement does to stock: signed quantity, signed value, the unit cost to show. */
interface Change {
  kind: StockMovementKind;
  quantityMilli: number;
  valueMinor: number;
  unitCostMinor: number;
}

type LockedPart = NonNullable<Awaited<ReturnType<PartsRepo['lock']>>>;

const insufficient = (onHandMilli?: number) =>
  onHandMilli === undefined
    ? new AppError('insufficient_stock', 409, 'Not enough in stock for that')
    : new AppError('insufficient_stock', 409, `Not enough in stock: ${formatQuantityMilli(Math.max(0, onHandMilli))} on hand`, undefined, { onHandMilli });

/**
 * Stock movements and parts used on tasks. Every movement of a part holds the part's row lock
 * and reads the ledger's sums inside it, so on-hand is checked against every committed movement;
 * the database's trigger refuses a movement that would take stock below zero all the same.
 * Costs follow IAS 2's weighted average: a use takes value × used / on hand (shared stock-cost).
 */
export function createStockService({ repo, pins, now }: Deps) {
  /** Takes `quantityMilli` out of stock at the moving weighted average; refused when short unless allowed. */
  function issue(part: LockedPart, stock: StockValue, quantityMilli: number, kind: StockMovementKind): Change {
    if (!part.allowNegativeStock && quantityMilli > stock.quantityMilli) throw insufficient(stock.quantityMilli);
    const unitCostMinor = averageUnitCostMinor(stock) ?? part.unitCostMinor;
    const { costMinor } = part.allowNegativeStock ? issueStockAllowingShortfall(stock, quantityMilli, part.unitCostMinor) : issueStock(stock, quantityMilli);
    return { kind, quantityMilli: -quantityMilli, valueMinor: -costMinor, unitCostMinor };
  }

  /** Puts back what a task had of the part, at what it cost the task (its own weighted average). */
  function putBack(onTask: StockValue, quantityMilli: number, kind: StockMovementKind): Change {
    if (quantityMilli > onTask.quantityMilli) {
      const message = `Only ${formatQuantityMilli(Math.max(0, onTask.quantityMilli))} of this part is recorded on the task`;
      throw new AppError('conflict', 409, message, { quantityMilli: [message] });
    }
    const { costMinor } = issueStock(onTask, quantityMilli);
    return { kind, quantityMilli, valueMinor: costMinor, unitCostMinor: averageUnitCostMinor(onTask) ?? 0 };
  }

  /** Locks the part, works out the change from the current stock, writes the movement, tells the screens. */
  async function record(
    actor: Actor,
    partId: string,
    extra: { taskId?: string; jobId?: string; reason?: string | null },
    change: (tx: Tx, part: LockedPart, stock: StockValue) => Promise<Change>,
  ): Promise<StockMovementResult> {
    try {
      return await repo.transaction(async (tx) => {
        const part = await repo.lock(tx, actor.workshopId, partId);
        if (!part) throw new AppError('validation_failed', 400, 'There is no such part', { partId: ['There is no such part'] });
        const c = await change(tx, part, await repo.stock(tx, partId));
        const at = now();
        const id = await repo.insertMovement(tx, {
          workshopId: actor.workshopId,
          partId,
          ...c,
          taskId: extra.taskId ?? null,
          jobId: extra.jobId ?? null,
          reason: extra.reason?.trim() || null,
          byUserId: actor.userId,
          at,
        });
        await notifyLive(tx, actor.workshopId, 'part.changed', partId, at);
        if (extra.jobId) await notifyLive(tx, actor.workshopId, 'costing.changed', extra.jobId, at);
        return { movement: toMovement(actor.role, await repo.movement(id, tx)), part: toPart(actor.role, (await repo.find(actor.workshopId, partId, tx))!) };
      });
    } catch (err) {
      if (constraintOf(err) === 'stock_movements_on_hand_not_negative') throw insufficient();
      throw err;
    }
  }

  /** The task, checked for the actor: 404 when not in the workshop, 403 when a technician's it is not, 409 when its job is closed. */
  async function taskFor(actor: Actor, taskId: string) {
    const task = await repo.task(actor.workshopId, taskId, actor.role === 'technician' ? actor.userId : null);
    if (!task) throw notFound('That task');
    if (actor.isAtWall) {
      if (task.jobStatus !== 'active') throw new AppError('task_not_open', 409, 'That job is not active');
    } else if (actor.role === 'technician' && !task.isOwnTask) {
      throw new AppError('forbidden', 403, 'Technicians log parts on tasks assigned to them or that they have worked on');
    }
    if (task.jobStatus === 'cancelled') throw new AppError('task_not_open', 409, 'That job was cancelled');
    return task;
  }

  async function partsUsed(actor: Actor, taskId: string, input: PartsUsedInput) {
    const task = await taskFor(actor, taskId);
    return record(actor, input.partId, { taskId, jobId: task.jobId }, async (_tx, part, stock) => issue(part, stock, input.quantityMilli, 'used'));
  }

  return {
    /** A delivery received, parts returned from a task, or a stock-count adjustment (owner, foreman). */
    async movement(auth: AuthContext, partId: string, input: CreateStockMovementInput): Promise<StockMovementResult> {
      if (!(await repo.find(auth.workshopId, partId))) throw notFound('That part');
      const actor = { ...auth };
      if (input.kind === 'received') {
        return record(actor, partId, { reason: input.reason }, async (_tx, part, stock) => {
          const unitCostMinor = input.unitCostMinor ?? part.unitCostMinor;
          const after = receiveStock(stock, input.quantityMilli, unitCostMinor);
          return { kind: 'received', quantityMilli: input.quantityMilli, valueMinor: after.valueMinor - stock.valueMinor, unitCostMinor };
        });
      }
      if (input.kind === 'returned') {
        const task = await taskFor(actor, input.taskId);
        return record(actor, partId, { taskId: task.id, jobId: task.jobId, reason: input.reason }, async (tx) =>
          putBack(await repo.onTask(tx, task.id, partId), input.quantityMilli, 'returned'),
        );
      }
      return record(actor, partId, { reason: input.reason }, async (_tx, part, stock) => {
        if (input.quantityMilli < 0) return issue(part, stock, -input.quantityMilli, 'adjusted');
        const unitCostMinor = averageUnitCostMinor(stock) ?? part.unitCostMinor;
        const after = receiveStock(stock, input.quantityMilli, unitCostMinor);
        return { kind: 'adjusted', quantityMilli: input.quantityMilli, valueMinor: after.valueMinor - stock.valueMinor, unitCostMinor };
      });
    },

    /** Parts taken from stock for a task: technicians on their own tasks, the foreman and owner on any. */
    partsUsed: (auth: AuthContext, taskId: string, input: PartsUsedInput) => partsUsed(auth, taskId, input),

    /** The foreman or owner puts right a wrong record of parts used, with the reason, as an adjusting movement. */
    async correction(auth: AuthContext, taskId: string, input: PartsUsedCorrectionInput): Promise<StockMovementResult> {
      const task = await taskFor(auth, taskId);
      return record(auth, input.partId, { taskId, jobId: task.jobId, reason: input.reason }, async (tx, part, stock) =>
        input.quantityMilli > 0 ? issue(part, stock, input.quantityMilli, 'adjusted') : putBack(await repo.onTask(tx, taskId, input.partId), -input.quantityMilli, 'adjusted'),
      );
    },

    async taskPartsUsed(auth: AuthContext, taskId: string): Promise<TaskPartsUsed> {
      if (!(await repo.task(auth.workshopId, taskId, null))) throw notFound('That task');
      const [movements, totals] = await Promise.all([repo.movementsOfTask(auth.workshopId, taskId), repo.taskTotals(auth.workshopId, taskId)]);
      return {
        movements: movements.map((m) => toMovement(auth.role, m)),
        totals: [...totals].map((t) => ({
          partId: t.part_id,
          sku: t.sku,
          name: t.name,
          unit: t.unit,
          quantityMilli: Number(t.quantity),
          ...(seesCosts(auth.role) ? { costMinor: Number(t.cost) } : {}),
        })),
      };
    },

    /** The wall screen's picker: active parts, what is on hand and whether that is low, no money. */
    async wallParts(wall: WallContext): Promise<WallPart[]> {
      const rows = await repo.list(wall.workshopId, { include: 'active' });
      return rows.map((p) => {
        const onHandMilli = Number(p.onHandMilli);
        return { id: p.id, sku: p.sku, name: p.name, unit: p.unit, onHandMilli, isLowStock: onHandMilli <= p.reorderLevelMilli };
      });
    },

    /** A technician at the wall screen logs parts on an open task of an active job, confirming with their PIN. */
    async wallPartsUsed(wall: WallContext, input: WallPartsUsedInput): Promise<StockMovementResult> {
      const { technicianId, pin, taskId, ...used } = input;
      await pins.verifyAtWall(wall, technicianId, pin);
      return partsUsed({ workshopId: wall.workshopId, userId: technicianId, role: 'technician', isAtWall: true }, taskId, used);
    },
  };
}

export type StockService = ReturnType<typeof createStockService>;
