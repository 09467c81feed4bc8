import { z } from 'zod';
import { Id } from './common';
import { QuantityMilli } from './parts';
import { MinorAmount } from './settings';
import { ComponentKey, SurveyPianoType } from './surveys';

/*
 * The work catalogue: standard operations with default lines. Labour in minutes (priced at the
 * workshop's charge-out rate on the estimate), parts from the parts catalogue in thousandths of
 * their unit, sublet work with the price to the client and the supplier's expected cost in minor
 * units. Costs are the owner's only; the foreman sees prices; technicians see the operations
 * without money.
 */

const Text = (what: string, max: number) =>
  z.string({ error: `${what} is required` }).trim().min(1, { error: `${what} is required` }).max(max, { error: `${what} is too long` });

export const CatalogueLineInput = z.discriminatedUnion(
  'kind',
  [
    z.object({ kind: z.literal('labour'), description: Text('Task', 300), minutes: z.number({ error: 'Enter minutes' }).int({ error: 'Use whole minutes' }).min(1, { error: 'Minutes must be above zero' }).max(30_000, { error: 'At most 500 hours' }) }),
    z.object({ kind: z.literal('part'), partId: Id, description: z.string().trim().max(300).optional(), quantityMilli: QuantityMilli }),
    z.object({ kind: z.literal('sublet'), description: Text('Description', 300), supplier: z.string().trim().max(200).default(''), quantityMilli: QuantityMilli.default(1000), unitPriceMinor: MinorAmount, unitCostMinor: MinorAmount.nullable().optional() }),
  ],
  { error: 'Choose labour, part or sublet' },
);
export type CatalogueLineInput = z.infer<typeof CatalogueLineInput>;

const fields = {
  name: Text('Name', 200),
  description: z.string().trim().max(2000, { error: 'Description is too long' }),
  /** Null: suits any piano. */
  pianoType: SurveyPianoType.nullable(),
  /** Survey components this operation remedies; "prepare estimate" proposes it for them. */
  componentKeys: z.array(ComponentKey).max(20).refine((keys) => new Set(keys).size === keys.length, { error: 'A component is listed twice' }),
  lines: z.array(CatalogueLineInput).min(1, { error: 'Add at least one line' }).max(50, { error: 'At most 50 lines' }),
  isActive: z.boolean(),
};

/** `POST /api/catalogue` (owner, foreman). */
export const CreateCatalogueOperationInput = z.object({
  ...fields,
  description: fields.description.default(''),
  pianoType: fields.pianoType.default(null),
  componentKeys: fields.componentKeys.default([]),
  isActive: fields.isActive.default(true),
});
export type CreateCatalogueOperationInput = z.infer<typeof CreateCatalogueOperationInput>;

/** `PATCH /api/catalogue/:id`: `lines` replaces the whole list; carries the version. */
export const UpdateCatalogueOperationInput = z
  .object({
    version: z.number({ error: 'Version must be a number' }).int().min(1),
    name: fields.name.optional(),
    description: fields.description.optional(),
    pianoType: fields.pianoType.optional(),
    componentKeys: fields.componentKeys.optional(),
    lines: fields.lines.optional(),
    isActive: fields.isActive.optional(),
  })
  .refine(({ version: _version, ...changes }) => Object.values(changes).some((x) => x !== undefined), { error: 'Nothing to change', path: ['name'] });
export type UpdateCatalogueOperationInput = z.infer<typeof UpdateCatalogueOperationInput>;

export const CatalogueListQuery = z.object({
  pianoType: SurveyPianoType.optional(),
  includeInactive: z.enum(['true', 'false']).transform((v) => v === 'true').default(false),
});

export const CatalogueLine = z.object({
  kind: z.enum(['labour', 'part', 'sublet']),
  description: z.string(),
  minutes: z.number().nullable(),
  part: z.object({ id: z.string(), sku: z.string(), name: z.string(), unit: z.string() }).nullable(),
  quantityMilli: z.number().nullable(),
  supplier: z.string().nullable(),
  /** Owner and foreman: sublet price; parts their catalogue sell price; labour the charge-out rate × minutes. */
  amountMinor: z.number().optional(),
  /** Owner only: sublet's expected cost. */
  unitCostMinor: z.number().nullable().optional(),
  unitPriceMinor: z.number().nullable().optional(),
});
export type CatalogueLine = z.infer<typeof CatalogueLine>;

export const CatalogueOperation = z.object({
  id: z.string(),
  name: z.string(),
  description: z.string(),
  pianoType: SurveyPianoType.nullable(),
  componentKeys: z.array(z.string()),
  isActive: z.boolean(),
  lines: z.array(CatalogueLine),
  labourMinutes: z.number(),
  /** Owner and foreman: the lines' price ex tax at today's rates. */
  netMinor: z.number().optional(),
  version: z.number(),
  updatedAt: z.string(),
});
export type CatalogueOperation = z.infer<typeof CatalogueOperation>;

export const CatalogueList = z.object({ operations: z.array(CatalogueOperation) });
export type CatalogueList = z.infer<typeof CatalogueList>;
