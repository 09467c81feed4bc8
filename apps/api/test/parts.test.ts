import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { EMPTY_STOCK, issueStock, receiveStock, PartDetail, PartList, StockMovementResult, TaskPartsUsed, WallPartList, type Part } from '@keybed/shared';
import { pairWall, setPin } from './bench-fixtures';
import { createJob } from './board-fixtures';
import { createTestApp, type TestApp } from './helpers';
import { ANY_MONEY, COSTS, createPart, keysMatching, moneyWorkshop, receive, SCENARIO_PARTS, useParts, type MoneyWorkshop } from './money-fixtures';
import { ErrorBody } from './schemas';

let t: TestApp;
let w: MoneyWorkshop;
beforeAll(async () => {
  t = await createTestApp();
  w = await moneyWorkshop(t);
});
afterAll(() => t.close());

const errorOf = (body: unknown) => ErrorBody.parse(body).error;
let skuCount = 0;
const sku = (base: string) => `${base}-${++skuCount}`;

/** A job with one task assigned to Priya. */
async function priyasTask(ws: MoneyWorkshop = w) {
  const job = await createJob(ws.owner.agent);
  const res = await ws.owner.agent.post(`/api/jobs/${job.id}/tasks`).send({ title: 'Rebush keys', assigneeIds: [ws.priya.userId] }).expect(201);
  return { job, task: res.body as { id: string } };
}

const ledger = async (partId: string) =>
  (await t.sql<{ quantity: string; value: string }[]>`select coalesce(sum(quantity_milli), 0)::text as quantity, coalesce(sum(value_minor), 0)::text as value from stock_movements where part_id = ${partId}`)[0]!;

describe('POST /api/parts', () => {
  it('when the owner adds a part with a markup, then its sell price is cost plus markup (cost £100, markup 25 % → £125, a 20 % margin [S17])', async () => {
    const part = await createPart(w.owner.agent, { sku: sku('LEAD'), name: 'Key leads, assorted', unit: 'box', unitCostMinor: 10000, sellPriceMinor: undefined, markupBasisPoints: 2500 });
    expect(part).toMatchObject({ unitCostMinor: 10000, markupBasisPoints: 2500, sellPriceMinor: 12500, onHandMilli: 0 });
  });

  it('when a SKU is taken in any case, then 409 on sku and only one part exists', async () => {
    await createPart(w.owner.agent, { sku: 'TP-20X' });
    const res = await w.owner.agent.post('/api/parts').send({ ...SCENARIO_PARTS.tuningPins, sku: 'tp-20x' }).expect(409);
    expect(errorOf(res.body).fields).toHaveProperty('sku');
    expect((await t.sql`select count(*)::int as n from parts where lower(sku) = 'tp-20x'`)[0]!.n).toBe(1);
  });

  it('when the input is wrong, then 400 with each field', async () => {
    const res = await w.owner.agent.post('/api/parts').send({ sku: 'has space', name: '', unit: 'm', unitCostMinor: -5, sellPriceMinor: 2.5 }).expect(400);
    expect(Object.keys(errorOf(res.body).fields ?? {}).sort()).toEqual(['name', 'sellPriceMinor', 'sku', 'unitCostMinor']);
    const both = await w.owner.agent.post('/api/parts').send({ ...SCENARIO_PARTS.shellac, sku: sku('SF'), markupBasisPoints: 2500 }).expect(400);
    expect(errorOf(both.body).fields).toHaveProperty('markupBasisPoints');
    const neither = await w.owner.agent.post('/api/parts').send({ ...SCENARIO_PARTS.shellac, sku: sku('SF'), sellPriceMinor: undefined }).expect(400);
    expect(errorOf(neither.body).fields).toHaveProperty('sellPriceMinor');
  });

  it('when the foreman or a technician adds a part, then 403', async () => {
    await w.foreman.agent.post('/api/parts').send({ ...SCENARIO_PARTS.shellac, sku: sku('SF') }).expect(403);
    await w.priya.agent.post('/api/parts').send({ ...SCENARIO_PARTS.shellac, sku: sku('SF') }).expect(403);
  });
});

