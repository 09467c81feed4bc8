import {
  addDaysToDayKey,
  localDayKey,
  startOfLocalDay,
  utilisationRatio,
  workingMinutesInPeriod,
  type CreateSubletBillInput,
  type JobCosting,
  type MarginRow,
  type MarginsQuery,
  type MarginsReport,
  type SubletBill,
  type SubletBillList,
} from '@keybed/shared';
import type { AuthContext } from '../../http/context';
import { notFound } from '../../http/errors';
import { seesCosts } from '../../http/money-access';
import { notifyLive } from '../../lib/live-events';
import type { SettingsService } from '../settings/settings.service';
import type { CostingRepo, CostingScope, PartTotal } from './costing.repo';
import { costJob, fallbackRate, groupByJob, partsOfJob } from './job-costing';

interface Deps {
  repo: CostingRepo;
  settings: SettingsService;
  now: () => Date;
}

const toBill = (b: { id: string; job_id: string; supplier: string; description: string; cost_minor: string; received_on: string; created_at: Date }): SubletBill => ({
  id: b.id,
  jobId: b.job_id,
  supplier: b.supplier,
  description: b.description,
  costMinor: Number(b.cost_minor),
  receivedOn: b.received_on,
  createdAt: new Date(b.created_at).toISOString(),
});

