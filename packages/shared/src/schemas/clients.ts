import { z } from 'zod';
import { Email } from './common';
import { Piano } from './pianos';

const optionalText = (max: number, label: string) =>
  z
    .string()
    .trim()
    .max(max, { error: `${label} is too long` })
    .transform((v) => (v === '' ? null : v))
    .nullable()
    .optional();

export const CreateClientInput = z.object({
  name: z.string({ error: 'Name is required' }).trim().min(1, { error: 'Name is required' }).max(200, { error: 'Name is too long' }),
  email: z.union([z.literal('').transform(() => null), Email]).nullable().optional(),
  phone: optionalText(40, 'Phone'),
  address: optionalText(500, 'Address'),
  notes: z.string().max(5000, { error: 'Notes are too long' }).optional(),
});
export type CreateClientInput = z.infer<typeof CreateClientInput>;

export const UpdateClientInput = CreateClientInput.partial().refine((v) => Object.values(v).some((x) => x !== undefined), {
  error: 'Nothing to change',
  path: ['name'],
});
export type UpdateClientInput = z.infer<typeof UpdateClientInput>;

export const ClientListQuery = z.object({
  q: z.string().trim().max(200).optional(),
  limit: z.coerce.number().int().min(1).max(200).default(50),
});
export type ClientListQuery = z.infer<typeof ClientListQuery>;

export const Client = z.object({
  id: z.string(),
  name: z.string(),
  email: z.string().nullable(),
  phone: z.string().nullable(),
  address: z.string().nullable(),
  notes: z.string(),
  createdAt: z.string(),
  updatedAt: z.string(),
});
export type Client = z.infer<typeof Client>;

export const ClientList = z.object({ clients: z.array(Client) });
export type ClientList = z.infer<typeof ClientList>;

export const ClientDetail = Client.extend({ pianos: z.array(Piano) });
export type ClientDetail = z.infer<typeof ClientDetail>;
