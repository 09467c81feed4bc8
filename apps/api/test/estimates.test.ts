import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { Estimate, JobEstimates, Task } from '@keybed/shared';
import { createJob } from './board-fixtures';
import { createTestApp, type TestApp } from './helpers';
import { ANY_MONEY, COSTS, createPart, keysMatching, moneyWorkshop, SCENARIO_PARTS, type MoneyWorkshop } from './money-fixtures';
import { ErrorBody } from './schemas';

let t: TestApp;
let w: MoneyWorkshop;
let hammersId: string;
let clothId: string;
beforeAll(async () => {
  t = await createTestApp();
  w = await moneyWorkshop(t);
  hammersId = (await createPart(w.owner.agent, SCENARIO_PARTS.grandHammers)).id;
  clothId = (await createPart(w.owner.agent, SCENARIO_PARTS.bushingCloth)).id;
});
afterAll(() => t.close());

const errorOf = (body: unknown) => ErrorBody.parse(body).error;

/** Harriet Pembleton's Salon grand (SCENARIO.md): hammers new or recovered; the case revived or stripped and refinished (sublet). */
function salonGrand(hangTaskId?: string) {
  return {
    title: 'Salon grand: action and case',
    options: [
      { key: 'new-hammers', choice: 'Hammers', name: 'New hammers' },
      { key: 'recover-hammers', choice: 'Hammers', name: 'Recover the old ones' },
      { key: 'revive', choice: 'Case', name: 'Revive the shellac' },
      { key: 'refinish', choice: 'Case', name: 'Strip and refinish' },
    ],
    lines: [
      { kind: 'labour', description: 'Rebush keys and full regulation', minutes: 720 },
      { kind: 'part', partId: clothId, quantityMilli: 2500 },
      { kind: 'labour', description: 'Hang new hammers', minutes: 480, taskId: hangTaskId, optionKey: 'new-hammers' },
      { kind: 'part', partId: hammersId, quantityMilli: 1000, optionKey: 'new-hammers' },
      { kind: 'labour', description: 'Recover and reshape the hammers', minutes: 900, optionKey: 'recover-hammers' },
      { kind: 'labour', description: 'Revive the shellac', minutes: 600, optionKey: 'revive' },
      { kind: 'sublet', description: 'Black polyester refinish (Heathside Finishers)', unitPriceMinor: 185000, unitCostMinor: 145000, optionKey: 'refinish' },
    ],
  };
}

async function draft(jobId: string, body: object = salonGrand()) {
  const res = await w.owner.agent.post(`/api/jobs/${jobId}/estimates`).send(body);
  if (res.status !== 201) throw new Error(`POST estimates answered ${res.status}: ${JSON.stringify(res.body)}`);
  return Estimate.parse(res.body);
}

const optionId = (e: Estimate, key: string) => e.options.find((o) => o.key === key)!.id;
const tasksOf = async (jobId: string) => (await w.owner.agent.get(`/api/jobs/${jobId}/tasks`).expect(200)).body.tasks as Task[];

