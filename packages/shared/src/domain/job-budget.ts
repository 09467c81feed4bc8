/**
 * What is left of a job's budget: the inputs to {@link forecastAtCompletion} that come from the
 * agreed estimates and the tasks. Time in whole minutes, money in integer minor units.
 */
import { roundHalfUp } from './money';

/** A task's budget and what has been logged on it. */
export interface TaskBudget {
  estimatedMinutes: number | null;
  minutesToDate: number;
  isDone: boolean;
}

/** One part's budget on a job (summed over the agreed estimates' lines) and how much has been used. */
export interface PartBudget {
  budgetedQuantityMilli: number;
  /** Budgeted cost of the whole budgeted quantity. */
  budgetedCostMinor: number;
  /** Net used on the job so far (uses less returns); may exceed the budget. */
  usedQuantityMilli: number;
}

/**
 * Minutes still to go = for each unfinished task, its estimate less the minutes already logged on
 * it (never below 0). Done tasks and tasks without an estimate add nothing.
 */
export function remainingBudgetedMinutes(tasks: readonly TaskBudget[]): number {
  return tasks.reduce((sum, t) => (t.isDone || t.estimatedMinutes === null ? sum : sum + Math.max(0, t.estimatedMinutes - t.minutesToDate)), 0);
}

/**
 * Budgeted parts not yet used, at their budgeted cost: for each part, budgeted cost × (budgeted −
 * used) / budgeted quantity, rounded half-up, never below 0.
 */
export function unusedBudgetedPartsMinor(parts: readonly PartBudget[]): number {
  return parts.reduce((sum, p) => {
    const unused = Math.min(p.budgetedQuantityMilli, Math.max(0, p.budgetedQuantityMilli - p.usedQuantityMilli));
    return p.budgetedQuantityMilli > 0 ? sum + roundHalfUp(BigInt(p.budgetedCostMinor) * BigInt(unused), BigInt(p.budgetedQuantityMilli)) : sum;
  }, 0);
}

/** Budgeted sublet cost not yet billed = budget − bills so far, never below 0. */
export function unbilledSubletMinor(budgetedCostMinor: number, billedMinor: number): number {
  return Math.max(0, budgetedCostMinor - billedMinor);
}
