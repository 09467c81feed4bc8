import { and, count, eq, inArray } from 'drizzle-orm';
import {
  averageUnitCostMinor,
  EMPTY_STOCK,
  estimateLineAmountMinor,
  estimateLineCostMinor,
  estimateTotals,
  issueStock,
  linesInScope,
  receiveStock,
  type StockValue,
} from '@keybed/shared';
import type { Database } from '../client';
import { estimateLines, estimateOptions, estimates, memberships, parts, stockMovements, subletBills, tasks, technicianCostRates, workshops } from '../schema/index';
import { demoInstant, DEMO_WORKSHOP } from './demo';
import {
  DEMO_COST_RATES,
  DEMO_ESTIMATES,
  demoLineId,
  demoOptionId,
  DEMO_PARTS,
  DEMO_PARTS_USED,
  DEMO_SETTINGS,
  DEMO_SUBLET_BILLS,
  type DemoEstimate,
  type DemoLine,
} from './money-demo';

type Tx = Parameters<Parameters<Database['transaction']>[0]>[0];

const workshopId = DEMO_WORKSHOP.id;
const priceOf = new Map<string, { sellPriceMinor: number; unitCostMinor: number; name: string }>(DEMO_PARTS.map((p) => [p.id, p]));

/** A demo line with the catalogue's price and cost filled in, in the shape the shared estimate functions take. */
function figures(line: DemoLine, optionId: string | null) {
  if (line.kind === 'labour') return { kind: line.kind, minutes: line.minutes, quantityMilli: null, unitPriceMinor: DEMO_SETTINGS.labourRateMinorPerHour, unitCostMinor: null, optionId };
  if (line.kind === 'part') {
    const part = priceOf.get(line.partId)!;
    return { kind: line.kind, minutes: null, quantityMilli: line.quantityMilli, unitPriceMinor: part.sellPriceMinor, unitCostMinor: part.unitCostMinor, optionId };
  }
  return { kind: line.kind, minutes: null, quantityMilli: line.quantityMilli, unitPriceMinor: line.unitPriceMinor, unitCostMinor: line.unitCostMinor, optionId };
}

/**
 * Adds what is missing of the demo money: settings (when never set), cost rates and parts (by
 * id), and, the first time only (no stock movements or estimates yet, the demo tasks present),
 * opening stock, estimates with their task budgets, parts used and the refinisher's bill.
 */
export async function seedMoney(tx: Tx, now: Date) {
  await tx.update(workshops).set(DEMO_SETTINGS).where(and(eq(workshops.id, workshopId), eq(workshops.labourRateMinorPerHour, 0)));
  const members = new Set((await tx.select({ userId: memberships.userId }).from(memberships).where(eq(memberships.workshopId, workshopId))).map((m) => m.userId));
  const rates = DEMO_COST_RATES.filter((r) => members.has(r.userId));
  if (rates.length > 0) await tx.insert(technicianCostRates).values(rates.map((r) => ({ ...r, workshopId, createdAt: now }))).onConflictDoNothing();
  await tx
    .insert(parts)
    .values(DEMO_PARTS.map(({ receipts: _receipts, ...p }) => ({ ...p, workshopId, createdAt: demoInstant(now, 90), updatedAt: demoInstant(now, 90) })))
    .onConflictDoNothing();

  const [moved] = await tx.select({ n: count() }).from(stockMovements).where(eq(stockMovements.workshopId, workshopId));
  const [estimated] = await tx.select({ n: count() }).from(estimates).where(eq(estimates.workshopId, workshopId));
  const taskIds = new Set((await tx.select({ id: tasks.id }).from(tasks).where(eq(tasks.workshopId, workshopId))).map((t) => t.id));
  const needed = [...DEMO_ESTIMATES.flatMap((e) => e.lines.flatMap((l) => (l.kind === 'labour' && l.taskId ? [l.taskId] : []))), ...DEMO_PARTS_USED.map((u) => u.taskId)];
  const ownParts = await tx.select({ id: parts.id }).from(parts).where(and(eq(parts.workshopId, workshopId), inArray(parts.id, DEMO_PARTS.map((p) => p.id))));
  if ((moved?.n ?? 0) > 0 || (estimated?.n ?? 0) > 0 || needed.some((id) => !taskIds.has(id)) || ownParts.length !== DEMO_PARTS.length) return;

  await seedStock(tx, now);
  for (const [i, estimate] of DEMO_ESTIMATES.entries()) await seedEstimate(tx, i + 1, estimate, now);
  await applyLabourBudget(tx, now);
  await tx.insert(subletBills).values(
    DEMO_SUBLET_BILLS.map(({ daysAgo, ...b }) => ({ ...b, workshopId, receivedOn: demoInstant(now, daysAgo).toISOString().slice(0, 10), createdAt: demoInstant(now, daysAgo) })),
  );
}