/** Job costing and the owner's margins report, computed for many jobs at once. */
export function createCostingService({ repo, settings, now }: Deps) {
  /**
   * Every fact of the jobs in scope: a constant number of statements. `parts` reads them per task
   * with their details (one job's costing), or totals per part (a report over many jobs).
   */
  async function gather<P extends PartTotal>(workshopId: string, scope: CostingScope, timeZone: string, parts: (workshopId: string, scope: CostingScope) => Promise<P[]>) {
    const at = now();
    const [jobs, tasks, partRows, rates] = await Promise.all([
      repo.jobs(workshopId, scope),
      repo.tasks(workshopId, scope, at),
      parts(workshopId, scope),
      repo.currentRates(workshopId, localDayKey(at, timeZone)),
    ]);
    return { facts: groupByJob(jobs, tasks, partRows), workshopRate: fallbackRate(rates) };
  }

  return {
    /** One job per task and in total: hours and part quantities for everyone, money for the owner. */
    async job(auth: AuthContext, jobId: string): Promise<JobCosting> {
      const s = await settings.get(auth.workshopId);
      const { facts, workshopRate } = await gather(auth.workshopId, { jobId }, s.timeZone, repo.parts);
      const one = facts[0];
      if (!one) throw notFound('That job');
      const isOwner = seesCosts(auth.role);
      const costed = costJob(one, s.targetMarginBasisPoints, workshopRate);
      const bills = isOwner ? [...(await repo.subletBills(auth.workshopId, jobId))].map(toBill) : [];
      return {
        jobId: one.job.id,
        title: one.job.title,
        status: one.job.status,
        currency: s.currency,
        hours: costed.hours,
        tasks: one.tasks.map((t) => {
          const used = partsOfJob(one.parts.filter((p) => p.taskId === t.id)).filter((p) => p.usedMilli !== 0 || p.costMinor !== 0);
          const partsCostMinor = used.reduce((sum, p) => sum + p.costMinor, 0);
          const minutesOverEstimate = t.estimatedMinutes === null ? 0 : Math.max(0, t.minutes - t.estimatedMinutes);
          return {
            taskId: t.id,
            title: t.title,
            status: t.status,
            estimatedMinutes: t.estimatedMinutes,
            actualMinutes: t.minutes,
            minutesOverEstimate,
            isOverEstimate: minutesOverEstimate > 0,
            parts: used.map((p) => ({ partId: p.partId, sku: p.sku, name: p.name, unit: p.unit, quantityMilli: p.usedMilli, ...(isOwner ? { costMinor: p.costMinor } : {}) })),
            ...(isOwner
              ? { money: { labourCostMinor: t.labourCostMinor, unratedMinutes: t.unratedMinutes, partsCostMinor, costToDateMinor: t.labourCostMinor + partsCostMinor } }
              : {}),
          };
        }),
        parts: partsOfJob(one.parts).map((p) => ({
          partId: p.partId,
          sku: p.sku,
          name: p.name,
          unit: p.unit,
          usedQuantityMilli: p.usedMilli,
          budgetedQuantityMilli: p.budgetMilli,
          ...(isOwner ? { costMinor: p.costMinor, budgetCostMinor: p.budgetCostMinor } : {}),
        })),
        ...(isOwner
          ? { money: costed.money, subletBills: bills.map(({ id, supplier, description, costMinor, receivedOn }) => ({ id, supplier, description, costMinor, receivedOn })) }
          : {}),
      };
    },

    /**
     * The owner's margins: one row per job open at any time in the period (at-risk first, then by
     * forecast margin %), totals, and each technician's utilisation: minutes on job tasks in the
     * period ÷ working minutes of its working days up to today.
     */
    async margins(auth: AuthContext, query: MarginsQuery): Promise<MarginsReport> {
      const s = await settings.get(auth.workshopId);
      const at = now();
      const today = localDayKey(at, s.timeZone);
      const from = query.from ?? `${today.slice(0, 4)}-01-01`;
      const to = query.to ?? today;
      const start = startOfLocalDay(from, s.timeZone);
      const end = startOfLocalDay(addDaysToDayKey(to, 1), s.timeZone);
      const [{ facts, workshopRate }, worked] = await Promise.all([
        gather(auth.workshopId, { start, end, status: query.status }, s.timeZone, repo.partTotals),
        repo.utilisation(auth.workshopId, start, end, at),
      ]);
      const rows: MarginRow[] = facts.map((f) => {
        const { hours, money } = costJob(f, s.targetMarginBasisPoints, workshopRate);
        return {
          jobId: f.job.id,
          title: f.job.title,
          clientName: f.job.clientName,
          status: f.job.status,
          priceMinor: money.priceMinor,
          costToDateMinor: money.costToDateMinor,
          forecastCostMinor: money.forecastCostMinor,
          forecastMarginMinor: money.forecastMarginMinor,
          forecastMarginPercent: money.forecastMarginPercent,
          estimatedMinutes: hours.estimatedMinutes,
          actualMinutes: hours.actualMinutes,
          isBelowTargetMargin: money.isBelowTargetMargin,
          isOverEstimate: hours.isOverEstimate,
          isAtRisk: money.isBelowTargetMargin || hours.isOverEstimate,
        };
      });
      rows.sort((a, b) => Number(b.isAtRisk) - Number(a.isAtRisk) || (a.forecastMarginPercent ?? -Infinity) - (b.forecastMarginPercent ?? -Infinity) || a.title.localeCompare(b.title));
      const total = (pick: (r: MarginRow) => number) => rows.reduce((sum, r) => sum + pick(r), 0);
      const priceMinor = total((r) => r.priceMinor);
      const forecastMarginMinor = total((r) => r.forecastMarginMinor);
      const availableMinutes = workingMinutesInPeriod(from, to < today ? to : today, s.workingWeekdays, s.workingDayStart, s.workingDayEnd);
      const technicians = [...worked].map((w) => ({ id: w.id, name: w.name, workedMinutes: Number(w.minutes), availableMinutes, utilisation: utilisationRatio(Number(w.minutes), availableMinutes) }));
      const workedMinutes = technicians.reduce((sum, t) => sum + t.workedMinutes, 0);
      const allAvailable = availableMinutes * technicians.length;
      return {
        from,
        to,
        status: query.status ?? null,
        currency: s.currency,
        targetMarginBasisPoints: s.targetMarginBasisPoints,
        rows,
        totals: {
          jobCount: rows.length,
          atRiskCount: rows.filter((r) => r.isAtRisk).length,
          priceMinor,
          costToDateMinor: total((r) => r.costToDateMinor),
          forecastCostMinor: total((r) => r.forecastCostMinor),
          forecastMarginMinor,
          forecastMarginPercent: priceMinor > 0 ? (forecastMarginMinor * 100) / priceMinor : null,
          estimatedMinutes: total((r) => r.estimatedMinutes),
          actualMinutes: total((r) => r.actualMinutes),
        },
        utilisation: { technicians, total: { workedMinutes, availableMinutes: allAvailable, utilisation: utilisationRatio(workedMinutes, allAvailable) } },
      };
    },

    async subletBills(auth: AuthContext, jobId: string): Promise<SubletBillList> {
      const rows = await repo.subletBills(auth.workshopId, jobId);
      if (rows.length === 0 && !(await repo.jobs(auth.workshopId, { jobId }))[0]) throw notFound('That job');
      return { bills: [...rows].map(toBill) };
    },

    /** Records a supplier's bill for sublet work on the job (owner). */
    async addSubletBill(auth: AuthContext, jobId: string, input: CreateSubletBillInput): Promise<SubletBill> {
      if (!(await repo.jobs(auth.workshopId, { jobId }))[0]) throw notFound('That job');
      const id = await repo.transaction(async (tx) => {
        const at = now();
        const billId = await repo.insertSubletBill(tx, { ...input, workshopId: auth.workshopId, jobId, createdBy: auth.userId, createdAt: at });
        await notifyLive(tx, auth.workshopId, 'costing.changed', jobId, at);
        return billId;
      });
      return toBill([...(await repo.subletBills(auth.workshopId, jobId))].find((b) => b.id === id)!);
    },
  };
}

export type CostingService = ReturnType<typeof createCostingService>;