describe('POST /api/jobs/:id/estimates', () => {
  it('when the owner drafts the Salon grand estimate, then prices default from the settings and catalogue and totals use the first option of each choice', async () => {
    const job = await createJob(w.owner.agent);
    const e = await draft(job.id);
    expect(e).toMatchObject({ revision: 1, kind: 'original', status: 'draft', currency: 'GBP', taxRateBasisPoints: 2000 });
    expect(e.lines.map((l) => [l.kind, l.unitPriceMinor, l.amountMinor, l.costMinor])).toEqual([
      ['labour', 5500, 66000, null], // 12 h at £55
      ['part', 2400, 6000, 4500], // 2.5 m cloth at £24, cost £18
      ['labour', 5500, 44000, null],
      ['part', 69000, 69000, 52000],
      ['labour', 5500, 82500, null],
      ['labour', 5500, 55000, null],
      ['sublet', 185000, 185000, 145000],
    ]);
    expect(e.lines[1]!.description).toBe('Key bushing cloth');
    expect(e.baseNetMinor).toBe(72000);
    expect(e.options.map((o) => [o.name, o.netMinor])).toEqual([['New hammers', 113000], ['Recover the old ones', 82500], ['Revive the shellac', 55000], ['Strip and refinish', 185000]]);
    // 72 000 + 113 000 + 55 000 = 240 000p net; VAT at 20 % on the net [S19a] = 48 000p.
    expect(e.totals).toEqual({ netMinor: 240000, taxMinor: 48000, grossMinor: 288000 });
    expect(e.labourMinutes).toBe(720 + 480 + 600);
  });

  it('when the foreman reads it, then prices are there and costs are absent; a technician sees no money', async () => {
    const job = await createJob(w.owner.agent);
    await draft(job.id);
    const foreman = (await w.foreman.agent.get(`/api/jobs/${job.id}/estimates`).expect(200)).body;
    expect(keysMatching(foreman, COSTS)).toEqual([]);
    expect(JobEstimates.parse(foreman).estimates[0]!.totals?.netMinor).toBe(240000);
    const technician = (await w.priya.agent.get(`/api/jobs/${job.id}/estimates`).expect(200)).body;
    expect(keysMatching(technician, ANY_MONEY)).toEqual([]);
    expect(JobEstimates.parse(technician).estimates[0]!.lines).toHaveLength(7);
  });

  it('when many half-penny lines, then each line rounds half-up before summing and tax is taken once on the net', async () => {
    const job = await createJob(w.owner.agent);
    const lines = Array.from({ length: 101 }, () => ({ kind: 'other', description: 'Felt punching, per half', quantityMilli: 500, unitPriceMinor: 3 }));
    const e = await draft(job.id, { lines });
    expect(e.lines.every((l) => l.amountMinor === 2)).toBe(true); // 1.5p → 2p
    expect(e.totals).toEqual({ netMinor: 202, taxMinor: 40, grossMinor: 242 }); // 40.4p → 40p
  });

  it('when the input is wrong, then 400 names the fields and nothing is saved', async () => {
    const job = await createJob(w.owner.agent);
    const bad = await w.owner.agent
      .post(`/api/jobs/${job.id}/estimates`)
      .send({
        options: [{ key: 'only', choice: 'Hammers', name: 'New hammers' }],
        lines: [
          { kind: 'labour', description: 'Regulate', minutes: 0 },
          { kind: 'part', partId: clothId, quantityMilli: -1 },
          { kind: 'other', description: 'Tuning', unitPriceMinor: 1000, optionKey: 'missing' },
          { kind: 'gift', description: 'x' },
        ],
      })
      .expect(400);
    expect(Object.keys(errorOf(bad.body).fields ?? {}).sort()).toEqual(['lines.0.minutes', 'lines.1.quantityMilli', 'lines.3.kind']);
    const options = await w.owner.agent
      .post(`/api/jobs/${job.id}/estimates`)
      .send({ options: [{ key: 'only', choice: 'Hammers', name: 'New hammers' }], lines: [{ kind: 'other', description: 'Tuning', unitPriceMinor: 1000, optionKey: 'missing' }] })
      .expect(400);
    expect(Object.keys(errorOf(options.body).fields ?? {}).sort()).toEqual(['lines.0.optionKey', 'options.0.choice']);
    const foreignPart = (await createPart((await moneyWorkshop(t)).owner.agent, { sku: 'KBC-1' })).id;
    const unknown = await w.owner.agent.post(`/api/jobs/${job.id}/estimates`).send({ lines: [{ kind: 'part', partId: foreignPart, quantityMilli: 1000 }] }).expect(400);
    expect(errorOf(unknown.body).fields).toHaveProperty('lines.0.partId');
    const otherJob = await createJob(w.owner.agent);
    const otherTask = (await w.owner.agent.post(`/api/jobs/${otherJob.id}/tasks`).send({ title: 'Regulate' }).expect(201)).body.id;
    const wrongTask = await w.owner.agent.post(`/api/jobs/${job.id}/estimates`).send({ lines: [{ kind: 'labour', description: 'Regulate', minutes: 60, taskId: otherTask }] }).expect(400);
    expect(errorOf(wrongTask.body).fields).toHaveProperty('lines.0.taskId');
    expect(JobEstimates.parse((await w.owner.agent.get(`/api/jobs/${job.id}/estimates`)).body).estimates).toEqual([]);
  });

  it("when a technician drafts, then 403; another workshop's job, then 404", async () => {
    const job = await createJob(w.owner.agent);
    await w.priya.agent.post(`/api/jobs/${job.id}/estimates`).send({ lines: [] }).expect(403);
    const other = await moneyWorkshop(t);
    const foreignJob = await createJob(other.owner.agent);
    await w.owner.agent.post(`/api/jobs/${foreignJob.id}/estimates`).send({ lines: [] }).expect(404);
    await w.owner.agent.get(`/api/jobs/${foreignJob.id}/estimates`).expect(404);
    const foreign = await other.owner.agent.post(`/api/jobs/${foreignJob.id}/estimates`).send({ lines: [{ kind: 'other', description: 'Tuning', unitPriceMinor: 9000 }] }).expect(201);
    await w.owner.agent.get(`/api/estimates/${foreign.body.id}`).expect(404);
    await w.owner.agent.patch(`/api/estimates/${foreign.body.id}`).send({ version: 1, title: 'Mine' }).expect(404);
    await w.owner.agent.post(`/api/estimates/${foreign.body.id}/issue`).expect(404);
  });
});

