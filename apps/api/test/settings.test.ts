import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { CostRateList, WorkshopSettings } from '@keybed/shared';
import { createJob } from './board-fixtures';
import { createTestApp, signUpWorkshop, type TestApp } from './helpers';
import { ANY_MONEY, COSTS, FENNICK_SETTINGS, createPart, insertEntry, keysMatching, membershipOf, moneyWorkshop, type MoneyWorkshop } from './money-fixtures';
import { ErrorBody } from './schemas';

let t: TestApp;
let w: MoneyWorkshop;
beforeAll(async () => {
  t = await createTestApp({ now: () => new Date('2026-03-16T12:00:00Z') });
  w = await moneyWorkshop(t);
});
afterAll(() => t.close());

const errorOf = (body: unknown) => ErrorBody.parse(body).error;

describe('GET /api/settings', () => {
  it('when the owner reads the settings, then every one is there', async () => {
    const res = await w.owner.agent.get('/api/settings').expect(200);
    expect(WorkshopSettings.parse(res.body)).toEqual(FENNICK_SETTINGS);
  });

  it('when the foreman reads them, then prices are there but the target margin is absent', async () => {
    const res = await w.foreman.agent.get('/api/settings').expect(200);
    expect(res.body).toMatchObject({ currency: 'GBP', labourRateMinorPerHour: 5500, taxRateBasisPoints: 2000 });
    expect(keysMatching(res.body, COSTS)).toEqual([]);
    expect('targetMarginBasisPoints' in res.body).toBe(false);
  });

  it('when a technician reads them, then no money field is present at all', async () => {
    const res = await w.priya.agent.get('/api/settings').expect(200);
    expect(keysMatching(res.body, ANY_MONEY)).toEqual([]);
    expect(res.body).toMatchObject({ timeZone: 'Europe/London', workingDayStart: '08:00', workingDayEnd: '17:30' });
  });

  it('when nobody is signed in, then 401', async () => {
    await t.request().get('/api/settings').expect(401);
  });
});

describe('PUT /api/settings', () => {
  it('when the owner changes the target margin and working days, then they are kept', async () => {
    const other = await signUpWorkshop(t, 'settings');
    const res = await other.agent.put('/api/settings').send({ ...FENNICK_SETTINGS, targetMarginBasisPoints: 3000, workingWeekdays: [6, 1, 2] }).expect(200);
    expect(res.body).toMatchObject({ targetMarginBasisPoints: 3000, workingWeekdays: [1, 2, 6] });
    expect((await other.agent.get('/api/settings').expect(200)).body.targetMarginBasisPoints).toBe(3000);
  });

  it.each([
    { role: 'foreman' as const },
    { role: 'priya' as const },
  ])('when the $role tries, then 403 and nothing changes', async ({ role }) => {
    const res = await w[role].agent.put('/api/settings').send({ ...FENNICK_SETTINGS, labourRateMinorPerHour: 1 }).expect(403);
    expect(errorOf(res.body).code).toBe('forbidden');
    expect((await w.owner.agent.get('/api/settings')).body.labourRateMinorPerHour).toBe(5500);
  });

  it('when fields are wrong, then 400 names each and nothing changes', async () => {
    const res = await w.owner.agent
      .put('/api/settings')
      .send({ ...FENNICK_SETTINGS, currency: 'XQQ', taxRateBasisPoints: 20.5, timeZone: 'Atlantis/Harbour', workingDayStart: '17:30', workingDayEnd: '08:00', workingWeekdays: [], labourRateMinorPerHour: -1 })
      .expect(400);
    expect(Object.keys(errorOf(res.body).fields ?? {}).sort()).toEqual(['currency', 'labourRateMinorPerHour', 'taxRateBasisPoints', 'timeZone', 'workingWeekdays']);
    const order = await w.owner.agent.put('/api/settings').send({ ...FENNICK_SETTINGS, workingDayStart: '17:30', workingDayEnd: '08:00' }).expect(400);
    expect(errorOf(order.body).fields).toHaveProperty('workingDayEnd');
    expect(WorkshopSettings.parse((await w.owner.agent.get('/api/settings')).body)).toEqual(FENNICK_SETTINGS);
  });

  it('when prices exist in GBP and the owner switches to EUR, then 409 on the currency', async () => {
    const other = await moneyWorkshop(t);
    await createPart(other.owner.agent, { sku: 'KBC-1' });
    const res = await other.owner.agent.put('/api/settings').send({ ...FENNICK_SETTINGS, currency: 'EUR' }).expect(409);
    expect(errorOf(res.body).fields).toHaveProperty('currency');
  });

  it('when the database is asked for a tax rate above 100 %, then its CHECK refuses', async () => {
    await expect(t.sql`update workshops set tax_rate_basis_points = 10001 where id = ${w.workshopId}`).rejects.toThrow(/workshops_tax_rate_range/);
  });
});

