import { sql, type SQL } from 'drizzle-orm';
import type { Database } from '@keybed/db/client';
import type { Tx } from '../auth/auth.repo';

/*
 * The facts job costing needs, for one job or every job of a report, in a fixed number of
 * statements whatever the number of jobs: each statement starts from the same `scope` of job ids
 * and aggregates in SQL. Labour is costed per time entry at the technician's rate in force on the
 * entry's local start date, rounded half-up per entry — integer arithmetic mirroring the shared
 * `entryCostMinor` ((minutes × rate × 2 + 60) div 120 = round half-up of minutes × rate / 60 for
 * non-negative values); the API tests check it against `labourCost`. Everything else is sums of
 * integers already rounded when written (stock movement values, estimate line costs, bills).
 * Minutes come from `date_part` (double precision) rather than `extract` (numeric): per row over
 * every entry of a year, numeric division is most of a report's cost, and for any duration under
 * centuries the double's error is far below the microsecond, so the floor is the same.
 */

/** Which jobs: one job, or those open at any time in [start, end) of one status. */
export type CostingScope = { jobId: string } | { start: Date; end: Date; status?: string };

export interface JobFact {
  id: string;
  title: string;
  status: 'active' | 'on_hold' | 'done' | 'cancelled';
  clientName: string;
  priceMinor: number;
  subletBudgetMinor: number;
  subletBilledMinor: number;
  /** Paid by the client (recorded payments), as charged. */
  receivedMinor: number;
}

export interface TaskFact {
  id: string;
  jobId: string;
  title: string;
  status: 'todo' | 'in_progress' | 'done';
  estimatedMinutes: number | null;
  minutes: number;
  unratedMinutes: number;
  labourCostMinor: number;
}

/** A part on a job: used (net, per task) or budgeted by the agreed estimates (task null). */
export interface PartFact {
  jobId: string;
  taskId: string | null;
  partId: string;
  sku: string;
  name: string;
  unit: string;
  usedMilli: number;
  costMinor: number;
  budgetMilli: number;
  budgetCostMinor: number;
}

/** A part's net use and budget on a job, all tasks together: what costing needs without the part's details. */
export type PartTotal = Pick<PartFact, 'jobId' | 'partId' | 'usedMilli' | 'costMinor' | 'budgetMilli' | 'budgetCostMinor'>;

const n = (v: string | number | null) => (v === null ? 0 : Number(v));

function scopeCte(workshopId: string, scope: CostingScope): SQL {
  if ('jobId' in scope) return sql`scope as (select id from jobs where workshop_id = ${workshopId} and id = ${scope.jobId})`;
  return sql`scope as (
    select id from jobs
    where workshop_id = ${workshopId} and created_at < ${scope.end.toISOString()}::timestamptz
      and (status in ('active', 'on_hold') or updated_at >= ${scope.start.toISOString()}::timestamptz)
      ${scope.status ? sql`and status = ${scope.status}::job_status` : sql``})`;
}

/** The jobs in scope (`scope`) and their parts used (net, per task) and budgeted by the agreed estimates (`facts`). */
function partFactsCte(workshopId: string, scope: CostingScope): SQL {
  return sql`${scopeCte(workshopId, scope)},
        facts as (
          select m.job_id, m.task_id, m.part_id, -sum(m.quantity_milli) as used, -sum(m.value_minor) as cost, 0 as budget, 0 as budget_cost
          from stock_movements m join scope s on s.id = m.job_id
          group by m.job_id, m.task_id, m.part_id
          union all
          select e.job_id, null, l.part_id, 0, 0, sum(l.quantity_milli), sum(l.cost_minor)
          from estimate_lines l join estimates e on e.id = l.estimate_id join scope s on s.id = e.job_id
          left join estimate_options o on o.id = l.option_id
          where e.status = 'accepted' and l.kind = 'part' and (l.option_id is null or o.is_chosen)
          group by e.job_id, l.part_id)`;
}

