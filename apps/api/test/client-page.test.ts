import http from 'node:http';
import type { AddressInfo } from 'node:net';
import Stripe from 'stripe';
import { extractText, getDocumentProxy } from 'unpdf';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { Board, ClientPage, Estimate, EstimateProposal, JobCosting, JobDetail, JobPayments } from '@keybed/shared';
import { startFakePayments, type FakePayments } from '../../../scripts/fakes/payments.mjs';
import { preparedEstimate, surveyedGrand } from './assessment-fixtures';
import { createJob } from './board-fixtures';
import { scenarioCatalogue } from './catalogue-fixtures';
import { createTestApp, waitForMail, type TestApp } from './helpers';
import { ANY_MONEY, keysMatching, moneyWorkshop, type MoneyWorkshop } from './money-fixtures';
import { ErrorBody } from './schemas';
import { componentOf } from './survey-fixtures';

const WEBHOOK_SECRET = 'whsec_keybed_test_secret';
const API_KEY = 'sk_test_keybed_local';

let t: TestApp;
let fake: FakePayments;
let server: http.Server;
beforeAll(async () => {
  fake = await startFakePayments({ webhookSecret: WEBHOOK_SECRET, apiKey: API_KEY });
  t = await createTestApp({
    env: { STRIPE_SECRET_KEY: API_KEY, STRIPE_WEBHOOK_SECRET: WEBHOOK_SECRET, STRIPE_API_HOST: fake.host, STRIPE_API_PORT: String(fake.port), STRIPE_API_PROTOCOL: 'http' },
  });
  server = http.createServer(t.app).listen(0, '127.0.0.1');
  await new Promise((resolve) => server.once('listening', resolve));
  fake.setWebhookUrl(`http://127.0.0.1:${(server.address() as AddressInfo).port}/api/webhooks/payments`);
});
afterAll(async () => {
  server.close();
  await fake.stop();
  await t.close();
});

/** The scenario's workshop with its terms, and a Salon grand surveyed and estimated, its client given a fresh address. */
async function setUp() {
  const w = await moneyWorkshop(t);
  await w.owner.agent
    .put('/api/client-terms')
    .send({ address: '12 Market Row\nFennick Cross', phone: '01632 960100', email: 'office@fennick.example', vatNumber: 'GB 123 4567 89', terms: 'Work starts when the deposit is received.', depositBasisPoints: 3000, linkLifetimeDays: 30 })
    .expect(200);
  const prepared = await preparedEstimate(w.owner.agent);
  const email = `harriet-${prepared.jobId.slice(0, 8)}@pembleton.example`;
  await t.sql`update clients set email = ${email} where id = ${prepared.survey.client.id}`;
  return { w, ...prepared, email };
}

async function sendAndOpen(agent: MoneyWorkshop['owner']['agent'], estimateId: string, email: string) {
  await agent.post(`/api/estimates/${estimateId}/send`).send({}).expect(201);
  const mail = await waitForMail(email);
  const token = /\/c\/([A-Za-z0-9_-]{43})/.exec(mail.text)?.[1];
  if (!token) throw new Error('No client link in the e-mail');
  return { token, mail };
}

const pdfText = async (body: Buffer) => (await extractText(await getDocumentProxy(new Uint8Array(body)), { mergePages: true })).text;

const jobRow = async (jobId: string) => (await t.sql`select status, position, stage_id from jobs where id = ${jobId}`)[0]!;

