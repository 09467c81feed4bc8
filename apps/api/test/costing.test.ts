import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { JobCosting, MarginsReport, forecastAtCompletion, labourCost, workingMinutesInPeriod, type Job, type Task } from '@keybed/shared';
import { createJob } from './board-fixtures';
import { createTestApp, type TestApp } from './helpers';
import { ANY_MONEY, addCostRate, createPart, insertEntry, keysMatching, moneyWorkshop, receive, SCENARIO_PARTS, useParts, type MoneyWorkshop } from './money-fixtures';
import { ErrorBody } from './schemas';

let statements = 0;
let t: TestApp;
let w: MoneyWorkshop;
const NOW = new Date('2026-06-15T12:00:00Z');
beforeAll(async () => {
  t = await createTestApp({ now: () => NOW, onQuery: () => statements++ });
  w = await moneyWorkshop(t);
});
afterAll(() => t.close());

const errorOf = (body: unknown) => ErrorBody.parse(body).error;
const LONDON = 'Europe/London';

// Cost rates from SCENARIO.md (Priya £24/h, Declan £22/h); Priya's rise to £25/h from 2 March 2026 is invented.
const RATES = {
  priya: [
    { effectiveFrom: '2026-01-05', rateMinorPerHour: 2400 },
    { effectiveFrom: '2026-03-02', rateMinorPerHour: 2500 },
  ],
  declan: [{ effectiveFrom: '2026-01-05', rateMinorPerHour: 2200 }],
};

interface Scene {
  salon: Job;
  school: Job;
  rebush: Task;
  hang: Task;
  entries: Array<{ who: 'priya' | 'declan' | 'foreman'; taskId: string; startedAt: string; endedAt: string }>;
}
let scene: Scene;

/** Drafts, issues and accepts an estimate without options. */
async function accept(agent: MoneyWorkshop['owner']['agent'], jobId: string, body: object) {
  const e = (await agent.post(`/api/jobs/${jobId}/estimates`).send(body).expect(201)).body;
  await agent.post(`/api/estimates/${e.id}/issue`).expect(200);
  return (await agent.post(`/api/estimates/${e.id}/accept`).send({}).expect(200)).body;
}

beforeAll(async () => {
  for (const r of RATES.priya) await addCostRate(w.owner.agent, w.priya.userId, r.effectiveFrom, r.rateMinorPerHour);
  for (const r of RATES.declan) await addCostRate(w.owner.agent, w.declan.userId, r.effectiveFrom, r.rateMinorPerHour);
  const hammers = await createPart(w.owner.agent, SCENARIO_PARTS.grandHammers);
  await receive(w.owner.agent, hammers.id, 1000);

  const salon = await createJob(w.owner.agent, { title: 'Salon grand: new hammers, rebush, refinish' });
  await accept(w.owner.agent, salon.id, {
    lines: [
      { kind: 'labour', description: 'Rebush keys', minutes: 600 },
      { kind: 'labour', description: 'Hang new hammers', minutes: 480 },
      { kind: 'part', partId: hammers.id, quantityMilli: 1000 },
      { kind: 'sublet', description: 'Black polyester refinish (Heathside Finishers)', unitPriceMinor: 185000, unitCostMinor: 145000 },
    ],
  });
  const [rebush, hang] = (await w.owner.agent.get(`/api/jobs/${salon.id}/tasks`).expect(200)).body.tasks as Task[];
  await useParts(w.owner.agent, hang!.id, hammers.id, 1000);
  await w.owner.agent.post(`/api/jobs/${salon.id}/sublet-bills`).send({ supplier: 'Heathside Finishers', description: 'Black polyester refinish', costMinor: 148000, receivedOn: '2026-04-20' }).expect(201);

  const school = await createJob(w.owner.agent, { title: 'Osterholt upright: rebush after moth' });
  await accept(w.owner.agent, school.id, { lines: [{ kind: 'labour', description: 'Rebush after moth', minutes: 120 }] });
  const [schoolTask] = (await w.owner.agent.get(`/api/jobs/${school.id}/tasks`).expect(200)).body.tasks as Task[];

  const entries: Scene['entries'] = [
    { who: 'priya', taskId: rebush!.id, startedAt: '2026-02-02T09:00:00Z', endedAt: '2026-02-02T11:07:00Z' }, // 127 min at £24: 5080p
    { who: 'priya', taskId: rebush!.id, startedAt: '2026-03-03T09:00:00Z', endedAt: '2026-03-03T09:07:00Z' }, // 7 min at £25: 291.67p → 292p
    { who: 'declan', taskId: hang!.id, startedAt: '2026-03-04T10:00:00Z', endedAt: '2026-03-04T16:00:00Z' }, // 360 min at £22: 13 200p
    { who: 'foreman', taskId: rebush!.id, startedAt: '2026-03-05T10:00:00Z', endedAt: '2026-03-05T10:30:00Z' }, // no rate: 0p, 30 unrated
    { who: 'declan', taskId: schoolTask!.id, startedAt: '2026-03-10T09:00:00Z', endedAt: '2026-03-10T13:00:00Z' }, // 240 min at £22: 8 800p
  ];
  for (const e of entries) {
    const jobId = e.taskId === schoolTask!.id ? school.id : salon.id;
    await insertEntry(t, { workshopId: w.workshopId, technicianId: w[e.who].userId, taskId: e.taskId, jobId, startedAt: e.startedAt, endedAt: e.endedAt });
  }
  scene = { salon, school, rebush: rebush!, hang: hang!, entries };
});

