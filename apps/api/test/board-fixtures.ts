import type supertest from 'supertest';
import { Client, Job, Piano, StageList, type CreatePianoInput, type Stage } from '@keybed/shared';
import type { TestApp } from './helpers';

/** The scenario's Salon grand, as the default piano of test jobs. */
export const SALON_GRAND = {
  maker: 'Carrow & Finch',
  model: 'Salon',
  serialNumber: 'CF-19114',
  type: 'grand',
  sizeMm: 1778,
  yearApprox: 1911,
  caseFinish: 'Figured rosewood, shellac',
  keytopMaterial: 'ivory',
} as const;

export async function createClient(agent: supertest.Agent, input: Record<string, unknown> = { name: 'Harriet Pembleton', email: 'harriet@pembleton.example' }) {
  const res = await agent.post('/api/clients').send(input).expect(201);
  return Client.parse(res.body);
}

export async function createPiano(agent: supertest.Agent, clientId: string, input: Partial<CreatePianoInput> = {}) {
  const res = await agent
    .post('/api/pianos')
    .send({ ...SALON_GRAND, ...input, clientId })
    .expect(201);
  return Piano.parse(res.body);
}

/** The workshop's active stages, in board order. */
export async function activeStages(agent: supertest.Agent): Promise<Stage[]> {
  const res = await agent.get('/api/stages').expect(200);
  return StageList.parse(res.body).stages.filter((s) => !s.isArchived);
}

/** A job on a fresh piano of a fresh client (or on `pianoId`), in `stageId` or the first stage. */
export async function createJob(agent: supertest.Agent, input: { title?: string; stageId?: string; pianoId?: string } = {}) {
  const pianoId = input.pianoId ?? (await createPiano(agent, (await createClient(agent)).id)).id;
  const res = await agent
    .post('/api/jobs')
    .send({ title: input.title ?? 'New hammers, rebush, full regulation', pianoId, stageId: input.stageId })
    .expect(201);
  return Job.parse(res.body);
}

/** Several jobs in one stage, in the order made (so positions 0..n-1); one shared piano. */
export async function fillStage(agent: supertest.Agent, stageId: string, count: number, label = 'Job') {
  const piano = await createPiano(agent, (await createClient(agent)).id);
  const jobs: Job[] = [];
  for (let i = 0; i < count; i++) jobs.push(await createJob(agent, { title: `${label} ${i}`, stageId, pianoId: piano.id }));
  return jobs;
}

/** Job ids of a stage by position, read straight from the database. */
export async function idsByPosition(t: TestApp, stageId: string): Promise<string[]> {
  const rows = await t.sql<{ id: string }[]>`select id from jobs where stage_id = ${stageId} and position is not null order by position`;
  return rows.map((r) => r.id);
}

/** Positions of a stage's jobs on the board, straight from the database, in order. */
export async function positionsIn(t: TestApp, stageId: string): Promise<number[]> {
  const rows = await t.sql<{ position: number }[]>`select position from jobs where stage_id = ${stageId} and position is not null order by position`;
  return rows.map((r) => r.position);
}

export const range = (n: number) => Array.from({ length: n }, (_, i) => i);