describe('POST /api/surveys/:id/estimate', () => {
  it('when the owner prepares the estimate, then a proposed job waits off the board with a draft in options, totals with the first option of each choice', async () => {
    const { w, jobId, estimate, survey } = await setUp();
    expect(estimate).toMatchObject({ status: 'draft', revision: 1, title: 'New hammers, rebush the keys, full regulation' });
    expect(estimate.options.map((o) => [o.choice, o.name, o.netMinor])).toEqual([
      ['Hammers', 'New hammers', 124000],
      ['Hammers', 'Recover the old ones', 42000],
      ['Case', 'Revive the shellac', 46400],
      ['Case', 'Strip and refinish in black polyester', 185000],
    ]);
    expect(estimate.totals).toEqual({ netMinor: 264400, taxMinor: 52880, grossMinor: 317280 });
    expect(await jobRow(jobId)).toMatchObject({ status: 'proposed', position: null });
    const board = await w.owner.agent.get('/api/board').expect(200);
    expect(JSON.stringify(board.body)).not.toContain(jobId);
    const proposal = EstimateProposal.parse((await w.owner.agent.get(`/api/surveys/${survey.id}/estimate-proposal`).expect(200)).body);
    expect(proposal.jobId).toBe(jobId);
    expect(proposal.components.map((c) => [c.key, c.operations.map((o) => o.name)])).toEqual([
      ['case-finish', ['Case tidy: revive the shellac', 'Full refinish in black polyester']],
      ['key-bushings', ['Rebush keys']],
      ['hammers', ['Full regulation', 'Recover the old hammers', 'Replace hammer set (grand)']],
    ]);
  });

  it('when an operation is unknown, a component is not one needing work, or a choice has one option, then 400 and no job is left behind', async () => {
    const w = await moneyWorkshop(t);
    const catalogue = await scenarioCatalogue(w.owner.agent);
    const survey = await surveyedGrand(w.owner.agent);
    const jobsNow = async () => (await t.sql`select count(*)::int as n from jobs where workshop_id = ${w.workshopId}`)[0]!.n;
    const url = `/api/surveys/${survey.id}/estimate`;
    const unknown = await w.owner.agent.post(url).send({ items: [{ operationId: '00000000-0000-4000-8000-000000000000' }] }).expect(400);
    expect(ErrorBody.parse(unknown.body).error.fields).toHaveProperty(['items.0.operationId']);
    const sound = await w.owner.agent.post(url).send({ items: [{ operationId: catalogue.rebush.id, componentIds: [componentOf(survey, 'soundboard').id] }] }).expect(400);
    expect(ErrorBody.parse(sound.body).error.fields).toHaveProperty(['items.0.componentIds']);
    const one = await w.owner.agent.post(url).send({ options: [{ key: 'a', choice: 'Case', name: 'Only one' }], items: [{ operationId: catalogue.revive.id, optionKey: 'a' }] }).expect(400);
    expect(ErrorBody.parse(one.body).error.fields).toHaveProperty(['options.0.choice']);
    expect(await jobsNow()).toBe(0);
    expect((await t.sql`select job_id from surveys where id = ${survey.id}`)[0]).toEqual({ job_id: null });
  });

  it('when a technician prepares an estimate, then 403', async () => {
    const w = await moneyWorkshop(t);
    const { survey } = await preparedEstimate(w.owner.agent);
    await w.priya.agent.post(`/api/surveys/${survey.id}/estimate`).send({ items: [{ lines: [{ kind: 'labour', description: 'Tidy', minutes: 60 }] }] }).expect(403);
  });
});

describe('GET /api/estimates/:id/pdf', () => {
  it('when the owner asks for the PDF, then it reads back with the workshop, the options, the totals with VAT and the ivory and moving cautions', async () => {
    const { w, estimate } = await setUp();
    const res = await w.owner.agent.get(`/api/estimates/${estimate.id}/pdf`).buffer(true).parse((r, cb) => {
      const chunks: Buffer[] = [];
      r.on('data', (c: Buffer) => chunks.push(c));
      r.on('end', () => cb(null, Buffer.concat(chunks)));
    }).expect(200).expect('Content-Type', 'application/pdf');
    const text = await pdfText(res.body as Buffer);
    for (const expected of ['Estimate, revision 1', 'VAT no. GB 123 4567 89', 'Your choice: Hammers', 'Option: Recover the old ones', '£2,644.00', 'VAT at 20 %', '£528.80', 'Total to pay', '£3,172.80', 'Ivory keytops', 'Ivory Act 2018', 'Moving the piano', 'trained piano movers', 'Work starts when the deposit is received.']) {
      expect(text).toContain(expected);
    }
    await w.priya.agent.get(`/api/estimates/${estimate.id}/pdf`).expect(403);
  });
});

