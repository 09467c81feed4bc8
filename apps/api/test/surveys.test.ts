import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { DEFAULT_SURVEY_TEMPLATES, Survey, SurveyComponent, SurveyList, SurveyTemplate } from '@keybed/shared';
import { createClient, createPiano } from './board-fixtures';
import { addMember, createTestApp, signUpWorkshop, type TestApp } from './helpers';
import { ErrorBody } from './schemas';
import { componentOf, startSurvey } from './survey-fixtures';

let t: TestApp;
beforeAll(async () => {
  t = await createTestApp();
});
afterAll(() => t.close());

describe('POST /api/pianos/:id/surveys', () => {
  it('when a technician starts a survey of a grand, then it copies the grand template grouped by area with the piano’s particulars and the ivory caution', async () => {
    const { agent: owner } = await signUpWorkshop(t);
    const { agent: tech, userId } = await addMember(t, owner, 'technician');
    const piano = await createPiano(owner, (await createClient(owner)).id);
    const res = await tech.post(`/api/pianos/${piano.id}/surveys`).send({ surveyedOn: '2026-11-20', place: 'Client’s home, 3 Mill Lane', isSerialConfirmed: true }).expect(201);
    const survey = Survey.parse(res.body);
    expect(survey).toMatchObject({ pianoType: 'grand', serialNumber: 'CF-19114', isSerialConfirmed: true, sizeMm: 1778, keytopMaterial: 'ivory', assessor: { id: userId }, answeredCount: 0 });
    expect(survey.componentCount).toBe(DEFAULT_SURVEY_TEMPLATES.grand.length);
    expect(survey.areas.map((a) => a.area)).toEqual(['Case', 'Keys', 'Action', 'Dampers', 'Soundboard and bridges', 'Strings and tuning', 'Regulation', 'Woodworm']);
    expect(survey.cautions.map((c) => c.key)).toEqual(['ivory']);
    const keys = survey.areas.flatMap((a) => a.components.map((c) => c.key));
    for (const key of ['case-finish', 'music-desk', 'lid-hinges', 'legs-castors', 'pedals-trapwork', 'keytops', 'key-bushings', 'key-frame', 'hammers', 'shanks-flanges', 'repetition', 'dampers', 'soundboard', 'ribs', 'bridges', 'pinblock', 'strings', 'plate', 'tuning-pitch', 'regulation', 'woodworm']) {
      expect(keys).toContain(key);
    }
  });

  it('when the piano belongs to another workshop, then 404 and no survey is made', async () => {
    const { agent } = await signUpWorkshop(t);
    const { agent: other } = await signUpWorkshop(t, 'other');
    const theirs = await createPiano(other, (await createClient(other)).id);
    const res = await agent.post(`/api/pianos/${theirs.id}/surveys`).send({ surveyedOn: '2026-11-20' }).expect(404);
    expect(ErrorBody.parse(res.body).error.code).toBe('not_found');
    expect((await t.sql`select 1 from surveys where piano_id = ${theirs.id}`).length).toBe(0);
  });

  it('when the date is not a date or the size is silly, then 400 on that field', async () => {
    const { agent } = await signUpWorkshop(t);
    const piano = await createPiano(agent, (await createClient(agent)).id);
    const bad = await agent.post(`/api/pianos/${piano.id}/surveys`).send({ surveyedOn: '20/11/2026', sizeMm: 17780 }).expect(400);
    expect(Object.keys(ErrorBody.parse(bad.body).error.fields ?? {}).sort()).toEqual(['sizeMm', 'surveyedOn']);
  });

  it('when the workshop edited its upright template, then a new upright survey uses it and older surveys keep theirs', async () => {
    const { agent } = await signUpWorkshop(t);
    const client = await createClient(agent, { name: 'Ines Carvalho' });
    const upright = await createPiano(agent, client.id, { maker: 'Carrow & Finch', model: '', type: 'upright', sizeMm: null, serialNumber: '' });
    const before = await startSurvey(agent, upright.id);
    const items = [
      { key: 'keytops', area: 'Keys', name: 'Keytops' },
      { key: 'tuning-pitch', area: 'Strings and tuning', name: 'Tuning and pitch', measure: 'a4_pitch' },
    ];
    const put = SurveyTemplate.parse((await agent.put('/api/survey-templates/upright').send({ items }).expect(200)).body);
    expect(put).toMatchObject({ isCustomised: true, items: [{ key: 'keytops', hint: '', measure: null }, { measure: 'a4_pitch' }] });
    const after = await startSurvey(agent, upright.id);
    expect(after.componentCount).toBe(2);
    expect(Survey.parse((await agent.get(`/api/surveys/${before.id}`).expect(200)).body).componentCount).toBe(DEFAULT_SURVEY_TEMPLATES.upright.length);
    const list = SurveyList.parse((await agent.get(`/api/pianos/${upright.id}/surveys`).expect(200)).body);
    expect(list.surveys).toHaveLength(2);
  });
});

