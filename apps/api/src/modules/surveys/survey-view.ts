import { CAUTIONS, SurveyChoice, type Survey, type SurveyArea, type SurveyComponent, type SurveySummary } from '@keybed/shared';
import { z } from 'zod';
import type { ComponentRow, SurveyRow, SurveySummaryRow, SurveysRepo } from './surveys.repo';

type PhotoRow = Awaited<ReturnType<SurveysRepo['photosOf']>>[number];

/** Stored in centihertz and decinewton-metres; sent in hertz and newton-metres. */
export const hzToCenti = (hz: number | null) => (hz === null ? null : Math.round(hz * 100));
export const nmToDeci = (nm: number | null) => (nm === null ? null : Math.round(nm * 10));

export function toSurveySummary(row: SurveySummaryRow): SurveySummary {
  return {
    id: row.id,
    pianoId: row.pianoId,
    surveyedOn: row.surveyedOn,
    place: row.place,
    assessor: row.assessorId && row.assessorName ? { id: row.assessorId, name: row.assessorName } : null,
    overallGrade: row.overallGrade,
    isFinished: row.finishedAt !== null,
    answeredCount: row.answeredCount,
    componentCount: row.componentCount,
    jobId: row.jobId,
    createdAt: row.createdAt.toISOString(),
    updatedAt: row.updatedAt.toISOString(),
  };
}

export function toComponent(c: ComponentRow, photos: PhotoRow[]): SurveyComponent {
  return {
    id: c.id,
    key: c.key,
    area: c.area,
    name: c.name,
    hint: c.hint,
    measure: c.measure,
    position: c.position,
    grade: c.grade,
    isNotInspected: c.notInspectedReason !== null,
    notInspectedReason: c.notInspectedReason,
    note: c.note,
    a4PitchHz: c.a4PitchCentiHz === null ? null : c.a4PitchCentiHz / 100,
    tuningPinTorqueNm: c.tuningPinTorqueDeciNm === null ? null : c.tuningPinTorqueDeciNm / 10,
    photos: photos
      .filter((p) => p.surveyComponentId === c.id)
      .map((p) => ({ id: p.id, isSharedWithClient: p.isSharedWithClient, width: p.width, height: p.height, createdAt: p.createdAt.toISOString() })),
    version: c.version,
    updatedAt: c.updatedAt.toISOString(),
    updatedBy: c.updatedBy && c.updatedByName ? { id: c.updatedBy, name: c.updatedByName } : null,
  };
}

/** Components grouped by area, areas in the order they first appear. */
export function groupByArea(components: SurveyComponent[]): SurveyArea[] {
  const areas = new Map<string, SurveyComponent[]>();
  for (const c of components) areas.set(c.area, [...(areas.get(c.area) ?? []), c]);
  return [...areas].map(([area, list]) => ({ area, components: list }));
}

export function toSurvey(row: SurveyRow, components: ComponentRow[], photos: PhotoRow[]): Survey {
  return {
    ...toSurveySummary(row),
    piano: row.piano,
    client: row.client,
    pianoType: row.pianoType,
    serialNumber: row.serialNumber,
    isSerialConfirmed: row.isSerialConfirmed,
    sizeMm: row.sizeMm,
    keytopMaterial: row.keytopMaterial,
    overallCondition: row.overallCondition,
    recommendedWork: row.recommendedWork,
    choices: z.array(SurveyChoice).parse(row.choices),
    finishedAt: row.finishedAt?.toISOString() ?? null,
    version: row.version,
    areas: groupByArea(components.map((c) => toComponent(c, photos))),
    cautions: row.keytopMaterial === 'ivory' ? [CAUTIONS.ivory] : [],
  };
}