describe('POST /api/estimates/:id/send and GET /api/client/:token', () => {
  it('when the owner sends the draft, then it is issued and the client gets a private link with the PDF; the page shows the piano, survey, options, totals, terms and cautions', async () => {
    const { w, estimate, email } = await setUp();
    const { token, mail } = await sendAndOpen(w.owner.agent, estimate.id, email);
    expect(mail.subject).toBe(`Your estimate from ${w.owner.me.workshop.name}`);
    const inbox = (await (await fetch(`${(await import('vitest')).inject('inboxUrl')}/api/email`)).json()) as Array<{ to: Array<{ address: string }>; attachments?: Array<{ contentType: string; filename: string }> }>;
    const withPdf = inbox.find((m) => m.to.some((x) => x.address === email));
    expect(withPdf?.attachments?.map((a) => [a.contentType, a.filename])).toEqual([['application/pdf', 'estimate-1.pdf']]);
    const page = ClientPage.parse((await t.request().get(`/api/client/${token}`).expect(200)).body);
    expect(page).toMatchObject({ client: { name: 'Harriet Pembleton' }, piano: { maker: 'Carrow & Finch', keytopMaterial: 'ivory' }, estimate: { status: 'issued', revision: 1, totals: { grossMinor: 317280 } }, response: null, deposit: null });
    expect(page.workshop).toMatchObject({ address: '12 Market Row\nFennick Cross', terms: 'Work starts when the deposit is received.' });
    expect(page.survey?.findings.map((f) => f.name)).toEqual(['Case and finish', 'Keys and key bushings', 'Hammers']);
    expect(page.cautions.map((c) => c.key)).toEqual(['ivory', 'moving']);
    expect(JSON.stringify(page)).not.toMatch(/costMinor|unitCostMinor/);
    expect(Estimate.parse((await w.owner.agent.get(`/api/estimates/${estimate.id}`).expect(200)).body).status).toBe('issued');
  });

  it('when the link has expired, was withdrawn, was tampered with or belongs to a superseded revision, then it is refused with its own code', async () => {
    const { w, estimate, email, jobId } = await setUp();
    const { token } = await sendAndOpen(w.owner.agent, estimate.id, email);
    const tampered = `${token.slice(0, -1)}${token.endsWith('A') ? 'B' : 'A'}`;
    expect(ErrorBody.parse((await t.request().get(`/api/client/${tampered}`).expect(404)).body).error.code).toBe('token_invalid');
    expect(ErrorBody.parse((await t.request().get('/api/client/not-a-token').expect(400)).body).error.code).toBe('validation_failed');

    await t.sql`update client_links set expires_at = now() - interval '1 minute', created_at = now() - interval '31 days' where estimate_id = ${estimate.id}`;
    expect(ErrorBody.parse((await t.request().get(`/api/client/${token}`).expect(410)).body).error.code).toBe('link_expired');
    await t.request().post(`/api/client/${token}/accept`).send({ name: 'Harriet Pembleton', optionIds: [] }).expect(410);

    const second = await sendAndOpen(w.owner.agent, estimate.id, email);
    const { links } = (await w.owner.agent.get(`/api/estimates/${estimate.id}/links`).expect(200)).body as { links: Array<{ id: string; revokedAt: string | null }> };
    await w.owner.agent.post(`/api/client-links/${links[0]!.id}/revoke`).expect(200);
    expect(ErrorBody.parse((await t.request().get(`/api/client/${second.token}`).expect(410)).body).error.code).toBe('link_revoked');

    const third = await sendAndOpen(w.owner.agent, estimate.id, email);
    const revision2 = Estimate.parse((await w.owner.agent.post(`/api/jobs/${jobId}/estimates`).send({ copyFromId: estimate.id, title: 'Revised after the call' }).expect(201)).body);
    await sendAndOpen(w.owner.agent, revision2.id, email);
    expect(ErrorBody.parse((await t.request().get(`/api/client/${third.token}`).expect(409)).body).error.code).toBe('link_superseded');
    await t.request().post(`/api/client/${third.token}/accept`).send({ name: 'Harriet Pembleton', optionIds: [] }).expect(409);
    expect(await jobRow(jobId)).toMatchObject({ status: 'proposed' });
  });
});

