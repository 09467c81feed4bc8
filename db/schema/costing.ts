import { sql } from 'drizzle-orm';
import { bigint, check, date, foreignKey, index, integer, pgTable, text, unique, uuid } from 'drizzle-orm/pg-core';
import { jobs } from './board';
import { createdAt, id } from './columns';
import { memberships, users } from './users';
import { workshops } from './workshops';

/*
 * What work costs the workshop: technicians' effective-dated cost rates and suppliers' bills for
 * sublet work. Money in integer minor units of the workshop's currency.
 */

const workshopId = () =>
  uuid()
    .notNull()
    .references(() => workshops.id, { onDelete: 'cascade' });

/**
 * A member's cost per hour from a local date until their next rate starts. Time is costed at the
 * rate in force on the local date the entry started.
 */
export const technicianCostRates = pgTable(
  'technician_cost_rates',
  {
    id: id(),
    workshopId: workshopId(),
    userId: uuid().notNull(),
    effectiveFrom: date({ mode: 'string' }).notNull(),
    rateMinorPerHour: integer().notNull(),
    createdBy: uuid().references(() => users.id, { onDelete: 'set null' }),
    createdAt: createdAt(),
  },
  (t) => [
    unique('technician_cost_rates_one_per_day').on(t.workshopId, t.userId, t.effectiveFrom),
    foreignKey({ name: 'technician_cost_rates_member_same_workshop', columns: [t.workshopId, t.userId], foreignColumns: [memberships.workshopId, memberships.userId] }).onDelete('cascade'),
    check('technician_cost_rates_positive', sql`${t.rateMinorPerHour} > 0`),
  ],
);

/** A supplier's bill for work sent out on a job, counted in the job's cost from when it arrives. */
export const subletBills = pgTable(
  'sublet_bills',
  {
    id: id(),
    workshopId: workshopId(),
    jobId: uuid().notNull(),
    supplier: text().notNull(),
    description: text().notNull(),
    costMinor: bigint({ mode: 'number' }).notNull(),
    receivedOn: date({ mode: 'string' }).notNull(),
    createdBy: uuid().references(() => users.id, { onDelete: 'set null' }),
    createdAt: createdAt(),
  },
  (t) => [
    foreignKey({ name: 'sublet_bills_job_same_workshop', columns: [t.jobId, t.workshopId], foreignColumns: [jobs.id, jobs.workshopId] }).onDelete('cascade'),
    check('sublet_bills_cost_positive', sql`${t.costMinor} > 0`),
    check('sublet_bills_supplier_not_blank', sql`length(trim(${t.supplier})) > 0`),
    check('sublet_bills_description_not_blank', sql`length(trim(${t.description})) > 0`),
    index().on(t.jobId),
  ],
);
