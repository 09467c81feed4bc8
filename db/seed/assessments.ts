import crypto from 'node:crypto';
import { eq } from 'drizzle-orm';
import { DEFAULT_SURVEY_TEMPLATES } from '@keybed/shared';
import type { Database } from '../client';
import { catalogueLines, catalogueOperations, clientLinks, clientResponses, clientTerms, estimates, surveyComponents, surveys } from '../schema/index';
import { DEMO_CATALOGUE, DEMO_CLIENT_TERMS, DEMO_DECLINE, DEMO_SURVEYS } from './assessments-demo';
import { DEMO_PIANOS, demoInstant, DEMO_WORKSHOP } from './demo';

type Tx = Parameters<Parameters<Database['transaction']>[0]>[0];

const workshopId = DEMO_WORKSHOP.id;

/** Inserts the demo terms, catalogue, surveys and Ines Carvalho's refusal that are missing. */
export async function seedAssessments(tx: Tx, now: Date) {
  await tx.insert(clientTerms).values({ ...DEMO_CLIENT_TERMS, workshopId }).onConflictDoNothing();

  const ops = await tx.insert(catalogueOperations).values(DEMO_CATALOGUE.map(({ lines: _lines, ...op }) => ({ ...op, workshopId }))).onConflictDoNothing().returning({ id: catalogueOperations.id });
  const added = new Set(ops.map((o) => o.id));
  const lines = DEMO_CATALOGUE.filter((op) => added.has(op.id)).flatMap((op) =>
    op.lines.map((line, position) => ({ workshopId, operationId: op.id, position, ...line })),
  );
  if (lines.length > 0) await tx.insert(catalogueLines).values(lines);

  for (const s of DEMO_SURVEYS) {
    const piano = DEMO_PIANOS.find((p) => p.id === s.pianoId)!;
    const at = demoInstant(now, s.daysAgo);
    const [created] = await tx
      .insert(surveys)
      .values({
        id: s.id,
        workshopId,
        pianoId: s.pianoId,
        clientId: piano.clientId,
        surveyedOn: at.toISOString().slice(0, 10),
        place: s.place,
        assessorId: s.assessorId,
        pianoType: s.pianoType,
        serialNumber: piano.serialNumber,
        isSerialConfirmed: s.isSerialConfirmed,
        sizeMm: piano.sizeMm,
        keytopMaterial: piano.keytopMaterial,
        overallGrade: s.overallGrade,
        overallCondition: s.overallCondition,
        recommendedWork: s.recommendedWork,
        choices: s.choices,
        finishedAt: at,
        jobId: s.jobId,
        createdBy: s.assessorId,
        createdAt: at,
        updatedAt: at,
      })
      .onConflictDoNothing()
      .returning({ id: surveys.id });
    if (!created) continue;
    await tx.insert(surveyComponents).values(
      DEFAULT_SURVEY_TEMPLATES[s.pianoType].map((item, position) => {
        const answer = s.answers[item.key] ?? { grade: 'sound' as const };
        return {
          id: `${s.componentIdPrefix}${String(position).padStart(2, '0')}`,
          workshopId,
          surveyId: s.id,
          key: item.key,
          area: item.area,
          name: item.name,
          hint: item.hint,
          measure: item.measure,
          position,
          grade: answer.grade ?? null,
          notInspectedReason: answer.notInspectedReason ?? null,
          note: answer.note ?? '',
          a4PitchCentiHz: answer.a4PitchCentiHz ?? null,
          tuningPinTorqueDeciNm: answer.tuningPinTorqueDeciNm ?? null,
          updatedBy: s.assessorId,
          updatedAt: at,
        };
      }),
    );
  }

  const [declined] = await tx.select({ revision: estimates.revision, version: estimates.version, declinedAt: estimates.declinedAt, issuedAt: estimates.issuedAt }).from(estimates).where(eq(estimates.id, DEMO_DECLINE.estimateId));
  if (declined?.declinedAt && declined.issuedAt) {
    const sentAt = declined.issuedAt;
    // A link whose token nobody holds: its hash is of random bytes thrown away here.
    const tokenHash = crypto.createHash('sha256').update(crypto.randomBytes(32)).digest('hex');
    await tx
      .insert(clientLinks)
      .values({ id: DEMO_DECLINE.linkId, workshopId, estimateId: DEMO_DECLINE.estimateId, tokenHash, sentTo: DEMO_DECLINE.sentTo, expiresAt: new Date(sentAt.getTime() + 30 * 24 * 3600_000), createdAt: sentAt })
      .onConflictDoNothing();
    await tx
      .insert(clientResponses)
      .values({ id: DEMO_DECLINE.responseId, workshopId, linkId: DEMO_DECLINE.linkId, estimateId: DEMO_DECLINE.estimateId, answer: 'declined', revision: declined.revision, estimateVersion: declined.version, reason: DEMO_DECLINE.reason, ipAddress: '127.0.0.1', at: declined.declinedAt })
      .onConflictDoNothing();
  }
}
