import { describe, expect, it } from 'vitest';
import { changedParts, isSameSurveyAnswer, toSurveyWire, type SurveyAnswer } from './survey-answer';

const salon: SurveyAnswer = {
  surveyedOn: '2026-03-02',
  place: '3 Mill Lane, Fennick Cross',
  assessorId: '1f6a0e52-3b9c-4d71-8e2a-0c5b7d9e1a03',
  serialNumber: 'CF-19114',
  isSerialConfirmed: true,
  sizeText: '5 ft 10 in',
  sizeMm: 1778,
  isSizeEdited: false,
  keytopMaterial: 'ivory',
  overallGrade: 'needs_work',
  overallCondition: 'Sound structure; worn action.',
  recommendedWork: 'New hammers, rebush keys, full regulation',
  choices: [{ choice: 'Case', alternatives: ['Revive the shellac', 'Strip and refinish'] }],
  isFinished: false,
};

describe('toSurveyWire', () => {
  it('when the size text was not touched, then the stored millimetres go back unchanged', () => {
    expect(toSurveyWire(salon, 'ft-in')).toMatchObject({ ok: true, wire: { sizeMm: 1778 } });
  });

  it('when the size is retyped in centimetres, then it is read as whole millimetres', () => {
    expect(toSurveyWire({ ...salon, sizeText: '177.9', isSizeEdited: true }, 'cm')).toMatchObject({ ok: true, wire: { sizeMm: 1779 } });
  });

  it('when the size cannot be read, then the size field says why', () => {
    const result = toSurveyWire({ ...salon, sizeText: 'big', isSizeEdited: true }, 'ft-in');
    expect(result.ok).toBe(false);
    expect(result.ok ? [] : Object.keys(result.fields)).toEqual(['sizeMm']);
  });

  it('when a choice row is left empty, then it is ignored; one with a single alternative is refused', () => {
    const withEmpty = { ...salon, choices: [...salon.choices, { choice: ' ', alternatives: ['', ''] }] };
    expect(toSurveyWire(withEmpty, 'ft-in')).toMatchObject({ ok: true, wire: { choices: salon.choices } });
    const single = { ...salon, choices: [{ choice: 'Hammers', alternatives: ['New hammers', ''] }] };
    expect(toSurveyWire(single, 'ft-in')).toEqual({ ok: false, fields: { 'choices.0.alternatives': ['Name at least two alternatives'] } });
  });
});

describe('comparing survey answers', () => {
  it('when only spacing differs, then the answers are the same', () => {
    expect(isSameSurveyAnswer(salon, { ...salon, place: ' 3 Mill Lane, Fennick Cross ' }, 'ft-in')).toBe(true);
  });

  it('when someone else changed the place and the condition, then the conflict names both', () => {
    expect(changedParts(salon, { ...salon, place: 'Workshop', overallCondition: 'Fair' }, 'ft-in')).toEqual(['place', 'overall condition']);
  });
});
