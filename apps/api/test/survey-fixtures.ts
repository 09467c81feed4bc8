import type supertest from 'supertest';
import { Survey } from '@keybed/shared';
import { createClient, createPiano } from './board-fixtures';

/** A survey started today on `pianoId`, or on a fresh Salon grand of a fresh client. */
export async function startSurvey(agent: supertest.Agent, pianoId?: string) {
  const id = pianoId ?? (await createPiano(agent, (await createClient(agent)).id)).id;
  const res = await agent.post(`/api/pianos/${id}/surveys`).send({ surveyedOn: '2026-11-20', place: 'Workshop' }).expect(201);
  return Survey.parse(res.body);
}

export const componentOf = (survey: Survey, key: string) => {
  const found = survey.areas.flatMap((a) => a.components).find((c) => c.key === key);
  if (!found) throw new Error(`No component ${key} in the survey`);
  return found;
};