describe('GET /api/jobs/:id/costing', () => {
  it("when Priya's rate rose mid-job, then each entry is costed at the rate in force on its own day, as the shared labourCost says", async () => {
    const costing = JobCosting.parse((await w.owner.agent.get(`/api/jobs/${scene.salon.id}/costing`).expect(200)).body);
    const salonEntries = scene.entries.filter((e) => e.taskId !== scene.entries[4]!.taskId);
    const expected = labourCost(
      salonEntries.map((e) => ({ technicianId: e.who, startedAt: e.startedAt, minutes: (Date.parse(e.endedAt) - Date.parse(e.startedAt)) / 60_000 })),
      RATES,
      LONDON,
    );
    expect(expected.costMinor).toBe(5080 + 292 + 13200);
    expect(costing.money).toMatchObject({ labourCostMinor: expected.costMinor, unratedMinutes: expected.unratedMinutes });
    const rebush = costing.tasks.find((x) => x.taskId === scene.rebush.id)!;
    expect(rebush).toMatchObject({ estimatedMinutes: 600, actualMinutes: 164, isOverEstimate: false });
    expect(rebush.money).toEqual({ labourCostMinor: 5372, unratedMinutes: 30, partsCostMinor: 0, costToDateMinor: 5372 });
  });

  it('when entries straddle local midnight in summer time, then each is costed by its London date, as labourCost says', async () => {
    const other = await moneyWorkshop(t);
    await addCostRate(other.owner.agent, other.priya.userId, '2026-01-05', 2400);
    await addCostRate(other.owner.agent, other.priya.userId, '2026-04-01', 2600);
    const job = await createJob(other.owner.agent);
    const task = (await other.owner.agent.post(`/api/jobs/${job.id}/tasks`).send({ title: 'Regulate' }).expect(201)).body as Task;
    const entries = [
      { startedAt: '2026-03-31T22:00:00Z', endedAt: '2026-03-31T22:50:00Z' }, // 23:00 BST on 31 March: £24
      { startedAt: '2026-03-31T23:10:00Z', endedAt: '2026-03-31T23:47:00Z' }, // 00:10 BST on 1 April: £26
    ];
    for (const e of entries) await insertEntry(t, { workshopId: other.workshopId, technicianId: other.priya.userId, taskId: task.id, jobId: job.id, ...e });
    const expected = labourCost(
      entries.map((e) => ({ technicianId: 'priya', startedAt: e.startedAt, minutes: (Date.parse(e.endedAt) - Date.parse(e.startedAt)) / 60_000 })),
      { priya: [{ effectiveFrom: '2026-01-05', rateMinorPerHour: 2400 }, { effectiveFrom: '2026-04-01', rateMinorPerHour: 2600 }] },
      LONDON,
    );
    expect(expected.entries.map((e) => e.rateMinorPerHour)).toEqual([2400, 2600]);
    const costing = JobCosting.parse((await other.owner.agent.get(`/api/jobs/${job.id}/costing`).expect(200)).body);
    expect(costing.money?.labourCostMinor).toBe(expected.costMinor); // 2000p + 1603.3p → 1603p
  });

  it('when a later rate is added, then costs already incurred do not change', async () => {
    const before = (await w.owner.agent.get(`/api/jobs/${scene.salon.id}/costing`)).body.money.labourCostMinor;
    await addCostRate(w.owner.agent, w.priya.userId, '2026-06-01', 3000);
    expect((await w.owner.agent.get(`/api/jobs/${scene.salon.id}/costing`)).body.money.labourCostMinor).toBe(before);
  });

  it('when the Salon grand is costed, then labour, parts and the sublet bill make the cost to date and the forecast follows the shared forecast', async () => {
    const costing = JobCosting.parse((await w.owner.agent.get(`/api/jobs/${scene.salon.id}/costing`).expect(200)).body);
    expect(costing.hours).toEqual({ estimatedMinutes: 1080, actualMinutes: 524, remainingMinutes: 436 + 120, minutesOverEstimate: 0, isOverEstimate: false });
    // Blended rate so far: 18 572p × 60 / 494 rated min = 2255.7 → 2256p/h; 556 min left → 20 905.6 → 20 906p.
    expect(costing.money).toEqual({
      priceMinor: 55000 + 44000 + 69000 + 185000,
      labourCostMinor: 18572,
      unratedMinutes: 30,
      partsCostMinor: 52000,
      subletCostMinor: 148000,
      costToDateMinor: 218572,
      averageCostRateMinorPerHour: 2256,
      remainingLabourMinor: 20906,
      unusedBudgetedPartsMinor: 0,
      unbilledSubletMinor: 0,
      forecastCostMinor: 239478,
      forecastMarginMinor: 113522,
      forecastMarginPercent: (113522 * 100) / 353000,
      targetMarginBasisPoints: 2500,
      isBelowTargetMargin: false,
      receivedMinor: 0,
    });
    const shared = forecastAtCompletion({
      priceMinor: 353000,
      labourCostToDateMinor: 18572,
      partsCostToDateMinor: 52000,
      subletCostToDateMinor: 148000,
      minutesToDate: 524,
      budgetedMinutes: 1080,
      averageCostRateMinorPerHour: 2256,
      unusedBudgetedPartsMinor: 0,
      unbilledSubletMinor: 0,
      targetMarginBasisPoints: 2500,
      estimatedMinutesToComplete: 556,
    });
    expect(costing.money?.forecastCostMinor).toBe(shared.forecastCostMinor);
    expect(costing.parts).toEqual([expect.objectContaining({ sku: 'HS-G88', usedQuantityMilli: 1000, budgetedQuantityMilli: 1000, costMinor: 52000, budgetCostMinor: 52000 })]);
    expect(costing.tasks.find((x) => x.taskId === scene.hang.id)!.parts).toEqual([expect.objectContaining({ sku: 'HS-G88', quantityMilli: 1000, costMinor: 52000 })]);
    expect(costing.subletBills).toEqual([expect.objectContaining({ supplier: 'Heathside Finishers', costMinor: 148000, receivedOn: '2026-04-20' })]);
  });

  it('when the school upright has run over its hours at a thin margin, then both flags are raised', async () => {
    const costing = JobCosting.parse((await w.owner.agent.get(`/api/jobs/${scene.school.id}/costing`).expect(200)).body);
    expect(costing.hours).toMatchObject({ estimatedMinutes: 120, actualMinutes: 240, minutesOverEstimate: 120, isOverEstimate: true, remainingMinutes: 0 });
    expect(costing.money).toMatchObject({ priceMinor: 11000, costToDateMinor: 8800, forecastCostMinor: 8800, forecastMarginMinor: 2200, isBelowTargetMargin: true });
    expect(costing.tasks[0]).toMatchObject({ isOverEstimate: true, minutesOverEstimate: 120 });
  });

  it('when the foreman or a technician opens the costing, then hours and part quantities are there and no money field at all', async () => {
    for (const agent of [w.foreman.agent, w.priya.agent]) {
      const body = (await agent.get(`/api/jobs/${scene.salon.id}/costing`).expect(200)).body;
      expect(keysMatching(body, ANY_MONEY)).toEqual([]);
      const costing = JobCosting.parse(body);
      expect(costing.hours.actualMinutes).toBe(524);
      expect(costing.parts[0]).toMatchObject({ usedQuantityMilli: 1000 });
    }
  });

  it("when another workshop's job is asked for, then 404; a bad id, 400", async () => {
    const other = await moneyWorkshop(t);
    const foreign = await createJob(other.owner.agent);
    await w.owner.agent.get(`/api/jobs/${foreign.id}/costing`).expect(404);
    await w.owner.agent.get('/api/jobs/nope/costing').expect(400);
  });
});

