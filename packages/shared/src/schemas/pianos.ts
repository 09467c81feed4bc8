import { z } from 'zod';
import { Id } from './common';
import { JobStatus } from './job-status';

export const PIANO_TYPES = ['grand', 'upright', 'square', 'other'] as const;
export const PianoType = z.enum(PIANO_TYPES, { error: 'Choose grand, upright, square or other' });
export type PianoType = z.infer<typeof PianoType>;

export const KEYTOP_MATERIALS = ['ivory', 'plastic', 'other', 'unknown'] as const;
export const KeytopMaterial = z.enum(KEYTOP_MATERIALS, { error: 'Choose ivory, plastic, other or unknown' });
export type KeytopMaterial = z.infer<typeof KeytopMaterial>;

/** Size in whole millimetres: a grand's length or an upright's height (1 in = 25.4 mm exactly). */
export const SizeMm = z
  .number({ error: 'Size must be a number of millimetres' })
  .int({ error: 'Size must be whole millimetres' })
  .positive({ error: 'Size must be more than zero' })
  .max(4000, { error: 'Size above 4 m is not a piano: check the unit' });

export const CreatePianoInput = z.object({
  clientId: Id,
  maker: z.string({ error: 'Maker is required' }).trim().min(1, { error: 'Maker is required' }).max(200),
  model: z.string().trim().max(200).optional(),
  serialNumber: z.string().trim().max(100).optional(),
  type: PianoType,
  sizeMm: SizeMm.nullable().optional(),
  yearApprox: z.number().int().min(1700, { error: 'Year must be 1700 or later' }).max(2100, { error: 'Year must be 2100 or earlier' }).nullable().optional(),
  caseFinish: z.string().trim().max(200).optional(),
  keytopMaterial: KeytopMaterial.optional(),
  notes: z.string().max(5000).optional(),
});
export type CreatePianoInput = z.infer<typeof CreatePianoInput>;

export const UpdatePianoInput = CreatePianoInput.partial().refine((v) => Object.values(v).some((x) => x !== undefined), {
  error: 'Nothing to change',
  path: ['maker'],
});
export type UpdatePianoInput = z.infer<typeof UpdatePianoInput>;

export const PianoListQuery = z.object({
  q: z.string().trim().max(200).optional(),
  clientId: Id.optional(),
  limit: z.coerce.number().int().min(1).max(200).default(50),
});
export type PianoListQuery = z.infer<typeof PianoListQuery>;

export const Piano = z.object({
  id: z.string(),
  clientId: z.string(),
  clientName: z.string(),
  maker: z.string(),
  model: z.string(),
  serialNumber: z.string(),
  type: PianoType,
  sizeMm: z.number().nullable(),
  yearApprox: z.number().nullable(),
  caseFinish: z.string(),
  keytopMaterial: KeytopMaterial,
  notes: z.string(),
  createdAt: z.string(),
  updatedAt: z.string(),
});
export type Piano = z.infer<typeof Piano>;

export const PianoList = z.object({ pianos: z.array(Piano) });
export type PianoList = z.infer<typeof PianoList>;

/** One line of a piano's job history, newest first. */
export const PianoJob = z.object({
  id: z.string(),
  title: z.string(),
  status: JobStatus,
  stageName: z.string(),
  createdAt: z.string(),
  updatedAt: z.string(),
});
export type PianoJob = z.infer<typeof PianoJob>;

export const PianoDetail = Piano.extend({ jobs: z.array(PianoJob) });
export type PianoDetail = z.infer<typeof PianoDetail>;
