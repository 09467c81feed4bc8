import type supertest from 'supertest';
import { Part, StockMovementResult, type CreatePartInput, type PutSettingsInput } from '@keybed/shared';
import { addMember, signUpWorkshop, type TestApp } from './helpers';

/** Fennick Cross Piano Works' settings (SCENARIO.md): GBP, VAT 20 %, £55/h, target margin 25 %. */
export const FENNICK_SETTINGS: PutSettingsInput = {
  currency: 'GBP',
  taxRateBasisPoints: 2000,
  labourRateMinorPerHour: 5500,
  targetMarginBasisPoints: 2500,
  allowNegativeStock: false,
  timeZone: 'Europe/London',
  benchDayClose: '19:00',
  workingDayStart: '08:00',
  workingDayEnd: '17:30',
  workingWeekdays: [1, 2, 3, 4, 5],
};

/** The scenario's parts catalogue (SCENARIO.md), costs and sell prices in pence. */
export const SCENARIO_PARTS = {
  grandHammers: { sku: 'HS-G88', name: 'Hammer set, grand, 88', unit: 'set', supplier: 'Larkspur Felts', unitCostMinor: 52000, sellPriceMinor: 69000 },
  uprightHammers: { sku: 'HS-U88', name: 'Hammer set, upright, 88', unit: 'set', supplier: 'Larkspur Felts', unitCostMinor: 41000, sellPriceMinor: 54500 },
  bushingCloth: { sku: 'KBC-1', name: 'Key bushing cloth', unit: 'm', supplier: 'Larkspur Felts', unitCostMinor: 1800, sellPriceMinor: 2400 },
  damperFelts: { sku: 'DF-U', name: 'Damper felt set, upright', unit: 'set', supplier: 'Larkspur Felts', unitCostMinor: 9500, sellPriceMinor: 13000 },
  wire16: { sku: 'MW-16', name: 'Music wire, plain steel, size 16', unit: 'coil (1 lb)', supplier: 'Quayside Wire Co.', unitCostMinor: 1450, sellPriceMinor: 1900 },
  tuningPins: { sku: 'TP-20', name: 'Tuning pins, 2/0, blued', unit: 'box of 100', supplier: 'Quayside Wire Co.', unitCostMinor: 6200, sellPriceMinor: 8000 },
  shellac: { sku: 'SF-1', name: 'Shellac flakes', unit: 'kg', supplier: 'Larkspur Felts', unitCostMinor: 3800, sellPriceMinor: 4800 },
} satisfies Record<string, Partial<CreatePartInput>>;

/** A workshop with the scenario's settings: owner, foreman and two technicians, each with an agent. */
export async function moneyWorkshop(t: TestApp, settings: Partial<PutSettingsInput> = {}) {
  const owner = await signUpWorkshop(t);
  const foreman = await addMember(t, owner.agent, 'foreman');
  const priya = await addMember(t, owner.agent, 'technician');
  const declan = await addMember(t, owner.agent, 'technician');
  await owner.agent.put('/api/settings').send({ ...FENNICK_SETTINGS, ...settings }).expect(200);
  return { owner, foreman, priya, declan, workshopId: owner.me.workshop.id };
}

export type MoneyWorkshop = Awaited<ReturnType<typeof moneyWorkshop>>;

/** The membership id of a member, from the owner's team list. */
export async function membershipOf(owner: supertest.Agent, userId: string): Promise<string> {
  const res = await owner.get('/api/team/members').expect(200);
  return (res.body.members as Array<{ id: string; userId: string }>).find((m) => m.userId === userId)!.id;
}

export async function addCostRate(owner: supertest.Agent, userId: string, effectiveFrom: string, rateMinorPerHour: number) {
  await owner.post(`/api/team/members/${await membershipOf(owner, userId)}/cost-rates`).send({ effectiveFrom, rateMinorPerHour }).expect(201);
}

export async function createPart(owner: supertest.Agent, input: Partial<CreatePartInput> & { sku: string }) {
  const res = await owner.post('/api/parts').send({ ...SCENARIO_PARTS.bushingCloth, ...input });
  if (res.status !== 201) throw new Error(`POST /api/parts answered ${res.status}: ${JSON.stringify(res.body)}`);
  return Part.parse(res.body);
}

export async function receive(agent: supertest.Agent, partId: string, quantityMilli: number, unitCostMinor?: number) {
  const res = await agent.post(`/api/parts/${partId}/movements`).send({ kind: 'received', quantityMilli, unitCostMinor }).expect(201);
  return StockMovementResult.parse(res.body);
}

export async function useParts(agent: supertest.Agent, taskId: string, partId: string, quantityMilli: number) {
  const res = await agent.post(`/api/tasks/${taskId}/parts-used`).send({ partId, quantityMilli }).expect(201);
  return StockMovementResult.parse(res.body);
}

/** Key paths in a response body that match `pattern` (money a role must not see). */
export function keysMatching(body: unknown, pattern: RegExp, path = ''): string[] {
  if (Array.isArray(body)) return body.flatMap((item, i) => keysMatching(item, pattern, `${path}[${i}]`));
  if (body === null || typeof body !== 'object') return [];
  return Object.entries(body).flatMap(([key, value]) => [...(pattern.test(key) ? [`${path}.${key}`] : []), ...keysMatching(value, pattern, `${path}.${key}`)]);
}

/** Any money at all: prices, costs, rates, margins, tax (technicians see none). */
export const ANY_MONEY = /minor|basispoints|price|cost|margin|markup|^money$|^totals$/i;
/** What only the owner sees: costs, cost rates, stock value, markups and margins (the foreman sees prices). */
export const COSTS = /cost|margin|markup|^money$|valueminor|subletbills/i;

/** A finished time entry inserted straight into the database (time is the bench module's; here it is a fact to cost). */
export async function insertEntry(t: TestApp, values: { workshopId: string; technicianId: string; taskId: string; jobId: string; startedAt: string; endedAt: string | null }) {
  const [row] = await t.sql<{ id: string }[]>`
    insert into time_entries (workshop_id, technician_id, task_id, job_id, started_at, ended_at, source, created_by)
    values (${values.workshopId}, ${values.technicianId}, ${values.taskId}, ${values.jobId}, ${values.startedAt}, ${values.endedAt}, 'web', ${values.technicianId})
    returning id`;
  return row!.id;
}