describe('PATCH /api/parts/:id', () => {
  it('when the owner sets a fixed price on a marked-up part, then the markup is cleared, and the other way round', async () => {
    const part = await createPart(w.owner.agent, { sku: sku('KBC') });
    const marked = await w.owner.agent.patch(`/api/parts/${part.id}`).send({ markupBasisPoints: 5000 }).expect(200);
    expect(marked.body).toMatchObject({ markupBasisPoints: 5000, sellPriceMinor: 2700 });
    const fixed = await w.owner.agent.patch(`/api/parts/${part.id}`).send({ sellPriceMinor: 2600, reorderLevelMilli: 5000 }).expect(200);
    expect(fixed.body).toMatchObject({ markupBasisPoints: null, sellPriceMinor: 2600, reorderLevelMilli: 5000 });
  });

  it('when both prices are cleared, or nothing is sent, then 400', async () => {
    const part = await createPart(w.owner.agent, { sku: sku('KBC') });
    await w.owner.agent.patch(`/api/parts/${part.id}`).send({ sellPriceMinor: null }).expect(400);
    await w.owner.agent.patch(`/api/parts/${part.id}`).send({}).expect(400);
  });

  it("when another workshop's part is named, then 404", async () => {
    const other = await moneyWorkshop(t);
    const foreign = await createPart(other.owner.agent, { sku: 'KBC-1' });
    await w.owner.agent.patch(`/api/parts/${foreign.id}`).send({ name: 'Mine now' }).expect(404);
    await w.owner.agent.get(`/api/parts/${foreign.id}`).expect(404);
    await w.owner.agent.post(`/api/parts/${foreign.id}/movements`).send({ kind: 'received', quantityMilli: 1000 }).expect(404);
  });
});

describe('GET /api/parts', () => {
  it('when each role lists the catalogue, then the owner sees costs, the foreman sell prices only, technicians quantities only', async () => {
    const part = await createPart(w.owner.agent, { ...SCENARIO_PARTS.damperFelts, sku: sku('DF') });
    await receive(w.owner.agent, part.id, 4000);
    const own = PartList.parse((await w.owner.agent.get('/api/parts').expect(200)).body).parts.find((p) => p.id === part.id)!;
    expect(own).toMatchObject({ unitCostMinor: 9500, sellPriceMinor: 13000, averageUnitCostMinor: 9500, stockValueMinor: 38000, onHandMilli: 4000 });
    const foreman = (await w.foreman.agent.get('/api/parts').expect(200)).body;
    expect(keysMatching(foreman, COSTS)).toEqual([]);
    expect(foreman.parts.find((p: Part) => p.id === part.id)).toMatchObject({ sellPriceMinor: 13000, onHandMilli: 4000 });
    const technician = (await w.priya.agent.get('/api/parts').expect(200)).body;
    expect(keysMatching(technician, ANY_MONEY)).toEqual([]);
    expect(technician.parts.find((p: Part) => p.id === part.id)).toMatchObject({ onHandMilli: 4000 });
    const detail = (await w.priya.agent.get(`/api/parts/${part.id}`).expect(200)).body;
    expect(keysMatching(detail, ANY_MONEY)).toEqual([]);
    expect(PartDetail.parse(detail).movements).toHaveLength(1);
  });

  it('when stock falls to the reorder level, then the part is flagged low and counted, and the low-stock filter finds it', async () => {
    const other = await moneyWorkshop(t);
    const low = await createPart(other.owner.agent, { sku: 'MW-16', reorderLevelMilli: 2000 });
    const plenty = await createPart(other.owner.agent, { sku: 'SF-1', reorderLevelMilli: 1000 });
    await receive(other.owner.agent, low.id, 2000);
    await receive(other.owner.agent, plenty.id, 3000);
    const list = PartList.parse((await other.foreman.agent.get('/api/parts').expect(200)).body);
    expect(list.parts.map((p) => [p.sku, p.isLowStock])).toEqual([['MW-16', true], ['SF-1', false]]);
    expect(list.lowStockCount).toBe(1);
    const filtered = PartList.parse((await other.foreman.agent.get('/api/parts?lowStock=true').expect(200)).body);
    expect(filtered.parts.map((p) => p.sku)).toEqual(['MW-16']);
    await other.owner.agent.patch(`/api/parts/${low.id}`).send({ isActive: false }).expect(200);
    expect(PartList.parse((await other.foreman.agent.get('/api/parts').expect(200)).body).parts.map((p) => p.sku)).toEqual(['SF-1']);
    expect(PartList.parse((await other.foreman.agent.get('/api/parts?include=all').expect(200)).body).parts).toHaveLength(2);
  });

  it('when the query is wrong, then 400', async () => {
    await w.owner.agent.get('/api/parts?lowStock=maybe').expect(400);
  });
});