describe('POST /api/client/:token/accept', () => {
  async function sentEstimate() {
    const s = await setUp();
    const { token } = await sendAndOpen(s.w.owner.agent, s.estimate.id, s.email);
    const pick = (name: string) => s.estimate.options.find((o) => o.name === name)!.id;
    return { ...s, token, optionIds: [pick('Recover the old ones'), pick('Strip and refinish in black polyester')] };
  }

  it('when the client picks options and signs, then the exact revision, name, time and address are recorded, the job joins the first stage with tasks and budgets, and both sides get mail', async () => {
    const { w, token, optionIds, jobId, estimate, email } = await sentEstimate();
    const res = await t.request().post(`/api/client/${token}/accept`).set('X-Forwarded-For', '203.0.113.9').send({ optionIds, name: 'Harriet Pembleton' }).expect(200);
    const page = ClientPage.parse(res.body);
    expect(page.estimate).toMatchObject({ status: 'accepted', totals: { netMinor: 321000, taxMinor: 64200, grossMinor: 385200 } });
    expect(page.response).toMatchObject({ answer: 'accepted', name: 'Harriet Pembleton' });
    expect(page.deposit).toMatchObject({ basisPoints: 3000, amountMinor: 115560, status: 'due', isPayable: true });
    const [recorded] = await t.sql`select revision, estimate_version, name, ip_address, option_ids from client_responses where estimate_id = ${estimate.id}`;
    expect(recorded).toMatchObject({ revision: 1, name: 'Harriet Pembleton', option_ids: optionIds });
    expect(recorded!.ip_address).toMatch(/127\.0\.0\.1|::1|::ffff:127\.0\.0\.1/);

    const stages = (await w.owner.agent.get('/api/stages').expect(200)).body.stages as Array<{ id: string; isArchived: boolean }>;
    const job = JobDetail.parse((await w.owner.agent.get(`/api/jobs/${jobId}`).expect(200)).body);
    expect(job).toMatchObject({ status: 'active', stageId: stages.find((s) => !s.isArchived)!.id, position: 0 });
    expect(job.history).toHaveLength(1);
    const tasks = await t.sql`select title, estimated_minutes from tasks where job_id = ${jobId} order by position`;
    expect(tasks.map((r) => [r.title, r.estimated_minutes])).toEqual([
      ['Rebush keys', 360],
      ['Full regulation', 600],
    ]);
    const board = JSON.stringify((await w.owner.agent.get('/api/board').expect(200)).body);
    expect(board).toContain(jobId);
    expect((await waitForMail(w.owner.input.email)).subject).toBe('Harriet Pembleton accepted estimate 1');
    expect((await waitForMail(email)).subject).toMatch(/^Your acceptance/);
  });

  it('when the same acceptance is submitted several times at once, then one acceptance, one placement on the board and one set of tasks', async () => {
    const { token, optionIds, jobId, estimate } = await sentEstimate();
    const results = await Promise.all(Array.from({ length: 4 }, () => t.request().post(`/api/client/${token}/accept`).send({ optionIds, name: 'Harriet Pembleton' })));
    expect(results.map((r) => r.status)).toEqual([200, 200, 200, 200]);
    expect((await t.sql`select count(*)::int as n from client_responses where estimate_id = ${estimate.id}`)[0]!.n).toBe(1);
    expect((await t.sql`select count(*)::int as n from job_stage_events where job_id = ${jobId}`)[0]!.n).toBe(1);
    expect((await t.sql`select count(*)::int as n from tasks where job_id = ${jobId}`)[0]!.n).toBe(2);
    expect((await t.sql`select count(*)::int as n from jobs where piano_id = (select piano_id from jobs where id = ${jobId})`)[0]!.n).toBe(1);
    expect(await jobRow(jobId)).toMatchObject({ status: 'active', position: 0 });
  });

  it('when the options do not make one per choice, or the name is blank, then 400 and nothing is accepted', async () => {
    const { token, optionIds, estimate, jobId } = await sentEstimate();
    const one = await t.request().post(`/api/client/${token}/accept`).send({ optionIds: [optionIds[0]], name: 'Harriet Pembleton' }).expect(400);
    expect(ErrorBody.parse(one.body).error.fields).toHaveProperty('optionIds');
    await t.request().post(`/api/client/${token}/accept`).send({ optionIds, name: ' ' }).expect(400);
    expect((await t.sql`select status from estimates where id = ${estimate.id}`)[0]!.status).toBe('issued');
    expect(await jobRow(jobId)).toMatchObject({ status: 'proposed', position: null });
  });

  it('when accepted once, then a later acceptance with other options is refused', async () => {
    const { token, optionIds, estimate } = await sentEstimate();
    await t.request().post(`/api/client/${token}/accept`).send({ optionIds, name: 'Harriet Pembleton' }).expect(200);
    const others = estimate.options.filter((o) => !optionIds.includes(o.id)).map((o) => o.id);
    expect(ErrorBody.parse((await t.request().post(`/api/client/${token}/accept`).send({ optionIds: others, name: 'Harriet Pembleton' }).expect(409)).body).error.code).toBe('estimate_status');
  });
});

