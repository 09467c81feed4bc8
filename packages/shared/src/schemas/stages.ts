import { z } from 'zod';
import { Id } from './common';

const StageName = z.string({ error: 'Name is required' }).trim().min(1, { error: 'Name is required' }).max(60, { error: 'Name is too long' });
const WipLimit = z.number().int({ error: 'WIP limit must be a whole number' }).min(1, { error: 'WIP limit must be at least 1' }).max(999).nullable();

export const CreateStageInput = z.object({ name: StageName, wipLimit: WipLimit.optional() });
export type CreateStageInput = z.infer<typeof CreateStageInput>;

/** Rename, set the WIP limit, or archive (only an empty stage) / restore. */
export const UpdateStageInput = z
  .object({ name: StageName.optional(), wipLimit: WipLimit.optional(), isArchived: z.boolean().optional() })
  .refine((v) => Object.values(v).some((x) => x !== undefined), { error: 'Nothing to change', path: ['name'] });
export type UpdateStageInput = z.infer<typeof UpdateStageInput>;

/** The full new order of the workshop's active stages. */
export const ReorderStagesInput = z.object({
  stageIds: z.array(Id).min(1, { error: 'List every active stage' }).refine((ids) => new Set(ids).size === ids.length, { error: 'A stage is listed twice' }),
});
export type ReorderStagesInput = z.infer<typeof ReorderStagesInput>;

export const Stage = z.object({
  id: z.string(),
  name: z.string(),
  position: z.number(),
  wipLimit: z.number().nullable(),
  isArchived: z.boolean(),
  jobCount: z.number(),
});
export type Stage = z.infer<typeof Stage>;

export const StageList = z.object({ stages: z.array(Stage) });
export type StageList = z.infer<typeof StageList>;

export const DEFAULT_STAGE_NAMES = ['Intake', 'Strip-down', 'Hammers', 'Regulation', 'Finish', 'Delivery'] as const;
