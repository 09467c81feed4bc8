import { sql } from 'drizzle-orm';
import { boolean, check, foreignKey, index, integer, pgTable, text, unique, uuid } from 'drizzle-orm/pg-core';
import { tasks } from './bench';
import { jobs } from './board';
import { createdAt, id } from './columns';
import { surveyComponents } from './surveys';
import { users } from './users';
import { workshops } from './workshops';

/**
 * A photo: a web-size copy and a thumbnail (both JPEG, metadata stripped) stored under random keys
 * in the configured storage. It belongs to exactly one survey component, job or task.
 */
export const uploads = pgTable(
  'uploads',
  {
    id: id(),
    workshopId: uuid()
      .notNull()
      .references(() => workshops.id, { onDelete: 'cascade' }),
    storageKey: text().notNull().unique(),
    thumbKey: text().notNull().unique(),
    /** The type the content was recognised as when it arrived (image/jpeg, image/png, image/webp). */
    sourceType: text().notNull(),
    /** The file name as sent, reduced to its last part, for display only. */
    originalName: text().notNull(),
    width: integer().notNull(),
    height: integer().notNull(),
    byteSize: integer().notNull(),
    surveyComponentId: uuid(),
    jobId: uuid(),
    taskId: uuid(),
    /** Shown on the client's page with the survey. */
    isSharedWithClient: boolean().notNull().default(false),
    uploadedBy: uuid().references(() => users.id, { onDelete: 'set null' }),
    createdAt: createdAt(),
  },
  (t) => [
    unique('uploads_id_workshop').on(t.id, t.workshopId),
    foreignKey({ name: 'uploads_component_same_workshop', columns: [t.surveyComponentId, t.workshopId], foreignColumns: [surveyComponents.id, surveyComponents.workshopId] }).onDelete('cascade'),
    foreignKey({ name: 'uploads_job_same_workshop', columns: [t.jobId, t.workshopId], foreignColumns: [jobs.id, jobs.workshopId] }).onDelete('cascade'),
    foreignKey({ name: 'uploads_task_same_workshop', columns: [t.taskId, t.workshopId], foreignColumns: [tasks.id, tasks.workshopId] }).onDelete('cascade'),
    check('uploads_one_owner', sql`num_nonnulls(${t.surveyComponentId}, ${t.jobId}, ${t.taskId}) = 1`),
    check('uploads_source_type', sql`${t.sourceType} in ('image/jpeg', 'image/png', 'image/webp')`),
    check('uploads_dimensions_positive', sql`${t.width} > 0 and ${t.height} > 0 and ${t.byteSize} > 0`),
    check('uploads_name_plain', sql`${t.originalName} !~ '[/\\\\]' and length(${t.originalName}) between 1 and 255`),
    index().on(t.surveyComponentId),
    index().on(t.jobId),
    index().on(t.taskId),
  ],
);