describe('GET/PUT /api/survey-templates/:pianoType', () => {
  it('when nothing was saved, then the defaults; a technician may read but not change them', async () => {
    const { agent: owner } = await signUpWorkshop(t);
    const { agent: tech } = await addMember(t, owner, 'technician');
    const res = SurveyTemplate.parse((await tech.get('/api/survey-templates/grand').expect(200)).body);
    expect(res).toMatchObject({ isCustomised: false, updatedAt: null });
    expect(res.items).toEqual(DEFAULT_SURVEY_TEMPLATES.grand);
    expect(ErrorBody.parse((await tech.put('/api/survey-templates/grand').send({ items: res.items }).expect(403)).body).error.code).toBe('forbidden');
  });

  it('when a key is used twice or the type is unknown, then 400', async () => {
    const { agent } = await signUpWorkshop(t);
    const twice = await agent.put('/api/survey-templates/grand').send({ items: [{ key: 'a', area: 'A', name: 'One' }, { key: 'a', area: 'A', name: 'Two' }] }).expect(400);
    expect(ErrorBody.parse(twice.body).error.fields).toHaveProperty(['items.1.key']);
    await agent.get('/api/survey-templates/spinet').expect(400);
  });
});

describe('PUT /api/surveys/:id/components/:componentId', () => {
  it('when a grade, note and torque are saved, then they come back in newton-metres and the survey counts the answer', async () => {
    const { agent } = await signUpWorkshop(t);
    const survey = await startSurvey(agent);
    const pinblock = componentOf(survey, 'pinblock');
    const res = await agent.put(`/api/surveys/${survey.id}/components/${pinblock.id}`).send({ grade: 'serviceable', note: 'Even torque, a little low in the tenor', tuningPinTorqueNm: 9.5 }).expect(200);
    expect(SurveyComponent.parse(res.body)).toMatchObject({ grade: 'serviceable', tuningPinTorqueNm: 9.5, version: 2, isNotInspected: false });
    const again = Survey.parse((await agent.get(`/api/surveys/${survey.id}`).expect(200)).body);
    expect(again.answeredCount).toBe(1);
    expect((await t.sql`select tuning_pin_torque_deci_nm from survey_components where id = ${pinblock.id}`)[0]).toEqual({ tuning_pin_torque_deci_nm: 95 });
  });

  it('when the same answer is sent twice with the version it was based on, then the retry is a no-op, not a conflict', async () => {
    const { agent } = await signUpWorkshop(t);
    const survey = await startSurvey(agent);
    const pitch = componentOf(survey, 'tuning-pitch');
    const body = { version: 1, grade: 'needs_work', note: 'About 30 cents flat', a4PitchHz: 432.5 };
    const first = SurveyComponent.parse((await agent.put(`/api/surveys/${survey.id}/components/${pitch.id}`).send(body).expect(200)).body);
    const retry = SurveyComponent.parse((await agent.put(`/api/surveys/${survey.id}/components/${pitch.id}`).send(body).expect(200)).body);
    expect(retry).toEqual(first);
    expect(first).toMatchObject({ version: 2, a4PitchHz: 432.5 });
  });

  it('when another device saved in between, then a save on the old version gets 409 with their answer, and without a version the last write wins', async () => {
    const { agent } = await signUpWorkshop(t);
    const survey = await startSurvey(agent);
    const hammers = componentOf(survey, 'hammers');
    const url = `/api/surveys/${survey.id}/components/${hammers.id}`;
    await agent.put(url).send({ version: 1, grade: 'replace', note: 'Grooves 3 mm deep' }).expect(200);
    const stale = await agent.put(url).send({ version: 1, grade: 'needs_work', note: 'Could be filed' }).expect(409);
    expect(stale.body).toMatchObject({ error: { code: 'version_conflict' }, current: { grade: 'replace', note: 'Grooves 3 mm deep' } });
    const last = await agent.put(url).send({ grade: 'needs_work', note: 'Could be filed' }).expect(200);
    expect(last.body).toMatchObject({ grade: 'needs_work', version: 3 });
  });

  it('when a component is marked not inspected, then it needs a reason and no grade', async () => {
    const { agent } = await signUpWorkshop(t);
    const survey = await startSurvey(agent);
    const action = componentOf(survey, 'shanks-flanges');
    const url = `/api/surveys/${survey.id}/components/${action.id}`;
    const both = await agent.put(url).send({ grade: 'sound', notInspectedReason: 'Action not removed' }).expect(400);
    expect(ErrorBody.parse(both.body).error.fields).toHaveProperty('notInspectedReason');
    const blank = await agent.put(url).send({ notInspectedReason: '  ' }).expect(400);
    expect(ErrorBody.parse(blank.body).error.fields).toHaveProperty('notInspectedReason');
    const ok = SurveyComponent.parse((await agent.put(url).send({ notInspectedReason: 'Action not removed' }).expect(200)).body);
    expect(ok).toMatchObject({ isNotInspected: true, grade: null });
  });

  it('when a measurement is sent to a component that does not take it, or out of range, then 400 and nothing changes', async () => {
    const { agent } = await signUpWorkshop(t);
    const survey = await startSurvey(agent);
    const hammers = componentOf(survey, 'hammers');
    const pitch = componentOf(survey, 'tuning-pitch');
    await agent.put(`/api/surveys/${survey.id}/components/${hammers.id}`).send({ grade: 'sound', a4PitchHz: 440 }).expect(400);
    await agent.put(`/api/surveys/${survey.id}/components/${pitch.id}`).send({ a4PitchHz: 880 }).expect(400);
    await agent.put(`/api/surveys/${survey.id}/components/${pitch.id}`).send({ a4PitchHz: 440.123 }).expect(400);
    const rows = await t.sql`select version from survey_components where id in ${t.sql([hammers.id, pitch.id])}`;
    expect(rows.map((r) => r.version)).toEqual([1, 1]);
  });

  it('when the database is asked directly for a grade and a not-inspected reason together, then it refuses', async () => {
    const { agent } = await signUpWorkshop(t);
    const survey = await startSurvey(agent);
    const c = componentOf(survey, 'plate');
    await expect(t.sql`update survey_components set grade = 'sound', not_inspected_reason = 'Covered' where id = ${c.id}`).rejects.toThrow(/survey_components_graded_or_not_inspected/);
    await expect(t.sql`update survey_components set a4_pitch_centi_hz = 44000 where id = ${c.id}`).rejects.toThrow(/survey_components_pitch_measured_here/);
  });

  it('when the component belongs to another workshop’s survey, then 404', async () => {
    const { agent } = await signUpWorkshop(t);
    const { agent: other } = await signUpWorkshop(t, 'other');
    const theirs = await startSurvey(other);
    const c = componentOf(theirs, 'hammers');
    await agent.put(`/api/surveys/${theirs.id}/components/${c.id}`).send({ grade: 'sound' }).expect(404);
    await agent.get(`/api/surveys/${theirs.id}`).expect(404);
  });
});

