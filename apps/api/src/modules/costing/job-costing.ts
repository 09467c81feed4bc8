import {
  averageRateMinorPerHour,
  forecastAtCompletion,
  remainingBudgetedMinutes,
  roundHalfUp,
  unbilledSubletMinor,
  unusedBudgetedPartsMinor,
  type HoursSummary,
  type JobForecast,
  type JobMoney,
} from '@keybed/shared';
import type { JobFact, PartFact, PartTotal, TaskFact } from './costing.repo';

/** One job's facts, gathered from the repository's statements: its parts per task with details, or totals per part. */
export interface JobFacts<P extends PartTotal = PartFact> {
  job: JobFact;
  tasks: TaskFact[];
  parts: P[];
}

export interface CostedJob {
  hours: HoursSummary;
  money: JobMoney;
  forecast: JobForecast;
}

/** Groups the statements' rows by job, keeping the jobs' order. */
export function groupByJob<P extends PartTotal>(jobs: JobFact[], tasks: TaskFact[], parts: P[]): JobFacts<P>[] {
  const byJob = new Map(jobs.map((job) => [job.id, { job, tasks: [] as TaskFact[], parts: [] as P[] }]));
  for (const t of tasks) byJob.get(t.jobId)?.tasks.push(t);
  for (const p of parts) byJob.get(p.jobId)?.parts.push(p);
  return [...byJob.values()];
}

/** Net used and budgeted quantity and cost per part of a job. */
export function partsOfJob<P extends PartTotal>(parts: P[]): P[] {
  const byPart = new Map<string, P>();
  for (const p of parts) {
    const sum = byPart.get(p.partId) ?? { ...p, taskId: null, usedMilli: 0, costMinor: 0, budgetMilli: 0, budgetCostMinor: 0 };
    sum.usedMilli += p.usedMilli;
    sum.costMinor += p.costMinor;
    sum.budgetMilli += p.budgetMilli;
    sum.budgetCostMinor += p.budgetCostMinor;
    byPart.set(p.partId, sum);
  }
  return [...byPart.values()];
}

/** The workshop's fallback cost rate: the average of the rates in force today, half-up; 0 with none. */
export const fallbackRate = (rates: { totalMinor: number; count: number }) => (rates.count > 0 ? roundHalfUp(rates.totalMinor, rates.count) : 0);

/**
 * Costs a job with the shared functions: labour and parts to date, sublet bills, the budget left
 * (unfinished tasks' unused minutes at the job's blended rate so far, else the workshop's average;
 * budgeted parts not yet used; sublet budget not yet billed) and the forecast at completion;
 * beside them, the money received from the client.
 */
export function costJob({ job, tasks, parts }: JobFacts<PartTotal>, targetMarginBasisPoints: number, workshopRateMinorPerHour: number): CostedJob {
  const sum = (pick: (t: TaskFact) => number) => tasks.reduce((total, t) => total + pick(t), 0);
  const minutesToDate = sum((t) => t.minutes);
  const unratedMinutes = sum((t) => t.unratedMinutes);
  const labourCostMinor = sum((t) => t.labourCostMinor);
  const budgetedMinutes = sum((t) => t.estimatedMinutes ?? 0);
  const remainingMinutes = remainingBudgetedMinutes(tasks.map((t) => ({ estimatedMinutes: t.estimatedMinutes, minutesToDate: t.minutes, isDone: t.status === 'done' })));
  const byPart = partsOfJob(parts);
  const partsCostMinor = byPart.reduce((total, p) => total + p.costMinor, 0);
  const unusedPartsMinor = unusedBudgetedPartsMinor(byPart.map((p) => ({ budgetedQuantityMilli: p.budgetMilli, budgetedCostMinor: p.budgetCostMinor, usedQuantityMilli: p.usedMilli })));
  const unbilledMinor = unbilledSubletMinor(job.subletBudgetMinor, job.subletBilledMinor);
  const averageCostRateMinorPerHour = averageRateMinorPerHour(labourCostMinor, minutesToDate - unratedMinutes) ?? workshopRateMinorPerHour;
  const forecast = forecastAtCompletion({
    priceMinor: job.priceMinor,
    labourCostToDateMinor: labourCostMinor,
    partsCostToDateMinor: partsCostMinor,
    subletCostToDateMinor: job.subletBilledMinor,
    minutesToDate,
    budgetedMinutes,
    averageCostRateMinorPerHour,
    unusedBudgetedPartsMinor: unusedPartsMinor,
    unbilledSubletMinor: unbilledMinor,
    targetMarginBasisPoints,
    estimatedMinutesToComplete: remainingMinutes,
  });
  return {
    forecast,
    hours: {
      estimatedMinutes: budgetedMinutes,
      actualMinutes: minutesToDate,
      remainingMinutes,
      minutesOverEstimate: forecast.minutesOverEstimate,
      isOverEstimate: forecast.isOverEstimatedHours,
    },
    money: {
      priceMinor: job.priceMinor,
      labourCostMinor,
      unratedMinutes,
      partsCostMinor,
      subletCostMinor: job.subletBilledMinor,
      costToDateMinor: forecast.costToDateMinor,
      averageCostRateMinorPerHour,
      remainingLabourMinor: forecast.remainingLabourMinor,
      unusedBudgetedPartsMinor: unusedPartsMinor,
      unbilledSubletMinor: unbilledMinor,
      forecastCostMinor: forecast.forecastCostMinor,
      forecastMarginMinor: forecast.forecastMarginMinor,
      forecastMarginPercent: forecast.forecastMarginPercent,
      targetMarginBasisPoints,
      isBelowTargetMargin: forecast.isBelowTargetMargin,
      receivedMinor: job.receivedMinor,
    },
  };
}