describe('POST /api/jobs/:id/sublet-bills', () => {
  it('when the foreman records a bill, or the input is wrong, or the job is another workshop’s, then it is refused', async () => {
    await w.foreman.agent.post(`/api/jobs/${scene.salon.id}/sublet-bills`).send({ supplier: 'Heathside Finishers', description: 'x', costMinor: 100, receivedOn: '2026-04-20' }).expect(403);
    const bad = await w.owner.agent.post(`/api/jobs/${scene.salon.id}/sublet-bills`).send({ supplier: '', description: 'Refinish', costMinor: 0, receivedOn: '20 April' }).expect(400);
    expect(Object.keys(errorOf(bad.body).fields ?? {}).sort()).toEqual(['costMinor', 'receivedOn', 'supplier']);
    const other = await moneyWorkshop(t);
    const foreign = await createJob(other.owner.agent);
    await w.owner.agent.post(`/api/jobs/${foreign.id}/sublet-bills`).send({ supplier: 'Heathside Finishers', description: 'Refinish', costMinor: 100, receivedOn: '2026-04-20' }).expect(404);
    expect((await w.owner.agent.get(`/api/jobs/${scene.salon.id}/sublet-bills`).expect(200)).body.bills).toHaveLength(1);
  });
});

describe('GET /api/reports/margins', () => {
  it('when the owner loads the year, then one row per job, at-risk first, with totals', async () => {
    const report = MarginsReport.parse((await w.owner.agent.get('/api/reports/margins?from=2026-01-01&to=2026-12-31').expect(200)).body);
    expect(report.rows.map((r) => [r.title, r.isAtRisk, r.isBelowTargetMargin, r.isOverEstimate])).toEqual([
      ['Osterholt upright: rebush after moth', true, true, true],
      ['Salon grand: new hammers, rebush, refinish', false, false, false],
    ]);
    expect(report.rows[1]).toMatchObject({ priceMinor: 353000, costToDateMinor: 218572, forecastCostMinor: 239478, forecastMarginMinor: 113522, estimatedMinutes: 1080, actualMinutes: 524 });
    expect(report.totals).toMatchObject({ jobCount: 2, atRiskCount: 1, priceMinor: 364000, costToDateMinor: 227372, forecastCostMinor: 248278, forecastMarginMinor: 115722, estimatedMinutes: 1200, actualMinutes: 764 });
    expect(report.totals.forecastMarginPercent).toBeCloseTo((115722 * 100) / 364000, 10);
  });

  it('when the period is March, then utilisation is minutes on job tasks ÷ the working minutes of its weekdays (08:00–17:30)', async () => {
    const report = MarginsReport.parse((await w.owner.agent.get('/api/reports/margins?from=2026-03-01&to=2026-03-31').expect(200)).body);
    const available = workingMinutesInPeriod('2026-03-01', '2026-03-31', [1, 2, 3, 4, 5], '08:00', '17:30');
    expect(available).toBe(22 * 570);
    const byId = new Map(report.utilisation.technicians.map((x) => [x.id, x]));
    expect(byId.get(w.declan.userId)).toMatchObject({ workedMinutes: 600, availableMinutes: available, utilisation: 600 / available });
    expect(byId.get(w.priya.userId)).toMatchObject({ workedMinutes: 7 });
    expect(byId.get(w.foreman.userId)).toMatchObject({ workedMinutes: 30 });
    expect(report.utilisation.total).toEqual({ workedMinutes: 637, availableMinutes: 3 * available, utilisation: 637 / (3 * available) });
  });

  it('when a status is chosen, then only jobs of that status are listed', async () => {
    const report = MarginsReport.parse((await w.owner.agent.get('/api/reports/margins?from=2026-01-01&to=2026-12-31&status=done').expect(200)).body);
    expect(report.rows).toEqual([]);
    expect(report.totals).toMatchObject({ jobCount: 0, priceMinor: 0, forecastMarginPercent: null });
  });

  it('when CSV is asked for, then the rows and the totals row come as text with exact money', async () => {
    const res = await w.owner.agent.get('/api/reports/margins?from=2026-01-01&to=2026-12-31&format=csv').expect(200);
    expect(res.headers['content-type']).toMatch(/^text\/csv/);
    expect(res.text.split('\r\n')).toEqual([
      'Job,Client,Status,Price (GBP),Cost to date,Forecast cost,Forecast margin,Forecast margin %,Hours estimated,Hours actual,At risk',
      'Osterholt upright: rebush after moth,Harriet Pembleton,active,110.00,88.00,88.00,22.00,20.0,2:00,4:00,yes',
      '"Salon grand: new hammers, rebush, refinish",Harriet Pembleton,active,3530.00,2185.72,2394.78,1135.22,32.2,18:00,8:44,no',
      'Total (2 jobs),,,3640.00,2273.72,2482.78,1157.22,31.8,20:00,12:44,1 at risk',
      '',
    ]);
  });

  it('when the foreman or a technician asks, then 403', async () => {
    await w.foreman.agent.get('/api/reports/margins').expect(403);
    await w.priya.agent.get('/api/reports/margins').expect(403);
  });

  it('when the query is wrong, then 400 with the fields', async () => {
    const res = await w.owner.agent.get('/api/reports/margins?from=2026-12-31&to=2026-01-01&status=finished').expect(400);
    expect(Object.keys(errorOf(res.body).fields ?? {}).sort()).toEqual(['status']);
    const order = await w.owner.agent.get('/api/reports/margins?from=2026-12-31&to=2026-01-01').expect(400);
    expect(errorOf(order.body).fields).toHaveProperty('to');
  });

  it('when another workshop has many more jobs, then its report takes as many SQL statements as this one and shows none of this workshop’s jobs', async () => {
    const count = async (agent: typeof w.owner.agent) => {
      statements = 0;
      const res = await agent.get('/api/reports/margins?from=2026-01-01&to=2026-12-31').expect(200);
      return { statements, rows: MarginsReport.parse(res.body).rows };
    };
    const other = await moneyWorkshop(t);
    for (let i = 0; i < 6; i++) {
      const job = await createJob(other.owner.agent, { title: `Tuning visit ${i}` });
      await accept(other.owner.agent, job.id, { lines: [{ kind: 'other', description: 'Tuning', unitPriceMinor: 9000 }] });
    }
    const mine = await count(w.owner.agent);
    const theirs = await count(other.owner.agent);
    expect(theirs.rows).toHaveLength(6);
    expect(theirs.rows.some((r) => r.jobId === scene.salon.id)).toBe(false);
    expect(theirs.statements).toBe(mine.statements);
  });
});
