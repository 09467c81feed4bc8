import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { JobCosting, JobEstimates, MarginsReport, PartList, WorkshopSettings } from '@keybed/shared';
import { DEMO_PASSWORD, seedDemo } from '@keybed/db/seed/index';
import { DEMO_JOBS } from '@keybed/db/seed/demo';
import { hashPassword } from '../src/lib/password';
import { createTestApp, type TestApp } from './helpers';
import { ANY_MONEY, keysMatching } from './money-fixtures';

let t: TestApp;
const seededAt = new Date('2026-12-01T09:00:00Z');
beforeAll(async () => {
  t = await createTestApp({ now: () => seededAt });
  await seedDemo(t.db, hashPassword, seededAt);
});
afterAll(() => t.close());

async function signIn(email: string) {
  const agent = t.agent();
  await agent.post('/api/auth/sign-in').send({ email, password: DEMO_PASSWORD }).expect(200);
  return agent;
}

const [SALON, CASE, LINWOOD, PARLOUR, INES] = DEMO_JOBS.map((j) => j.id);
const counts = async () =>
  (await t.sql`select
      (select count(*)::int from parts) as parts, (select count(*)::int from stock_movements) as movements,
      (select count(*)::int from estimates) as estimates, (select count(*)::int from estimate_lines) as lines,
      (select count(*)::int from technician_cost_rates) as rates, (select count(*)::int from sublet_bills) as bills,
      (select count(*)::int from tasks) as tasks`)[0];

describe('demo money', () => {
  it('when Margaret opens the settings, then GBP, 20 % VAT, £55/h and a 25 % target margin are set', async () => {
    const margaret = await signIn('margaret@fennick.example');
    expect(WorkshopSettings.parse((await margaret.get('/api/settings').expect(200)).body)).toMatchObject({
      currency: 'GBP',
      taxRateBasisPoints: 2000,
      labourRateMinorPerHour: 5500,
      targetMarginBasisPoints: 2500,
    });
  });

  it("when Harriet Pembleton's estimates are opened, then the grand's is accepted with new hammers and the case's awaits her choice", async () => {
    const margaret = await signIn('margaret@fennick.example');
    const salon = JobEstimates.parse((await margaret.get(`/api/jobs/${SALON}/estimates`).expect(200)).body);
    expect(salon.estimates[0]).toMatchObject({ status: 'accepted', kind: 'original' });
    expect(salon.estimates[0]!.options.map((o) => [o.name, o.isChosen])).toEqual([['New hammers', true], ['Recover the old ones', false]]);
    // 1 920 min at £55/h = 176 000p; cloth 2.5 m at £24 = 6 000p; grand hammers £690 = 69 000p.
    expect(salon.agreed.netMinor).toBe(176000 + 6000 + 69000);
    const kase = JobEstimates.parse((await margaret.get(`/api/jobs/${CASE}/estimates`).expect(200)).body);
    expect(kase.estimates[0]).toMatchObject({ status: 'issued' });
    expect(kase.estimates[0]!.options.map((o) => o.name)).toEqual(['Revive the shellac', 'Strip and refinish']);
    const ines = JobEstimates.parse((await margaret.get(`/api/jobs/${INES}/estimates`).expect(200)).body);
    expect(ines.estimates.map((e) => e.status)).toEqual(['declined']);
  });

  it("when Oscar Feld's grand is costed, then the variation raised its budget and the refinisher's bill counts", async () => {
    const margaret = await signIn('margaret@fennick.example');
    const list = JobEstimates.parse((await margaret.get(`/api/jobs/${PARLOUR}/estimates`).expect(200)).body);
    expect(list.estimates.map((e) => [e.kind, e.status])).toEqual([['original', 'accepted'], ['variation', 'accepted']]);
    const costing = JobCosting.parse((await margaret.get(`/api/jobs/${PARLOUR}/costing`).expect(200)).body);
    expect(costing.tasks.find((x) => x.title === 'Repair the soundboard crack')!.estimatedMinutes).toBe(480 + 240);
    expect(costing.money).toMatchObject({ subletCostMinor: 145000, unbilledSubletMinor: 0, priceMinor: list.agreed.netMinor });
  });

  it('when Margaret opens the margins for the year, then every job of the year is listed, the active ones on their own, and the totals add up', async () => {
    const margaret = await signIn('margaret@fennick.example');
    const report = MarginsReport.parse((await margaret.get('/api/reports/margins?from=2026-01-01&to=2026-12-31').expect(200)).body);
    expect(report.rows.map((r) => r.jobId).sort()).toEqual([SALON, CASE, LINWOOD, PARLOUR, INES].sort());
    const active = MarginsReport.parse((await margaret.get('/api/reports/margins?from=2026-01-01&to=2026-12-31&status=active').expect(200)).body);
    expect(active.rows.map((r) => r.jobId).sort()).toEqual([SALON, LINWOOD, PARLOUR].sort());
    expect(report.totals.priceMinor).toBe(report.rows.reduce((sum, r) => sum + r.priceMinor, 0));
    expect(report.rows.find((r) => r.jobId === CASE)).toMatchObject({ priceMinor: 0, isAtRisk: true });
    expect(report.utilisation.technicians.map((x) => x.name)).toEqual(['Ana Sousa', 'Declan Moss', 'Priya Natarajan']);
  });

  it('when Tom opens the parts list, then the damper felts are low and he sees no costs; Priya sees no money', async () => {
    const tom = await signIn('tom@fennick.example');
    const list = PartList.parse((await tom.get('/api/parts').expect(200)).body);
    expect(list.parts.filter((p) => p.isLowStock).map((p) => p.sku).sort()).toEqual(['DF-U', 'HS-G88']);
    expect(list.parts.find((p) => p.sku === 'KBC-1')!.onHandMilli).toBe(12000 - 2000 - 2500);
    expect(list.parts.every((p) => p.unitCostMinor === undefined)).toBe(true);
    const priya = await signIn('priya@fennick.example');
    expect(keysMatching((await priya.get(`/api/jobs/${LINWOOD}/costing`).expect(200)).body, ANY_MONEY)).toEqual([]);
  });

  it('when the seed runs again, then nothing changes', async () => {
    const before = await counts();
    await seedDemo(t.db, hashPassword, new Date('2026-12-02T09:00:00Z'));
    expect(await counts()).toEqual(before);
    expect(before).toMatchObject({ parts: 7, movements: 10, estimates: 6, rates: 3, bills: 1, tasks: 20 });
  });
});