describe('PATCH /api/surveys/:id', () => {
  it('when the summary, choices and finish are saved, then they come back; a stale version gets 409', async () => {
    const { agent } = await signUpWorkshop(t);
    const survey = await startSurvey(agent);
    const summary = {
      version: 1,
      overallGrade: 'needs_work',
      overallCondition: 'Structurally sound; the action is worn out.',
      recommendedWork: 'New hammers, rebush the keys, full regulation.',
      choices: [
        { choice: 'Hammers', alternatives: ['New hammers', 'Recover the old ones'] },
        { choice: 'Case', alternatives: ['Revive the shellac', 'Strip and refinish'] },
      ],
      isFinished: true,
    };
    const res = Survey.parse((await agent.patch(`/api/surveys/${survey.id}`).send(summary).expect(200)).body);
    expect(res).toMatchObject({ overallGrade: 'needs_work', isFinished: true, version: 2, choices: summary.choices });
    expect(res.finishedAt).not.toBeNull();
    const stale = await agent.patch(`/api/surveys/${survey.id}`).send({ version: 1, place: 'Workshop' }).expect(409);
    expect(ErrorBody.parse(stale.body).error.code).toBe('version_conflict');
  });

  it('when a choice names one alternative or the assessor is not a member, then 400', async () => {
    const { agent } = await signUpWorkshop(t);
    const { me: stranger } = await signUpWorkshop(t, 'other');
    const survey = await startSurvey(agent);
    const one = await agent.patch(`/api/surveys/${survey.id}`).send({ version: 1, choices: [{ choice: 'Case', alternatives: ['Refinish'] }] }).expect(400);
    expect(ErrorBody.parse(one.body).error.fields).toHaveProperty(['choices.0.alternatives']);
    const notOurs = await agent.patch(`/api/surveys/${survey.id}`).send({ version: 1, assessorId: stranger.user.id }).expect(400);
    expect(ErrorBody.parse(notOurs.body).error.fields).toHaveProperty('assessorId');
  });
});