describe('POST /api/parts/:id/movements', () => {
  it('when 10 @ £5 and 10 @ £7 are received, 5 used, then 5 @ £8 received, then the use costs £30 and the average ends at £6.50 (IAS 2 weighted average, ¶25 from memory)', async () => {
    const part = await createPart(w.owner.agent, { sku: sku('WA'), unitCostMinor: 500, sellPriceMinor: 900 });
    await receive(w.owner.agent, part.id, 10_000, 500);
    await receive(w.foreman.agent, part.id, 10_000, 700);
    const { task } = await priyasTask();
    const used = await useParts(w.owner.agent, task.id, part.id, 5_000);
    expect(used.movement).toMatchObject({ kind: 'used', quantityMilli: -5_000, unitCostMinor: 600, valueMinor: -3_000 });
    const third = await receive(w.owner.agent, part.id, 5_000, 800);
    expect(third.part).toMatchObject({ onHandMilli: 20_000, stockValueMinor: 13_000, averageUnitCostMinor: 650 });
    // The same sequence through the shared functions.
    const expected = receiveStock(issueStock(receiveStock(receiveStock(EMPTY_STOCK, 10_000, 500), 10_000, 700), 5_000).stock, 5_000, 800);
    expect(await ledger(part.id)).toEqual({ quantity: String(expected.quantityMilli), value: String(expected.valueMinor) });
  });

  it('when received without a cost, then the catalogue cost is used', async () => {
    const part = await createPart(w.owner.agent, { ...SCENARIO_PARTS.wire16, sku: sku('MW') });
    const res = await receive(w.foreman.agent, part.id, 3000);
    expect(res.part.onHandMilli).toBe(3000);
    expect((await w.owner.agent.get(`/api/parts/${part.id}`)).body.stockValueMinor).toBe(4350);
    expect(keysMatching(res, COSTS)).toEqual([]);
  });

  it('when a count finds one missing, then an adjustment with its reason takes it out at the average cost', async () => {
    const part = await createPart(w.owner.agent, { ...SCENARIO_PARTS.tuningPins, sku: sku('TP') });
    await receive(w.owner.agent, part.id, 3000);
    const res = await w.foreman.agent.post(`/api/parts/${part.id}/movements`).send({ kind: 'adjusted', quantity: '-1', reason: 'Stock count: one box missing' }).expect(201);
    expect(StockMovementResult.parse(res.body).part.onHandMilli).toBe(2000);
    expect(await ledger(part.id)).toEqual({ quantity: '2000', value: '12400' });
  });

  it('when an adjustment has no reason, would go below zero, or the kind is unknown, then it is refused and stock is unchanged', async () => {
    const part = await createPart(w.owner.agent, { sku: sku('KBC') });
    await receive(w.owner.agent, part.id, 1000);
    const noReason = await w.owner.agent.post(`/api/parts/${part.id}/movements`).send({ kind: 'adjusted', quantityMilli: -500 }).expect(400);
    expect(errorOf(noReason.body).fields).toHaveProperty('reason');
    const tooMany = await w.owner.agent.post(`/api/parts/${part.id}/movements`).send({ kind: 'adjusted', quantityMilli: -1500, reason: 'Damaged in the damp' }).expect(409);
    expect(errorOf(tooMany.body).code).toBe('insufficient_stock');
    await w.owner.agent.post(`/api/parts/${part.id}/movements`).send({ kind: 'used', quantityMilli: 1000 }).expect(400);
    await w.owner.agent.post(`/api/parts/${part.id}/movements`).send({ kind: 'received', quantity: '1.2345' }).expect(400);
    expect(await ledger(part.id)).toEqual({ quantity: '1000', value: '1800' });
  });

  it('when a technician records a delivery, then 403', async () => {
    const part = await createPart(w.owner.agent, { sku: sku('KBC') });
    await w.priya.agent.post(`/api/parts/${part.id}/movements`).send({ kind: 'received', quantityMilli: 1000 }).expect(403);
  });

  it('when unused parts come back from a task, then they return at what they cost the task, and no more than was used may return', async () => {
    const part = await createPart(w.owner.agent, { sku: sku('KBC') });
    await receive(w.owner.agent, part.id, 3000, 1800);
    await receive(w.owner.agent, part.id, 3000, 1950);
    const { task } = await priyasTask();
    await useParts(w.priya.agent, task.id, part.id, 2500); // 2.5 m at the average £18.75 = £46.88 (4687.5p → 4688p)
    const back = await w.foreman.agent.post(`/api/parts/${part.id}/movements`).send({ kind: 'returned', taskId: task.id, quantity: 0.5 }).expect(201);
    expect(back.body.movement).toMatchObject({ kind: 'returned', quantityMilli: 500 });
    const used = TaskPartsUsed.parse((await w.owner.agent.get(`/api/tasks/${task.id}/parts-used`).expect(200)).body);
    expect(used.totals).toEqual([expect.objectContaining({ partId: part.id, quantityMilli: 2000, costMinor: 3750 })]); // 4688 − 938 (4688 × 0.5/2.5 = 937.6)
    const tooMany = await w.foreman.agent.post(`/api/parts/${part.id}/movements`).send({ kind: 'returned', taskId: task.id, quantityMilli: 2500 }).expect(409);
    expect(errorOf(tooMany.body).code).toBe('conflict');
  });
});

