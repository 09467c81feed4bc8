import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { CatalogueList, ClientTerms, Survey, SurveyList } from '@keybed/shared';
import { DEMO_PASSWORD, seedDemo } from '@keybed/db/seed/index';
import { hashPassword } from '../src/lib/password';
import { createTestApp, type TestApp } from './helpers';

let t: TestApp;
const seededAt = new Date('2026-12-01T09:00:00Z');
beforeAll(async () => {
  t = await createTestApp();
  await seedDemo(t.db, hashPassword, seededAt);
});
afterAll(() => t.close());

async function signIn(email: string) {
  const agent = t.agent();
  await agent.post('/api/auth/sign-in').send({ email, password: DEMO_PASSWORD }).expect(200);
  return agent;
}

const HARRIET_GRAND = '3d8e2a74-5b1f-4c93-8a4c-2e7f9b1c3d01';
const INES_UPRIGHT = '3d8e2a74-5b1f-4c93-8a4c-2e7f9b1c3d04';

describe('demo assessments', () => {
  it('when the owner opens Harriet Pembleton’s grand, then its survey is there with the worn hammers, the measured pitch and torque, the ivory caution and her job', async () => {
    const margaret = await signIn('margaret@fennick.example');
    const { surveys } = SurveyList.parse((await margaret.get(`/api/pianos/${HARRIET_GRAND}/surveys`).expect(200)).body);
    expect(surveys).toHaveLength(1);
    const survey = Survey.parse((await margaret.get(`/api/surveys/${surveys[0]!.id}`).expect(200)).body);
    const byKey = Object.fromEntries(survey.areas.flatMap((a) => a.components).map((c) => [c.key, c]));
    expect(byKey.hammers).toMatchObject({ grade: 'replace' });
    expect(byKey['tuning-pitch']).toMatchObject({ a4PitchHz: 436 });
    expect(byKey.pinblock).toMatchObject({ tuningPinTorqueNm: 11.3 });
    expect(byKey['shanks-flanges']).toMatchObject({ isNotInspected: true });
    expect(survey).toMatchObject({ isFinished: true, jobId: '4e9f3b85-6c2a-4da4-9b5d-3f8a0c2d4e01', cautions: [{ key: 'ivory' }] });
    expect(survey.choices.map((c) => c.choice)).toEqual(['Hammers', 'Case']);
  });

  it('when the owner looks at Ines Carvalho’s upright, then the survey is there and her refusal of the estimate is recorded with her reason', async () => {
    const margaret = await signIn('margaret@fennick.example');
    const { surveys } = SurveyList.parse((await margaret.get(`/api/pianos/${INES_UPRIGHT}/surveys`).expect(200)).body);
    expect(surveys).toHaveLength(1);
    const [response] = await t.sql`select answer, reason from client_responses r join estimates e on e.id = r.estimate_id where e.job_id = '4e9f3b85-6c2a-4da4-9b5d-3f8a0c2d4e05'`;
    expect(response).toEqual({ answer: 'declined', reason: 'We will wait until next year.' });
  });

  it('when the foreman reads the catalogue and the terms, then the scenario’s operations are priced and the deposit is 30 %', async () => {
    const tom = await signIn('tom@fennick.example');
    const { operations } = CatalogueList.parse((await tom.get('/api/catalogue').expect(200)).body);
    expect(operations.map((o) => o.name)).toEqual([
      'Case tidy',
      'Full refinish in black polyester',
      'Full regulation',
      'New damper felts',
      'Pitch raise and fine tuning',
      'Rebush keys',
      'Replace hammer set (grand)',
      'Restring',
      'Soundboard crack repair',
    ]);
    expect(operations.find((o) => o.name === 'Full refinish in black polyester')).toMatchObject({ netMinor: 185000, lines: [{ supplier: 'Heathside Finishers' }] });
    expect(ClientTerms.parse((await tom.get('/api/client-terms').expect(200)).body)).toMatchObject({ depositBasisPoints: 3000, linkLifetimeDays: 30 });
  });

  it('when the seed runs again, then no survey, component, operation or response is added', async () => {
    const count = async () => (await t.sql`select (select count(*)::int from surveys) as s, (select count(*)::int from survey_components) as c, (select count(*)::int from catalogue_lines) as l, (select count(*)::int from client_responses) as r`)[0];
    const before = await count();
    await seedDemo(t.db, hashPassword, new Date('2027-01-15T09:00:00Z'));
    expect(await count()).toEqual(before);
  });
});
