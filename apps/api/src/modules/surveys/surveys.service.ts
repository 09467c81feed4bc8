import {
  DEFAULT_SURVEY_TEMPLATES,
  SurveyTemplateItem,
  surveyTemplateTypeOf,
  type CreateSurveyInput,
  type PutSurveyComponentInput,
  type PutSurveyTemplateInput,
  type Survey,
  type SurveyComponent,
  type SurveyPianoType,
  type SurveyTemplate,
  type UpdateSurveyInput,
} from '@keybed/shared';
import { z } from 'zod';
import type { AuthContext } from '../../http/context';
import { AppError, notFound } from '../../http/errors';
import { hzToCenti, nmToDeci, toComponent, toSurvey, toSurveySummary } from './survey-view';
import type { SurveysRepo } from './surveys.repo';

interface Deps {
  repo: SurveysRepo;
  now: () => Date;
}

const fieldError = (field: string, message: string) => new AppError('validation_failed', 400, message, { [field]: [message] });
const StoredItems = z.array(SurveyTemplateItem);

/** Same answer as stored: a retried save changes nothing and never conflicts with itself. */
function isSameAnswer(c: { grade: string | null; notInspectedReason: string | null; note: string; a4PitchCentiHz: number | null; tuningPinTorqueDeciNm: number | null }, input: PutSurveyComponentInput) {
  return (
    c.grade === input.grade &&
    c.notInspectedReason === input.notInspectedReason &&
    c.note === input.note &&
    c.a4PitchCentiHz === hzToCenti(input.a4PitchHz) &&
    c.tuningPinTorqueDeciNm === nmToDeci(input.tuningPinTorqueNm)
  );
}