describe('POST /api/tasks/:id/parts-used', () => {
  it('when 20 uses of one unit race for the last 5 in stock, then exactly 5 are recorded, 15 are refused with 409, and stock ends at zero', async () => {
    const part = await createPart(w.owner.agent, { ...SCENARIO_PARTS.damperFelts, sku: sku('DF') });
    await receive(w.owner.agent, part.id, 5000);
    const { task } = await priyasTask();
    const answers = await Promise.all(Array.from({ length: 20 }, () => w.priya.agent.post(`/api/tasks/${task.id}/parts-used`).send({ partId: part.id, quantityMilli: 1000 })));
    const statuses = answers.map((r) => r.status).sort();
    expect(statuses.filter((s) => s === 201)).toHaveLength(5);
    expect(statuses.filter((s) => s === 409)).toHaveLength(15);
    expect(answers.filter((r) => r.status === 409).every((r) => errorOf(r.body).code === 'insufficient_stock')).toBe(true);
    expect(await ledger(part.id)).toEqual({ quantity: '0', value: '0' });
  });

  it('when the workshop allows negative stock, then a use beyond what is on hand is recorded at the catalogue cost for the shortfall', async () => {
    const other = await moneyWorkshop(t, { allowNegativeStock: true });
    const part = await createPart(other.owner.agent, { ...SCENARIO_PARTS.tuningPins });
    await receive(other.owner.agent, part.id, 1000);
    const { task } = await priyasTask(other);
    const used = await useParts(other.owner.agent, task.id, part.id, 3000);
    expect(used.part.onHandMilli).toBe(-2000);
    expect(used.movement.valueMinor).toBe(-18600);
  });

  it('when a technician logs a part on a task not theirs, then 403; on their own task, then 201 with no money in the answer', async () => {
    const part = await createPart(w.owner.agent, { sku: sku('KBC') });
    await receive(w.owner.agent, part.id, 5000);
    const { task } = await priyasTask();
    const res = await w.declan.agent.post(`/api/tasks/${task.id}/parts-used`).send({ partId: part.id, quantityMilli: 1000 }).expect(403);
    expect(errorOf(res.body).code).toBe('forbidden');
    const mine = await w.priya.agent.post(`/api/tasks/${task.id}/parts-used`).send({ partId: part.id, quantity: '1.5' }).expect(201);
    expect(mine.body.movement.quantityMilli).toBe(-1500);
    expect(keysMatching(mine.body, ANY_MONEY)).toEqual([]);
  });

  it("when the part or the task belongs to another workshop, then it is refused and nothing moves", async () => {
    const other = await moneyWorkshop(t);
    const foreignPart = await createPart(other.owner.agent, { sku: 'KBC-1' });
    await receive(other.owner.agent, foreignPart.id, 5000);
    const foreignTask = await priyasTask(other);
    const { task } = await priyasTask();
    const part = await createPart(w.owner.agent, { sku: sku('KBC') });
    await receive(w.owner.agent, part.id, 5000);
    const res = await w.owner.agent.post(`/api/tasks/${task.id}/parts-used`).send({ partId: foreignPart.id, quantityMilli: 1000 }).expect(400);
    expect(errorOf(res.body).fields).toHaveProperty('partId');
    await w.owner.agent.post(`/api/tasks/${foreignTask.task.id}/parts-used`).send({ partId: part.id, quantityMilli: 1000 }).expect(404);
    expect(await ledger(foreignPart.id)).toEqual({ quantity: '5000', value: '9000' });
  });

  it('when the quantity is zero, negative, too precise or missing, then 400', async () => {
    const { task } = await priyasTask();
    const part = await createPart(w.owner.agent, { sku: sku('KBC') });
    for (const body of [{ quantityMilli: 0 }, { quantityMilli: -1000 }, { quantity: '0.0005' }, {}, { quantityMilli: 1.5 }]) {
      const res = await w.owner.agent.post(`/api/tasks/${task.id}/parts-used`).send({ partId: part.id, ...body }).expect(400);
      expect(errorOf(res.body).code).toBe('validation_failed');
    }
  });
});