describe('POST /api/estimates/:id/accept on a job waiting for the client', () => {
  /** Everything acceptance leaves on the job and the board, whichever way it came. */
  async function placement(agent: MoneyWorkshop['owner']['agent'], jobId: string) {
    const job = JobDetail.parse((await agent.get(`/api/jobs/${jobId}`).expect(200)).body);
    const board = Board.parse((await agent.get('/api/board').expect(200)).body);
    const stage = board.stages.find((st) => st.jobs.some((j) => j.id === jobId));
    const tasks = await t.sql`select title, estimated_minutes from tasks where job_id = ${jobId} order by position`;
    return {
      status: job.status,
      stage: stage?.name,
      isFirstStage: stage?.id === board.stages[0]?.id,
      position: job.position,
      isLastCard: stage?.jobs.at(-1)?.id === jobId,
      events: job.history.map((h) => [h.fromStage?.name ?? null, h.toStage.name, h.by?.name ?? null]),
      tasks: tasks.map((r) => [r.title, r.estimated_minutes]),
      hours: stage?.jobs.find((j) => j.id === jobId)?.hours,
    };
  }

  const chosen = (estimate: Estimate) => ['Recover the old ones', 'Strip and refinish in black polyester'].map((name) => estimate.options.find((o) => o.name === name)!.id);
  const expected = (by: string | null) => ({
    status: 'active',
    stage: 'Intake',
    isFirstStage: true,
    position: 1,
    isLastCard: true,
    events: [[null, 'Intake', by]],
    tasks: [
      ['Rebush keys', 360],
      ['Full regulation', 600],
    ],
    hours: { estimatedMinutes: 960, loggedMinutes: 0 },
  });

  it('when the owner accepts in the app, then the job joins the end of the first active stage with its stage event, tasks, budgets and hours, exactly as through the client’s link', async () => {
    const viaLink = await setUp();
    await createJob(viaLink.w.owner.agent, { title: 'Tuning and a check-over' });
    const { token } = await sendAndOpen(viaLink.w.owner.agent, viaLink.estimate.id, viaLink.email);
    await t.request().post(`/api/client/${token}/accept`).send({ optionIds: chosen(viaLink.estimate), name: 'Harriet Pembleton' }).expect(200);

    const inApp = await setUp();
    await createJob(inApp.w.owner.agent, { title: 'Tuning and a check-over' });
    await inApp.w.owner.agent.post(`/api/estimates/${inApp.estimate.id}/issue`).expect(200);
    const accepted = Estimate.parse((await inApp.w.owner.agent.post(`/api/estimates/${inApp.estimate.id}/accept`).send({ optionIds: chosen(inApp.estimate) }).expect(200)).body);
    expect(accepted).toMatchObject({ status: 'accepted', totals: { netMinor: 321000 } });

    expect(await placement(viaLink.w.owner.agent, viaLink.jobId)).toEqual(expected(null));
    expect(await placement(inApp.w.owner.agent, inApp.jobId)).toEqual(expected('Margaret Oyelaran'));
  });

  it('when the owner accepts in the app and the client through the link at the same moment, then one acceptance, one place on the board and one set of tasks', async () => {
    const s = await setUp();
    const { token } = await sendAndOpen(s.w.owner.agent, s.estimate.id, s.email);
    const optionIds = chosen(s.estimate);
    const [owner, client] = await Promise.all([
      s.w.owner.agent.post(`/api/estimates/${s.estimate.id}/accept`).send({ optionIds }),
      t.request().post(`/api/client/${token}/accept`).send({ optionIds, name: 'Harriet Pembleton' }),
    ]);
    expect(client.status).toBe(200);
    expect([200, 409]).toContain(owner.status);
    if (owner.status === 409) expect(ErrorBody.parse(owner.body).error.code).toBe('estimate_status');
    expect((await t.sql`select count(*)::int as n from job_stage_events where job_id = ${s.jobId}`)[0]!.n).toBe(1);
    expect((await t.sql`select count(*)::int as n from tasks where job_id = ${s.jobId}`)[0]!.n).toBe(2);
    expect((await t.sql`select count(*)::int as n from estimates where job_id = ${s.jobId} and status = 'accepted'`)[0]!.n).toBe(1);
    expect(await jobRow(s.jobId)).toMatchObject({ status: 'active', position: 0 });
  });

  it('when the owner’s choice of options is incomplete, then 400 and the job still waits off the board with no tasks', async () => {
    const s = await setUp();
    await s.w.owner.agent.post(`/api/estimates/${s.estimate.id}/issue`).expect(200);
    const res = await s.w.owner.agent.post(`/api/estimates/${s.estimate.id}/accept`).send({ optionIds: chosen(s.estimate).slice(0, 1) }).expect(400);
    expect(ErrorBody.parse(res.body).error.fields).toHaveProperty('optionIds');
    expect(await jobRow(s.jobId)).toMatchObject({ status: 'proposed', position: null });
    expect((await t.sql`select count(*)::int as n from job_stage_events where job_id = ${s.jobId}`)[0]!.n).toBe(0);
    expect((await t.sql`select count(*)::int as n from tasks where job_id = ${s.jobId}`)[0]!.n).toBe(0);
    expect(JSON.stringify((await s.w.owner.agent.get('/api/board').expect(200)).body)).not.toContain(s.jobId);
  });
});

