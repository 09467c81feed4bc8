/**
 * Forecast at completion of one job and the flags the owner and foreman act on. Money in integer
 * minor units, time in minutes, target margin in basis points (3500 = 35 %).
 */
import { roundHalfUp } from './money';

/** What is known about a job part-way through. */
export interface ForecastInput {
  /** Agreed price ex-VAT. */
  priceMinor: number;
  labourCostToDateMinor: number;
  partsCostToDateMinor: number;
  minutesToDate: number;
  budgetedMinutes: number;
  /** Cost rate for the remaining hours, e.g. the blended rate so far or the assigned technician's. */
  averageCostRateMinorPerHour: number;
  /** Budgeted parts not yet issued to the job, at cost. */
  unusedBudgetedPartsMinor: number;
  /** Suppliers' bills for sublet work received so far (0 when left out). */
  subletCostToDateMinor?: number;
  /** Budgeted sublet cost not yet billed (0 when left out). */
  unbilledSubletMinor?: number;
  targetMarginBasisPoints: number;
  /** The foreman's own estimate of minutes still to go; replaces budget − to date when given. */
  estimatedMinutesToComplete?: number;
}

/** The forecast and its flags. */
export interface JobForecast {
  costToDateMinor: number;
  remainingMinutes: number;
  remainingLabourMinor: number;
  forecastCostMinor: number;
  /** Price − forecast cost. */
  forecastMarginMinor: number;
  /** Forecast margin / price × 100, unrounded; null when the price is 0 or less. */
  forecastMarginPercent: number | null;
  isBelowTargetMargin: boolean;
  isOverEstimatedHours: boolean;
  /** Minutes logged beyond the budget (0 when within). */
  minutesOverEstimate: number;
}

/**
 * Cost to date = labour + parts + sublet bills. Forecast cost = cost to date + remaining minutes ×
 * average cost rate (rounded half-up once) + unused budgeted parts + unbilled budgeted sublet. Remaining minutes = the foreman's estimate when given, else the budget
 * left (never below 0). Below target when margin < target (exact integer comparison; a price of 0
 * or less is always below). Over hours when minutes to date exceed the budget.
 */
export function forecastAtCompletion(input: ForecastInput): JobForecast {
  const costToDateMinor = input.labourCostToDateMinor + input.partsCostToDateMinor + (input.subletCostToDateMinor ?? 0);
  const remainingMinutes = input.estimatedMinutesToComplete ?? Math.max(0, input.budgetedMinutes - input.minutesToDate);
  const remainingLabourMinor = roundHalfUp(BigInt(remainingMinutes) * BigInt(input.averageCostRateMinorPerHour), 60n);
  const forecastCostMinor = costToDateMinor + remainingLabourMinor + input.unusedBudgetedPartsMinor + (input.unbilledSubletMinor ?? 0);
  const forecastMarginMinor = input.priceMinor - forecastCostMinor;
  const isPriced = input.priceMinor > 0;
  return {
    costToDateMinor,
    remainingMinutes,
    remainingLabourMinor,
    forecastCostMinor,
    forecastMarginMinor,
    forecastMarginPercent: isPriced ? (forecastMarginMinor * 100) / input.priceMinor : null,
    isBelowTargetMargin:
      !isPriced || BigInt(forecastMarginMinor) * 10_000n < BigInt(input.targetMarginBasisPoints) * BigInt(input.priceMinor),
    isOverEstimatedHours: input.minutesToDate > input.budgetedMinutes,
    minutesOverEstimate: Math.max(0, input.minutesToDate - input.budgetedMinutes),
  };
}