describe('POST /api/tasks/:id/parts-used/corrections', () => {
  it('when the foreman corrects a use recorded as 3 that was 2, then an adjustment with the reason gives one back at its cost', async () => {
    const part = await createPart(w.owner.agent, { ...SCENARIO_PARTS.tuningPins, sku: sku('TP') });
    await receive(w.owner.agent, part.id, 5000);
    const { task } = await priyasTask();
    await useParts(w.priya.agent, task.id, part.id, 3000);
    const res = await w.foreman.agent.post(`/api/tasks/${task.id}/parts-used/corrections`).send({ partId: part.id, quantityMilli: -1000, reason: 'Logged three boxes, used two' }).expect(201);
    expect(res.body.movement).toMatchObject({ kind: 'adjusted', quantityMilli: 1000, reason: 'Logged three boxes, used two' });
    expect(keysMatching(res.body, COSTS)).toEqual([]);
    const used = TaskPartsUsed.parse((await w.owner.agent.get(`/api/tasks/${task.id}/parts-used`).expect(200)).body);
    expect(used.totals[0]).toMatchObject({ quantityMilli: 2000, costMinor: 12400 });
  });

  it('when a technician corrects, or the reason is missing, then it is refused', async () => {
    const { task } = await priyasTask();
    const part = await createPart(w.owner.agent, { sku: sku('KBC') });
    await w.priya.agent.post(`/api/tasks/${task.id}/parts-used/corrections`).send({ partId: part.id, quantityMilli: -1000, reason: 'Wrong count' }).expect(403);
    const res = await w.foreman.agent.post(`/api/tasks/${task.id}/parts-used/corrections`).send({ partId: part.id, quantityMilli: -1000 }).expect(400);
    expect(errorOf(res.body).fields).toHaveProperty('reason');
  });
});

