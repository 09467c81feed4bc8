import { and, asc, desc, eq, inArray, isNotNull, or } from 'drizzle-orm';
import type { Database } from '@keybed/db/client';
import { clientLinks, clientResponses, clients, clientTerms, estimates, jobs, memberships, payments, pianos, surveyComponents, surveys, uploads, users, workshops } from '@keybed/db/schema';
import type { Tx } from '../auth/auth.repo';

type Db = Database | Tx;
export type LinkRow = typeof clientLinks.$inferSelect;
export type ResponseRow = typeof clientResponses.$inferSelect;
export type TermsValues = Omit<typeof clientTerms.$inferInsert, 'workshopId' | 'updatedAt'>;

export function createClientPageRepo(db: Database) {
  return {
    transaction: <T>(fn: (tx: Tx) => Promise<T>) => db.transaction(fn),

    async terms(workshopId: string, q: Db = db) {
      const [row] = await q.select().from(clientTerms).where(eq(clientTerms.workshopId, workshopId));
      return row;
    },

    async putTerms(workshopId: string, values: TermsValues, at: Date) {
      await db
        .insert(clientTerms)
        .values({ ...values, workshopId, updatedAt: at })
        .onConflictDoUpdate({ target: clientTerms.workshopId, set: { ...values, updatedAt: at } });
    },

    async workshopName(workshopId: string) {
      const [row] = await db.select({ name: workshops.name }).from(workshops).where(eq(workshops.id, workshopId));
      return row?.name ?? '';
    },

    /** Active owners' e-mail addresses, for the owner's notices. */
    async ownerEmails(workshopId: string) {
      const rows = await db
        .select({ email: users.email })
        .from(memberships)
        .innerJoin(users, eq(users.id, memberships.userId))
        .where(and(eq(memberships.workshopId, workshopId), eq(memberships.role, 'owner'), eq(memberships.isActive, true)));
      return rows.map((r) => r.email);
    },

    async anyOwnerId(workshopId: string) {
      const [row] = await db
        .select({ userId: memberships.userId })
        .from(memberships)
        .where(and(eq(memberships.workshopId, workshopId), eq(memberships.role, 'owner'), eq(memberships.isActive, true)))
        .orderBy(asc(memberships.createdAt))
        .limit(1);
      return row?.userId ?? null;
    },

    /** The estimate's job with its client and piano. */
    async context(workshopId: string, estimateId: string) {
      const [row] = await db
        .select({
          estimateId: estimates.id,
          jobId: jobs.id,
          jobStatus: jobs.status,
          client: { id: clients.id, name: clients.name, email: clients.email, address: clients.address },
          piano: { maker: pianos.maker, model: pianos.model, type: pianos.type, yearApprox: pianos.yearApprox, sizeMm: pianos.sizeMm, keytopMaterial: pianos.keytopMaterial, serialNumber: pianos.serialNumber },
        })
        .from(estimates)
        .innerJoin(jobs, eq(jobs.id, estimates.jobId))
        .innerJoin(clients, eq(clients.id, jobs.clientId))
        .innerJoin(pianos, eq(pianos.id, jobs.pianoId))
        .where(and(eq(estimates.workshopId, workshopId), eq(estimates.id, estimateId)));
      return row;
    },

    /** The latest survey the job was prepared from, with its findings that need work and the photos shared with the client. */
    async surveyOfJob(workshopId: string, jobId: string) {
      const [survey] = await db
        .select()
        .from(surveys)
        .where(and(eq(surveys.workshopId, workshopId), eq(surveys.jobId, jobId)))
        .orderBy(desc(surveys.surveyedOn), desc(surveys.createdAt))
        .limit(1);
      if (!survey) return undefined;
      const components = await db
        .select()
        .from(surveyComponents)
        .where(and(eq(surveyComponents.surveyId, survey.id), isNotNull(surveyComponents.grade), or(eq(surveyComponents.grade, 'needs_work'), eq(surveyComponents.grade, 'replace'))))
        .orderBy(asc(surveyComponents.position));
      const photos =
        components.length === 0
          ? []
          : await db
              .select({ id: uploads.id, surveyComponentId: uploads.surveyComponentId })
              .from(uploads)
              .where(and(inArray(uploads.surveyComponentId, components.map((c) => c.id)), eq(uploads.isSharedWithClient, true)))
              .orderBy(asc(uploads.createdAt));
      return { survey, components, photos };
    },

    /** A photo the client may see through a link to this estimate: shared, and of the survey the estimate's job came from. */
    async sharedPhoto(workshopId: string, jobId: string, photoId: string) {
      const [row] = await db
        .select({ storageKey: uploads.storageKey, thumbKey: uploads.thumbKey })
        .from(uploads)
        .innerJoin(surveyComponents, eq(surveyComponents.id, uploads.surveyComponentId))
        .innerJoin(surveys, eq(surveys.id, surveyComponents.surveyId))
        .where(and(eq(uploads.workshopId, workshopId), eq(uploads.id, photoId), eq(uploads.isSharedWithClient, true), eq(surveys.jobId, jobId)));
      return row;
    },

    async insertLink(values: typeof clientLinks.$inferInsert) {
      const [row] = await db.insert(clientLinks).values(values).returning();
      return row!;
    },

    linksOf: (workshopId: string, estimateId: string) =>
      db.select().from(clientLinks).where(and(eq(clientLinks.workshopId, workshopId), eq(clientLinks.estimateId, estimateId))).orderBy(desc(clientLinks.createdAt)),

    async revokeLink(workshopId: string, id: string, at: Date) {
      const [row] = await db.update(clientLinks).set({ revokedAt: at }).where(and(eq(clientLinks.workshopId, workshopId), eq(clientLinks.id, id))).returning();
      return row;
    },

    /** The link by its token's hash, with its estimate's revision and status. */
    async linkByHash(tokenHash: string) {
      const [row] = await db
        .select({ link: clientLinks, estimate: { id: estimates.id, jobId: estimates.jobId, revision: estimates.revision, status: estimates.status, version: estimates.version, kind: estimates.kind } })
        .from(clientLinks)
        .innerJoin(estimates, eq(estimates.id, clientLinks.estimateId))
        .where(eq(clientLinks.tokenHash, tokenHash));
      return row;
    },

    async markOpened(id: string, at: Date) {
      await db.update(clientLinks).set({ lastOpenedAt: at }).where(eq(clientLinks.id, id));
    },

    async response(estimateId: string, q: Db = db) {
      const [row] = await q.select().from(clientResponses).where(eq(clientResponses.estimateId, estimateId));
      return row;
    },

    /** Records the answer once per estimate; answers the stored one (which may be another request's). */
    async recordResponse(tx: Tx, values: typeof clientResponses.$inferInsert) {
      await tx.insert(clientResponses).values(values).onConflictDoNothing({ target: clientResponses.estimateId });
      const [row] = await tx.select().from(clientResponses).where(eq(clientResponses.estimateId, values.estimateId));
      return row!;
    },

    async deposit(estimateId: string) {
      const [row] = await db.select().from(payments).where(and(eq(payments.estimateId, estimateId), eq(payments.kind, 'deposit')));
      return row;
    },
  };
}

export type ClientPageRepo = ReturnType<typeof createClientPageRepo>;