describe('PATCH /api/estimates/:id', () => {
  it('when the foreman edits a draft without sending costs, then the hidden costs are kept and the version moves on', async () => {
    const job = await createJob(w.owner.agent);
    const e = await draft(job.id);
    const foremanView = Estimate.parse((await w.foreman.agent.get(`/api/estimates/${e.id}`).expect(200)).body);
    const lines = foremanView.lines.map((l) =>
      l.kind === 'labour'
        ? { id: l.id, kind: l.kind, description: l.description, minutes: l.minutes === 720 ? 780 : l.minutes!, optionKey: l.optionKey }
        : l.kind === 'part'
          ? { id: l.id, kind: l.kind, partId: l.part!.id, quantityMilli: l.quantityMilli!, optionKey: l.optionKey }
          : { id: l.id, kind: l.kind, description: l.description, quantityMilli: l.quantityMilli!, unitPriceMinor: l.unitPriceMinor!, optionKey: l.optionKey },
    );
    const res = await w.foreman.agent.patch(`/api/estimates/${e.id}`).send({ version: e.version, lines }).expect(200);
    expect(res.body.version).toBe(e.version + 1);
    const owner = Estimate.parse((await w.owner.agent.get(`/api/estimates/${e.id}`)).body);
    expect(owner.lines.map((l) => l.costMinor)).toEqual(e.lines.map((l) => l.costMinor));
    expect(owner.lines[0]!.minutes).toBe(780);
    expect(owner.lines.map((l) => l.id)).toEqual(e.lines.map((l) => l.id));
  });

  it('when two people edit from the same version, then the second gets 409 with the estimate as it is', async () => {
    const job = await createJob(w.owner.agent);
    const e = await draft(job.id);
    await w.owner.agent.patch(`/api/estimates/${e.id}`).send({ version: e.version, title: 'First' }).expect(200);
    const res = await w.foreman.agent.patch(`/api/estimates/${e.id}`).send({ version: e.version, title: 'Second' }).expect(409);
    expect(errorOf(res.body).code).toBe('version_conflict');
    expect(res.body.current.title).toBe('First');
  });

  it('when the options are renamed, then their ids stay and lines still point at them', async () => {
    const job = await createJob(w.owner.agent);
    const e = await draft(job.id);
    const options = e.options.map((o) => ({ key: o.key, choice: o.choice, name: `${o.name} (revised)` }));
    const res = Estimate.parse((await w.owner.agent.patch(`/api/estimates/${e.id}`).send({ version: e.version, options }).expect(200)).body);
    expect(res.options.map((o) => o.id)).toEqual(e.options.map((o) => o.id));
    expect(res.lines.map((l) => l.optionId)).toEqual(e.lines.map((l) => l.optionId));
    const dropped = await w.owner.agent.patch(`/api/estimates/${e.id}`).send({ version: res.version, options: options.slice(0, 2) }).expect(400);
    expect(Object.keys(errorOf(dropped.body).fields ?? {})[0]).toMatch(/^lines\.\d+\.optionKey$/);
  });

  it('when the estimate was issued, then editing is refused with estimate_status and the database keeps its lines frozen', async () => {
    const job = await createJob(w.owner.agent);
    const e = await draft(job.id);
    await w.owner.agent.post(`/api/estimates/${e.id}/issue`).expect(200);
    const res = await w.owner.agent.patch(`/api/estimates/${e.id}`).send({ version: e.version + 1, title: 'Later' }).expect(409);
    expect(errorOf(res.body).code).toBe('estimate_status');
    await expect(t.sql`update estimate_lines set unit_price_minor = 1 where estimate_id = ${e.id}`).rejects.toThrow(/no longer a draft/);
    await expect(t.sql`delete from estimate_options where estimate_id = ${e.id}`).rejects.toThrow(/no longer a draft/);
  });
});

