import type { CreatePartInput, Part, PartDetail, PartList, PartListQuery, UpdatePartInput } from '@keybed/shared';
import type { AuthContext } from '../../http/context';
import { AppError, notFound } from '../../http/errors';
import { notifyLive } from '../../lib/live-events';
import { constraintOf, isUniqueViolation } from '../../lib/pg-errors';
import type { Tx } from '../auth/auth.repo';
import { toMovement, toPart } from './part-view';
import type { PartsRepo } from './parts.repo';

interface Deps {
  repo: PartsRepo;
  now: () => Date;
}

const skuTaken = () => new AppError('conflict', 409, 'Another part already has this SKU', { sku: ['Another part already has this SKU'] });

/** The parts catalogue: the owner keeps it (it holds costs); everyone reads what their role may see. */
export function createPartsService({ repo, now }: Deps) {
  /** Runs a write that may break the SKU's uniqueness and answers 409 on the field if it does. */
  async function writing<T>(write: (tx: Tx) => Promise<T>): Promise<T> {
    try {
      return await repo.transaction(write);
    } catch (err) {
      if (isUniqueViolation(err) && constraintOf(err) === 'parts_sku_per_workshop') throw skuTaken();
      throw err;
    }
  }

  return {
    async list(auth: AuthContext, query: PartListQuery): Promise<PartList> {
      const rows = await repo.list(auth.workshopId, query);
      const list = rows.map((p) => toPart(auth.role, p));
      return { parts: list, lowStockCount: list.filter((p) => p.isLowStock && p.isActive).length };
    },

    async get(auth: AuthContext, id: string): Promise<PartDetail> {
      const part = await repo.find(auth.workshopId, id);
      if (!part) throw notFound('That part');
      const movements = await repo.movementsOfPart(auth.workshopId, id, 200);
      return { ...toPart(auth.role, part), movements: movements.map((m) => toMovement(auth.role, m)) };
    },

    create: (auth: AuthContext, input: CreatePartInput): Promise<Part> =>
      writing(async (tx) => {
        const at = now();
        const id = await repo.insert(tx, {
          ...input,
          workshopId: auth.workshopId,
          sellPriceMinor: input.sellPriceMinor ?? null,
          markupBasisPoints: input.sellPriceMinor != null ? null : (input.markupBasisPoints ?? null),
          createdAt: at,
          updatedAt: at,
        });
        await notifyLive(tx, auth.workshopId, 'part.changed', id, at);
        return toPart(auth.role, (await repo.find(auth.workshopId, id, tx))!);
      }),

    /** Setting a sell price clears the markup and the other way round; a part keeps one of them. */
    update: (auth: AuthContext, id: string, input: UpdatePartInput): Promise<Part> =>
      writing(async (tx) => {
        const current = await repo.lock(tx, auth.workshopId, id);
        if (!current) throw notFound('That part');
        const pricing = {
          sellPriceMinor: input.sellPriceMinor !== undefined ? input.sellPriceMinor : input.markupBasisPoints != null ? null : current.sellPriceMinor,
          markupBasisPoints: input.markupBasisPoints !== undefined ? input.markupBasisPoints : input.sellPriceMinor != null ? null : current.markupBasisPoints,
        };
        if (pricing.sellPriceMinor === null && pricing.markupBasisPoints === null) {
          throw new AppError('validation_failed', 400, 'Give a sell price or a markup', { sellPriceMinor: ['Give a sell price or a markup'] });
        }
        const at = now();
        await repo.update(tx, id, { ...input, ...pricing, updatedAt: at });
        await notifyLive(tx, auth.workshopId, 'part.changed', id, at);
        return toPart(auth.role, (await repo.find(auth.workshopId, id, tx))!);
      }),
  };
}

export type PartsService = ReturnType<typeof createPartsService>;