describe('POST /api/team/members/:id/cost-rates', () => {
  it("when the owner sets Priya's rate, then it is listed and in force today", async () => {
    const other = await moneyWorkshop(t);
    const member = await membershipOf(other.owner.agent, other.priya.userId);
    const res = await other.owner.agent.post(`/api/team/members/${member}/cost-rates`).send({ effectiveFrom: '2026-01-05', rateMinorPerHour: 2400 }).expect(201);
    const list = CostRateList.parse(res.body);
    expect(list.currentRateMinorPerHour).toBe(2400);
    expect(list.rates.map((r) => [r.effectiveFrom, r.rateMinorPerHour, r.createdBy?.name])).toEqual([['2026-01-05', 2400, 'Margaret Oyelaran']]);
    await other.owner.agent.post(`/api/team/members/${member}/cost-rates`).send({ effectiveFrom: '2026-04-01', rateMinorPerHour: 2500 }).expect(201);
    const after = CostRateList.parse((await other.owner.agent.get(`/api/team/members/${member}/cost-rates`).expect(200)).body);
    expect(after.rates.map((r) => r.rateMinorPerHour)).toEqual([2500, 2400]);
    expect(after.currentRateMinorPerHour).toBe(2400); // the rise starts in April; today is 16 March
  });

  it('when a rate already starts that day, then 409 on effectiveFrom', async () => {
    const member = await membershipOf(w.owner.agent, w.declan.userId);
    await w.owner.agent.post(`/api/team/members/${member}/cost-rates`).send({ effectiveFrom: '2026-02-02', rateMinorPerHour: 2200 }).expect(201);
    const res = await w.owner.agent.post(`/api/team/members/${member}/cost-rates`).send({ effectiveFrom: '2026-02-02', rateMinorPerHour: 2300 }).expect(409);
    expect(errorOf(res.body).fields).toHaveProperty('effectiveFrom');
  });

  it('when a new rate would start on a day whose time is already costed, then 409 and the old cost stands', async () => {
    const other = await moneyWorkshop(t);
    const member = await membershipOf(other.owner.agent, other.priya.userId);
    await other.owner.agent.post(`/api/team/members/${member}/cost-rates`).send({ effectiveFrom: '2026-01-05', rateMinorPerHour: 2400 }).expect(201);
    const job = await createJob(other.owner.agent);
    const task = (await other.owner.agent.post(`/api/jobs/${job.id}/tasks`).send({ title: 'Rebush keys' }).expect(201)).body as { id: string };
    await insertEntry(t, { workshopId: other.workshopId, technicianId: other.priya.userId, taskId: task.id, jobId: job.id, startedAt: '2026-03-10T09:00:00Z', endedAt: '2026-03-10T11:00:00Z' });
    const res = await other.owner.agent.post(`/api/team/members/${member}/cost-rates`).send({ effectiveFrom: '2026-03-10', rateMinorPerHour: 3000 }).expect(409);
    expect(errorOf(res.body).message).toContain('2026-03-10');
    await other.owner.agent.post(`/api/team/members/${member}/cost-rates`).send({ effectiveFrom: '2026-03-11', rateMinorPerHour: 3000 }).expect(201);
  });

  it("when a member has time but no rate yet, then their first rate may start before it", async () => {
    const other = await moneyWorkshop(t);
    const job = await createJob(other.owner.agent);
    const task = (await other.owner.agent.post(`/api/jobs/${job.id}/tasks`).send({ title: 'Regulate' }).expect(201)).body as { id: string };
    await insertEntry(t, { workshopId: other.workshopId, technicianId: other.declan.userId, taskId: task.id, jobId: job.id, startedAt: '2026-03-10T09:00:00Z', endedAt: '2026-03-10T10:00:00Z' });
    const member = await membershipOf(other.owner.agent, other.declan.userId);
    await other.owner.agent.post(`/api/team/members/${member}/cost-rates`).send({ effectiveFrom: '2026-01-05', rateMinorPerHour: 2200 }).expect(201);
  });

  it('when the foreman asks for cost rates, then 403', async () => {
    const member = await membershipOf(w.owner.agent, w.priya.userId);
    await w.foreman.agent.get(`/api/team/members/${member}/cost-rates`).expect(403);
    await w.foreman.agent.post(`/api/team/members/${member}/cost-rates`).send({ effectiveFrom: '2026-05-01', rateMinorPerHour: 1 }).expect(403);
  });

  it("when another workshop's member is named, then 404", async () => {
    const other = await moneyWorkshop(t);
    const foreign = await membershipOf(other.owner.agent, other.priya.userId);
    await w.owner.agent.get(`/api/team/members/${foreign}/cost-rates`).expect(404);
    await w.owner.agent.post(`/api/team/members/${foreign}/cost-rates`).send({ effectiveFrom: '2026-05-01', rateMinorPerHour: 2000 }).expect(404);
  });

  it('when the input is wrong, then 400 with the fields', async () => {
    const member = await membershipOf(w.owner.agent, w.priya.userId);
    const res = await w.owner.agent.post(`/api/team/members/${member}/cost-rates`).send({ effectiveFrom: '2026-02-30', rateMinorPerHour: 24.5 }).expect(400);
    expect(Object.keys(errorOf(res.body).fields ?? {}).sort()).toEqual(['effectiveFrom', 'rateMinorPerHour']);
    await w.owner.agent.post(`/api/team/members/${member}/cost-rates`).send({ effectiveFrom: '2026-05-01', rateMinorPerHour: 0 }).expect(400);
    await w.owner.agent.get('/api/team/members/not-an-id/cost-rates').expect(400);
  });
});