describe('POST /api/estimates/:id/issue, /accept, /decline', () => {
  it('when an empty draft is issued, then 409; a draft cannot be accepted or declined', async () => {
    const job = await createJob(w.owner.agent);
    const empty = await draft(job.id, { lines: [] });
    expect(errorOf((await w.owner.agent.post(`/api/estimates/${empty.id}/issue`).expect(409)).body).code).toBe('estimate_status');
    await w.owner.agent.post(`/api/estimates/${empty.id}/accept`).send({ optionIds: [] }).expect(409);
    await w.owner.agent.post(`/api/estimates/${empty.id}/decline`).expect(409);
  });

  it('when the client accepts new hammers and the refinish, then the chosen labour sets the task budgets (a task is made for each unlinked line) and the agreed price is the chosen scope', async () => {
    const job = await createJob(w.owner.agent);
    const hang = (await w.owner.agent.post(`/api/jobs/${job.id}/tasks`).send({ title: 'Hang hammers', estimatedMinutes: 300 }).expect(201)).body as Task;
    const e = await draft(job.id, salonGrand(hang.id));
    await w.owner.agent.post(`/api/estimates/${e.id}/issue`).expect(200);
    const missing = await w.foreman.agent.post(`/api/estimates/${e.id}/accept`).send({ optionIds: [optionId(e, 'new-hammers')] }).expect(400);
    expect(errorOf(missing.body).fields?.optionIds).toEqual(['Choose an option for "Case"']);
    const both = await w.foreman.agent.post(`/api/estimates/${e.id}/accept`).send({ optionIds: [optionId(e, 'new-hammers'), optionId(e, 'recover-hammers'), optionId(e, 'refinish')] }).expect(400);
    expect(errorOf(both.body).fields?.optionIds).toEqual(['Choose only one option for "Hammers"']);

    const res = await w.foreman.agent.post(`/api/estimates/${e.id}/accept`).send({ optionIds: [optionId(e, 'new-hammers'), optionId(e, 'refinish')] }).expect(200);
    const accepted = Estimate.parse(res.body);
    expect(accepted.status).toBe('accepted');
    expect(accepted.options.filter((o) => o.isChosen).map((o) => o.name)).toEqual(['New hammers', 'Strip and refinish']);
    // 66 000 + 6 000 + 44 000 + 69 000 + 185 000 = 370 000p
    expect(accepted.totals).toEqual({ netMinor: 370000, taxMinor: 74000, grossMinor: 444000 });
    const tasks = await tasksOf(job.id);
    expect(tasks.map((x) => [x.title, x.estimatedMinutes])).toEqual([
      ['Hang hammers', 480],
      ['Rebush keys and full regulation', 720],
    ]);
    expect(accepted.lines.find((l) => l.description === 'Rebush keys and full regulation')!.task?.title).toBe('Rebush keys and full regulation');
    expect(accepted.lines.find((l) => l.description === 'Revive the shellac')!.task).toBeNull();
    const summary = JobEstimates.parse((await w.owner.agent.get(`/api/jobs/${job.id}/estimates`)).body).agreed;
    expect(summary).toEqual({ estimateIds: [e.id], labourMinutes: 1200, netMinor: 370000 });
  });

  it('when a second revision is accepted, then the first is superseded and a second original cannot be drafted', async () => {
    const job = await createJob(w.owner.agent);
    const first = await draft(job.id, { lines: [{ kind: 'other', description: 'Pitch raise', unitPriceMinor: 12000 }] });
    await w.owner.agent.post(`/api/estimates/${first.id}/issue`).expect(200);
    const second = await draft(job.id, { copyFromId: first.id });
    expect(second.revision).toBe(2);
    expect(second.lines.map((l) => [l.description, l.amountMinor])).toEqual([['Pitch raise', 12000]]);
    await w.owner.agent.post(`/api/estimates/${second.id}/issue`).expect(200);
    expect((await w.owner.agent.get(`/api/estimates/${first.id}`)).body.status).toBe('superseded');
    await w.owner.agent.post(`/api/estimates/${second.id}/accept`).send({}).expect(200);
    const again = await w.owner.agent.post(`/api/jobs/${job.id}/estimates`).send({ kind: 'original', lines: [] }).expect(409);
    expect(errorOf(again.body).code).toBe('estimate_status');
  });

  it('when Ines Carvalho declines, then the estimate is declined and nothing is budgeted', async () => {
    const job = await createJob(w.owner.agent);
    const e = await draft(job.id, { lines: [{ kind: 'labour', description: 'Assessment and estimate', minutes: 90 }] });
    await w.owner.agent.post(`/api/estimates/${e.id}/issue`).expect(200);
    const res = await w.foreman.agent.post(`/api/estimates/${e.id}/decline`).expect(200);
    expect(res.body.status).toBe('declined');
    expect(await tasksOf(job.id)).toEqual([]);
    await w.foreman.agent.post(`/api/estimates/${e.id}/accept`).send({}).expect(409);
    await w.priya.agent.post(`/api/estimates/${e.id}/decline`).expect(403);
  });
});

