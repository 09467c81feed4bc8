import { z } from 'zod';
import { DateOnly } from './jobs';

/*
 * Workshop settings and technicians' cost rates. Money is integer minor units of the workshop's
 * currency, rates are basis points (2000 = 20 %). Who sees what: the owner every field; the
 * foreman no target margin and no cost rates; technicians no money at all. Fields a role may not
 * see are absent from the response, not null.
 */

/** A minor-unit amount that cannot be negative (a price, a cost, a rate), at most £100 million. */
export const MinorAmount = z
  .number({ error: 'Enter an amount in minor units (pence)' })
  .int({ error: 'Use whole minor units (pence)' })
  .min(0, { error: 'Cannot be negative' })
  .max(10_000_000_000, { error: 'Amount is too large' });

/** A price or cost per hour in minor units, at most 1 000 000.00 an hour. */
export const RateMinorPerHour = z
  .number({ error: 'Enter an hourly rate in minor units (pence)' })
  .int({ error: 'Use whole minor units (pence)' })
  .min(0, { error: 'Cannot be negative' })
  .max(100_000_000, { error: 'Rate is too large' });

/** Basis points from 0 to 10 000 (0 %–100 %). */
export const BasisPoints = z
  .number({ error: 'Enter basis points (2000 = 20 %)' })
  .int({ error: 'Use whole basis points (2000 = 20 %)' })
  .min(0, { error: 'Cannot be negative' })
  .max(10_000, { error: 'Cannot be above 100 %' });

/** Wall-clock time of day, "HH:mm" on the 24-hour clock. */
export const TimeOfDay = z.string({ error: 'Use a time like 08:00' }).regex(/^([01]\d|2[0-3]):[0-5]\d$/, { error: 'Use a time like 08:00' });

const isKnown = (check: () => unknown) => {
  try {
    check();
    return true;
  } catch {
    return false;
  }
};

let currencies: Set<string> | undefined;
/** ISO 4217 codes the runtime's Intl data lists (Intl accepts any well-formed code when formatting). */
const knownCurrencies = () => (currencies ??= new Set(Intl.supportedValuesOf('currency')));

/** ISO 4217 alphabetic code that the runtime's Intl data knows ("GBP"). */
export const CurrencyCode = z
  .string({ error: 'Choose a currency' })
  .trim()
  .toUpperCase()
  .regex(/^[A-Z]{3}$/, { error: 'Use a three-letter ISO 4217 code, like GBP' })
  .refine((code) => knownCurrencies().has(code), { error: 'Unknown currency code' });

/** IANA time zone name ("Europe/London"). */
export const TimeZoneName = z
  .string({ error: 'Choose a time zone' })
  .trim()
  .min(1, { error: 'Choose a time zone' })
  .refine((zone) => isKnown(() => new Intl.DateTimeFormat('en', { timeZone: zone })), { error: 'Unknown time zone' });

/** ISO 8601 weekdays the workshop works: 1 = Monday … 7 = Sunday. */
export const Weekdays = z
  .array(z.number().int().min(1, { error: 'Use 1 (Monday) to 7 (Sunday)' }).max(7, { error: 'Use 1 (Monday) to 7 (Sunday)' }))
  .min(1, { error: 'Choose at least one working day' })
  .max(7)
  .refine((days) => new Set(days).size === days.length, { error: 'A day is listed twice' });

/** `PUT /api/settings` (owner): every setting at once. */
export const PutSettingsInput = z
  .object({
    currency: CurrencyCode,
    taxRateBasisPoints: BasisPoints,
    labourRateMinorPerHour: RateMinorPerHour,
    /** The forecast margin below which a job is flagged. */
    targetMarginBasisPoints: BasisPoints.max(9_999, { error: 'Must be below 100 %' }),
    allowNegativeStock: z.boolean({ error: 'Say whether stock may go below zero' }),
    timeZone: TimeZoneName,
    benchDayClose: TimeOfDay,
    workingDayStart: TimeOfDay,
    workingDayEnd: TimeOfDay,
    workingWeekdays: Weekdays,
  })
  .refine((v) => v.workingDayStart < v.workingDayEnd, { error: 'The working day must end after it starts', path: ['workingDayEnd'] });
export type PutSettingsInput = z.infer<typeof PutSettingsInput>;

/** `GET /api/settings`: what the caller's role may see. */
export const WorkshopSettings = z.object({
  currency: z.string(),
  allowNegativeStock: z.boolean(),
  timeZone: z.string(),
  benchDayClose: z.string(),
  workingDayStart: z.string(),
  workingDayEnd: z.string(),
  workingWeekdays: z.array(z.number()),
  /** Owner and foreman. */
  taxRateBasisPoints: z.number().optional(),
  /** Owner and foreman: the price of an hour of labour on estimates. */
  labourRateMinorPerHour: z.number().optional(),
  /** Owner only. */
  targetMarginBasisPoints: z.number().optional(),
});
export type WorkshopSettings = z.infer<typeof WorkshopSettings>;

// ── Technicians' cost rates (owner only) ─────────────────────────────────────

/**
 * What an hour of a member's time costs the workshop, from a local date on. A new rate may not
 * start on or before a day that already has time costed at an earlier rate: costs already
 * incurred are never rewritten (409).
 */
export const CreateCostRateInput = z.object({
  effectiveFrom: DateOnly,
  rateMinorPerHour: RateMinorPerHour.min(1, { error: 'A cost rate must be above zero' }),
});
export type CreateCostRateInput = z.infer<typeof CreateCostRateInput>;

export const CostRate = z.object({
  id: z.string(),
  effectiveFrom: z.string(),
  rateMinorPerHour: z.number(),
  createdBy: z.object({ id: z.string(), name: z.string() }).nullable(),
  createdAt: z.string(),
});
export type CostRate = z.infer<typeof CostRate>;

/** `GET /api/team/members/:id/cost-rates`: newest first, with the rate in force today. */
export const CostRateList = z.object({
  member: z.object({ id: z.string(), userId: z.string(), name: z.string() }),
  rates: z.array(CostRate),
  currentRateMinorPerHour: z.number().nullable(),
});
export type CostRateList = z.infer<typeof CostRateList>;