describe('POST /api/wall/parts-used', () => {
  it('when a technician at the wall screen picks a part (low stock marked) and logs it with their PIN, then it is recorded; a wrong PIN records nothing', async () => {
    const other = await moneyWorkshop(t);
    await setPin(other.owner.agent, other.declan.userId, '135790');
    const part = await createPart(other.owner.agent, { ...SCENARIO_PARTS.wire16, reorderLevelMilli: 4000 });
    await receive(other.owner.agent, part.id, 4000);
    const { task } = await priyasTask(other);
    const wall = await pairWall(t, other.owner);
    // On hand at the reorder level counts as low stock.
    const parts = WallPartList.parse((await wall.agent.get('/api/wall/parts').expect(200)).body);
    expect(parts.parts).toEqual([{ id: part.id, sku: 'MW-16', name: 'Music wire, plain steel, size 16', unit: 'coil (1 lb)', onHandMilli: 4000, isLowStock: true }]);
    const wrong = await wall.agent.post('/api/wall/parts-used').send({ technicianId: other.declan.userId, pin: '000000', taskId: task.id, partId: part.id, quantityMilli: 1000 });
    expect(errorOf(wrong.body).code).toBe('pin_incorrect');
    const res = await wall.agent.post('/api/wall/parts-used').send({ technicianId: other.declan.userId, pin: '135790', taskId: task.id, partId: part.id, quantity: 1 }).expect(201);
    expect(res.body.movement).toMatchObject({ kind: 'used', quantityMilli: -1000, by: { id: other.declan.userId } });
    expect(keysMatching(res.body, ANY_MONEY)).toEqual([]);
    expect(await ledger(part.id)).toEqual({ quantity: '3000', value: '4350' });
  });

  it('when a member session calls the wall route, then 401', async () => {
    await w.owner.agent.post('/api/wall/parts-used').send({}).expect(401);
  });
});

describe('stock ledger in the database', () => {
  it('when a movement is changed or removed directly, or a direct insert would take stock below zero, then PostgreSQL refuses', async () => {
    const part = await createPart(w.owner.agent, { sku: sku('KBC') });
    const { movement } = await receive(w.owner.agent, part.id, 1000);
    await expect(t.sql`update stock_movements set quantity_milli = 5000 where id = ${movement.id}`).rejects.toThrow(/cannot be changed/);
    await expect(t.sql`delete from stock_movements where id = ${movement.id}`).rejects.toThrow(/cannot be changed/);
    const { task, job } = await priyasTask();
    await expect(
      t.sql`insert into stock_movements (workshop_id, part_id, kind, quantity_milli, unit_cost_minor, value_minor, task_id, job_id)
            values (${w.workshopId}, ${part.id}, 'used', -2000, 1800, -3600, ${task.id}, ${job.id})`,
    ).rejects.toThrow(/below zero/);
    await expect(
      t.sql`insert into stock_movements (workshop_id, part_id, kind, quantity_milli, unit_cost_minor, value_minor) values (${w.workshopId}, ${part.id}, 'used', -500, 1800, -900)`,
    ).rejects.toThrow(/stock_movements_kind_rules/);
  });
});
