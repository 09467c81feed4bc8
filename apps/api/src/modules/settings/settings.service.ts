import { localDayKey, rateInForce, type CostRateList, type CreateCostRateInput, type PutSettingsInput, type Role, type WorkshopSettings } from '@keybed/shared';
import type { AuthContext } from '../../http/context';
import { AppError, notFound } from '../../http/errors';
import { seesCosts, seesPrices } from '../../http/money-access';
import { notifyLive } from '../../lib/live-events';
import { isUniqueViolation } from '../../lib/pg-errors';
import type { SettingsRepo, SettingsRow } from './settings.repo';

interface Deps {
  repo: SettingsRepo;
  now: () => Date;
}

/** The settings as the role may see them: the foreman no target margin, technicians no money. */
export function settingsFor(role: Role, s: SettingsRow): WorkshopSettings {
  const { taxRateBasisPoints, labourRateMinorPerHour, targetMarginBasisPoints, ...open } = s;
  return {
    ...open,
    workingWeekdays: [...open.workingWeekdays].sort(),
    ...(seesPrices(role) ? { taxRateBasisPoints, labourRateMinorPerHour } : {}),
    ...(seesCosts(role) ? { targetMarginBasisPoints } : {}),
  };
}

export function createSettingsService({ repo, now }: Deps) {
  async function costRates(workshopId: string, membershipId: string): Promise<CostRateList> {
    const member = await repo.member(workshopId, membershipId);
    if (!member) throw notFound('That member');
    const [rates, settings] = await Promise.all([repo.rates(workshopId, member.userId), repo.get(workshopId)]);
    return {
      member,
      rates: rates.map((r) => ({ ...r, createdBy: r.createdBy?.id ? r.createdBy : null, createdAt: r.createdAt.toISOString() })),
      currentRateMinorPerHour: rateInForce(rates, localDayKey(now(), settings.timeZone)),
    };
  }

  return {
    get: (workshopId: string) => repo.get(workshopId),

    async read(auth: AuthContext) {
      return settingsFor(auth.role, await repo.get(auth.workshopId));
    },

    /** Replaces every setting. The currency cannot change once prices are recorded in it. */
    async put(auth: AuthContext, input: PutSettingsInput): Promise<WorkshopSettings> {
      const saved = await repo.transaction(async (tx) => {
        const current = await repo.lock(tx, auth.workshopId);
        if (input.currency !== current.currency && (await repo.hasPrices(tx, auth.workshopId))) {
          const message = `Prices are already recorded in ${current.currency}; the currency cannot change now`;
          throw new AppError('conflict', 409, message, { currency: [message] });
        }
        await repo.put(tx, auth.workshopId, input);
        await notifyLive(tx, auth.workshopId, 'settings.changed', auth.workshopId, now());
        return repo.get(auth.workshopId, tx);
      });
      return settingsFor(auth.role, saved);
    },

    costRates,

    /**
     * Adds a rate from a date. It may not start on or before a day whose time an earlier rate
     * already costs (that would rewrite costs incurred); a member's first rate may start earlier.
     */
    async addCostRate(auth: AuthContext, membershipId: string, input: CreateCostRateInput): Promise<CostRateList> {
      const { workshopId } = auth;
      await repo.transaction(async (tx) => {
        if (!(await repo.lockMember(tx, workshopId, membershipId))) throw notFound('That member');
        const member = (await repo.member(workshopId, membershipId, tx))!;
        const lastDay = await repo.lastCostedDay(tx, workshopId, member.userId);
        if (lastDay !== null && input.effectiveFrom <= lastDay) {
          const message = `Time up to ${lastDay} is already costed at an earlier rate. Start the new rate after ${lastDay}.`;
          throw new AppError('conflict', 409, message, { effectiveFrom: [message] });
        }
        try {
          await tx.transaction(async (sp) => {
            await repo.insertRate(sp, { workshopId, userId: member.userId, effectiveFrom: input.effectiveFrom, rateMinorPerHour: input.rateMinorPerHour, createdBy: auth.userId, createdAt: now() });
          });
        } catch (err) {
          if (!isUniqueViolation(err)) throw err;
          const message = `A rate already starts on ${input.effectiveFrom}`;
          throw new AppError('conflict', 409, message, { effectiveFrom: [message] });
        }
        await notifyLive(tx, workshopId, 'settings.changed', workshopId, now());
      });
      return costRates(workshopId, membershipId);
    },
  };
}

export type SettingsService = ReturnType<typeof createSettingsService>;