describe('variations', () => {
  it('when a cracked bridge is found and the client accepts the variation, then the agreed price and the budgets rise and the job lists both', async () => {
    const job = await createJob(w.owner.agent);
    const early = await w.owner.agent.post(`/api/jobs/${job.id}/estimates`).send({ kind: 'variation', lines: [] }).expect(409);
    expect(errorOf(early.body).code).toBe('estimate_status');
    const original = await draft(job.id, { lines: [{ kind: 'labour', description: 'Restring', minutes: 1200 }, { kind: 'part', partId: clothId, quantityMilli: 1000 }] });
    await w.owner.agent.post(`/api/estimates/${original.id}/issue`).expect(200);
    await w.owner.agent.post(`/api/estimates/${original.id}/accept`).send({}).expect(200);
    const restring = (await tasksOf(job.id))[0]!;
    expect(restring.estimatedMinutes).toBe(1200);

    const variation = await draft(job.id, {
      title: 'Cracked bridge under the strings',
      lines: [
        { kind: 'labour', description: 'Repair the cracked bridge', minutes: 360 },
        { kind: 'labour', description: 'Restring: extra time around the bridge', minutes: 120, taskId: restring.id },
      ],
    });
    expect(variation).toMatchObject({ kind: 'variation', revision: 2 });
    await w.owner.agent.post(`/api/estimates/${variation.id}/issue`).expect(200);
    await w.owner.agent.post(`/api/estimates/${variation.id}/accept`).send({}).expect(200);

    const tasks = await tasksOf(job.id);
    expect(tasks.map((x) => [x.title, x.estimatedMinutes])).toEqual([
      ['Restring', 1320],
      ['Repair the cracked bridge', 360],
    ]);
    const list = JobEstimates.parse((await w.owner.agent.get(`/api/jobs/${job.id}/estimates`)).body);
    expect(list.estimates.map((e) => [e.kind, e.status])).toEqual([['original', 'accepted'], ['variation', 'accepted']]);
    // Original 110 000 + 2 400 = 112 400p; variation 33 000 + 11 000 = 44 000p.
    expect(list.agreed).toEqual({ estimateIds: [original.id, variation.id], labourMinutes: 1680, netMinor: 156400 });
    const costing = (await w.owner.agent.get(`/api/jobs/${job.id}/costing`).expect(200)).body;
    expect(costing.money.priceMinor).toBe(156400);
    expect(costing.hours.estimatedMinutes).toBe(1680);
  });
});
