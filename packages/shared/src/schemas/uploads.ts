import { z } from 'zod';
import { Id } from './common';

/*
 * Photos. `POST /api/uploads` is multipart: one to ten `files` (JPEG, PNG or WebP, decided from the
 * content; at most 15 MB each by default) and exactly one of `surveyComponentId`, `jobId`,
 * `taskId` naming what they belong to. The server keeps a web-size copy (1600 px) and a thumbnail
 * (320 px), both JPEG without metadata (no GPS position).
 */

/** The text fields sent beside the files. */
export const UploadTarget = z
  .object({
    surveyComponentId: Id.optional(),
    jobId: Id.optional(),
    taskId: Id.optional(),
    /** Survey photos only: show them to the client with the survey. */
    isSharedWithClient: z.enum(['true', 'false']).transform((v) => v === 'true').optional(),
  })
  .refine((v) => [v.surveyComponentId, v.jobId, v.taskId].filter(Boolean).length === 1, {
    error: 'Say what the photos belong to: one survey component, job or task',
    path: ['surveyComponentId'],
  });
export type UploadTarget = z.infer<typeof UploadTarget>;

/** `GET /api/uploads/:id?size=thumb`: the thumbnail; without it, the web-size copy. */
export const UploadSizeQuery = z.object({ size: z.enum(['web', 'thumb'], { error: 'Size is web or thumb' }).default('web') });

/** `PATCH /api/uploads/:id` (owner, foreman): whether the client sees it. */
export const UpdateUploadInput = z.object({ isSharedWithClient: z.boolean({ error: 'Say whether the client sees this photo' }) });
export type UpdateUploadInput = z.infer<typeof UpdateUploadInput>;

export const Upload = z.object({
  id: z.string(),
  originalName: z.string(),
  sourceType: z.string(),
  width: z.number(),
  height: z.number(),
  byteSize: z.number(),
  surveyComponentId: z.string().nullable(),
  jobId: z.string().nullable(),
  taskId: z.string().nullable(),
  isSharedWithClient: z.boolean(),
  /** Paths of the web copy and thumbnail. */
  url: z.string(),
  thumbUrl: z.string(),
  createdAt: z.string(),
});
export type Upload = z.infer<typeof Upload>;

export const UploadList = z.object({ uploads: z.array(Upload) });
export type UploadList = z.infer<typeof UploadList>;