describe('POST /api/client/:token/decline', () => {
  it('when the client declines with a reason, then the estimate is declined, the proposed job cancelled and never on the board, and the owner told', async () => {
    const { w, estimate, email, jobId } = await setUp();
    const { token } = await sendAndOpen(w.owner.agent, estimate.id, email);
    const page = ClientPage.parse((await t.request().post(`/api/client/${token}/decline`).send({ reason: 'We will wait until next year.' }).expect(200)).body);
    expect(page.estimate.status).toBe('declined');
    expect(await jobRow(jobId)).toMatchObject({ status: 'cancelled', position: null });
    expect((await t.sql`select reason from client_responses where estimate_id = ${estimate.id}`)[0]).toEqual({ reason: 'We will wait until next year.' });
    expect((await waitForMail(w.owner.input.email)).subject).toBe('Harriet Pembleton declined estimate 1');
    await t.request().post(`/api/client/${token}/accept`).send({ optionIds: [], name: 'Harriet Pembleton' }).expect(409);
  });
});

describe('Deposit by card', () => {
  async function accepted() {
    const s = await setUp();
    const { token } = await sendAndOpen(s.w.owner.agent, s.estimate.id, s.email);
    const optionIds = [s.estimate.options[0]!.id, s.estimate.options[2]!.id];
    await t.request().post(`/api/client/${token}/accept`).send({ optionIds, name: 'Harriet Pembleton' }).expect(200);
    return { ...s, token };
  }

  const paymentsOf = async (jobId: string) => (await t.sql`select status, amount_minor from payments where job_id = ${jobId}`).map((r) => [r.status, Number(r.amount_minor)]);

  const costingOf = async (agent: MoneyWorkshop['owner']['agent'], jobId: string) => JobCosting.parse((await agent.get(`/api/jobs/${jobId}/costing`).expect(200)).body);

  it('when the client pays on the fake pay page, then the signed event records the deposit once against the job, shown to the owner and the client', async () => {
    const { w, token, jobId } = await accepted();
    const { checkoutUrl } = (await t.request().post(`/api/client/${token}/deposit`).expect(201)).body as { checkoutUrl: string };
    expect((await costingOf(w.owner.agent, jobId)).money?.receivedMinor).toBe(0);
    expect(checkoutUrl.startsWith(fake.url)).toBe(true);
    const pay = await fetch(checkoutUrl);
    expect(await pay.text()).toContain('£951.84');
    const paid = await fetch(checkoutUrl, { method: 'POST', redirect: 'manual' });
    expect(paid.status).toBe(303);
    expect(paid.headers.get('location')).toContain(`/c/${token}?deposit=paid`);
    expect(fake.events.at(-1)?.lastStatus).toBe(200);
    expect(await paymentsOf(jobId)).toEqual([['paid', 95184]]);
    const list = JobPayments.parse((await w.owner.agent.get(`/api/jobs/${jobId}/payments`).expect(200)).body);
    expect(list).toMatchObject({ receivedMinor: 95184, payments: [{ status: 'paid', kind: 'deposit', currency: 'GBP' }] });
    await w.priya.agent.get(`/api/jobs/${jobId}/payments`).expect(403);
    expect(ClientPage.parse((await t.request().get(`/api/client/${token}`).expect(200)).body).deposit).toMatchObject({ status: 'paid', amountMinor: 95184 });
    expect(ErrorBody.parse((await t.request().post(`/api/client/${token}/deposit`).expect(409)).body).error.code).toBe('conflict');
  });

  it('when a deposit is paid, then the owner’s job costing shows it as money received, leaving the costs and margin alone; the foreman and technicians see no money', async () => {
    const { w, token, jobId } = await accepted();
    const before = await costingOf(w.owner.agent, jobId);
    const { checkoutUrl } = (await t.request().post(`/api/client/${token}/deposit`).expect(201)).body as { checkoutUrl: string };
    await fetch(checkoutUrl, { method: 'POST', redirect: 'manual' });
    const after = await costingOf(w.owner.agent, jobId);
    expect(after.money?.receivedMinor).toBe(95184);
    const { receivedMinor: _before, ...costsBefore } = before.money!;
    const { receivedMinor: _after, ...costsAfter } = after.money!;
    expect(costsAfter).toEqual(costsBefore);
    for (const agent of [w.foreman.agent, w.priya.agent]) {
      const body = (await agent.get(`/api/jobs/${jobId}/costing`).expect(200)).body;
      expect(keysMatching(body, ANY_MONEY)).toEqual([]);
      expect(JSON.stringify(body)).not.toContain('received');
    }
  });

  it('when the same event is replayed, then it is acknowledged and changes nothing', async () => {
    const { token, jobId } = await accepted();
    const { checkoutUrl } = (await t.request().post(`/api/client/${token}/deposit`).expect(201)).body as { checkoutUrl: string };
    await fetch(checkoutUrl, { method: 'POST', redirect: 'manual' });
    const event = fake.events.at(-1)!;
    const replay = await fetch(`${fake.url}/__events/${event.id}/resend`, { method: 'POST' });
    expect(((await replay.json()) as { status: number }).status).toBe(200);
    expect(await paymentsOf(jobId)).toEqual([['paid', 95184]]);
    expect((await t.sql`select count(*)::int as n from payment_events where event_id = ${event.id}`)[0]!.n).toBe(1);
  });

  it('when an event is forged, altered or stale, then 400 and nothing is recorded', async () => {
    const { token, jobId } = await accepted();
    const { checkoutUrl } = (await t.request().post(`/api/client/${token}/deposit`).expect(201)).body as { checkoutUrl: string };
    const session = [...fake.sessions.values()].find((s) => s.url === checkoutUrl)!;
    const payload = JSON.stringify({ id: 'evt_forged_1', object: 'event', type: 'checkout.session.completed', data: { object: { ...session, payment_status: 'paid', status: 'complete' } } });
    const stripe = new Stripe(API_KEY);
    const forged = stripe.webhooks.generateTestHeaderString({ payload, secret: 'whsec_someone_else' });
    const stale = stripe.webhooks.generateTestHeaderString({ payload, secret: WEBHOOK_SECRET, timestamp: Math.floor(Date.now() / 1000) - 3600 });
    const good = stripe.webhooks.generateTestHeaderString({ payload, secret: WEBHOOK_SECRET });
    const post = (body: string, signature?: string) => {
      const req = t.request().post('/api/webhooks/payments').set('Content-Type', 'application/json');
      return (signature ? req.set('Stripe-Signature', signature) : req).send(body);
    };
    for (const [body, signature] of [[payload, forged], [payload, stale], [payload.replace('"paid"', '"unpaid"'), good], [payload, undefined]] as const) {
      const res = await post(body, signature);
      expect(res.status).toBe(400);
    }
    expect(await paymentsOf(jobId)).toEqual([['pending', 95184]]);
    expect((await t.sql`select count(*)::int as n from payment_events where event_id = 'evt_forged_1'`)[0]!.n).toBe(0);
    const ok = await post(payload, good).expect(200);
    expect(ok.body).toEqual({ received: true, isDuplicate: false });
    expect(await paymentsOf(jobId)).toEqual([['paid', 95184]]);
  });

  it('when the estimate is not accepted yet, then no deposit can be started', async () => {
    const { w, estimate, email } = await setUp();
    const { token } = await sendAndOpen(w.owner.agent, estimate.id, email);
    expect(ErrorBody.parse((await t.request().post(`/api/client/${token}/deposit`).expect(409)).body).error.code).toBe('estimate_status');
  });
});

