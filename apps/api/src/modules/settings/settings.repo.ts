import { and, desc, eq, sql } from 'drizzle-orm';
import type { Database } from '@keybed/db/client';
import { estimates, memberships, parts, technicianCostRates, users, workshops } from '@keybed/db/schema';
import type { PutSettingsInput } from '@keybed/shared';
import type { Tx } from '../auth/auth.repo';

type Db = Database | Tx;

const settingsColumns = {
  currency: workshops.currency,
  taxRateBasisPoints: workshops.taxRateBasisPoints,
  labourRateMinorPerHour: workshops.labourRateMinorPerHour,
  targetMarginBasisPoints: workshops.targetMarginBasisPoints,
  allowNegativeStock: workshops.allowNegativeStock,
  timeZone: workshops.timeZone,
  benchDayClose: workshops.benchDayClose,
  workingDayStart: workshops.workingDayStart,
  workingDayEnd: workshops.workingDayEnd,
  workingWeekdays: workshops.workingWeekdays,
};

export type SettingsRow = PutSettingsInput;

export function createSettingsRepo(db: Database) {
  return {
    transaction: <T>(fn: (tx: Tx) => Promise<T>) => db.transaction(fn),

    async get(workshopId: string, q: Db = db): Promise<SettingsRow> {
      const [row] = await q.select(settingsColumns).from(workshops).where(eq(workshops.id, workshopId));
      return row!;
    },

    /** The workshop row, locked, with its settings. */
    async lock(tx: Tx, workshopId: string): Promise<SettingsRow> {
      const [row] = await tx.select(settingsColumns).from(workshops).where(eq(workshops.id, workshopId)).for('update');
      return row!;
    },

    async put(tx: Tx, workshopId: string, input: PutSettingsInput) {
      await tx.update(workshops).set(input).where(eq(workshops.id, workshopId));
    },

    /** Whether any price is recorded in the workshop's currency (estimates or parts). */
    async hasPrices(tx: Tx, workshopId: string) {
      const [row] = await tx.execute<{ found: boolean }>(sql`select exists (select 1 from ${estimates} where workshop_id = ${workshopId})
        or exists (select 1 from ${parts} where workshop_id = ${workshopId}) as found`);
      return Boolean(row?.found);
    },

    async member(workshopId: string, membershipId: string, q: Db = db) {
      const [row] = await q
        .select({ id: memberships.id, userId: memberships.userId, name: users.name })
        .from(memberships)
        .innerJoin(users, eq(users.id, memberships.userId))
        .where(and(eq(memberships.workshopId, workshopId), eq(memberships.id, membershipId)));
      return row;
    },

    /** The member's membership row, locked: rate changes for one member run one after another. */
    async lockMember(tx: Tx, workshopId: string, membershipId: string) {
      const [row] = await tx
        .select({ id: memberships.id })
        .from(memberships)
        .where(and(eq(memberships.workshopId, workshopId), eq(memberships.id, membershipId)))
        .for('update');
      return row;
    },

    rates: (workshopId: string, userId: string, q: Db = db) =>
      q
        .select({
          id: technicianCostRates.id,
          effectiveFrom: technicianCostRates.effectiveFrom,
          rateMinorPerHour: technicianCostRates.rateMinorPerHour,
          createdBy: { id: users.id, name: users.name },
          createdAt: technicianCostRates.createdAt,
        })
        .from(technicianCostRates)
        .leftJoin(users, eq(users.id, technicianCostRates.createdBy))
        .where(and(eq(technicianCostRates.workshopId, workshopId), eq(technicianCostRates.userId, userId)))
        .orderBy(desc(technicianCostRates.effectiveFrom)),

    /**
     * The latest local day (in the workshop's zone) on which the member has time that an existing
     * rate already costs: entries started on or after the earliest rate's first day. Null when none.
     */
    async lastCostedDay(tx: Tx, workshopId: string, userId: string): Promise<string | null> {
      const [row] = await tx.execute<{ day: string | null }>(sql`
        select max((e.started_at at time zone w.time_zone)::date)::text as day
        from time_entries e join workshops w on w.id = e.workshop_id
        where e.workshop_id = ${workshopId} and e.technician_id = ${userId}
          and (e.started_at at time zone w.time_zone)::date >= (
            select min(effective_from) from technician_cost_rates r where r.workshop_id = ${workshopId} and r.user_id = ${userId})`);
      return row?.day ?? null;
    },

    async insertRate(tx: Tx, values: typeof technicianCostRates.$inferInsert) {
      const [row] = await tx.insert(technicianCostRates).values(values).returning({ id: technicianCostRates.id });
      return row!.id;
    },
  };
}

export type SettingsRepo = ReturnType<typeof createSettingsRepo>;
