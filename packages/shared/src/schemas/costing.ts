import { z } from 'zod';
import { JobStatus } from './job-status';
import { DateOnly } from './jobs';

/*
 * Job costing and the margins report. Hours are whole minutes; money integer minor units.
 * Who sees what: the owner everything; the foreman and technicians hours and part quantities
 * only (every money field and the `money` blocks are absent). The margins report is the owner's.
 */

const PartRef = { partId: z.string(), sku: z.string(), name: z.string(), unit: z.string() };

/** Budgeted against actual minutes. */
export const HoursSummary = z.object({
  estimatedMinutes: z.number(),
  actualMinutes: z.number(),
  /** Budget not yet used on unfinished tasks. */
  remainingMinutes: z.number(),
  minutesOverEstimate: z.number(),
  isOverEstimate: z.boolean(),
});
export type HoursSummary = z.infer<typeof HoursSummary>;

export const TaskCosting = z.object({
  taskId: z.string(),
  title: z.string(),
  status: z.enum(['todo', 'in_progress', 'done']),
  estimatedMinutes: z.number().nullable(),
  actualMinutes: z.number(),
  minutesOverEstimate: z.number(),
  isOverEstimate: z.boolean(),
  parts: z.array(z.object({ ...PartRef, quantityMilli: z.number(), costMinor: z.number().optional() })),
  /** Owner only. */
  money: z
    .object({
      labourCostMinor: z.number(),
      /** Minutes logged on days the technician had no cost rate yet (costed at nothing). */
      unratedMinutes: z.number(),
      partsCostMinor: z.number(),
      costToDateMinor: z.number(),
    })
    .optional(),
});
export type TaskCosting = z.infer<typeof TaskCosting>;

export const JobMoney = z.object({
  /** Accepted original plus accepted variations, ex tax. */
  priceMinor: z.number(),
  labourCostMinor: z.number(),
  unratedMinutes: z.number(),
  partsCostMinor: z.number(),
  subletCostMinor: z.number(),
  costToDateMinor: z.number(),
  /** Cost rate used for the remaining minutes: the job's blended rate so far, else the workshop's average current rate. */
  averageCostRateMinorPerHour: z.number(),
  remainingLabourMinor: z.number(),
  unusedBudgetedPartsMinor: z.number(),
  unbilledSubletMinor: z.number(),
  forecastCostMinor: z.number(),
  forecastMarginMinor: z.number(),
  /** Forecast margin ÷ price × 100; null with no price. */
  forecastMarginPercent: z.number().nullable(),
  targetMarginBasisPoints: z.number(),
  isBelowTargetMargin: z.boolean(),
  /** Paid by the client so far (deposits by card, as charged: with VAT). Not a cost: it leaves the figures above alone. */
  receivedMinor: z.number(),
});
export type JobMoney = z.infer<typeof JobMoney>;

/** `GET /api/jobs/:id/costing`. */
export const JobCosting = z.object({
  jobId: z.string(),
  title: z.string(),
  status: JobStatus,
  currency: z.string(),
  hours: HoursSummary,
  tasks: z.array(TaskCosting),
  /** Each part used on the job against what the agreed estimates budgeted. */
  parts: z.array(z.object({ ...PartRef, usedQuantityMilli: z.number(), budgetedQuantityMilli: z.number(), costMinor: z.number().optional(), budgetCostMinor: z.number().optional() })),
  /** Owner only. */
  money: JobMoney.optional(),
  /** Owner only. */
  subletBills: z.array(z.object({ id: z.string(), supplier: z.string(), description: z.string(), costMinor: z.number(), receivedOn: z.string() })).optional(),
});
export type JobCosting = z.infer<typeof JobCosting>;

// ── Margins report (owner) ───────────────────────────────────────────────────

/**
 * `GET /api/reports/margins`: jobs open at any time from `from` to `to` (local dates, inclusive;
 * default the calendar year so far), optionally of one status. `format=csv` answers text/csv.
 */
export const MarginsQuery = z
  .object({
    from: DateOnly.optional(),
    to: DateOnly.optional(),
    status: JobStatus.optional(),
    format: z.enum(['json', 'csv']).default('json'),
  })
  .refine((v) => !v.from || !v.to || v.from <= v.to, { error: 'The start must not be after the end', path: ['to'] })
  .refine((v) => !v.from || !v.to || Date.parse(v.to) - Date.parse(v.from) <= 3 * 366 * 86_400_000, { error: 'Choose at most three years', path: ['to'] });
export type MarginsQuery = z.infer<typeof MarginsQuery>;

const marginFigures = {
  priceMinor: z.number(),
  costToDateMinor: z.number(),
  forecastCostMinor: z.number(),
  forecastMarginMinor: z.number(),
  forecastMarginPercent: z.number().nullable(),
  estimatedMinutes: z.number(),
  actualMinutes: z.number(),
};

export const MarginRow = z.object({
  jobId: z.string(),
  title: z.string(),
  clientName: z.string(),
  status: JobStatus,
  ...marginFigures,
  isBelowTargetMargin: z.boolean(),
  isOverEstimate: z.boolean(),
  /** Below the target margin or over its hours: listed first. */
  isAtRisk: z.boolean(),
});
export type MarginRow = z.infer<typeof MarginRow>;

export const TechnicianUtilisation = z.object({
  id: z.string(),
  name: z.string(),
  /** Minutes on job tasks inside the period. */
  workedMinutes: z.number(),
  /** Minutes in the period's working days (settings: working day and weekdays). */
  availableMinutes: z.number(),
  /** worked ÷ available (0.82 = 82 %); null when nothing was available. */
  utilisation: z.number().nullable(),
});
export type TechnicianUtilisation = z.infer<typeof TechnicianUtilisation>;

export const MarginsReport = z.object({
  from: z.string(),
  to: z.string(),
  status: JobStatus.nullable(),
  currency: z.string(),
  targetMarginBasisPoints: z.number(),
  /** At-risk jobs first, then by forecast margin %, lowest first. */
  rows: z.array(MarginRow),
  totals: z.object({ jobCount: z.number(), atRiskCount: z.number(), ...marginFigures }),
  utilisation: z.object({ technicians: z.array(TechnicianUtilisation), total: TechnicianUtilisation.omit({ id: true, name: true }) }),
});
export type MarginsReport = z.infer<typeof MarginsReport>;