describe('GET /api/client/:token/photos/:photoId', () => {
  it('when the owner shared a survey photo, then the client sees it through the link; an unshared one is 404', async () => {
    const { w, estimate, email, survey } = await setUp();
    const sharp = (await import('sharp')).default;
    const png = await sharp({ create: { width: 64, height: 48, channels: 3, background: '#555' } }).png().toBuffer();
    const hammers = componentOf(survey, 'hammers').id;
    const up = await w.owner.agent.post('/api/uploads').field('surveyComponentId', hammers).field('isSharedWithClient', 'true').attach('files', png, 'shared.png').expect(201);
    const hidden = await w.owner.agent.post('/api/uploads').field('surveyComponentId', hammers).attach('files', png, 'hidden.png').expect(201);
    const { token } = await sendAndOpen(w.owner.agent, estimate.id, email);
    const page = ClientPage.parse((await t.request().get(`/api/client/${token}`).expect(200)).body);
    const sharedId = up.body.uploads[0].id as string;
    expect(page.survey?.findings.find((f) => f.name === 'Hammers')?.photoIds).toEqual([sharedId]);
    await t.request().get(`/api/client/${token}/photos/${sharedId}?size=thumb`).expect(200).expect('Content-Type', 'image/jpeg');
    await t.request().get(`/api/client/${token}/photos/${hidden.body.uploads[0].id as string}`).expect(404);
  });
});