/** Deliveries, then parts used, each valued at the moving weighted average (shared stock-cost). */
async function seedStock(tx: Tx, now: Date) {
  const stock = new Map<string, StockValue>(DEMO_PARTS.map((p) => [p.id, EMPTY_STOCK]));
  const rows: Array<typeof stockMovements.$inferInsert> = [];
  DEMO_PARTS.forEach((part, p) =>
    part.receipts.forEach(([quantityMilli, unitCostMinor], r) => {
      const before = stock.get(part.id)!;
      const after = receiveStock(before, quantityMilli, unitCostMinor);
      stock.set(part.id, after);
      const id = `c9ac138f-a4b5-46d7-8c23-8e9fabc1${String(p + 1).padStart(2, '0')}${String(r + 1).padStart(2, '0')}`;
      rows.push({ id, workshopId, partId: part.id, kind: 'received', quantityMilli, unitCostMinor, valueMinor: after.valueMinor - before.valueMinor, at: demoInstant(now, 60 - 10 * r) });
    }),
  );
  const jobOfTask = new Map((await tx.select({ id: tasks.id, jobId: tasks.jobId }).from(tasks).where(eq(tasks.workshopId, workshopId))).map((t) => [t.id, t.jobId]));
  for (const use of DEMO_PARTS_USED) {
    const before = stock.get(use.partId)!;
    const { stock: after, costMinor } = issueStock(before, use.quantityMilli);
    stock.set(use.partId, after);
    rows.push({
      id: use.id,
      workshopId,
      partId: use.partId,
      kind: 'used',
      quantityMilli: -use.quantityMilli,
      unitCostMinor: averageUnitCostMinor(before)!,
      valueMinor: -costMinor,
      taskId: use.taskId,
      jobId: jobOfTask.get(use.taskId)!,
      byUserId: use.byUserId,
      at: demoInstant(now, use.daysAgo),
    });
  }
  await tx.insert(stockMovements).values(rows);
}

/** Writes an estimate as a draft with its options and priced lines, then moves it to its status (lines freeze once issued). */
async function seedEstimate(tx: Tx, n: number, e: DemoEstimate, now: Date) {
  const optionIdOf = new Map(e.options.map((o, i) => [o.key, demoOptionId(n, i + 1)]));
  await tx.insert(estimates).values({ id: e.id, workshopId, jobId: e.jobId, revision: e.revision, kind: e.kind, title: e.title, createdAt: demoInstant(now, e.issuedDaysAgo + 1), updatedAt: demoInstant(now, e.issuedDaysAgo + 1) });
  if (e.options.length > 0) {
    await tx.insert(estimateOptions).values(e.options.map((o, position) => ({ id: optionIdOf.get(o.key)!, workshopId, estimateId: e.id, key: o.key, choice: o.choice, name: o.name, position })));
  }
  const priced = e.lines.map((line) => ({ line, f: figures(line, line.option ? optionIdOf.get(line.option)! : null) }));
  await tx.insert(estimateLines).values(
    priced.map(({ line, f }, position) => ({
      id: demoLineId(n, position + 1),
      workshopId,
      estimateId: e.id,
      jobId: e.jobId,
      position,
      kind: line.kind,
      description: line.kind === 'part' ? priceOf.get(line.partId)!.name : line.description,
      taskId: line.kind === 'labour' ? (line.taskId ?? null) : null,
      partId: line.kind === 'part' ? line.partId : null,
      optionId: f.optionId,
      minutes: f.minutes,
      quantityMilli: f.quantityMilli,
      unitPriceMinor: f.unitPriceMinor,
      unitCostMinor: f.unitCostMinor,
      amountMinor: estimateLineAmountMinor(f),
      costMinor: estimateLineCostMinor(f),
    })),
  );
  const chosen = e.options.filter((o) => o.isChosen).map((o) => optionIdOf.get(o.key)!);
  if (chosen.length > 0) await tx.update(estimateOptions).set({ isChosen: true }).where(inArray(estimateOptions.id, chosen));
  const decidedAt = e.decidedDaysAgo === null ? null : demoInstant(now, e.decidedDaysAgo);
  const { netMinor } = estimateTotals(
    priced.map(({ f }) => f),
    chosen,
    DEMO_SETTINGS.taxRateBasisPoints,
  );
  await tx
    .update(estimates)
    .set({
      status: e.status,
      issuedAt: demoInstant(now, e.issuedDaysAgo),
      acceptedAt: e.status === 'accepted' ? decidedAt : null,
      acceptedNetMinor: e.status === 'accepted' ? netMinor : null,
      declinedAt: e.status === 'declined' ? decidedAt : null,
      version: 2,
      updatedAt: decidedAt ?? demoInstant(now, e.issuedDaysAgo),
    })
    .where(eq(estimates.id, e.id));
}

/** Each budgeted task's estimate = the labour minutes of the accepted estimates' chosen lines, as acceptance sets it. */
async function applyLabourBudget(tx: Tx, now: Date) {
  const minutes = new Map<string, number>();
  DEMO_ESTIMATES.filter((e) => e.status === 'accepted').forEach((e) => {
    const chosen = e.options.filter((o) => o.isChosen).map((o) => o.key);
    for (const line of linesInScope(e.lines.map((l) => ({ ...l, optionId: l.option ?? null })), chosen)) {
      if (line.kind === 'labour' && line.taskId) minutes.set(line.taskId, (minutes.get(line.taskId) ?? 0) + line.minutes);
    }
  });
  for (const [id, estimatedMinutes] of minutes) await tx.update(tasks).set({ estimatedMinutes, updatedAt: now }).where(eq(tasks.id, id));
}
