/**
 * Job costing shared by the API and the web app: labour at effective-dated cost rates, parts from
 * stock movements, and the forecast at completion. Money in integer minor units, time in minutes.
 */
import { lineAmountMinor, roundHalfUp } from './money';
import { type Instant, localDayKey } from './time';

/** A technician's cost rate from a local date (YYYY-MM-DD) until the next period starts. */
export interface RatePeriod {
  effectiveFrom: string;
  rateMinorPerHour: number;
}

/** Logged bench time: who, when it started, and whole minutes worked. */
export interface LabourEntry {
  technicianId: string;
  startedAt: Instant;
  minutes: number;
}

/** A labour entry with the local date, rate and cost applied to it; rate null when none was in force. */
export interface CostedLabourEntry extends LabourEntry {
  dayKey: string;
  rateMinorPerHour: number | null;
  costMinor: number;
}

/** Labour totals; unratedMinutes are included in `minutes` but cost nothing until a rate is set. */
export interface LabourCost {
  minutes: number;
  unratedMinutes: number;
  costMinor: number;
  entries: CostedLabourEntry[];
}

/** Parts leaving stock for a job ('issue') or coming back ('return'); quantity > 0 in thousandths. */
export interface PartMovement {
  kind: 'issue' | 'return';
  quantityMilli: number;
  unitCostMinor: number;
}

/** The rate of the period with the latest effectiveFrom on or before dayKey; null if none has started. */
export function rateInForce(rates: readonly RatePeriod[], dayKey: string): number | null {
  let best: RatePeriod | undefined;
  for (const period of rates) {
    if (period.effectiveFrom <= dayKey && (!best || period.effectiveFrom > best.effectiveFrom)) best = period;
  }
  return best ? best.rateMinorPerHour : null;
}

/** Cost of one entry = minutes × rate / 60, rounded half away from zero to the minor unit (per entry, before summing). */
export function entryCostMinor(minutes: number, rateMinorPerHour: number): number {
  return roundHalfUp(BigInt(minutes) * BigInt(rateMinorPerHour), 60n);
}

/**
 * Labour cost of entries, each at its technician's rate in force on the entry's local start date
 * in `timeZone` and rounded per entry ({@link entryCostMinor}). Entries with no rate cost 0 and
 * are counted in unratedMinutes so the screen can say so.
 */
export function labourCost(
  entries: readonly LabourEntry[],
  ratesByTechnician: Readonly<Record<string, readonly RatePeriod[]>>,
  timeZone: string,
): LabourCost {
  const costed = entries.map((entry): CostedLabourEntry => {
    const dayKey = localDayKey(entry.startedAt, timeZone);
    const rateMinorPerHour = rateInForce(ratesByTechnician[entry.technicianId] ?? [], dayKey);
    const costMinor = rateMinorPerHour === null ? 0 : entryCostMinor(entry.minutes, rateMinorPerHour);
    return { ...entry, dayKey, rateMinorPerHour, costMinor };
  });
  const sum = (pick: (e: CostedLabourEntry) => number) => costed.reduce((total, e) => total + pick(e), 0);
  return {
    minutes: sum((e) => e.minutes),
    unratedMinutes: sum((e) => (e.rateMinorPerHour === null ? e.minutes : 0)),
    costMinor: sum((e) => e.costMinor),
    entries: costed,
  };
}

/** Blended cost rate = cost × 60 / minutes, minor units per hour rounded half-up; null for no minutes. */
export function averageRateMinorPerHour(costMinor: number, minutes: number): number | null {
  return minutes > 0 ? roundHalfUp(BigInt(costMinor) * 60n, BigInt(minutes)) : null;
}

/** Net parts cost of a job: issues minus returns, each movement rounded half-up ({@link lineAmountMinor}). */
export function partsCostMinor(movements: readonly PartMovement[]): number {
  return movements.reduce((total, m) => {
    if (!(m.quantityMilli > 0)) throw new RangeError('Movement quantity must be positive');
    const amount = lineAmountMinor(m.quantityMilli, m.unitCostMinor);
    return total + (m.kind === 'issue' ? amount : -amount);
  }, 0);
}