export function createSurveysService({ repo, now }: Deps) {
  async function templateItems(workshopId: string, pianoType: SurveyPianoType) {
    const row = await repo.template(workshopId, pianoType);
    return { row, items: row ? StoredItems.parse(row.items) : DEFAULT_SURVEY_TEMPLATES[pianoType] };
  }

  async function view(workshopId: string, id: string): Promise<Survey> {
    const row = await repo.find(workshopId, id);
    if (!row) throw notFound('That survey');
    const components = await repo.components(id);
    return toSurvey(row, components, await repo.photosOf(components.map((c) => c.id)));
  }

  async function checkAssessor(workshopId: string, assessorId: string) {
    if (!(await repo.isActiveMember(workshopId, assessorId))) throw fieldError('assessorId', 'Choose an active member of the workshop');
  }

  return {
    get: (auth: AuthContext, id: string) => view(auth.workshopId, id),

    async listForPiano(auth: AuthContext, pianoId: string) {
      if (!(await repo.piano(auth.workshopId, pianoId))) throw notFound('That piano');
      return { surveys: (await repo.listForPiano(auth.workshopId, pianoId)).map(toSurveySummary) };
    },

    async getTemplate(auth: AuthContext, pianoType: SurveyPianoType): Promise<SurveyTemplate> {
      const { row, items } = await templateItems(auth.workshopId, pianoType);
      return { pianoType, items, isCustomised: Boolean(row), updatedAt: row?.updatedAt.toISOString() ?? null };
    },

    async putTemplate(auth: AuthContext, pianoType: SurveyPianoType, input: PutSurveyTemplateInput): Promise<SurveyTemplate> {
      const at = now();
      await repo.putTemplate(auth.workshopId, pianoType, input.items, auth.userId, at);
      return { pianoType, items: input.items, isCustomised: true, updatedAt: at.toISOString() };
    },

    /** Starts a survey with the template's components; particulars default to the piano's record. */
    async create(auth: AuthContext, pianoId: string, input: CreateSurveyInput): Promise<Survey> {
      const piano = await repo.piano(auth.workshopId, pianoId);
      if (!piano) throw notFound('That piano');
      const assessorId = input.assessorId ?? auth.userId;
      if (input.assessorId) await checkAssessor(auth.workshopId, input.assessorId);
      const pianoType = surveyTemplateTypeOf(piano.type);
      const { items } = await templateItems(auth.workshopId, pianoType);
      const at = now();
      const id = await repo.transaction((tx) =>
        repo.insert(
          tx,
          {
            workshopId: auth.workshopId,
            pianoId,
            clientId: piano.clientId,
            surveyedOn: input.surveyedOn,
            place: input.place,
            assessorId,
            pianoType,
            serialNumber: input.serialNumber ?? piano.serialNumber,
            isSerialConfirmed: input.isSerialConfirmed,
            sizeMm: input.sizeMm !== undefined ? input.sizeMm : piano.sizeMm,
            keytopMaterial: input.keytopMaterial ?? piano.keytopMaterial,
            createdBy: auth.userId,
            createdAt: at,
            updatedAt: at,
          },
          items.map((item, position) => ({ workshopId: auth.workshopId, key: item.key, area: item.area, name: item.name, hint: item.hint, measure: item.measure, position, updatedAt: at })),
        ),
      );
      return view(auth.workshopId, id);
    },

    async update(auth: AuthContext, id: string, input: UpdateSurveyInput): Promise<Survey> {
      if (input.assessorId) await checkAssessor(auth.workshopId, input.assessorId);
      await repo.transaction(async (tx) => {
        const survey = await repo.lock(tx, auth.workshopId, id);
        if (!survey) throw notFound('That survey');
        if (survey.version !== input.version) {
          throw new AppError('version_conflict', 409, 'Someone changed this survey since you loaded it. Check it and try again.', undefined, { current: await view(auth.workshopId, id) });
        }
        const { version: _version, isFinished, ...changes } = input;
        const at = now();
        const finishedAt = isFinished === undefined ? undefined : isFinished ? (survey.finishedAt ?? at) : null;
        await repo.update(tx, id, { ...changes, finishedAt }, at);
      });
      return view(auth.workshopId, id);
    },

    /**
     * Saves one component's whole answer. The same answer again is a no-op (a retry after a lost
     * response). With a version, a save based on an older one is refused with the current answer.
     */
    async putComponent(auth: AuthContext, surveyId: string, componentId: string, input: PutSurveyComponentInput): Promise<SurveyComponent> {
      await repo.transaction(async (tx) => {
        const component = await repo.lockComponent(tx, auth.workshopId, surveyId, componentId);
        if (!component) throw notFound('That survey component');
        if (isSameAnswer(component, input)) return;
        if (input.version !== undefined && input.version !== component.version) {
          const [current] = await repo.components(surveyId, tx).then((all) => all.filter((c) => c.id === componentId));
          throw new AppError('version_conflict', 409, 'Someone saved this component since you loaded it. Check their answer and save again.', undefined, { current: toComponent(current!, []) });
        }
        if (input.a4PitchHz !== null && component.measure !== 'a4_pitch') throw fieldError('a4PitchHz', 'This component does not take a pitch measurement');
        if (input.tuningPinTorqueNm !== null && component.measure !== 'tuning_pin_torque') throw fieldError('tuningPinTorqueNm', 'This component does not take a torque measurement');
        const at = now();
        await repo.updateComponent(
          tx,
          componentId,
          { grade: input.grade, notInspectedReason: input.notInspectedReason, note: input.note, a4PitchCentiHz: hzToCenti(input.a4PitchHz), tuningPinTorqueDeciNm: nmToDeci(input.tuningPinTorqueNm), updatedBy: auth.userId },
          at,
        );
        await repo.touch(tx, surveyId, at);
      });
      const components = await repo.components(surveyId);
      const saved = components.find((c) => c.id === componentId)!;
      return toComponent(saved, await repo.photosOf([componentId]));
    },
  };
}

export type SurveysService = ReturnType<typeof createSurveysService>;
