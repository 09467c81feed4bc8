import type supertest from 'supertest';
import { Survey, SurveyEstimateResult } from '@keybed/shared';
import { scenarioCatalogue } from './catalogue-fixtures';
import { componentOf, startSurvey } from './survey-fixtures';

/** Harriet Pembleton's grand surveyed as in the scenario: worn hammers, loose bushings, a tired case. */
export async function surveyedGrand(agent: supertest.Agent) {
  const survey = await startSurvey(agent);
  const grades: Array<[string, string, string]> = [
    ['hammers', 'replace', 'Grooves about 3 mm deep, felt hard'],
    ['key-bushings', 'needs_work', 'Loose throughout, some moth damage'],
    ['case-finish', 'needs_work', 'Shellac crazed and dull'],
    ['soundboard', 'sound', ''],
  ];
  for (const [key, grade, note] of grades) {
    await agent.put(`/api/surveys/${survey.id}/components/${componentOf(survey, key).id}`).send({ grade, note }).expect(200);
  }
  const res = await agent
    .patch(`/api/surveys/${survey.id}`)
    .send({
      version: 1,
      overallGrade: 'needs_work',
      overallCondition: 'Structurally sound; the action is worn out.',
      recommendedWork: 'New hammers, rebush the keys, full regulation',
      choices: [
        { choice: 'Hammers', alternatives: ['New hammers', 'Recover the old ones'] },
        { choice: 'Case', alternatives: ['Revive the shellac', 'Strip and refinish'] },
      ],
      isFinished: true,
    })
    .expect(200);
  return Survey.parse(res.body);
}

/**
 * The scenario end to end up to a draft: catalogue, survey, and "prepare estimate" with two
 * choices (hammers new or recovered; case revived or refinished) and rebushing always included.
 */
export async function preparedEstimate(agent: supertest.Agent) {
  const catalogue = await scenarioCatalogue(agent);
  const survey = await surveyedGrand(agent);
  const hammers = componentOf(survey, 'hammers').id;
  const res = await agent
    .post(`/api/surveys/${survey.id}/estimate`)
    .send({
      options: [
        { key: 'new-hammers', choice: 'Hammers', name: 'New hammers' },
        { key: 'recover', choice: 'Hammers', name: 'Recover the old ones' },
        { key: 'revive', choice: 'Case', name: 'Revive the shellac' },
        { key: 'refinish', choice: 'Case', name: 'Strip and refinish in black polyester' },
      ],
      items: [
        { operationId: catalogue.newHammers.id, componentIds: [hammers], optionKey: 'new-hammers' },
        { operationId: catalogue.recover.id, componentIds: [hammers], optionKey: 'recover' },
        { operationId: catalogue.rebush.id },
        { operationId: catalogue.regulation.id },
        { operationId: catalogue.revive.id, optionKey: 'revive' },
        { operationId: catalogue.refinish.id, optionKey: 'refinish' },
      ],
    })
    .expect(201);
  return { catalogue, survey, ...SurveyEstimateResult.parse(res.body) };
}
