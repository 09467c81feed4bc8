import { and, asc, count, desc, eq, getTableColumns, inArray, isNotNull, or, sql } from 'drizzle-orm';
import type { Database } from '@keybed/db/client';
import { clients, memberships, pianos, surveyComponents, surveys, surveyTemplates, uploads, users } from '@keybed/db/schema';
import type { Tx } from '../auth/auth.repo';

type Db = Database | Tx;
export type SurveyValues = typeof surveys.$inferInsert;
export type ComponentValues = typeof surveyComponents.$inferInsert;
export type ComponentRow = typeof surveyComponents.$inferSelect & { updatedByName: string | null };

const answered = sql<number>`count(*) filter (where ${surveyComponents.grade} is not null or ${surveyComponents.notInspectedReason} is not null)`.mapWith(Number);

export function createSurveysRepo(db: Database) {
  const summaryColumns = {
    ...getTableColumns(surveys),
    assessorName: users.name,
    answeredCount: answered,
    componentCount: count(surveyComponents.id),
  };

  const selectSummaries = (q: Db) =>
    q
      .select(summaryColumns)
      .from(surveys)
      .leftJoin(users, eq(users.id, surveys.assessorId))
      .leftJoin(surveyComponents, eq(surveyComponents.surveyId, surveys.id))
      .groupBy(surveys.id, users.name);

  return {
    transaction: <T>(fn: (tx: Tx) => Promise<T>) => db.transaction(fn),

    async piano(workshopId: string, pianoId: string, q: Db = db) {
      const [row] = await q
        .select({ id: pianos.id, clientId: pianos.clientId, type: pianos.type, serialNumber: pianos.serialNumber, sizeMm: pianos.sizeMm, keytopMaterial: pianos.keytopMaterial })
        .from(pianos)
        .where(and(eq(pianos.workshopId, workshopId), eq(pianos.id, pianoId)));
      return row;
    },

    async isActiveMember(workshopId: string, userId: string, q: Db = db) {
      const [row] = await q
        .select({ id: memberships.id })
        .from(memberships)
        .where(and(eq(memberships.workshopId, workshopId), eq(memberships.userId, userId), eq(memberships.isActive, true)));
      return Boolean(row);
    },

    async template(workshopId: string, pianoType: 'grand' | 'upright', q: Db = db) {
      const [row] = await q.select().from(surveyTemplates).where(and(eq(surveyTemplates.workshopId, workshopId), eq(surveyTemplates.pianoType, pianoType)));
      return row;
    },

    async putTemplate(workshopId: string, pianoType: 'grand' | 'upright', items: unknown, userId: string, at: Date) {
      await db
        .insert(surveyTemplates)
        .values({ workshopId, pianoType, items, updatedBy: userId, updatedAt: at })
        .onConflictDoUpdate({ target: [surveyTemplates.workshopId, surveyTemplates.pianoType], set: { items, updatedBy: userId, updatedAt: at } });
    },

    async insert(tx: Tx, values: SurveyValues, components: Omit<ComponentValues, 'surveyId'>[]) {
      const [row] = await tx.insert(surveys).values(values).returning({ id: surveys.id });
      await tx.insert(surveyComponents).values(components.map((c) => ({ ...c, surveyId: row!.id })));
      return row!.id;
    },

    listForPiano: (workshopId: string, pianoId: string) =>
      selectSummaries(db)
        .where(and(eq(surveys.workshopId, workshopId), eq(surveys.pianoId, pianoId)))
        .orderBy(desc(surveys.surveyedOn), desc(surveys.createdAt)),

    async find(workshopId: string, id: string, q: Db = db) {
      const [row] = await selectSummaries(q).where(and(eq(surveys.workshopId, workshopId), eq(surveys.id, id)));
      if (!row) return undefined;
      const [extra] = await q
        .select({
          piano: { id: pianos.id, maker: pianos.maker, model: pianos.model, type: pianos.type, yearApprox: pianos.yearApprox, caseFinish: pianos.caseFinish },
          client: { id: clients.id, name: clients.name },
        })
        .from(pianos)
        .innerJoin(clients, eq(clients.id, row.clientId))
        .where(eq(pianos.id, row.pianoId));
      return { ...row, ...extra! };
    },

    components: (surveyId: string, q: Db = db): Promise<ComponentRow[]> =>
      q
        .select({ ...getTableColumns(surveyComponents), updatedByName: users.name })
        .from(surveyComponents)
        .leftJoin(users, eq(users.id, surveyComponents.updatedBy))
        .where(eq(surveyComponents.surveyId, surveyId))
        .orderBy(asc(surveyComponents.position)),

    photosOf: (componentIds: string[], q: Db = db) =>
      componentIds.length === 0
        ? Promise.resolve([])
        : q
            .select({ id: uploads.id, surveyComponentId: uploads.surveyComponentId, isSharedWithClient: uploads.isSharedWithClient, width: uploads.width, height: uploads.height, createdAt: uploads.createdAt })
            .from(uploads)
            .where(inArray(uploads.surveyComponentId, componentIds))
            .orderBy(asc(uploads.createdAt), asc(uploads.id)),

    async lock(tx: Tx, workshopId: string, id: string) {
      const [row] = await tx.select().from(surveys).where(and(eq(surveys.workshopId, workshopId), eq(surveys.id, id))).for('update');
      return row;
    },

    async update(tx: Tx, id: string, values: Partial<SurveyValues>, at: Date) {
      await tx
        .update(surveys)
        .set({ ...values, version: sql`${surveys.version} + 1`, updatedAt: at })
        .where(eq(surveys.id, id));
    },

    /** Marks the survey as changed (a component was saved) without touching its version. */
    async touch(tx: Tx, id: string, at: Date) {
      await tx.update(surveys).set({ updatedAt: at }).where(eq(surveys.id, id));
    },

    async lockComponent(tx: Tx, workshopId: string, surveyId: string, componentId: string) {
      const [row] = await tx
        .select()
        .from(surveyComponents)
        .where(and(eq(surveyComponents.workshopId, workshopId), eq(surveyComponents.surveyId, surveyId), eq(surveyComponents.id, componentId)))
        .for('update');
      return row;
    },

    async updateComponent(tx: Tx, id: string, values: Partial<ComponentValues>, at: Date) {
      await tx
        .update(surveyComponents)
        .set({ ...values, version: sql`${surveyComponents.version} + 1`, updatedAt: at })
        .where(eq(surveyComponents.id, id));
    },

    /** Components graded Needs work or Replace, in survey order. */
    needingWork: (surveyId: string) =>
      db
        .select()
        .from(surveyComponents)
        .where(and(eq(surveyComponents.surveyId, surveyId), or(eq(surveyComponents.grade, 'needs_work'), eq(surveyComponents.grade, 'replace')), isNotNull(surveyComponents.grade)))
        .orderBy(asc(surveyComponents.position)),
  };
}

export type SurveysRepo = ReturnType<typeof createSurveysRepo>;
export type SurveySummaryRow = Awaited<ReturnType<SurveysRepo['listForPiano']>>[number];
export type SurveyRow = NonNullable<Awaited<ReturnType<SurveysRepo['find']>>>;