export function createCostingRepo(db: Database) {
  return {
    transaction: <T>(fn: (tx: Tx) => Promise<T>) => db.transaction(fn),

    /** Jobs in scope with their agreed price (accepted estimates, ex tax), sublet budget and bills, and money received. */
    async jobs(workshopId: string, scope: CostingScope): Promise<JobFact[]> {
      const rows = await db.execute<{ id: string; title: string; status: JobFact['status']; client_name: string; price: string; sublet_budget: string; sublet_billed: string; received: string }>(sql`
        with ${scopeCte(workshopId, scope)},
        agreed as (
          select e.job_id, sum(e.accepted_net_minor) as price
          from estimates e join scope s on s.id = e.job_id where e.status = 'accepted' group by e.job_id),
        sublet_budget as (
          select e.job_id, sum(l.cost_minor) as cost
          from estimate_lines l join estimates e on e.id = l.estimate_id join scope s on s.id = e.job_id
          left join estimate_options o on o.id = l.option_id
          where e.status = 'accepted' and l.kind = 'sublet' and (l.option_id is null or o.is_chosen)
          group by e.job_id),
        bills as (select b.job_id, sum(b.cost_minor) as cost from sublet_bills b join scope s on s.id = b.job_id group by b.job_id),
        received as (select p.job_id, sum(p.amount_minor) as amount from payments p join scope s on s.id = p.job_id where p.status = 'paid' group by p.job_id)
        select j.id, j.title, j.status, c.name as client_name,
          coalesce(a.price, 0)::text as price, coalesce(sb.cost, 0)::text as sublet_budget, coalesce(b.cost, 0)::text as sublet_billed,
          coalesce(r.amount, 0)::text as received
        from scope s join jobs j on j.id = s.id join clients c on c.id = j.client_id
        left join agreed a on a.job_id = j.id left join sublet_budget sb on sb.job_id = j.id left join bills b on b.job_id = j.id
        left join received r on r.job_id = j.id
        order by j.title, j.id`);
      return [...rows].map((r) => ({
        id: r.id,
        title: r.title,
        status: r.status,
        clientName: r.client_name,
        priceMinor: n(r.price),
        subletBudgetMinor: n(r.sublet_budget),
        subletBilledMinor: n(r.sublet_billed),
        receivedMinor: n(r.received),
      }));
    },

    /** Every task of the jobs in scope with minutes logged (running entries up to `now`) and labour cost. */
    async tasks(workshopId: string, scope: CostingScope, now: Date): Promise<TaskFact[]> {
      const rows = await db.execute<{ id: string; job_id: string; title: string; status: TaskFact['status']; estimated_minutes: number | null; minutes: string; unrated: string; cost: string }>(sql`
        with ${scopeCte(workshopId, scope)},
        zone as (select time_zone from workshops where id = ${workshopId}),
        -- Each rate's period as instants: from local midnight of its first day to that of the next
        -- rate's, so an entry falls in the period of the local day it started on.
        periods as (
          select r.user_id, r.rate_minor_per_hour as rate,
            (r.effective_from::timestamp at time zone z.time_zone) as from_at,
            (lead(r.effective_from) over (partition by r.user_id order by r.effective_from))::timestamp at time zone z.time_zone as until_at
          from technician_cost_rates r cross join zone z where r.workshop_id = ${workshopId}),
        costed as (
          select e.task_id, p.rate,
            floor(date_part('epoch', coalesce(e.ended_at, ${now.toISOString()}::timestamptz) - e.started_at) / 60)::bigint as minutes
          from time_entries e join scope s on s.id = e.job_id
          left join periods p on p.user_id = e.technician_id and e.started_at >= p.from_at and (p.until_at is null or e.started_at < p.until_at)),
        labour as (
          select task_id, sum(minutes) as minutes,
            sum(case when rate is null then minutes else 0 end) as unrated,
            sum(case when rate is null then 0 else (minutes * rate * 2 + 60) / 120 end) as cost
          from costed group by task_id)
        select t.id, t.job_id, t.title, t.status, t.estimated_minutes,
          coalesce(l.minutes, 0)::text as minutes, coalesce(l.unrated, 0)::text as unrated, coalesce(l.cost, 0)::text as cost
        from tasks t join scope s on s.id = t.job_id left join labour l on l.task_id = t.id
        order by t.job_id, t.position`);
      return [...rows].map((r) => ({
        id: r.id,
        jobId: r.job_id,
        title: r.title,
        status: r.status,
        estimatedMinutes: r.estimated_minutes,
        minutes: n(r.minutes),
        unratedMinutes: n(r.unrated),
        labourCostMinor: n(r.cost),
      }));
    },

    /** Parts used per task (net of returns and corrections) and parts budgeted per job by the agreed estimates. */
    async parts(workshopId: string, scope: CostingScope): Promise<PartFact[]> {
      const rows = await db.execute<{ job_id: string; task_id: string | null; part_id: string; sku: string; name: string; unit: string; used: string; cost: string; budget: string; budget_cost: string }>(sql`
        with ${partFactsCte(workshopId, scope)}
        select f.job_id, f.task_id, f.part_id, p.sku, p.name, p.unit,
          f.used::text as used, f.cost::text as cost, f.budget::text as budget, f.budget_cost::text as budget_cost
        from facts f join parts p on p.id = f.part_id
        order by p.name, p.sku`);
      return [...rows].map((r) => ({
        jobId: r.job_id,
        taskId: r.task_id,
        partId: r.part_id,
        sku: r.sku,
        name: r.name,
        unit: r.unit,
        usedMilli: n(r.used),
        costMinor: n(r.cost),
        budgetMilli: n(r.budget),
        budgetCostMinor: n(r.budget_cost),
      }));
    },

    /**
     * Per job and part, used (net, all tasks together) and budgeted: what a report costing many
     * jobs needs, in fewer and narrower rows than `parts` (no per-task split, no part details).
     */
    async partTotals(workshopId: string, scope: CostingScope): Promise<PartTotal[]> {
      const rows = await db.execute<{ job_id: string; part_id: string; used: string; cost: string; budget: string; budget_cost: string }>(sql`
        with ${partFactsCte(workshopId, scope)}
        select job_id, part_id, sum(used)::text as used, sum(cost)::text as cost, sum(budget)::text as budget, sum(budget_cost)::text as budget_cost
        from facts group by job_id, part_id`);
      return [...rows].map((r) => ({
        jobId: r.job_id,
        partId: r.part_id,
        usedMilli: n(r.used),
        costMinor: n(r.cost),
        budgetMilli: n(r.budget),
        budgetCostMinor: n(r.budget_cost),
      }));
    },

    /** Active members' cost rates in force on `day`: their sum and count (for the workshop's average). */
    async currentRates(workshopId: string, day: string) {
      const [row] = await db.execute<{ total: string | null; count: number }>(sql`
        select sum(r.rate)::text as total, count(r.rate)::int as count
        from memberships m
        cross join lateral (
          select rate_minor_per_hour as rate from technician_cost_rates c
          where c.workshop_id = m.workshop_id and c.user_id = m.user_id and c.effective_from <= ${day}::date
          order by c.effective_from desc limit 1) r
        where m.workshop_id = ${workshopId} and m.is_active`);
      return { totalMinor: n(row?.total ?? null), count: row?.count ?? 0 };
    },

    /** Sublet bills of one job, oldest first. */
    subletBills: (workshopId: string, jobId: string) =>
      db.execute<{ id: string; supplier: string; description: string; cost_minor: string; received_on: string; created_at: Date; job_id: string }>(sql`
        select id, job_id, supplier, description, cost_minor::text, received_on::text, created_at from sublet_bills
        where workshop_id = ${workshopId} and job_id = ${jobId} order by received_on, created_at`),

    async insertSubletBill(tx: Tx, values: { workshopId: string; jobId: string; supplier: string; description: string; costMinor: number; receivedOn: string; createdBy: string; createdAt: Date }) {
      const [row] = await tx.execute<{ id: string }>(sql`
        insert into sublet_bills (workshop_id, job_id, supplier, description, cost_minor, received_on, created_by, created_at)
        values (${values.workshopId}, ${values.jobId}, ${values.supplier}, ${values.description}, ${values.costMinor}, ${values.receivedOn}::date, ${values.createdBy}, ${values.createdAt.toISOString()}::timestamptz)
        returning id`);
      return row!.id;
    },

    /**
     * Minutes each person logged on job tasks inside [start, end) (entries clipped to it, running
     * ones up to `now`), with every active technician listed even at zero.
     */
    utilisation: (workshopId: string, start: Date, end: Date, now: Date) =>
      db.execute<{ id: string; name: string; minutes: string }>(sql`
        with worked as (
          select e.technician_id,
            sum(greatest(0, floor(date_part('epoch', least(coalesce(e.ended_at, ${now.toISOString()}::timestamptz), ${end.toISOString()}::timestamptz)
              - greatest(e.started_at, ${start.toISOString()}::timestamptz)) / 60)::bigint))::bigint as minutes
          from time_entries e
          where e.workshop_id = ${workshopId} and e.started_at < ${end.toISOString()}::timestamptz
            and coalesce(e.ended_at, ${now.toISOString()}::timestamptz) > ${start.toISOString()}::timestamptz
          group by e.technician_id)
        select u.id, u.name, coalesce(w.minutes, 0)::text as minutes
        from memberships m join users u on u.id = m.user_id left join worked w on w.technician_id = m.user_id
        where m.workshop_id = ${workshopId} and ((m.is_active and m.role = 'technician') or w.minutes > 0)
        order by u.name, u.id`),
  };
}

export type CostingRepo = ReturnType<typeof createCostingRepo>;
